import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { makers, packs } from "@/db/schema";

export type PackSummary = {
  id: number;
  slug: string;
  model: string;
  makerName: string;
  makerSlug: string;
  cellsInSeries: number;
  ratedCapacityMah: number;
  labelledContinuousC: number;
  labelledBurstC: number | null;
  weightG: number | null;
  connector: string;
};

const packColumns = {
  id: packs.id,
  slug: packs.slug,
  model: packs.model,
  makerName: makers.name,
  makerSlug: makers.slug,
  cellsInSeries: packs.cellsInSeries,
  ratedCapacityMah: packs.ratedCapacityMah,
  labelledContinuousC: packs.labelledContinuousC,
  labelledBurstC: packs.labelledBurstC,
  weightG: packs.weightG,
  connector: packs.connector,
};

/** Active packs in the catalogue, maker then model. */
export async function listActivePacks(): Promise<PackSummary[]> {
  return db
    .select(packColumns)
    .from(packs)
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(eq(packs.status, "active"))
    .orderBy(asc(makers.name), asc(packs.model));
}

export async function getPackBySlug(slug: string): Promise<PackSummary | null> {
  const rows = await db
    .select(packColumns)
    .from(packs)
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(and(eq(packs.slug, slug), eq(packs.status, "active")))
    .limit(1);
  return rows[0] ?? null;
}
