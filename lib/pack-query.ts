// Filters, fuzzy search (Fuse.js over maker and model), sorting and paging of the pack catalogue. Runs on
// the server (API and the first page of /packs) over the cached catalogue — thousands of rows at most —
// so the browser never downloads the search index.
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

function filterPacks(rows: PackRow[], p: PackParams): PackRow[] {
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
function searchPacks(rows: PackRow[], q: string): PackRow[] {
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

export function sortPacks(rows: PackRow[], key: PackSortKey, dir: "asc" | "desc"): PackRow[] {
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

export function queryPacks(rows: PackRow[], p: PackParams): PackPage {
  const filtered = filterPacks(rows, p);
  // A text search orders by relevance unless the reader picked a column to sort by.
  const searched = searchPacks(filtered, p.q);
  const sorted = p.q.trim() && p.sort === "maker" && p.dir === "asc" ? searched : sortPacks(searched, p.sort, p.dir);
  const pageCount = Math.max(1, Math.ceil(sorted.length / p.size));
  const page = Math.min(p.page, pageCount);
  return {
    rows: sorted.slice((page - 1) * p.size, page * p.size),
    total: sorted.length,
    page,
    pageCount,
    size: p.size,
  };
}
