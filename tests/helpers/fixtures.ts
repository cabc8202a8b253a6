// Fixture rows for integration tests, inserted through the schema (the demo seed is not loaded there).
// Every result's group key is computed from its method card, as the submission flow does.
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { makers, packs, readerFlags, results, reviewEvents, users } from "@/db/schema";
import { groupKey, type CurvePoint, type Figures, type RetentionSeries } from "@/lib/analysis";

let seq = 0;
const next = () => `${process.pid}-${++seq}`;

export async function makeUser(opts: { displayName?: string; anonymous?: boolean } = {}) {
  const n = next();
  const [u] = await db
    .insert(users)
    .values({
      email: `u${n}@test.localhost`,
      displayName: opts.displayName ?? `Tester ${n}`,
      anonymous: opts.anonymous ?? false,
    })
    .returning();
  if (!u) throw new Error("no user");
  return u;
}

export async function makeMaker(name?: string) {
  const n = next();
  const [m] = await db
    .insert(makers)
    .values({ slug: `maker-${n}`, name: name ?? `Maker ${n}` })
    .returning();
  if (!m) throw new Error("no maker");
  return m;
}

export async function makePack(makerId: number, opts: Partial<typeof packs.$inferInsert> = {}) {
  const n = next();
  const [p] = await db
    .insert(packs)
    .values({
      slug: `pack-${n}`,
      makerId,
      model: `Model ${n}`,
      cellsInSeries: 4,
      ratedCapacityMah: 1500,
      labelledContinuousC: 50,
      connector: "XT60",
      weightG: 180,
      ...opts,
    })
    .returning();
  if (!p) throw new Error("no pack");
  return p;
}

export type ResultOpts = {
  status?: (typeof results.$inferInsert)["status"];
  ambientC?: number;
  cutoffVPerCell?: number;
  rateC?: number;
  cycles?: number;
  method?: "iec-61960-two-level" | "dc-step" | "ac-1khz" | "charger-readout";
  sagLimitedC?: number | null;
  labelRatio?: number | null;
  /** The measured rating (null unless given). */
  sustainedCMeasured?: number | null;
  /** A retention series in the stored figures (a log of several cycles). */
  retention?: RetentionSeries;
  capacityMah?: number | null;
  capacityRatio?: number | null;
  dcResistanceMohm?: number | null;
  reachedCutoff?: boolean;
  passedStop?: boolean;
  loadMode?: "constant-current" | "constant-power" | "constant-resistance";
  publishedAt?: Date;
  curve?: CurvePoint[];
  /** A reader's open flag on it (an open case: the result stays approved and counted). */
  openCase?: boolean;
};

export async function makeResult(
  pack: { id: number; ratedCapacityMah: number; labelledContinuousC: number },
  contributorId: string,
  o: ResultOpts = {},
) {
  const n = next();
  const rateC = o.rateC ?? 8;
  const loadCurrentA = (rateC * pack.ratedCapacityMah) / 1000;
  const card = {
    resistanceMethod: o.method ?? "dc-step",
    ambientC: o.ambientC ?? 22,
    cutoffVPerCell: o.cutoffVPerCell ?? 3.3,
    loadCurrentA,
    ratedMah: pack.ratedCapacityMah,
    cyclesBeforeTest: o.cycles ?? 0,
  };
  const sag = o.sagLimitedC === undefined ? 40 : o.sagLimitedC;
  const figures = {
    timeToCutoffS: o.reachedCutoff === false ? null : 400,
    timeToStopTemperatureS: o.passedStop ? 300 : null,
    sagLimitedC: sag,
    sustainedCMeasured: o.sustainedCMeasured ?? null,
    retention: o.retention ?? null,
  } as unknown as Figures;
  const status = o.status ?? "approved";
  const [r] = await db
    .insert(results)
    .values({
      packId: pack.id,
      contributorId,
      status,
      ambientTemperatureC: card.ambientC,
      loadMode: o.loadMode ?? "constant-current",
      loadCurrentA,
      cutoffVPerCell: card.cutoffVPerCell,
      stopTemperatureC: 60,
      resistanceMethod: card.resistanceMethod,
      equipment: "Test load",
      cyclesBeforeTest: card.cyclesBeforeTest,
      logKey: `logs/${n}`,
      logSha256: n,
      logBytes: 10,
      logFilename: "x.csv",
      figures,
      curve: o.curve ?? [],
      sagLimitedC: sag,
      labelRatio: o.labelRatio === undefined ? (sag === null ? null : sag / pack.labelledContinuousC) : o.labelRatio,
      sustainedCMeasured: o.sustainedCMeasured ?? null,
      sustainedLabelRatio:
        o.sustainedCMeasured === undefined || o.sustainedCMeasured === null
          ? null
          : o.sustainedCMeasured / pack.labelledContinuousC,
      capacityMah: o.capacityMah === undefined ? pack.ratedCapacityMah * 0.95 : o.capacityMah,
      capacityRatio: o.capacityRatio ?? 0.95,
      dcResistanceMohm: o.dcResistanceMohm === undefined ? 12 : o.dcResistanceMohm,
      loadRateC: rateC,
      groupKey: groupKey(card).key,
      publishedAt: status === "approved" ? (o.publishedAt ?? new Date()) : null,
    })
    .returning();
  if (!r) throw new Error("no result");
  await db
    .insert(reviewEvents)
    .values({ resultId: r.id, actorId: contributorId, toStatus: "pending", note: "Submitted." });
  if (o.openCase) await db.insert(readerFlags).values({ resultId: r.id, reason: "wrong-figures", note: "Check it." });
  return r;
}

/** Removes every result, pack and maker, so each test file starts from an empty catalogue. */
export async function emptyCatalogue() {
  await db.delete(readerFlags).where(sql`true`);
  await db.delete(reviewEvents).where(sql`true`);
  await db.delete(results).where(sql`true`);
  await db.delete(packs).where(sql`true`);
  await db.delete(makers).where(sql`true`);
}

/**
 * An open reader case on a result, as a signed-in reader's flag leaves it: the result stays approved and keeps
 * counting (the counting rule, lib/open-data/licence.ts#PUBLISHED_RULE) until a moderator resolves the case.
 */
export async function openReaderCase(resultId: number, reporterId: string) {
  const [flag] = await db
    .insert(readerFlags)
    .values({ resultId, reporterId, reason: "wrong-figures", note: "The capacity looks high." })
    .returning();
  if (!flag) throw new Error("no flag");
  return flag;
}
