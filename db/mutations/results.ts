// Writes of results by their contributor. Each runs in one transaction with its review event (and, on
// submission, the catalogue proposal and the receipt in the mail outbox), so a failure leaves nothing.
import "server-only";
import { eq } from "drizzle-orm";
import { db, type Executor } from "@/db";
import { findResultByIdempotencyKey } from "@/db/queries/submissions";
import { results, reviewEvents, type ReviewStatus } from "@/db/schema";
import { AppError } from "@/lib/errors";
import { ownStatusLabels } from "@/lib/labels";
import { createProposedPack, type PackProposal } from "./catalogue";
import { queueMail, type NewOutboxMessage } from "./mail-outbox";
import { computeAndStoreFlags } from "./review";

/** The columns a submission or resubmission sets (method card, stored files, computed figures). */
export type ResultFields = Omit<
  typeof results.$inferInsert,
  "id" | "packId" | "contributorId" | "status" | "idempotencyKey" | "submittedAt" | "publishedAt" | "updatedAt"
>;
export type NewSubmission = {
  contributorId: string;
  idempotencyKey: string;
  pack: { packId: number } | { proposal: PackProposal };
  fields: ResultFields;
  /** The receipt, written once the result has its number; queued in the same transaction. */
  receipt: ((resultId: number) => NewOutboxMessage) | null;
};

/** The PostgreSQL error behind a Drizzle query error (or the error itself). */
function pgError(err: unknown): { code?: string; constraint?: string } {
  const e = err as { code?: string; constraint?: string; cause?: unknown } | null;
  if (e && typeof e === "object" && !e.code && e.cause) return pgError(e.cause);
  return e && typeof e === "object" ? e : {};
}

/**
 * Result, proposal, first review event (none → pending, by the contributor) and receipt, together.
 * The same idempotency key from the same contributor gives back the first result (a double click).
 */
export async function createSubmission(s: NewSubmission): Promise<{ resultId: number; created: boolean }> {
  try {
    return await db.transaction(async (tx) => {
      const packId =
        "packId" in s.pack ? s.pack.packId : (await createProposedPack(tx, s.pack.proposal, s.contributorId)).packId;
      const [row] = await tx
        .insert(results)
        .values({
          ...s.fields,
          packId,
          contributorId: s.contributorId,
          status: "pending",
          idempotencyKey: s.idempotencyKey,
        })
        .returning({ id: results.id });
      if (!row) throw new Error("result insert returned nothing");
      await tx.insert(reviewEvents).values({
        resultId: row.id,
        actorId: s.contributorId,
        fromStatus: null,
        toStatus: "pending",
        note: "Submitted.",
      });
      // The automatic plausibility flags arrive with the result (same transaction), ready for the review queue.
      await computeAndStoreFlags(row.id, tx);
      if (s.receipt) await queueMail(tx, [s.receipt(row.id)]);
      return { resultId: row.id, created: true };
    });
  } catch (err) {
    const pg = pgError(err);
    if (pg.code === "23505" && pg.constraint === "results_idempotency_idx") {
      const existing = await findResultByIdempotencyKey(s.contributorId, s.idempotencyKey);
      if (existing) return { resultId: existing.id, created: false };
    }
    throw err;
  }
}

/** Locks the contributor's own result, checking who owns it and that its state allows the change. */
async function lockOwn(
  tx: Executor,
  resultId: number,
  contributorId: string,
  allowed: readonly ReviewStatus[],
  verb: string,
) {
  const [row] = await tx
    .select({ contributorId: results.contributorId, status: results.status })
    .from(results)
    .where(eq(results.id, resultId))
    .for("update");
  // Someone else's result answers exactly like a missing one: no existence oracle.
  if (!row || row.contributorId !== contributorId) throw new AppError("not_found", "That result does not exist.");
  if (!allowed.includes(row.status)) {
    throw new AppError(
      "conflict",
      `This result is now “${ownStatusLabels[row.status].toLowerCase()}”; only a result ${allowed.map((s) => `“${ownStatusLabels[s].toLowerCase()}”`).join(" or ")} can be ${verb === "withdraw" ? "withdrawn" : "answered"}.`,
    );
  }
  return row;
}

/** A contributor takes back a result that is still waiting for review (or for their changes). */
export async function withdrawOwnResult(resultId: number, contributorId: string, note: string | null): Promise<void> {
  await db.transaction(async (tx) => {
    const row = await lockOwn(tx, resultId, contributorId, ["pending", "awaiting_answer"], "withdraw");
    await tx.update(results).set({ status: "withdrawn", updatedAt: new Date() }).where(eq(results.id, resultId));
    await tx.insert(reviewEvents).values({
      resultId,
      actorId: contributorId,
      fromStatus: row.status,
      toStatus: "withdrawn",
      note: note ?? "Withdrawn by the contributor.",
    });
  });
}

/**
 * The contributor's answer to a moderator's request: new method card and figures, back to pending, history
 * kept, and the answer's receipt queued with it.
 */
export async function resubmitOwnResult(
  resultId: number,
  contributorId: string,
  fields: Partial<ResultFields>,
  note: string,
  receipt: NewOutboxMessage | null,
): Promise<void> {
  await db.transaction(async (tx) => {
    await lockOwn(tx, resultId, contributorId, ["awaiting_answer"], "resubmit");
    await tx
      .update(results)
      .set({ ...fields, status: "pending", updatedAt: new Date() })
      .where(eq(results.id, resultId));
    await tx
      .insert(reviewEvents)
      .values({ resultId, actorId: contributorId, fromStatus: "awaiting_answer", toStatus: "pending", note });
    // New method card or figures: the plausibility flags are computed again.
    await computeAndStoreFlags(resultId, tx);
    if (receipt) await queueMail(tx, [receipt]);
  });
}
