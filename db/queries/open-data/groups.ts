// One like-for-like group's samples: the values per-pack aggregates (median of published results, with n and
// spread) are computed from, with the pack each belongs to.
import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { makers, packGroupSummaries, packs, results } from "@/db/schema";
import { isCatalogueActive, isPublished, makerOfPack, packOfResult } from "@/db/queries/published";
import { resultConditions, type PackWhere } from "./where";

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
  sustainedCMeasured: number | null;
  sustainedLabelRatio: number | null;
  capacityRatio: number | null;
};

export async function listGroupSamples(groupKey: string, w: PackWhere): Promise<GroupSample[]> {
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
      sustainedCMeasured: results.sustainedCMeasured,
      sustainedLabelRatio: results.sustainedLabelRatio,
      capacityRatio: results.capacityRatio,
    })
    .from(results)
    .innerJoin(packs, packOfResult)
    .innerJoin(makers, makerOfPack)
    .where(and(isPublished, eq(results.groupKey, groupKey), ...resultConditions(w)))
    .orderBy(asc(makers.name), asc(packs.model), asc(results.id));
}

/** What each like-for-like group holds, per maker and pack size: published results, those with a label ratio by
 * the estimate (`rated`) and by the measured rating (`measured`) — the label check and maker ranking draw only
 * those. The chart builder offers only what has data. */
export type GroupCoverageRow = {
  group: string;
  maker: string;
  cells: number;
  results: number;
  rated: number;
  measured: number;
};

/** From the summary tables (one row per pack and group; db/schema/summaries.ts), not from the results. */
export async function listGroupCoverage(): Promise<GroupCoverageRow[]> {
  const s = packGroupSummaries;
  return db
    .select({
      group: s.groupKey,
      maker: makers.slug,
      cells: packs.cellsInSeries,
      results: sql<number>`sum(${s.resultCount})::int`,
      rated: sql<number>`sum(${s.labelRatioN})::int`,
      measured: sql<number>`sum(${s.sustainedLabelRatioN})::int`,
    })
    .from(s)
    .innerJoin(packs, eq(packs.id, s.packId))
    .innerJoin(makers, makerOfPack)
    .where(isCatalogueActive)
    .groupBy(s.groupKey, makers.slug, packs.cellsInSeries)
    .orderBy(s.groupKey, makers.slug, packs.cellsInSeries);
}
