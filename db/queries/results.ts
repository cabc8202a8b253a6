// Reads of published results (the counting rule: ./published.ts). A result a reader asked moderators to check (an
// open reader flag) stays published and counted, marked with its open case. Dates leave as ISO strings so the cached reads
// (server/public-data.ts) survive JSON round trips.
import "server-only";
import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { db } from "@/db";
import { benchProfiles, makers, packs, readerFlags, results, reviewEvents, users } from "@/db/schema";
import { methodCardColumns } from "./method-card-columns";
import type { ColumnMapping, CurvePoint, Discharge, Figures } from "@/lib/analysis";
import { headlineCurve } from "@/lib/curves";
import type { FlagReason } from "@/lib/enums";
import { statedAccuracyOf } from "@/lib/bench-accuracy";
import type { StatedAccuracy } from "@/lib/analysis/uncertainty";
import { benchAccuracyColumns } from "./bench-profiles";
import type { PublicResultRow } from "@/lib/pack-summary";
import { isPublished, makerOfPack, packOfResult } from "./published";
import { nameOnResults } from "@/lib/user-name";

/** Whether a reader's flag on the result is open (a case moderators have not decided). */
const hasOpenCase = sql<boolean>`exists (select 1 from ${readerFlags} where ${readerFlags.resultId} = ${results.id} and ${readerFlags.status} = 'open')`;

/** What headlineCurve needs from the stored figures (absent on results stored before discharges were listed). */
export const headlineColumns = {
  discharges: sql<Discharge[] | null>`${results.figures}->'discharges'`,
  headlineDischarge: sql<number | null>`(${results.figures}->>'headlineDischarge')::int`,
};

const iso = (d: Date | string | null) => (d === null ? null : new Date(d).toISOString());

const publicResultColumns = {
  id: results.id,
  packId: results.packId,
  openCase: hasOpenCase,
  groupKey: results.groupKey,
  ratedCapacityMah: packs.ratedCapacityMah,
  ...methodCardColumns,
  publishedAt: results.publishedAt,
  capacityMah: results.capacityMah,
  energyWh: results.energyWh,
  dcResistanceMohm: results.dcResistanceMohm,
  resistanceAt25CMohm: results.resistanceAt25CMohm,
  holdVoltagePerCellV: results.holdVoltagePerCellV,
  temperatureRiseC: results.temperatureRiseC,
  sagLimitedC: results.sagLimitedC,
  labelRatio: results.labelRatio,
  sustainedCMeasured: results.sustainedCMeasured,
  sustainedLabelRatio: results.sustainedLabelRatio,
  capacityRatio: results.capacityRatio,
  // Stored generated columns (db/schema/results.ts): one read each instead of unpacking `figures` per reference.
  retention: results.retention,
  reachedCutoff: results.reachedCutoff,
  passedStopTemperature: results.passedStopTemperature,
};

type RawRow = Omit<PublicResultRow, "publishedAt"> & { publishedAt: Date | null };
function toRow(r: RawRow): PublicResultRow {
  return { ...r, publishedAt: iso(r.publishedAt) };
}

/** Published results of the given packs (method card and headline figures, no curve), oldest first. */
export async function listPublicResultsForPacks(packIds: number[]): Promise<PublicResultRow[]> {
  if (packIds.length === 0) return [];
  const rows = await db
    .select(publicResultColumns)
    .from(results)
    .innerJoin(packs, packOfResult)
    .innerJoin(makers, makerOfPack)
    .where(and(inArray(results.packId, packIds), isPublished))
    .orderBy(asc(results.cyclesBeforeTest), asc(results.id));
  return rows.map(toRow);
}

/** Stored chart curves of the given published results: the headline discharge of each (lib/curves.ts headlineCurve). */
export async function getPublicCurves(resultIds: number[]): Promise<Map<number, CurvePoint[]>> {
  if (resultIds.length === 0) return new Map();
  const rows = await db
    .select({ id: results.id, curve: results.curve, ...headlineColumns })
    .from(results)
    .innerJoin(packs, packOfResult)
    .innerJoin(makers, makerOfPack)
    .where(and(inArray(results.id, resultIds), isPublished));
  return new Map(rows.map((r) => [r.id, headlineCurve(r.curve, r)]));
}

export type NewestResult = {
  id: number;
  publishedAt: string | null;
  packSlug: string;
  packModel: string;
  makerName: string;
  groupKey: string;
  capacityMah: number | null;
  /** Sag-limited C estimate. */
  sagLimitedC: number | null;
  /** Sag-limited C estimate ÷ labelled C. */
  labelRatio: number | null;
  sustainedCMeasured: number | null;
};

/** The newest published results, for the home page and the sitemap. */
export async function listNewestApprovedResults(limit: number): Promise<NewestResult[]> {
  const rows = await db
    .select({
      id: results.id,
      publishedAt: results.publishedAt,
      packSlug: packs.slug,
      packModel: packs.model,
      makerName: makers.name,
      groupKey: results.groupKey,
      capacityMah: results.capacityMah,
      sagLimitedC: results.sagLimitedC,
      labelRatio: results.labelRatio,
      sustainedCMeasured: results.sustainedCMeasured,
    })
    .from(results)
    .innerJoin(packs, packOfResult)
    .innerJoin(makers, makerOfPack)
    .where(isPublished)
    // In the order of results_published_newest_idx (an approved result always has its publishedAt).
    .orderBy(sql`${results.publishedAt} desc nulls last`, sql`${results.id} desc nulls last`)
    .limit(limit);
  return rows.map((r) => ({ ...r, publishedAt: iso(r.publishedAt) }));
}

export type ResultDetail = PublicResultRow & {
  pack: {
    slug: string;
    model: string;
    makerName: string;
    makerSlug: string;
    cellsInSeries: number;
    labelledContinuousC: number;
    labelledBurstC: number | null;
    weightG: number | null;
    connector: string;
  };
  contributor: string;
  /** The bench profile the result was tested on (null: none chosen, or since deleted). */
  benchProfileId: number | null;
  /** The bench's stated instrument accuracy as it stands now (blank parts are assumed: resolveAccuracy). */
  statedAccuracy: StatedAccuracy;
  /** Reasons of the open reader flags (each once, in the order they were filed); empty when none is open. */
  openCaseReasons: FlagReason[];
  /** The uploaded log's file name (its extension names the download; the name itself is never shown). */
  logFilename: string;
  /** The column mapping the log was read with (null: the columns were detected). */
  logMapping: ColumnMapping | null;
  notes: string | null;
  submittedAt: string;
  /** How many label photos the contributor sent (served at /results/<id>/photos/<n>, 1-based). */
  photoCount: number;
  figures: Figures;
  curve: CurvePoint[];
  events: {
    id: number;
    at: string;
    from: string | null;
    to: string;
    reason: string | null;
    note: string | null;
    actor: "contributor" | "moderator" | "system";
  }[];
};

/** One published result with everything its page shows; null when missing or not public. */
export async function getPublicResult(id: number): Promise<ResultDetail | null> {
  const [row] = await db
    .select({
      ...publicResultColumns,
      notes: results.notes,
      logFilename: results.logFilename,
      logMapping: results.logMapping,
      submittedAt: results.submittedAt,
      figures: results.figures,
      curve: results.curve,
      photoCount: sql<number>`jsonb_array_length(${results.photoKeys})::int`,
      contributorId: results.contributorId,
      contributorName: users.displayName,
      contributorAnonymous: users.anonymous,
      packSlug: packs.slug,
      packModel: packs.model,
      makerName: makers.name,
      makerSlug: makers.slug,
      cellsInSeries: packs.cellsInSeries,
      labelledContinuousC: packs.labelledContinuousC,
      labelledBurstC: packs.labelledBurstC,
      weightG: packs.weightG,
      connector: packs.connector,
      benchProfileId: benchProfiles.id,
      // Flat, not nested: drizzle turns a left-joined nested object into null when its first column is null.
      ...benchAccuracyColumns,
    })
    .from(results)
    .innerJoin(packs, eq(packs.id, results.packId))
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .innerJoin(users, eq(users.id, results.contributorId))
    .leftJoin(benchProfiles, eq(benchProfiles.id, results.benchProfileId))
    .where(and(eq(results.id, id), isPublished))
    .limit(1);
  if (!row) return null;
  const events = await db
    .select({
      id: reviewEvents.id,
      at: reviewEvents.createdAt,
      from: reviewEvents.fromStatus,
      to: reviewEvents.toStatus,
      reason: reviewEvents.reason,
      note: reviewEvents.note,
      actorId: reviewEvents.actorId,
    })
    .from(reviewEvents)
    .where(eq(reviewEvents.resultId, id))
    .orderBy(asc(reviewEvents.createdAt), asc(reviewEvents.id));
  const open = await db
    .select({ reason: readerFlags.reason })
    .from(readerFlags)
    .where(and(eq(readerFlags.resultId, id), eq(readerFlags.status, "open")))
    .orderBy(asc(readerFlags.createdAt), asc(readerFlags.id));
  const {
    contributorId,
    contributorName,
    contributorAnonymous,
    packSlug,
    packModel,
    makerName,
    makerSlug,
    cellsInSeries,
    labelledContinuousC,
    labelledBurstC,
    weightG,
    connector,
    notes,
    logFilename,
    logMapping,
    submittedAt,
    figures,
    curve,
    photoCount,
    benchProfileId,
    voltageAccuracyPct,
    voltageOffsetV,
    voltageResolutionV,
    currentAccuracyPct,
    currentOffsetA,
    currentResolutionA,
    temperatureAccuracyPct,
    temperatureOffsetC,
    temperatureResolutionC,
    samplingIntervalS,
    ...rest
  } = row;
  const accuracy = {
    voltageAccuracyPct,
    voltageOffsetV,
    voltageResolutionV,
    currentAccuracyPct,
    currentOffsetA,
    currentResolutionA,
    temperatureAccuracyPct,
    temperatureOffsetC,
    temperatureResolutionC,
    samplingIntervalS,
  };
  return {
    ...toRow(rest),
    pack: {
      slug: packSlug,
      model: packModel,
      makerName,
      makerSlug,
      cellsInSeries,
      labelledContinuousC,
      labelledBurstC,
      weightG,
      connector,
    },
    contributor: nameOnResults({ displayName: contributorName, anonymous: contributorAnonymous }),
    openCaseReasons: [...new Set(open.map((o) => o.reason))],
    benchProfileId,
    statedAccuracy: statedAccuracyOf(accuracy, rest.resistanceMethod),
    notes,
    logFilename,
    logMapping,
    submittedAt: new Date(submittedAt).toISOString(),
    photoCount,
    figures,
    curve,
    events: events.map((e) => ({
      id: e.id,
      at: new Date(e.at).toISOString(),
      from: e.from,
      to: e.to,
      reason: e.reason,
      note: e.note,
      // Reviewers are named by role only; the contributor is already credited above (as they chose).
      actor: e.actorId === null ? "system" : e.actorId === contributorId ? "contributor" : "moderator",
    })),
  };
}

export type PublishedLog = { resultId: number; key: string; sha256: string; bytes: number; filename: string };

/** The stored log of a published result (its raw data, CC BY 4.0 like the figures); null otherwise. */
export async function getPublishedLog(id: number): Promise<PublishedLog | null> {
  const [row] = await db
    .select({
      resultId: results.id,
      key: results.logKey,
      sha256: results.logSha256,
      bytes: results.logBytes,
      filename: results.logFilename,
    })
    .from(results)
    .innerJoin(packs, packOfResult)
    .innerJoin(makers, makerOfPack)
    .where(and(eq(results.id, id), isPublished))
    .limit(1);
  return row ?? null;
}
