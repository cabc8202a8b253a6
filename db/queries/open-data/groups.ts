// Like-for-like groups and per-pack aggregates (median of approved results, with n and spread).
import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { makers, packs, results } from "@/db/schema";
import type { PackFilters } from "@/lib/validations/open-data";
import { groupLabel as groupLabelOf } from "@/lib/open-data/aggregate";
import { packConditions } from "./packs";

export type GroupRow = { key: string; resultCount: number; packCount: number };

export async function listGroups(minResults = 1): Promise<GroupRow[]> {
  return db
    .select({
      key: results.groupKey,
      resultCount: sql<number>`count(*)::int`,
      packCount: sql<number>`count(distinct ${results.packId})::int`,
    })
    .from(results)
    .where(eq(results.status, "approved"))
    .groupBy(results.groupKey)
    .having(sql`count(*) >= ${minResults}`)
    .orderBy(sql`count(*) desc`, asc(results.groupKey));
}

/** One sample of a group: the values the aggregates are computed from, with the pack they belong to. */
export type GroupSample = {
  resultId: number;
  packId: number;
  packSlug: string;
  makerSlug: string;
  makerName: string;
  model: string;
  cellsInSeries: number;
  ratedCapacityMah: number;
  labelledContinuousC: number;
  ambientTemperatureC: number;
  cutoffVPerCell: number;
  loadCurrentA: number;
  cyclesBeforeTest: number;
  resistanceMethod: string;
  capacityMah: number | null;
  dcResistanceMohm: number | null;
  resistanceAt25CMohm: number | null;
  holdVoltagePerCellV: number | null;
  temperatureRiseC: number | null;
  sagLimitedC: number | null;
  labelRatio: number | null;
  capacityRatio: number | null;
};

export async function listGroupSamples(groupKey: string, f: PackFilters = {}): Promise<GroupSample[]> {
  return db
    .select({
      resultId: results.id,
      packId: packs.id,
      packSlug: packs.slug,
      makerSlug: makers.slug,
      makerName: makers.name,
      model: packs.model,
      cellsInSeries: packs.cellsInSeries,
      ratedCapacityMah: packs.ratedCapacityMah,
      labelledContinuousC: packs.labelledContinuousC,
      ambientTemperatureC: results.ambientTemperatureC,
      cutoffVPerCell: results.cutoffVPerCell,
      loadCurrentA: results.loadCurrentA,
      cyclesBeforeTest: results.cyclesBeforeTest,
      resistanceMethod: results.resistanceMethod,
      capacityMah: results.capacityMah,
      dcResistanceMohm: results.dcResistanceMohm,
      resistanceAt25CMohm: results.resistanceAt25CMohm,
      holdVoltagePerCellV: results.holdVoltagePerCellV,
      temperatureRiseC: results.temperatureRiseC,
      sagLimitedC: results.sagLimitedC,
      labelRatio: results.labelRatio,
      capacityRatio: results.capacityRatio,
    })
    .from(results)
    .innerJoin(packs, eq(packs.id, results.packId))
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(and(eq(results.status, "approved"), eq(results.groupKey, groupKey), ...packConditions(f)))
    .orderBy(asc(makers.name), asc(packs.model), asc(results.id));
}

export type GroupOption = GroupRow & { label: string | null };

/** Groups with a human label (from one result's method card), most results first — for the chart builder. */
export async function listGroupOptions(minResults = 3): Promise<GroupOption[]> {
  const groups = await listGroups(minResults);
  const cards = await db
    .selectDistinctOn([results.groupKey], {
      key: results.groupKey,
      resistanceMethod: results.resistanceMethod,
      ambientTemperatureC: results.ambientTemperatureC,
      cutoffVPerCell: results.cutoffVPerCell,
      loadCurrentA: results.loadCurrentA,
      cyclesBeforeTest: results.cyclesBeforeTest,
      ratedCapacityMah: packs.ratedCapacityMah,
    })
    .from(results)
    .innerJoin(packs, eq(packs.id, results.packId))
    .where(eq(results.status, "approved"))
    .orderBy(results.groupKey, asc(results.id));
  const byKey = new Map(cards.map((c) => [c.key, c]));
  return groups.map((g) => ({ ...g, label: groupLabelOf(byKey.get(g.key)) }));
}

/** What a like-for-like group holds, per maker and pack size: approved results, and those with a label ratio
 * (the label check and maker ranking draw only those). The chart builder offers only what has data. */
export type GroupCoverageRow = { group: string; maker: string; cells: number; results: number; rated: number };

export async function listGroupCoverage(minResults = 3): Promise<GroupCoverageRow[]> {
  const groups = new Set((await listGroups(minResults)).map((g) => g.key));
  const rows = await db
    .select({
      group: results.groupKey,
      maker: makers.slug,
      cells: packs.cellsInSeries,
      results: sql<number>`count(*)::int`,
      rated: sql<number>`count(${results.labelRatio})::int`,
    })
    .from(results)
    .innerJoin(packs, eq(packs.id, results.packId))
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(eq(results.status, "approved"))
    .groupBy(results.groupKey, makers.slug, packs.cellsInSeries)
    .orderBy(results.groupKey, makers.slug, packs.cellsInSeries);
  return rows.filter((r) => groups.has(r.group));
}
