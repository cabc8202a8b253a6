import "server-only";
import { asc, desc, eq, inArray, sql } from "drizzle-orm";
import { db } from "@/db";
import { makers, packs, results, reviewEvents, type ReviewStatus } from "@/db/schema";
import { methodCardColumns } from "./method-card-columns";

type ContributorResultEvent = {
  fromStatus: ReviewStatus | null;
  toStatus: ReviewStatus;
  reason: string | null;
  createdAt: Date;
};
export type ContributorResult = {
  id: number;
  packSlug: string;
  makerName: string;
  model: string;
  status: ReviewStatus;
  loadCurrentA: number;
  ambientTemperatureC: number;
  submittedAt: Date;
  publishedAt: Date | null;
  events: ContributorResultEvent[];
};

/** A contributor's own results, newest first, each with its review history (oldest event first). The
 * moderators' internal notes stay out; the reason given with each decision is shown. */
export async function listResultsByContributor(userId: string, limit = 200): Promise<ContributorResult[]> {
  const rows = await db
    .select({
      id: results.id,
      packSlug: packs.slug,
      makerName: makers.name,
      model: packs.model,
      status: results.status,
      loadCurrentA: results.loadCurrentA,
      ambientTemperatureC: results.ambientTemperatureC,
      submittedAt: results.submittedAt,
      publishedAt: results.publishedAt,
    })
    .from(results)
    .innerJoin(packs, eq(packs.id, results.packId))
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(eq(results.contributorId, userId))
    .orderBy(desc(results.submittedAt), desc(results.id))
    .limit(limit);
  if (rows.length === 0) return [];
  const events = await db
    .select({
      resultId: reviewEvents.resultId,
      fromStatus: reviewEvents.fromStatus,
      toStatus: reviewEvents.toStatus,
      reason: reviewEvents.reason,
      createdAt: reviewEvents.createdAt,
    })
    .from(reviewEvents)
    .where(
      inArray(
        reviewEvents.resultId,
        rows.map((r) => r.id),
      ),
    )
    .orderBy(asc(reviewEvents.createdAt), asc(reviewEvents.id));
  const byResult = new Map<number, ContributorResultEvent[]>();
  for (const { resultId, ...e } of events) {
    const list = byResult.get(resultId) ?? [];
    list.push(e);
    byResult.set(resultId, list);
  }
  return rows.map((r) => ({ ...r, events: byResult.get(r.id) ?? [] }));
}

/** One result as its contributor sees it, in any state; ownership is the caller's check. */
export async function getOwnResult(resultId: number) {
  const [row] = await db
    .select({
      id: results.id,
      contributorId: results.contributorId,
      status: results.status,
      submittedAt: results.submittedAt,
      publishedAt: results.publishedAt,
      packSlug: packs.slug,
      packStatus: packs.status,
      makerName: makers.name,
      model: packs.model,
      cellsInSeries: packs.cellsInSeries,
      ratedCapacityMah: packs.ratedCapacityMah,
      labelledContinuousC: packs.labelledContinuousC,
      labelledBurstC: packs.labelledBurstC,
      weightG: packs.weightG,
      connector: packs.connector,
      ...methodCardColumns,
      logFilename: results.logFilename,
      photoCount: sql<number>`jsonb_array_length(${results.photoKeys})::int`,
      capacityMah: results.capacityMah,
      dcResistanceMohm: results.dcResistanceMohm,
      sagLimitedC: results.sagLimitedC,
      labelRatio: results.labelRatio,
    })
    .from(results)
    .innerJoin(packs, eq(packs.id, results.packId))
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(eq(results.id, resultId))
    .limit(1);
  return row ?? null;
}
