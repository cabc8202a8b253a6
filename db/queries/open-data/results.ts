// Published results for the public API, downloads and charts: method card and figures, never files or
// contributor identities.
import "server-only";
import { and, asc, count, desc, eq, gt, sql } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db";
import { benchProfiles, makers, packs, results } from "@/db/schema";
import { resolveAccuracy } from "@/lib/analysis/uncertainty";
import { pickBenchAccuracy, statedAccuracyOf } from "@/lib/bench-accuracy";
import { figureU95 } from "@/lib/figure-u95";
import { benchAccuracyColumns } from "../bench-profiles";
import type { CurvePoint } from "@/lib/analysis";
import { headlineCurve } from "@/lib/curves";
import type { ResultFlatRow } from "@/lib/open-data/records";
import { methodCardColumns } from "../method-card-columns";
import { headlineColumns } from "../results";
import { isPublished, makerOfPack, packOfResult } from "@/db/queries/published";
import { resultConditions, type ResultWhere } from "./where";

export type Page = { page: number; size: number };
export type Paged<T> = { rows: T[]; total: number };

const columns = {
  id: results.id,
  packId: results.packId,
  packSlug: packs.slug,
  makerSlug: makers.slug,
  groupKey: results.groupKey,
  publishedAt: results.publishedAt,
  notes: results.notes,
  figures: results.figures,
  ...methodCardColumns,
  cellsInSeries: packs.cellsInSeries,
  ratedCapacityMah: packs.ratedCapacityMah,
  labelledContinuousC: packs.labelledContinuousC,
  // Flat, not nested: drizzle turns a left-joined nested object into null when its first column is null.
  ...benchAccuracyColumns,
};

function baseQuery() {
  return db
    .select(columns)
    .from(results)
    .innerJoin(packs, packOfResult)
    .innerJoin(makers, makerOfPack)
    .leftJoin(benchProfiles, eq(benchProfiles.id, results.benchProfileId));
}
type Raw = Awaited<ReturnType<typeof baseQuery>>[number];

function toRow(r: Raw): ResultFlatRow {
  return {
    id: r.id,
    packId: r.packId,
    packSlug: r.packSlug,
    makerSlug: r.makerSlug,
    groupKey: r.groupKey,
    testedOn: r.testedOn,
    // Whole seconds in UTC: Table Schema's default datetime format (YYYY-MM-DDThh:mm:ssZ) has no fractions.
    publishedAt: r.publishedAt ? new Date(r.publishedAt).toISOString().replace(/\.\d{3}Z$/, "Z") : null,
    notes: r.notes,
    methodCard: {
      ambientTemperatureC: r.ambientTemperatureC,
      packStartTemperatureC: r.packStartTemperatureC,
      loadMode: r.loadMode,
      loadCurrentA: r.loadCurrentA,
      loadRateC: r.loadRateC,
      cutoffVPerCell: r.cutoffVPerCell,
      stopTemperatureC: r.stopTemperatureC,
      resistanceMethod: r.resistanceMethod,
      equipment: r.equipment,
      sampleRateHz: r.sampleRateHz,
      cyclesBeforeTest: r.cyclesBeforeTest,
    },
    figures: r.figures,
    u95: figureU95(r.figures, resolveAccuracy(statedAccuracyOf(pickBenchAccuracy(r), r.resistanceMethod)).accuracy, {
      cells: r.cellsInSeries,
      ratedMah: r.ratedCapacityMah,
      labelledC: r.labelledContinuousC,
    }),
  };
}

export async function listResultsPage(w: ResultWhere, { page, size }: Page): Promise<Paged<ResultFlatRow>> {
  const where = and(isPublished, ...resultConditions(w));
  const [rows, [total]] = await Promise.all([
    baseQuery()
      .where(where)
      .orderBy(asc(results.id))
      .limit(size)
      .offset((page - 1) * size),
    db.select({ n: count() }).from(results).innerJoin(packs, packOfResult).innerJoin(makers, makerOfPack).where(where),
  ]);
  return { rows: rows.map(toRow), total: total?.n ?? 0 };
}

/**
 * A page by key: published results with an id above `after`, in id order, read through the results (status, id)
 * index; one row more than asked tells whether another page follows.
 */
export async function listResultsAfter(
  w: ResultWhere,
  { after, size }: { after: number; size: number },
): Promise<{ rows: ResultFlatRow[]; hasMore: boolean }> {
  const rows = await baseQuery()
    .where(and(isPublished, gt(results.id, after), ...resultConditions(w)))
    .orderBy(asc(results.id))
    .limit(size + 1);
  return { rows: rows.slice(0, size).map(toRow), hasMore: rows.length > size };
}

const explainJson = z.array(z.object({ Plan: z.object({ "Plan Rows": z.number().min(0) }) })).min(1);

/**
 * How many published results match, as PostgreSQL's planner estimates it ("Plan Rows" of EXPLAIN (FORMAT JSON)
 * on the list's query; the count-estimate technique of the PostgreSQL wiki, "Count estimate"): no rows are read,
 * so it costs the same at any size, and it is only as good as the table statistics (ANALYZE / autovacuum).
 */
export async function estimatePublishedResults(w: ResultWhere): Promise<number> {
  const list = db
    .select({ id: results.id })
    .from(results)
    .innerJoin(packs, packOfResult)
    .innerJoin(makers, makerOfPack)
    .where(and(isPublished, ...resultConditions(w)));
  const out = await db.execute(sql`explain (format json) ${list.getSQL()}`);
  const plan = explainJson.parse(out.rows[0]?.["QUERY PLAN"]);
  return Math.round(plan[0]?.Plan["Plan Rows"] ?? 0);
}

export async function getPublishedResult(id: number): Promise<ResultFlatRow | null> {
  const rows = await baseQuery()
    .where(and(isPublished, eq(results.id, id)))
    .limit(1);
  return rows[0] ? toRow(rows[0]) : null;
}

export async function listAllResults(w: ResultWhere): Promise<ResultFlatRow[]> {
  const rows = await baseQuery()
    .where(and(isPublished, ...resultConditions(w)))
    .orderBy(asc(results.id));
  return rows.map(toRow);
}

export type CurveSeries = {
  resultId: number;
  packSlug: string;
  makerName: string;
  model: string;
  cellsInSeries: number;
  ratedCapacityMah: number;
  loadRateC: number;
  curve: CurvePoint[];
};

/**
 * Discharge curves for a group's curves chart, at most `limit` of them, picked in SQL: one per pack (its first
 * published result in the group, by id), for the packs with the most published results there, ties by slug.
 * `packTotal` is how many packs had a curve to offer, so the chart can say how many it left out.
 */
export async function listGroupCurves(
  groupKey: string,
  w: ResultWhere,
  limit: number,
): Promise<{ series: CurveSeries[]; packTotal: number }> {
  const perPack = db.$with("per_pack").as(
    db
      .select({
        packId: results.packId,
        firstId: sql<number>`min(${results.id})`.as("first_id"),
        n: sql<number>`count(*)`.as("n"),
      })
      .from(results)
      .innerJoin(packs, packOfResult)
      .innerJoin(makers, makerOfPack)
      .where(and(isPublished, ...resultConditions({ ...w, group: groupKey })))
      .groupBy(results.packId),
  );
  const rows = await db
    .with(perPack)
    .select({
      resultId: results.id,
      packSlug: packs.slug,
      makerName: makers.name,
      model: packs.model,
      cellsInSeries: packs.cellsInSeries,
      ratedCapacityMah: packs.ratedCapacityMah,
      loadRateC: results.loadRateC,
      curve: results.curve,
      ...headlineColumns,
      // Counted before LIMIT (window functions run first): every pack of the group that has a curve to offer.
      packTotal: sql<number>`count(*) over ()`.mapWith(Number),
    })
    .from(perPack)
    .innerJoin(results, eq(results.id, perPack.firstId))
    .innerJoin(packs, packOfResult)
    .innerJoin(makers, makerOfPack)
    .orderBy(desc(perPack.n), asc(packs.slug))
    .limit(limit);
  return {
    packTotal: rows[0]?.packTotal ?? 0,
    series: rows.map(({ discharges, headlineDischarge, curve, packTotal: _total, ...r }) => ({
      ...r,
      curve: headlineCurve(curve, { discharges, headlineDischarge }),
    })),
  };
}
