import type { PackRow } from "@/lib/catalogue";

/** A row as GET /api/v1/packs sends it (lib/api-contract/responses.ts#packListItem). */
export type ApiPackRow = PackRow;
/** What the table shows of one answer of GET /api/v1/packs ({ data, meta, links }). */
export type ApiPackPage = { data: ApiPackRow[]; page: number; pageCount: number; total: number };
/** The answer itself, as far as the table reads it. */
export type ApiPackList = { data: ApiPackRow[]; meta: { page: number; pageCount: number; total: number } };
export type FilterOptions = {
  makers: { slug: string; name: string }[];
  connectors: string[];
  cells: number[];
  groups: { key: string; label: string; packCount: number }[];
};
