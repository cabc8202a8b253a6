// The one pack filter with its search: PostgreSQL finds the packs matching every word of `q`
// (db/queries/pack-search.ts), lib/pack-query.ts filters, ranks, sorts and pages the cached rows. /packs,
// GET /api/v1/packs, the packs download and the results' pack filter all come through here.
import "server-only";
import { searchPackIds } from "@/db/queries/pack-search";
import type { PackRow } from "@/lib/catalogue";
import { matchPacks, queryPacks, type PackPage } from "@/lib/pack-query";
import type { PackParams } from "@/lib/pack-query-params";

/** Every pack matching the filters and the search, in the table's order. */
export async function findPacks<R extends PackRow>(rows: R[], p: PackParams): Promise<R[]> {
  return matchPacks(rows, p, await searchPackIds(p.q));
}

/** One page of the packs matching the filters and the search. */
export async function findPackPage(rows: PackRow[], p: PackParams): Promise<PackPage> {
  return queryPacks(rows, p, await searchPackIds(p.q));
}
