// URL slugs: catalogue entries (makers, packs — the seed, proposals and their activation) and heading anchors
// of the Markdown pages (server/markdown.ts).
export function slugify(text: string, maxLength = 80): string {
  const slug = text
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, maxLength)
    .replace(/-+$/, "");
  return slug || "unnamed";
}

/** Catalogue slugs (makers and packs) are at most this long, a numbered suffix included. */
const CATALOGUE_SLUG_MAX = 60;

const words = (text: string) => slugify(text, 200).split("-").filter(Boolean);

export function makerSlug(name: string, max = CATALOGUE_SLUG_MAX): string {
  return slugify(name, max);
}

/**
 * A pack's slug: maker, model, cells and capacity, each said once ("volta-ridge-1300-4s-75c" from maker
 * "Volta Ridge", model "1300 4S 75C", 4 cells, 1300 mAh). When that is too long, the maker, the cells and the
 * capacity stay and the model keeps as many of its words as fit, in order.
 */
export function packSlug(
  p: { makerName: string; model: string; cellsInSeries: number; ratedCapacityMah: number },
  max = CATALOGUE_SLUG_MAX,
): string {
  const maker = words(p.makerName).length ? words(p.makerName) : ["pack"];
  const model = words(p.model);
  // A model that repeats the maker's name ("Volta Ridge Volta 1300") says it once.
  if (model.length > maker.length && maker.every((w, i) => model[i] === w)) model.splice(0, maker.length);
  const cells = `${p.cellsInSeries}s`;
  const mah = String(p.ratedCapacityMah);
  const named = (w: string) => w === cells || w === mah || w === `${mah}mah`;
  const tail = [
    ...(model.includes(cells) ? [] : [cells]),
    ...(model.includes(mah) || model.includes(`${mah}mah`) ? [] : [`${mah}mah`]),
  ];
  const whole = [...maker, ...model, ...tail].join("-");
  if (whole.length <= max) return whole;
  // Too long: keep the maker (cut if it alone is too long), then cells and capacity, and model words that fit.
  const essentials = [cells, `${mah}mah`];
  const room = max - essentials.join("-").length - 1;
  const head = maker.join("-").length <= room ? maker : [slugify(maker.join("-"), Math.max(1, room))];
  const kept: string[] = [];
  for (const w of model.filter((x) => !named(x))) {
    if ([...head, ...kept, w, ...essentials].join("-").length > max) break;
    kept.push(w);
  }
  return [...head, ...kept, ...essentials].join("-");
}

/**
 * The first slug `taken` does not hold: make(max), then make(max − 2) + "-2", make(max − 2) + "-3" … so a
 * numbered slug is shortened by whole words, never longer than `max`.
 */
export function freeSlugFrom(
  make: (max: number) => string,
  taken: ReadonlySet<string>,
  max = CATALOGUE_SLUG_MAX,
): string {
  const base = make(max);
  if (!taken.has(base)) return base;
  for (let n = 2; ; n++) {
    const suffix = `-${n}`;
    const candidate = `${make(max - suffix.length)}${suffix}`;
    if (!taken.has(candidate)) return candidate;
  }
}
