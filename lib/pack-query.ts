// The pack filter's pure half: the search's ranking (Fuse.js over maker and model, of the packs PostgreSQL found)
// and page counting. Filtering, sorting and paging run in SQL (db/queries/pack-catalogue.ts) for /packs,
// GET /api/v1/packs, the packs download and the results' pack filter, so a filter or `q` means the same everywhere.
import Fuse from "fuse.js";
import type { PackRow } from "@/lib/catalogue";
import { searchWords } from "@/lib/pack-search";

export type PackPage = { rows: PackRow[]; total: number; page: number; pageCount: number; size: number };

/**
 * The packs the search found (PostgreSQL decides which match: db/queries/pack-search.ts), best match first:
 * Fuse.js scores each against the reader's words over "maker model" (extended search, a space means AND;
 * threshold 1, so it only orders and never drops one). Ties keep the order given (the catalogue's: maker, model).
 */
export function rankBySearch<R extends Pick<PackRow, "makerName" | "model">>(found: R[], q: string): R[] {
  const words = searchWords(q).map((w) => w.text);
  if (words.length === 0) return found;
  const fuse = new Fuse(found, {
    keys: [{ name: "title", getFn: (r) => `${r.makerName} ${r.model}` }],
    threshold: 1,
    ignoreLocation: true,
    useExtendedSearch: true,
  });
  const ranked = fuse.search(words.join(" ")).map((m) => m.item);
  const seen = new Set(ranked);
  return [...ranked, ...found.filter((r) => !seen.has(r))];
}

export function pageCountOf(total: number, size: number): number {
  return Math.max(1, Math.ceil(total / size));
}
