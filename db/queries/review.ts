// Reads for moderation: what the plausibility check needs, the review queue with its filters and counts,
// one result's review page (method card, figures, contributor history, the pack's group median before and
// after approval) and the review history shown publicly.
import "server-only";
import { and, asc, between, count, desc, eq, isNotNull, ne, sql, type SQL } from "drizzle-orm";
import { db, type Executor } from "@/db";
import { makers, packs, readerFlags, results, reviewEvents, users, type ReviewStatus } from "@/db/schema";
import { summarise, type PlausibilityInput } from "@/lib/analysis";
import { CURVE_KEY_TOLERANCE } from "@/lib/analysis/curve-fingerprint";
import type { PlausibilityFlag } from "@/db/schema/results";
import type { ReviewQueueFilter } from "@/lib/validations/review";
import { isPublished, makerOfPack, packOfResult } from "./published";

const finiteOnly = (xs: (number | null)[]) => xs.filter((x): x is number => x !== null && Number.isFinite(x));

/** Everything lib/analysis/plausibility needs about one result, gathered from the database. */
export async function getPlausibilityInput(resultId: number, exec: Executor = db): Promise<PlausibilityInput | null> {
  const [r] = await exec
    .select({
      figures: results.figures,
      ambientTemperatureC: results.ambientTemperatureC,
      cutoffVPerCell: results.cutoffVPerCell,
      groupKey: results.groupKey,
      logSha256: results.logSha256,
      curve: results.curve,
      curveKey: results.curveKey,
      cellsInSeries: packs.cellsInSeries,
      ratedCapacityMah: packs.ratedCapacityMah,
      packStatus: packs.status,
      makerStatus: makers.status,
    })
    .from(results)
    .innerJoin(packs, eq(packs.id, results.packId))
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(eq(results.id, resultId));
  if (!r) return null;
  const group = await exec
    .select({ labelRatio: results.labelRatio, sagLimitedC: results.sagLimitedC, capacityRatio: results.capacityRatio })
    .from(results)
    .where(and(eq(results.groupKey, r.groupKey), eq(results.status, "approved"), ne(results.id, resultId)));
  const dupes = await exec
    .select({ id: results.id })
    .from(results)
    .where(and(eq(results.logSha256, r.logSha256), ne(results.id, resultId)))
    .orderBy(asc(results.id));
  return {
    figures: r.figures,
    curve: r.curve,
    curveCandidates: await curveCandidates(resultId, r.curveKey, exec),
    method: { ambientTemperatureC: r.ambientTemperatureC, cutoffVPerCell: r.cutoffVPerCell },
    pack: { cellsInSeries: r.cellsInSeries, ratedCapacityMah: r.ratedCapacityMah },
    group: {
      labelRatios: finiteOnly(group.map((g) => g.labelRatio)),
      sagLimitedCs: finiteOnly(group.map((g) => g.sagLimitedC)),
      capacityRatios: finiteOnly(group.map((g) => g.capacityRatio)),
    },
    duplicateLogResultIds: dupes.map((d) => d.id),
    makerProposed: r.makerStatus === "proposed",
    packProposed: r.packStatus === "proposed",
  };
}

/** Closest first, so a copy is among them however many tests of one pack share the key's neighbourhood. */
const MAX_CURVE_CANDIDATES = 200;

/** Other results whose curve key is within CURVE_KEY_TOLERANCE of this one's (results_curve_key_idx). */
async function curveCandidates(resultId: number, key: number | null, exec: Executor) {
  if (key === null) return [];
  const rows = await exec
    .select({ resultId: results.id, fingerprint: results.curveFingerprint })
    .from(results)
    .where(
      and(
        ne(results.id, resultId),
        between(results.curveKey, key - CURVE_KEY_TOLERANCE, key + CURVE_KEY_TOLERANCE),
        isNotNull(results.curveFingerprint),
      ),
    )
    .orderBy(sql`abs(${results.curveKey} - ${key})`, asc(results.id))
    .limit(MAX_CURVE_CANDIDATES);
  return rows.flatMap((r) => (r.fingerprint ? [{ resultId: r.resultId, fingerprint: r.fingerprint }] : []));
}

type QueueItem = {
  id: number;
  packSlug: string;
  packModel: string;
  makerName: string;
  makerSlug: string;
  groupKey: string;
  contributorName: string;
  submittedAt: Date;
  flags: PlausibilityFlag[];
  capacityMah: number | null;
  labelRatio: number | null;
};
export type ReviewQueue = {
  items: QueueItem[];
  total: number;
  counts: {
    flags: Record<string, number>;
    unflagged: number;
    makers: { slug: string; name: string; n: number }[];
    groups: { key: string; n: number }[];
  };
};

/** Pending results, oldest first, filtered; counts are over all pending results so filters show what they hide. */
export async function listReviewQueue(filter: ReviewQueueFilter = {}, limit = 200): Promise<ReviewQueue> {
  const pending = eq(results.status, "pending");
  const where: SQL[] = [pending];
  if (filter.maker) where.push(eq(makers.slug, filter.maker));
  if (filter.group) where.push(eq(results.groupKey, filter.group));
  if (filter.flag === "none") where.push(sql`jsonb_array_length(${results.flags}) = 0`);
  else if (filter.flag) where.push(sql`${results.flags} @> ${JSON.stringify([{ code: filter.flag }])}::jsonb`);
  const items = await db
    .select({
      id: results.id,
      packSlug: packs.slug,
      packModel: packs.model,
      makerName: makers.name,
      makerSlug: makers.slug,
      groupKey: results.groupKey,
      displayName: users.displayName,
      email: users.email,
      submittedAt: results.submittedAt,
      flags: results.flags,
      capacityMah: results.capacityMah,
      labelRatio: results.labelRatio,
    })
    .from(results)
    .innerJoin(packs, eq(packs.id, results.packId))
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .innerJoin(users, eq(users.id, results.contributorId))
    .where(and(...where))
    .orderBy(asc(results.submittedAt), asc(results.id))
    .limit(limit);
  const all = await db
    .select({ flags: results.flags, makerSlug: makers.slug, makerName: makers.name, groupKey: results.groupKey })
    .from(results)
    .innerJoin(packs, eq(packs.id, results.packId))
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(pending);
  const flags: Record<string, number> = {};
  const makerCounts = new Map<string, { slug: string; name: string; n: number }>();
  const groupCounts = new Map<string, number>();
  let unflagged = 0;
  for (const r of all) {
    if (r.flags.length === 0) unflagged++;
    for (const code of new Set(r.flags.map((f) => f.code))) flags[code] = (flags[code] ?? 0) + 1;
    const m = makerCounts.get(r.makerSlug) ?? { slug: r.makerSlug, name: r.makerName, n: 0 };
    m.n++;
    makerCounts.set(r.makerSlug, m);
    groupCounts.set(r.groupKey, (groupCounts.get(r.groupKey) ?? 0) + 1);
  }
  return {
    items: items.map(({ displayName, email, ...i }) => ({
      ...i,
      contributorName: displayName?.trim() || email || "unknown",
    })),
    total: all.length,
    counts: {
      flags,
      unflagged,
      makers: [...makerCounts.values()].sort((a, b) => a.name.localeCompare(b.name)),
      groups: [...groupCounts.entries()]
        .map(([key, n]) => ({ key, n }))
        .sort((a, b) => b.n - a.n || a.key.localeCompare(b.key)),
    },
  };
}

export type HistoryEvent = {
  id: number;
  fromStatus: ReviewStatus | null;
  toStatus: ReviewStatus;
  reason: string | null;
  note: string | null;
  createdAt: Date;
  actorRole: "contributor" | "moderator" | "admin" | "system";
  actorName: string | null;
};

/** The full review history of a result, oldest first. Actor names are for moderators; pages for the public show the role. */
export async function getReviewHistory(resultId: number): Promise<HistoryEvent[]> {
  const rows = await db
    .select({
      id: reviewEvents.id,
      fromStatus: reviewEvents.fromStatus,
      toStatus: reviewEvents.toStatus,
      reason: reviewEvents.reason,
      note: reviewEvents.note,
      createdAt: reviewEvents.createdAt,
      role: users.role,
      displayName: users.displayName,
      email: users.email,
    })
    .from(reviewEvents)
    .leftJoin(users, eq(users.id, reviewEvents.actorId))
    .where(eq(reviewEvents.resultId, resultId))
    .orderBy(asc(reviewEvents.createdAt), asc(reviewEvents.id));
  return rows.map(({ role, displayName, email, ...e }) => ({
    ...e,
    actorRole: role ?? "system",
    actorName: role ? displayName?.trim() || email || null : null,
  }));
}

export type GroupMedians = {
  n: number;
  capacityMah: number | null;
  labelRatio: number | null;
  sagLimitedC: number | null;
  sustainedCMeasured: number | null;
  dcResistanceMohm: number | null;
};

function medians(
  rows: {
    capacityMah: number | null;
    labelRatio: number | null;
    sagLimitedC: number | null;
    sustainedCMeasured: number | null;
    dcResistanceMohm: number | null;
  }[],
): GroupMedians {
  const m = (xs: (number | null)[]) => summarise(finiteOnly(xs))?.median ?? null;
  return {
    n: rows.length,
    capacityMah: m(rows.map((r) => r.capacityMah)),
    labelRatio: m(rows.map((r) => r.labelRatio)),
    sagLimitedC: m(rows.map((r) => r.sagLimitedC)),
    sustainedCMeasured: m(rows.map((r) => r.sustainedCMeasured)),
    dcResistanceMohm: m(rows.map((r) => r.dcResistanceMohm)),
  };
}

export async function getReviewDetail(resultId: number) {
  const [row] = await db
    .select({
      result: results,
      pack: packs,
      makerName: makers.name,
      makerSlug: makers.slug,
      makerStatus: makers.status,
      contributor: { id: users.id, displayName: users.displayName, email: users.email },
    })
    .from(results)
    .innerJoin(packs, eq(packs.id, results.packId))
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .innerJoin(users, eq(users.id, results.contributorId))
    .where(eq(results.id, resultId));
  if (!row) return null;
  const r = row.result;
  const figureCols = {
    capacityMah: results.capacityMah,
    labelRatio: results.labelRatio,
    sagLimitedC: results.sagLimitedC,
    sustainedCMeasured: results.sustainedCMeasured,
    dcResistanceMohm: results.dcResistanceMohm,
  };
  const groupRows = await db
    .select(figureCols)
    .from(results)
    .innerJoin(packs, packOfResult)
    .innerJoin(makers, makerOfPack)
    .where(and(eq(results.packId, r.packId), eq(results.groupKey, r.groupKey), isPublished, ne(results.id, r.id)));
  const history = await db
    .select({ status: results.status, n: count() })
    .from(results)
    .where(and(eq(results.contributorId, r.contributorId), ne(results.id, r.id)))
    .groupBy(results.status);
  // How often this contributor's results (this one included) were sent back for an answer: counted from the
  // events, since a result that was answered is no longer in that state.
  const [asked] = await db
    .select({ n: count() })
    .from(reviewEvents)
    .innerJoin(results, eq(results.id, reviewEvents.resultId))
    .where(and(eq(results.contributorId, r.contributorId), eq(reviewEvents.toStatus, "awaiting_answer")));
  const recent = await db
    .select({
      id: results.id,
      status: results.status,
      packModel: packs.model,
      makerName: makers.name,
      submittedAt: results.submittedAt,
    })
    .from(results)
    .innerJoin(packs, eq(packs.id, results.packId))
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(and(eq(results.contributorId, r.contributorId), ne(results.id, r.id)))
    .orderBy(desc(results.submittedAt))
    .limit(8);
  const flags = await db
    .select()
    .from(readerFlags)
    .where(eq(readerFlags.resultId, r.id))
    .orderBy(asc(readerFlags.createdAt));
  const self = {
    capacityMah: r.capacityMah,
    labelRatio: r.labelRatio,
    sagLimitedC: r.sagLimitedC,
    sustainedCMeasured: r.sustainedCMeasured,
    dcResistanceMohm: r.dcResistanceMohm,
  };
  return {
    ...row,
    proposal: await proposalChoices(row.pack, row.makerStatus, row.pack.makerId),
    groupNow: medians(groupRows),
    groupAfterApproval: medians([...groupRows, self]),
    contributorHistory: {
      byStatus: Object.fromEntries(history.map((h) => [h.status, h.n])) as Partial<Record<ReviewStatus, number>>,
      timesSentBack: asked?.n ?? 0,
      recent,
    },
    events: await getReviewHistory(r.id),
    readerFlags: flags,
  };
}

export type ProposalChoices = {
  packProposed: boolean;
  makerProposed: boolean;
  /** Active packs with the same cells, rated capacity and labelled C: what a proposed pack may merge into. */
  samePacks: { id: number; title: string }[];
  /** Active makers: what a proposed maker may be the same as. */
  makers: { id: number; name: string }[];
};

/** For a result on a proposed pack or maker: what the moderator may merge the proposal into. */
async function proposalChoices(
  pack: typeof packs.$inferSelect,
  makerStatus: string,
  makerId: number,
): Promise<ProposalChoices | null> {
  const packProposed = pack.status === "proposed";
  const makerProposed = makerStatus === "proposed";
  if (!packProposed && !makerProposed) return null;
  const samePacks = packProposed
    ? await db
        .select({ id: packs.id, model: packs.model, makerName: makers.name })
        .from(packs)
        .innerJoin(makers, eq(makers.id, packs.makerId))
        .where(
          and(
            eq(packs.status, "active"),
            eq(makers.status, "active"),
            eq(packs.cellsInSeries, pack.cellsInSeries),
            eq(packs.ratedCapacityMah, pack.ratedCapacityMah),
            eq(packs.labelledContinuousC, pack.labelledContinuousC),
          ),
        )
        .orderBy(asc(makers.name), asc(packs.model))
        .limit(200)
    : [];
  const makerRows = makerProposed
    ? await db
        .select({ id: makers.id, name: makers.name })
        .from(makers)
        .where(and(eq(makers.status, "active"), ne(makers.id, makerId)))
        .orderBy(asc(makers.name))
    : [];
  return {
    packProposed,
    makerProposed,
    samePacks: samePacks.map((p) => ({ id: p.id, title: `${p.makerName} ${p.model}` })),
    makers: makerRows,
  };
}

export type OpenReaderFlag = {
  id: number;
  resultId: number;
  reason: string;
  note: string | null;
  createdAt: Date;
  resultStatus: ReviewStatus;
  packSlug: string;
  packModel: string;
  makerName: string;
  contributorId: string;
};

export async function listOpenReaderFlags(limit = 200): Promise<OpenReaderFlag[]> {
  return db
    .select({
      id: readerFlags.id,
      resultId: readerFlags.resultId,
      reason: readerFlags.reason,
      note: readerFlags.note,
      createdAt: readerFlags.createdAt,
      resultStatus: results.status,
      packSlug: packs.slug,
      packModel: packs.model,
      makerName: makers.name,
      contributorId: results.contributorId,
    })
    .from(readerFlags)
    .innerJoin(results, eq(results.id, readerFlags.resultId))
    .innerJoin(packs, eq(packs.id, results.packId))
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(eq(readerFlags.status, "open"))
    .orderBy(asc(readerFlags.createdAt), asc(readerFlags.id))
    .limit(limit);
}
