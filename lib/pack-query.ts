// The one pack filter: the packs table's filters, the search's ranking (Fuse.js over maker and model, of the packs
// PostgreSQL found), sorting and paging of the pack catalogue. Runs on the server over the cached catalogue for
// /packs, GET /api/v1/packs and the packs download; the results and group lists and their downloads take the ids
// of the packs it matches (server/open-data/catalogue.ts), so a filter or `q` means the same everywhere.
import Fuse from "fuse.js";
import type { PackRow } from "@/lib/catalogue";
import type { PackParams, PackSortKey } from "@/lib/pack-query-params";
import { searchWords } from "@/lib/pack-search";

export type PackPage = { rows: PackRow[]; total: number; page: number; pageCount: number; size: number };

const sortValue: Record<PackSortKey, (r: PackRow) => string | number | null> = {
  maker: (r) => r.makerName.toLowerCase(),
  model: (r) => r.model.toLowerCase(),
  cells: (r) => r.cellsInSeries,
  capacity: (r) => r.ratedCapacityMah,
  labelledC: (r) => r.labelledContinuousC,
  weight: (r) => r.weightG,
  connector: (r) => r.connector.toLowerCase(),
  results: (r) => r.resultCount,
  measuredC: (r) => r.measuredC,
  labelRatio: (r) => r.labelRatio,
  capacityRatio: (r) => r.capacityRatio,
};

const within = (v: number | null, min: number | null, max: number | null) =>
  (min === null || (v !== null && v >= min)) && (max === null || (v !== null && v <= max));

function filterPacks<R extends PackRow>(rows: R[], p: PackParams): R[] {
  return rows.filter(
    (r) =>
      (p.cells === null || r.cellsInSeries === p.cells) &&
      within(r.ratedCapacityMah, p.minMah, p.maxMah) &&
      within(r.labelledContinuousC, p.minC, p.maxC) &&
      within(r.weightG, p.minG, p.maxG) &&
      (p.connector === null || r.connector.toLowerCase() === p.connector.toLowerCase()) &&
      (p.maker === null || r.makerSlug === p.maker) &&
      // With a group chosen, only packs that have published results in it.
      (p.group === null || r.groupN > 0),
  );
}

/**
 * The packs the search found (PostgreSQL decides which match: db/queries/pack-search.ts), best match first:
 * Fuse.js scores each against the reader's words over "maker model" (extended search, a space means AND;
 * threshold 1, so it only orders and never drops one). Ties keep the catalogue's order (maker, model).
 */
function rankFound<R extends PackRow>(rows: R[], q: string, found: ReadonlySet<number>): R[] {
  const candidates = rows.filter((r) => found.has(r.id));
  const words = searchWords(q).map((w) => w.text);
  const fuse = new Fuse(candidates, {
    keys: [{ name: "title", getFn: (r) => `${r.makerName} ${r.model}` }],
    threshold: 1,
    ignoreLocation: true,
    useExtendedSearch: true,
  });
  const ranked = fuse.search(words.join(" ")).map((m) => m.item);
  const seen = new Set(ranked);
  return [...ranked, ...candidates.filter((r) => !seen.has(r))];
}

export function sortPacks<R extends PackRow>(rows: R[], key: PackSortKey, dir: "asc" | "desc"): R[] {
  const get = sortValue[key];
  const sign = dir === "asc" ? 1 : -1;
  return [...rows].sort((a, b) => {
    const va = get(a);
    const vb = get(b);
    // Missing values sort last whichever the direction: "—" is not a small number.
    if (va === null && vb === null) return a.slug.localeCompare(b.slug);
    if (va === null) return 1;
    if (vb === null) return -1;
    const c = typeof va === "number" && typeof vb === "number" ? va - vb : String(va).localeCompare(String(vb));
    return c !== 0 ? sign * c : a.slug.localeCompare(b.slug);
  });
}

/**
 * Every pack matching the filters and the search, in the table's order (relevance first for a search on the
 * default sort). `found` is the search's answer for `p.q` (the ids of the packs matching every word), null when
 * `p.q` holds no word.
 */
export function matchPacks<R extends PackRow>(rows: R[], p: PackParams, found: ReadonlySet<number> | null): R[] {
  const filtered = filterPacks(rows, p);
  if (found === null) return sortPacks(filtered, p.sort, p.dir);
  // A text search orders by relevance unless the reader picked a column to sort by.
  const searched = rankFound(filtered, p.q, found);
  return p.sort === "maker" && p.dir === "asc" ? searched : sortPacks(searched, p.sort, p.dir);
}

export function pageCountOf(total: number, size: number): number {
  return Math.max(1, Math.ceil(total / size));
}

/** One page of the matching packs. A page past the last is empty (the API answers 422 for it). */
export function queryPacks(rows: PackRow[], p: PackParams, found: ReadonlySet<number> | null): PackPage {
  const sorted = matchPacks(rows, p, found);
  return {
    rows: sorted.slice((p.page - 1) * p.size, p.page * p.size),
    total: sorted.length,
    page: p.page,
    pageCount: pageCountOf(sorted.length, p.size),
    size: p.size,
  };
}
