// Where published results sit (pack, maker, group, bench), for the cache tags a change must revalidate
// (server/cache-tags.ts tagsForResult): the results of packs a catalogue edit touched, or of one bench profile.
import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import { makers, packs, results } from "@/db/schema";
import { isPublished, makerOfPack, packOfResult } from "./published";

export type ResultPlace = {
  resultId: number;
  packSlug: string;
  makerSlug: string;
  groupKey: string;
  benchProfileId: number | null;
};

/** Published results of these packs, or measured with this bench profile, with their pack, maker and group. */
export async function listPublishedResultPlaces(by: { packIds: number[] } | { benchProfileId: number }) {
  if ("packIds" in by && by.packIds.length === 0) return [];
  const which = "packIds" in by ? inArray(results.packId, by.packIds) : eq(results.benchProfileId, by.benchProfileId);
  const rows: ResultPlace[] = await db
    .select({
      resultId: results.id,
      packSlug: packs.slug,
      makerSlug: makers.slug,
      groupKey: results.groupKey,
      benchProfileId: results.benchProfileId,
    })
    .from(results)
    .innerJoin(packs, packOfResult)
    .innerJoin(makers, makerOfPack)
    .where(and(isPublished, which));
  return rows;
}
