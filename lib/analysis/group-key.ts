/**
 * The like-for-like key: results are compared only with results that share it. Computed from
 * the method card, never typed. Five parts, each a band chosen so that figures inside it are
 * close enough to compare (reasons in content/methods/figures.md and content/methods/like-for-like.md):
 *   resistance method · ambient band · cut-off per cell (0.1 V) · load-rate band · pack age band.
 * Key strings use only [a-z0-9.-_] so they are safe in URLs and file names.
 *
 * The resistance part is what the LOG shows (groupKeyForAnalysis): the method the analysis used to
 * read the DC resistance, not the one typed on the method card — a result whose card says "charger
 * read-out" carries a resistance Sagline read from its log's step, and is compared as such.
 */
export type ResistanceMethod = "iec-61960-two-level" | "dc-step" | "ac-1khz" | "charger-readout";

export type MethodCardForKey = {
  resistanceMethod: string;
  ambientC: number;
  cutoffVPerCell: number;
  loadCurrentA: number;
  ratedMah: number;
  cyclesBeforeTest: number;
};

export type GroupKey = {
  key: string;
  parts: { resistance: string; ambient: string; cutoff: string; rate: string; age: string };
  label: string;
};

export const RESISTANCE_METHODS: Record<ResistanceMethod, string> = {
  "iec-61960-two-level": "IEC 61960-3 two-level",
  "dc-step": "DC step",
  "ac-1khz": "AC 1 kHz",
  "charger-readout": "charger read-out",
};

type Band = { key: string; label: string };

/** Ambient °C: [lower, upper) — a result at exactly 25 °C is in 25–35. */
export const AMBIENT_EDGES_C = [15, 25, 35];
/** Load rate C: (lower, upper] — a test at exactly 10C is in 5–10C. */
export const RATE_EDGES_C = [2, 5, 10, 20, 40];
/** Cycles before the test: [lower, upper]. */
export const AGE_BANDS: { max: number; key: string; label: string }[] = [
  { max: 4, key: "new", label: "new" },
  { max: 49, key: "c5-49", label: "5–49 cycles" },
  { max: 199, key: "c50-199", label: "50–199 cycles" },
  { max: Number.POSITIVE_INFINITY, key: "c200-up", label: "200+ cycles" },
];

export function ambientBand(ambientC: number): Band {
  if (!Number.isFinite(ambientC)) return { key: "a-unknown", label: "ambient unknown" };
  const [a, b, c] = AMBIENT_EDGES_C as [number, number, number];
  if (ambientC < a) return { key: `alt${a}`, label: `below ${a} °C` };
  if (ambientC < b) return { key: `a${a}-${b}`, label: `${a}–${b} °C` };
  if (ambientC < c) return { key: `a${b}-${c}`, label: `${b}–${c} °C` };
  return { key: `agt${c}`, label: `above ${c} °C` };
}

export function cutoffBand(cutoffVPerCell: number): Band {
  if (!Number.isFinite(cutoffVPerCell) || cutoffVPerCell <= 0) return { key: "co-unknown", label: "cut-off unknown" };
  const rounded = (Math.round(cutoffVPerCell * 10) / 10).toFixed(1);
  return { key: `co${rounded}`, label: `${rounded} V cut-off` };
}

export function rateBand(loadCurrentA: number, ratedMah: number): Band {
  const rate = loadCurrentA / (ratedMah / 1000);
  if (!Number.isFinite(rate) || rate <= 0) return { key: "r-unknown", label: "rate unknown" };
  // Round to 0.01C first so 50 A on a 5000 mAh pack is exactly 10C, not 10.000000001C.
  const c = Math.round(rate * 100) / 100;
  let lower = 0;
  for (const edge of RATE_EDGES_C) {
    if (c <= edge) return { key: `r${lower}-${edge}`, label: `${lower === 0 ? "up to " : `${lower}–`}${edge}C` };
    lower = edge;
  }
  return { key: `r${lower}-up`, label: `above ${lower}C` };
}

export function ageBand(cyclesBeforeTest: number): Band {
  const cycles = Number.isFinite(cyclesBeforeTest) ? Math.max(0, Math.floor(cyclesBeforeTest)) : Number.NaN;
  if (Number.isNaN(cycles)) return { key: "age-unknown", label: "age unknown" };
  const band = AGE_BANDS.find((b) => cycles <= b.max) ?? AGE_BANDS[AGE_BANDS.length - 1];
  return { key: band?.key ?? "c200-up", label: band?.label ?? "200+ cycles" };
}

export function resistanceBand(method: string): Band {
  const known = RESISTANCE_METHODS[method as ResistanceMethod];
  if (known) return { key: method, label: known };
  const slug =
    method
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-|-$/g, "") || "unknown";
  return { key: `other-${slug}`.slice(0, 40), label: method || "unknown method" };
}

/** The method the analysis used (Figures.dcResistanceMethod): two-level, step, or none. */
export type AnalysedResistanceMethod = "iec-61960-two-level" | "step" | null;
/** Key part for results whose log gave no DC resistance. */
export const NO_DC_RESISTANCE_KEY = "dc-none";
const NO_DC_RESISTANCE_LABEL = "no DC resistance in the log";

export function analysedResistanceBand(method: AnalysedResistanceMethod): Band {
  if (method === "iec-61960-two-level") return { key: method, label: RESISTANCE_METHODS[method] };
  if (method === "step") return { key: "dc-step", label: RESISTANCE_METHODS["dc-step"] };
  return { key: NO_DC_RESISTANCE_KEY, label: NO_DC_RESISTANCE_LABEL };
}

/**
 * The like-for-like key of an analysed result: the resistance part from the analysis
 * (figures.dcResistanceMethod), the other parts from the method card. Use this for new results.
 */
export function groupKeyForAnalysis(
  method: AnalysedResistanceMethod,
  card: Omit<MethodCardForKey, "resistanceMethod">,
): GroupKey {
  return keyFromBands(analysedResistanceBand(method), card);
}

/** The key from a method card's typed resistance method (older results, and cards without a log). */
export function groupKey(card: MethodCardForKey): GroupKey {
  return keyFromBands(resistanceBand(card.resistanceMethod), card);
}

function keyFromBands(resistance: Band, card: Omit<MethodCardForKey, "resistanceMethod">): GroupKey {
  const ambient = ambientBand(card.ambientC);
  const cutoff = cutoffBand(card.cutoffVPerCell);
  const rate = rateBand(card.loadCurrentA, card.ratedMah);
  const age = ageBand(card.cyclesBeforeTest);
  return {
    key: [resistance.key, ambient.key, cutoff.key, rate.key, age.key].join("_"),
    parts: { resistance: resistance.key, ambient: ambient.key, cutoff: cutoff.key, rate: rate.key, age: age.key },
    label: [resistance.label, ambient.label, cutoff.label, rate.label, age.label].join(" · "),
  };
}

/**
 * The label of a key, read back part by part with the same band functions that made it (so the two never
 * drift apart); null when the string is not a key these functions would produce. Lets pages that only
 * hold a key (the review queue, its filter) show "DC step · 15–25 °C · …" instead of the key itself.
 */
export function labelForGroupKey(key: string): string | null {
  const parts = key.split("_");
  if (parts.length !== 5) return null;
  const [res, amb, co, rate, age] = parts as [string, string, string, string, string];
  const labels = [resistanceFromKey(res), ambientFromKey(amb), cutoffFromKey(co), rateFromKey(rate), ageFromKey(age)];
  return labels.every((l): l is string => l !== null) ? labels.join(" · ") : null;
}

/** The resistance band of a stored key's first part ("dc-step", "dc-none", "charger-readout", …); null when unknown. */
export function resistanceBandFromKey(key: string): Band | null {
  const part = key.split("_")[0] ?? "";
  const label = resistanceFromKey(part);
  return label === null ? null : { key: part, label };
}

function same(band: Band, key: string): string | null {
  return band.key === key ? band.label : null;
}

function resistanceFromKey(key: string): string | null {
  if (key === NO_DC_RESISTANCE_KEY) return NO_DC_RESISTANCE_LABEL;
  if (key in RESISTANCE_METHODS) return RESISTANCE_METHODS[key as ResistanceMethod];
  const m = /^other-([a-z0-9-]+)$/.exec(key);
  return m?.[1] ? m[1].replace(/-/g, " ") : null;
}

function ambientFromKey(key: string): string | null {
  if (key === "a-unknown") return ambientBand(Number.NaN).label;
  let m = /^alt(\d+)$/.exec(key);
  if (m) return same(ambientBand(Number(m[1]) - 1), key);
  m = /^agt(\d+)$/.exec(key);
  if (m) return same(ambientBand(Number(m[1])), key);
  m = /^a(\d+)-(\d+)$/.exec(key);
  return m ? same(ambientBand(Number(m[1])), key) : null;
}

function cutoffFromKey(key: string): string | null {
  if (key === "co-unknown") return cutoffBand(Number.NaN).label;
  const m = /^co(\d+\.\d)$/.exec(key);
  return m ? same(cutoffBand(Number(m[1])), key) : null;
}

function rateFromKey(key: string): string | null {
  if (key === "r-unknown") return rateBand(Number.NaN, 1000).label;
  let m = /^r(\d+)-up$/.exec(key);
  if (m) return same(rateBand(Number(m[1]) + 1, 1000), key);
  m = /^r(\d+)-(\d+)$/.exec(key);
  return m ? same(rateBand(Number(m[2]), 1000), key) : null;
}

function ageFromKey(key: string): string | null {
  if (key === "age-unknown") return ageBand(Number.NaN).label;
  return AGE_BANDS.find((b) => b.key === key)?.label ?? null;
}
