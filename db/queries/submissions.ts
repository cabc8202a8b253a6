// Reads for the submission flow: the catalogue as the pack picker sees it, one pack or maker by id,
// a contributor's own result for withdrawal or resubmission, and earlier results with the same log.
import "server-only";
import { and, asc, desc, eq, or } from "drizzle-orm";
import { db } from "@/db";
import { makers, packs, results, reviewEvents } from "@/db/schema";
import type { PackLabelFields } from "@/lib/catalogue";
import { packLabelColumns } from "./packs";

export type PackChoice = { id: number; makerName: string; model: string; proposed: boolean } & PackLabelFields;

const choiceColumns = {
  id: packs.id,
  makerName: makers.name,
  model: packs.model,
  ...packLabelColumns,
  status: packs.status,
};

/** Packs a contributor may submit against: active ones, and their own proposals awaiting moderation. */
const pickableBy = (userId: string) =>
  or(eq(packs.status, "active"), and(eq(packs.status, "proposed"), eq(packs.proposedById, userId)));
const toChoice = ({ status, ...r }: { status: string } & Omit<PackChoice, "proposed">): PackChoice => ({
  ...r,
  proposed: status === "proposed",
});

/** Active packs, plus the ones this contributor proposed that are still waiting for moderation. */
export async function listPackChoices(userId: string): Promise<PackChoice[]> {
  const rows = await db
    .select(choiceColumns)
    .from(packs)
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(pickableBy(userId))
    .orderBy(asc(makers.name), asc(packs.model));
  return rows.map(toChoice);
}

/** A pack a contributor may submit against (active, or their own proposal); null otherwise. */
export async function getPackChoice(packId: number, userId: string): Promise<PackChoice | null> {
  const rows = await db
    .select(choiceColumns)
    .from(packs)
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(and(eq(packs.id, packId), pickableBy(userId)))
    .limit(1);
  return rows[0] ? toChoice(rows[0]) : null;
}

export type MakerChoice = { id: number; name: string };

export async function listMakerChoices(userId: string): Promise<MakerChoice[]> {
  return db
    .select({ id: makers.id, name: makers.name })
    .from(makers)
    .where(or(eq(makers.status, "active"), and(eq(makers.status, "proposed"), eq(makers.proposedById, userId))))
    .orderBy(asc(makers.name));
}

export async function getMakerChoice(makerId: number, userId: string): Promise<MakerChoice | null> {
  const rows = await db
    .select({ id: makers.id, name: makers.name })
    .from(makers)
    .where(
      and(
        eq(makers.id, makerId),
        or(eq(makers.status, "active"), and(eq(makers.status, "proposed"), eq(makers.proposedById, userId))),
      ),
    )
    .limit(1);
  return rows[0] ?? null;
}

/** The result a contributor's form submission already made (the idempotency key from the form). */
export async function findResultByIdempotencyKey(
  contributorId: string,
  idempotencyKey: string,
): Promise<{ id: number } | null> {
  const rows = await db
    .select({ id: results.id })
    .from(results)
    .where(and(eq(results.contributorId, contributorId), eq(results.idempotencyKey, idempotencyKey)))
    .limit(1);
  return rows[0] ?? null;
}

/** Other results stored with the same log file (a plausibility flag for moderators). */
export async function listResultIdsWithLog(sha256: string): Promise<number[]> {
  const rows = await db
    .select({ id: results.id })
    .from(results)
    .where(eq(results.logSha256, sha256))
    .orderBy(asc(results.id))
    .limit(10);
  return rows.map((r) => r.id);
}

export type OwnResult = {
  id: number;
  contributorId: string;
  status: (typeof results.$inferSelect)["status"];
  pack: PackChoice;
  method: Pick<
    typeof results.$inferSelect,
    | "benchProfileId"
    | "ambientTemperatureC"
    | "packStartTemperatureC"
    | "loadMode"
    | "loadCurrentA"
    | "cutoffVPerCell"
    | "stopTemperatureC"
    | "resistanceMethod"
    | "equipment"
    | "sampleRateHz"
    | "cyclesBeforeTest"
    | "testedOn"
    | "notes"
  >;
  logKey: string;
  logFilename: string;
  /** The column mapping the stored log was read with (null: detected). */
  logMapping: (typeof results.$inferSelect)["logMapping"];
  photoKeys: string[];
};

/** A result with what its edit form needs; null when it does not exist. Ownership is the caller's check. */
export async function getResultForEdit(resultId: number): Promise<OwnResult | null> {
  const row = await db.query.results.findFirst({ where: eq(results.id, resultId) });
  if (!row) return null;
  const pack = await db
    .select(choiceColumns)
    .from(packs)
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(eq(packs.id, row.packId))
    .limit(1);
  const p = pack[0];
  if (!p) return null;
  const { status: packStatus, ...packRest } = p;
  return {
    id: row.id,
    contributorId: row.contributorId,
    status: row.status,
    pack: { ...packRest, proposed: packStatus === "proposed" },
    method: {
      benchProfileId: row.benchProfileId,
      ambientTemperatureC: row.ambientTemperatureC,
      packStartTemperatureC: row.packStartTemperatureC,
      loadMode: row.loadMode,
      loadCurrentA: row.loadCurrentA,
      cutoffVPerCell: row.cutoffVPerCell,
      stopTemperatureC: row.stopTemperatureC,
      resistanceMethod: row.resistanceMethod,
      equipment: row.equipment,
      sampleRateHz: row.sampleRateHz,
      cyclesBeforeTest: row.cyclesBeforeTest,
      testedOn: row.testedOn,
      notes: row.notes,
    },
    logKey: row.logKey,
    logFilename: row.logFilename,
    logMapping: row.logMapping,
    photoKeys: row.photoKeys,
  };
}

/**
 * The latest time a moderator sent the result back for an answer: what they asked (the event's note, which
 * the contributor is meant to read — it is also in their e-mail) and when.
 */
export async function getLatestRequest(
  resultId: number,
): Promise<{ note: string | null; reason: string | null; createdAt: Date } | null> {
  const rows = await db
    .select({ note: reviewEvents.note, reason: reviewEvents.reason, createdAt: reviewEvents.createdAt })
    .from(reviewEvents)
    .where(and(eq(reviewEvents.resultId, resultId), eq(reviewEvents.toStatus, "awaiting_answer")))
    .orderBy(desc(reviewEvents.createdAt), desc(reviewEvents.id))
    .limit(1);
  return rows[0] ?? null;
}
