// Single-pack and single-maker reads by slug, each through a unique index (packs.slug, makers.slug) and, for the
// counts, results (pack_id, status) and packs (maker_id): their cost does not grow with the catalogue, unlike a
// search of the whole cached pack list. GET /api/v1/packs/{slug} and the cache guards of server/public-data.ts
// use them.
import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { makers, packs, results } from "@/db/schema";
import type { PackRow } from "@/lib/catalogue";
import { packLabelColumns } from "./packs";
import { isPublished, makerOfPack } from "./published";

const activeCatalogue = and(eq(packs.status, "active"), eq(makers.status, "active"));

/**
 * One active pack of an active maker, as a row of the packs table without a group: its published results and the
 * like-for-like groups they fall in (the counting rule of db/queries/published.ts); null for an unknown slug.
 */
export async function getPackRowBySlug(slug: string): Promise<PackRow | null> {
  const [pack] = await db
    .select({
      id: packs.id,
      slug: packs.slug,
      makerId: packs.makerId,
      model: packs.model,
      makerName: makers.name,
      makerSlug: makers.slug,
      ...packLabelColumns,
      resultCount: sql<number>`(
        select count(*)::int from ${results}
        where ${results.packId} = ${packs.id} and ${isPublished})`,
      groupCount: sql<number>`(
        select count(distinct ${results.groupKey})::int from ${results}
        where ${results.packId} = ${packs.id} and ${isPublished})`,
    })
    .from(packs)
    .innerJoin(makers, makerOfPack)
    .where(and(eq(packs.slug, slug), activeCatalogue))
    .limit(1);
  if (!pack) return null;
  return { ...pack, measuredC: null, labelRatio: null, capacityRatio: null, groupN: 0 };
}

/** Whether an active pack of an active maker has this slug (one row by the unique slug index). */
export async function activePackExists(slug: string): Promise<boolean> {
  const rows = await db
    .select({ id: packs.id })
    .from(packs)
    .innerJoin(makers, makerOfPack)
    .where(and(eq(packs.slug, slug), activeCatalogue))
    .limit(1);
  return rows.length > 0;
}

/** Whether an active maker with this slug has an active pack (makers.slug, then packs (maker_id); stops at one). */
export async function activeMakerWithPacksExists(slug: string): Promise<boolean> {
  const rows = await db
    .select({ id: packs.id })
    .from(makers)
    .innerJoin(packs, makerOfPack)
    .where(and(eq(makers.slug, slug), activeCatalogue))
    .limit(1);
  return rows.length > 0;
}
