// Moderation writes. Each status change and its review_events row share one transaction, with the result
// row locked (SELECT … FOR UPDATE) and its status re-checked, so two moderators can never both decide the
// same result. A decision's e-mails (the contributor's, and one row per person e-mailed about the pack) are
// queued in the same transaction: a decision that fails queues nothing, one that commits loses no e-mail.
// Revalidation runs only after the commit, in the service (server/review.ts).
import "server-only";
import { and, eq, ne } from "drizzle-orm";
import { db, type Executor, type Transaction } from "@/db";
import { getAgreementRow, listAgreementRows } from "@/db/queries/bench-agreement";
import { getPlausibilityInput } from "@/db/queries/review";
import { makers, packEmails, packs, readerFlags, results, reviewEvents, users, type ReviewStatus } from "@/db/schema";
import type { PlausibilityFlag } from "@/db/schema/results";
import { plausibilityFlags } from "@/lib/analysis/plausibility";
import { AGREEMENT_FLAG_CODE } from "@/lib/analysis/agreement/scores";
import { scoreNewResult } from "@/lib/bench-agreement";
import { storeCurveFingerprint } from "./curve-fingerprints";
import { AppError } from "@/lib/errors";
import type { ResolvedFlag } from "@/lib/flag-resolution-message";
import { packTitle } from "@/lib/format";
import type { FlagResolution, RejectReason } from "@/lib/validations/review";
import { settleProposedPack, type CatalogueChoice } from "./catalogue";
import { queueMail, type NewOutboxMessage } from "./mail-outbox";

/** What the after-effects of a moderation write need: the result, its pack and group, who submitted it. */
export type ResultContext = {
  resultId: number;
  packId: number;
  packSlug: string;
  makerSlug: string;
  groupKey: string;
  /** The bench profile the result was measured with (its public bench page and agreement show it). */
  benchProfileId: number | null;
  packTitle: string;
  contributorId: string;
  contributorEmail: string | null;
};

/**
 * Computes the automatic plausibility flags of a result and stores them on it (results.flags). The
 * submission flow calls this right after inserting a result; it is safe to call again.
 */
export async function computeAndStoreFlags(resultId: number, exec: Executor = db): Promise<PlausibilityFlag[]> {
  // The curve's fingerprint first: the copy check searches the other results by it.
  await storeCurveFingerprint(resultId, exec);
  const input = await getPlausibilityInput(resultId, exec);
  if (!input) throw new AppError("not_found", "That result does not exist.");
  const mine: PlausibilityFlag[] = [...plausibilityFlags(input), ...(await agreementFlags(resultId, exec))];
  // The submission's own checks against the method card (and its duplicate check) stay; a code raised here
  // replaces the same code already stored, so running this again is safe. The card check
  // "cutoff-not-reached" says the same as our cutoff-mismatch.
  const [row] = await exec.select({ flags: results.flags }).from(results).where(eq(results.id, resultId));
  // The agreement flag is always ours: a re-run that no longer finds the result far removes it.
  const ours = new Set<string>([...mine.map((f) => f.code), AGREEMENT_FLAG_CODE]);
  if (mine.some((f) => f.code === "cutoff-mismatch")) ours.add("cutoff-not-reached");
  const flags = [...(row?.flags ?? []).filter((f) => !ours.has(f.code)), ...mine];
  await exec.update(results).set({ flags }).where(eq(results.id, resultId));
  return flags;
}

/** One flag when the result lies |z| > 3 from the other benches on its pack and group (lib/bench-agreement.ts). */
async function agreementFlags(resultId: number, exec: Executor): Promise<PlausibilityFlag[]> {
  const candidate = await getAgreementRow(resultId, exec);
  if (!candidate) return [];
  const rows = await listAgreementRows({ packId: candidate.packId, groupKey: candidate.groupKey }, exec);
  const far = scoreNewResult(rows, candidate).flatMap((s) => (s.flag ? [s.flag.label] : []));
  return far.length === 0 ? [] : [{ code: AGREEMENT_FLAG_CODE, message: far.join(" ") }];
}

/** Locks a result and returns what the decision and its after-effects need. */
export async function lockResult(tx: Transaction, resultId: number): Promise<ResultContext & { status: ReviewStatus }> {
  const [row] = await tx
    .select({
      status: results.status,
      packId: results.packId,
      groupKey: results.groupKey,
      benchProfileId: results.benchProfileId,
      contributorId: results.contributorId,
      packSlug: packs.slug,
      model: packs.model,
      makerSlug: makers.slug,
      makerName: makers.name,
      contributorEmail: users.email,
    })
    .from(results)
    .innerJoin(packs, eq(packs.id, results.packId))
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .innerJoin(users, eq(users.id, results.contributorId))
    .where(eq(results.id, resultId))
    .for("update", { of: results });
  if (!row) throw new AppError("not_found", "That result does not exist.");
  return { ...row, resultId, packTitle: packTitle({ makerName: row.makerName, model: row.model }) };
}

async function transition(
  tx: Transaction,
  p: {
    resultId: number;
    actorId: string | null;
    from: ReviewStatus;
    to: ReviewStatus;
    reason?: string | null;
    note?: string | null;
    publish?: boolean;
  },
): Promise<void> {
  const now = new Date();
  const updated = await tx
    .update(results)
    .set({ status: p.to, updatedAt: now, ...(p.publish ? { publishedAt: now } : {}) })
    .where(and(eq(results.id, p.resultId), eq(results.status, p.from)))
    .returning({ id: results.id });
  if (updated.length !== 1)
    throw new AppError("conflict", "This result changed while you were looking at it. Reload and try again.");
  await tx.insert(reviewEvents).values({
    resultId: p.resultId,
    actorId: p.actorId,
    fromStatus: p.from,
    toStatus: p.to,
    reason: p.reason ?? null,
    note: p.note ?? null,
    createdAt: now,
  });
}

export type Decision =
  | { kind: "approve"; note: string | null; catalogue: CatalogueChoice }
  | { kind: "reject"; reason: RejectReason; note: string | null }
  | { kind: "ask"; note: string };

const decisionStatus = { approve: "approved", reject: "rejected", ask: "awaiting_answer" } as const;
export type DecisionStatus = (typeof decisionStatus)[Decision["kind"]];

/** What a decision's e-mails are written from: the result as it is after the decision, and who is e-mailed. */
export type DecisionMailInput = ResultContext & { status: DecisionStatus; packEmailRecipients: string[] };

/** Addresses of the people e-mailed new results of a pack, except the result's contributor. */
async function packEmailRecipients(tx: Transaction, packId: number, exceptUserId: string): Promise<string[]> {
  const rows = await tx
    .select({ email: users.email })
    .from(packEmails)
    .innerJoin(users, eq(users.id, packEmails.userId))
    .where(and(eq(packEmails.packId, packId), ne(packEmails.userId, exceptUserId)));
  return rows.flatMap((r) => (r.email ? [r.email] : []));
}

/**
 * Approve, reject or ask the contributor about a pending result, in one transaction: the status change and
 * its event; on approval the result's proposed pack (and maker) go live or merge into an existing entry; and
 * the e-mails `mailFor` writes are queued. A moderator cannot decide their own result. Returns what the
 * after-effects need (server/review.ts#decideResult revalidates), with the proposal slugs that went away.
 */
export async function writeDecision(
  actorId: string,
  resultId: number,
  decision: Decision,
  mailFor: (m: DecisionMailInput) => NewOutboxMessage[],
): Promise<{ ctx: ResultContext; status: DecisionStatus; oldSlugs: string[]; queued: number }> {
  const to = decisionStatus[decision.kind];
  const reason = decision.kind === "reject" ? decision.reason : null;
  return db.transaction(async (tx) => {
    const { status: current, ...locked } = await lockResult(tx, resultId);
    let c: ResultContext = locked;
    if (c.contributorId === actorId)
      throw new AppError("forbidden", "You cannot review your own result; another moderator has to.");
    if (current !== "pending")
      throw new AppError("conflict", "This result is no longer waiting for review; reload to see what changed.");
    let oldSlugs: string[] = [];
    if (decision.kind === "approve") {
      const settled = await settleProposedPack(tx, actorId, c.packId, decision.catalogue);
      c = {
        ...c,
        packId: settled.packId,
        packSlug: settled.packSlug,
        makerSlug: settled.makerSlug,
        packTitle: settled.title,
      };
      oldSlugs = settled.oldSlugs;
    }
    await transition(tx, {
      resultId,
      actorId,
      from: "pending",
      to,
      reason,
      note: decision.note,
      publish: to === "approved",
    });
    const recipients = to === "approved" ? await packEmailRecipients(tx, c.packId, c.contributorId) : [];
    const ids = await queueMail(tx, mailFor({ ...c, status: to, packEmailRecipients: recipients }));
    return {
      ctx: c,
      status: to,
      oldSlugs,
      queued: ids.length,
    };
  });
}

/**
 * Resolves an open reader flag. "kept" dismisses it (the result stays published and counted); "corrected"
 * dismisses it with a note saying what was put right; "withdrawn" takes the result out of publication
 * (approved → withdrawn, with the moderator's reason as a review event) and closes every other open flag on
 * it. A flag never changed the result by itself, so dismissing one changes no status. A withdrawn result is
 * never deleted: it and its history stay in the audit log.
 */
export async function writeFlagResolution(
  actorId: string,
  flagId: number,
  resolution: FlagResolution,
  note: string | null,
): Promise<{ ctx: ResultContext; resolved: ResolvedFlag }> {
  const { ctx, status, alsoClosed, stillOpen } = await db.transaction(async (tx) => {
    const [flag] = await tx.select().from(readerFlags).where(eq(readerFlags.id, flagId)).for("update");
    if (!flag) throw new AppError("not_found", "That flag does not exist.");
    const c = await lockResult(tx, flag.resultId);
    if (c.contributorId === actorId)
      throw new AppError("forbidden", "You cannot resolve a flag on your own result; another moderator has to.");
    if (flag.status !== "open") throw new AppError("conflict", "This flag has already been resolved.");
    const now = new Date();
    const close = { status: resolution, resolvedById: actorId, resolutionNote: note, resolvedAt: now } as const;
    await tx
      .update(readerFlags)
      .set(close)
      .where(and(eq(readerFlags.id, flagId), eq(readerFlags.status, "open")));
    let alsoClosed = 0;
    let status: ReviewStatus = c.status;
    if (resolution === "withdrawn") {
      if (c.status !== "approved")
        throw new AppError("conflict", `This result is no longer published (it is ${c.status.replace("_", " ")}).`);
      const others = await tx
        .update(readerFlags)
        .set(close)
        .where(and(eq(readerFlags.resultId, flag.resultId), eq(readerFlags.status, "open"), ne(readerFlags.id, flagId)))
        .returning({ id: readerFlags.id });
      alsoClosed = others.length;
      await transition(tx, {
        resultId: flag.resultId,
        actorId,
        from: "approved",
        to: "withdrawn",
        reason: "flag-withdrawn",
        note,
      });
      status = "withdrawn";
    }
    const open = await tx
      .select({ id: readerFlags.id })
      .from(readerFlags)
      .where(and(eq(readerFlags.resultId, flag.resultId), eq(readerFlags.status, "open")));
    return { ctx: c, status, alsoClosed, stillOpen: open.length };
  });
  return { ctx, resolved: { flagId, resolution, resultId: ctx.resultId, status, alsoClosed, stillOpen } };
}
