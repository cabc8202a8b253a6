// Approved results for the public API, downloads and charts: method card and figures, never files or
// contributor identities.
import "server-only";
import { and, asc, count, eq, type SQL } from "drizzle-orm";
import { db } from "@/db";
import { makers, packs, results } from "@/db/schema";
import type { CurvePoint } from "@/lib/analysis";
import { headlineCurve } from "@/lib/curves";
import type { ResultRow } from "@/lib/open-data/records";
import type { ResultFilters } from "@/lib/validations/open-data";
import { headlineColumns } from "../results";
import { packConditions, type Page, type Paged } from "./packs";

const columns = {
  id: results.id,
  packId: results.packId,
  packSlug: packs.slug,
  makerSlug: makers.slug,
  groupKey: results.groupKey,
  testedOn: results.testedOn,
  publishedAt: results.publishedAt,
  notes: results.notes,
  figures: results.figures,
  ambientTemperatureC: results.ambientTemperatureC,
  packStartTemperatureC: results.packStartTemperatureC,
  loadMode: results.loadMode,
  loadCurrentA: results.loadCurrentA,
  loadRateC: results.loadRateC,
  cutoffVPerCell: results.cutoffVPerCell,
  stopTemperatureC: results.stopTemperatureC,
  resistanceMethod: results.resistanceMethod,
  equipment: results.equipment,
  sampleRateHz: results.sampleRateHz,
  cyclesBeforeTest: results.cyclesBeforeTest,
};

function baseQuery() {
  return db
    .select(columns)
    .from(results)
    .innerJoin(packs, eq(packs.id, results.packId))
    .innerJoin(makers, eq(makers.id, packs.makerId));
}
type Raw = Awaited<ReturnType<typeof baseQuery>>[number];

function toRow(r: Raw): ResultRow {
  return {
    id: r.id,
    packId: r.packId,
    packSlug: r.packSlug,
    makerSlug: r.makerSlug,
    status: "approved",
    groupKey: r.groupKey,
    testedOn: r.testedOn,
    publishedAt: r.publishedAt ? r.publishedAt.toISOString() : null,
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
  };
}

function conditions(f: ResultFilters): SQL[] {
  const where = [eq(results.status, "approved"), ...packConditions(f)];
  if (f.pack) where.push(eq(packs.slug, f.pack));
  if (f.group) where.push(eq(results.groupKey, f.group));
  return where;
}

export async function listResultsPage(f: ResultFilters, { page, size }: Page): Promise<Paged<ResultRow>> {
  const where = and(...conditions(f));
  const rows = await baseQuery()
    .where(where)
    .orderBy(asc(results.id))
    .limit(size)
    .offset((page - 1) * size);
  const [total] = await db
    .select({ n: count() })
    .from(results)
    .innerJoin(packs, eq(packs.id, results.packId))
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(where);
  return { rows: rows.map(toRow), total: total?.n ?? 0 };
}

export async function getApprovedResult(id: number): Promise<ResultRow | null> {
  const { rows } = await listResultsPageById(id);
  return rows[0] ?? null;
}

async function listResultsPageById(id: number): Promise<Paged<ResultRow>> {
  const rows = await baseQuery()
    .where(and(eq(results.id, id), eq(results.status, "approved")))
    .limit(1);
  return { rows: rows.map(toRow), total: rows.length };
}

export async function listAllResults(f: ResultFilters = {}): Promise<ResultRow[]> {
  return (await listResultsPage(f, { page: 1, size: 1_000_000 })).rows;
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

/** Discharge curves of approved results in one like-for-like group (for the curves chart): each its headline discharge. */
export async function listGroupCurves(groupKey: string, f: ResultFilters = {}): Promise<CurveSeries[]> {
  const rows = await db
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
    })
    .from(results)
    .innerJoin(packs, eq(packs.id, results.packId))
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(and(...conditions({ ...f, group: groupKey })))
    .orderBy(asc(makers.name), asc(packs.model), asc(results.id));
  return rows.map(({ discharges, headlineDischarge, curve, ...r }) => ({
    ...r,
    curve: headlineCurve(curve, { discharges, headlineDischarge }),
  }));
}
