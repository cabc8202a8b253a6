// The one pack filter with its search, in SQL (db/queries/pack-catalogue.ts): /packs, GET /api/v1/packs, the packs
// download and the results' pack filter all come through here. Not in the data cache: each answer is one indexed
// query over the catalogue and its summaries, and any stranger can make up new filters.
import "server-only";
import { listMatchingPackIds, listMatchingPacks, queryPackPage } from "@/db/queries/pack-catalogue";
import type { PackRow } from "@/lib/catalogue";
import type { PackPage } from "@/lib/pack-query";
import type { PackParams } from "@/lib/pack-query-params";

/** Every pack matching the filters and the search, in the table's order. */
export function findPacks(p: PackParams): Promise<PackRow[]> {
  return listMatchingPacks(p);
}

/** The ids of the packs matching the filters and the search. */
export function findPackIds(p: PackParams): Promise<number[]> {
  return listMatchingPackIds(p);
}

/** One page of the packs matching the filters and the search. */
export function findPackPage(p: PackParams): Promise<PackPage> {
  return queryPackPage(p);
}
