// The catalogue as the open data publishes it, from the cached reads: makers with their pack and published-result
// counts (summed from the same pack rows the packs table shows, so the two can never disagree), and the one pack
// filter (server/pack-search.ts) turned into the pack ids the results and group reads filter by.
import "server-only";
import type { PackWhere } from "@/db/queries/open-data/where";
import type { PackFilters } from "@/lib/api-contract/queries";
import { AppError } from "@/lib/errors";
import type { MakerRow } from "@/lib/open-data/records";
import { toPackParams } from "@/lib/pack-query-params";
import { findPackIds } from "@/server/pack-search";
import { cachedMakerCounts, knownGroup } from "@/server/public-data";

/** Active makers, by name, with their active packs and published results. */
export async function makerRows(): Promise<MakerRow[]> {
  return cachedMakerCounts();
}

const PACK_FILTER_KEYS = [
  "q",
  "maker",
  "cells",
  "connector",
  "minMah",
  "maxMah",
  "minC",
  "maxC",
  "minG",
  "maxG",
] as const;

/**
 * The packs table's filters as the ids of the packs they match (null when none is set): the same filter, and
 * the same fuzzy `q`, as /packs and GET /api/v1/packs.
 */
export async function packWhere(filters: PackFilters): Promise<PackWhere> {
  if (PACK_FILTER_KEYS.every((k) => filters[k] === undefined)) return { packIds: null };
  // Only the pack filters: a list's group or pack narrows its results, not the catalogue.
  const { q, maker, cells, connector, minMah, maxMah, minC, maxC, minG, maxG } = filters;
  const only = { q, maker, cells, connector, minMah, maxMah, minC, maxC, minG, maxG };
  return { packIds: await findPackIds(toPackParams(only)) };
}

/** An unknown like-for-like group (no published results in it) is a 404, on every list and download alike. */
export async function requireKnownGroup(key: string | undefined): Promise<void> {
  if (key !== undefined && !(await knownGroup(key)))
    throw new AppError("not_found", `No like-for-like group "${key}" has published results.`);
}
