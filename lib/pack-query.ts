// The one pack filter: the packs table's filters, fuzzy search (Fuse.js over maker and model), sorting and
// paging of the pack catalogue. Runs on the server over the cached catalogue — thousands of rows at most — for
// /packs, GET /api/v1/packs and the packs download; the results and group lists and their downloads take the ids
// of the packs it matches (server/open-data/pack-filter.ts), so a filter or `q` means the same everywhere.
import Fuse from "fuse.js";
import type { PackRow } from "@/lib/catalogue";
import type { PackParams, PackSortKey } from "@/lib/pack-query-params";

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
 * Fuzzy match on maker and model ("brakwater torent" finds Brackwater Torrent), best match first. Every
 * word must match somewhere in "maker model" (Fuse's extended search: a space means AND); Fuse's operator
 * characters are dropped from the reader's text so they search as plain words.
 */
function searchPacks<R extends PackRow>(rows: R[], q: string): R[] {
  const query = q
    .replace(/[\^!'=$|"]/g, " ")
    .replace(/\s+/g, " ")
    .trim();
  if (!query) return rows;
  const fuse = new Fuse(rows, {
    keys: [{ name: "title", getFn: (r) => `${r.makerName} ${r.model}` }],
    threshold: 0.4,
    ignoreLocation: true,
    useExtendedSearch: true,
  });
  return fuse.search(query).map((m) => m.item);
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

/** Every pack matching the filters and the search, in the table's order (relevance first for a search on the
 * default sort). */
export function matchPacks<R extends PackRow>(rows: R[], p: PackParams): R[] {
  const filtered = filterPacks(rows, p);
  // A text search orders by relevance unless the reader picked a column to sort by.
  const searched = searchPacks(filtered, p.q);
  return p.q.trim() && p.sort === "maker" && p.dir === "asc" ? searched : sortPacks(searched, p.sort, p.dir);
}

export function pageCountOf(total: number, size: number): number {
  return Math.max(1, Math.ceil(total / size));
}

/** One page of the matching packs. A page past the last is empty (the API answers 422 for it). */
export function queryPacks(rows: PackRow[], p: PackParams): PackPage {
  const sorted = matchPacks(rows, p);
  return {
    rows: sorted.slice((p.page - 1) * p.size, p.page * p.size),
    total: sorted.length,
    page: p.page,
    pageCount: pageCountOf(sorted.length, p.size),
    size: p.size,
  };
}
