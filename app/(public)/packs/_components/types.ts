import type { PackRow } from "@/lib/catalogue";

/** A row as the public API sends it (no database id). */
export type ApiPackRow = Omit<PackRow, "id">;
export type ApiPackPage = {
  data: ApiPackRow[];
  page: number;
  pageSize: number;
  pageCount: number;
  total: number;
  group: string | null;
};
export type FilterOptions = {
  makers: { slug: string; name: string }[];
  connectors: string[];
  cells: number[];
  groups: { key: string; label: string; packCount: number }[];
};
