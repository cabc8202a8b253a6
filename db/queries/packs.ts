import "server-only";
import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { db } from "@/db";
import { makers, packs, results } from "@/db/schema";
import type { PackRow, PackSummary } from "@/lib/catalogue";
import { listPacksInGroup } from "./groups";
import { isPublished, makerOfPack, packOfResult } from "./published";

/** The columns of PackLabelFields, to spread into a select. */
export const packLabelColumns = {
  cellsInSeries: packs.cellsInSeries,
  ratedCapacityMah: packs.ratedCapacityMah,
  labelledContinuousC: packs.labelledContinuousC,
  labelledBurstC: packs.labelledBurstC,
  weightG: packs.weightG,
  connector: packs.connector,
};

const packColumns = {
  id: packs.id,
  slug: packs.slug,
  makerId: packs.makerId,
  model: packs.model,
  makerName: makers.name,
  makerSlug: makers.slug,
  ...packLabelColumns,
};

const activeCatalogue = and(eq(packs.status, "active"), eq(makers.status, "active"));

/** Active packs of active makers in the catalogue, maker then model. */
export async function listActivePacks(): Promise<PackSummary[]> {
  return db
    .select(packColumns)
    .from(packs)
    .innerJoin(makers, makerOfPack)
    .where(activeCatalogue)
    .orderBy(asc(makers.name), asc(packs.model), asc(packs.id));
}

/** Active makers, by name (with or without active packs). */
export async function listActiveMakers(): Promise<{ id: number; slug: string; name: string }[]> {
  return db
    .select({ id: makers.id, slug: makers.slug, name: makers.name })
    .from(makers)
    .where(eq(makers.status, "active"))
    .orderBy(asc(makers.name), asc(makers.id));
}

export async function getPackBySlug(slug: string): Promise<PackSummary | null> {
  const rows = await db
    .select(packColumns)
    .from(packs)
    .innerJoin(makers, makerOfPack)
    .where(and(eq(packs.slug, slug), activeCatalogue))
    .limit(1);
  return rows[0] ?? null;
}

/** Every active pack with its published-result counts; with a group, the pack's medians in it. */
export async function listPackRows(groupKey: string | null): Promise<PackRow[]> {
  const [list, counts, inGroup] = await Promise.all([
    listActivePacks(),
    db
      .select({
        packId: results.packId,
        n: sql<number>`count(*)::int`,
        groups: sql<number>`count(distinct ${results.groupKey})::int`,
      })
      .from(results)
      .innerJoin(packs, packOfResult)
      .innerJoin(makers, makerOfPack)
      .where(isPublished)
      .groupBy(results.packId),
    groupKey ? listPacksInGroup(groupKey) : Promise.resolve([]),
  ]);
  const countBy = new Map(counts.map((c) => [c.packId, c]));
  const groupBy = new Map(inGroup.map((g) => [g.packId, g]));
  return list.map((p) => {
    const c = countBy.get(p.id);
    const g = groupBy.get(p.id);
    return {
      ...p,
      resultCount: c?.n ?? 0,
      groupCount: c?.groups ?? 0,
      measuredC: g?.measuredC?.median ?? null,
      labelRatio: g?.labelRatio ?? null,
      capacityRatio: g?.capacityRatio ?? null,
      groupN: g?.n ?? 0,
    };
  });
}

/** Active packs by slug, in the order asked (unknown slugs are skipped). */
export async function getPacksBySlugs(slugs: string[]): Promise<PackSummary[]> {
  if (slugs.length === 0) return [];
  const rows = await db
    .select(packColumns)
    .from(packs)
    .innerJoin(makers, makerOfPack)
    .where(and(inArray(packs.slug, slugs), activeCatalogue));
  const bySlug = new Map(rows.map((r) => [r.slug, r]));
  return slugs.map((s) => bySlug.get(s)).filter((p): p is PackSummary => p !== undefined);
}
