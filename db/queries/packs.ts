import "server-only";
import { and, asc, eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import { makers, packs } from "@/db/schema";
import type { PackSummary } from "@/lib/catalogue";
import { makerOfPack } from "./published";

/** The columns of PackLabelFields, to spread into a select. */
export const packLabelColumns = {
  cellsInSeries: packs.cellsInSeries,
  ratedCapacityMah: packs.ratedCapacityMah,
  labelledContinuousC: packs.labelledContinuousC,
  labelledBurstC: packs.labelledBurstC,
  weightG: packs.weightG,
  connector: packs.connector,
};

export const packColumns = {
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

export async function getPackBySlug(slug: string): Promise<PackSummary | null> {
  const rows = await db
    .select(packColumns)
    .from(packs)
    .innerJoin(makers, makerOfPack)
    .where(and(eq(packs.slug, slug), activeCatalogue))
    .limit(1);
  return rows[0] ?? null;
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
