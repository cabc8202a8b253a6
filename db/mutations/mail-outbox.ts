// The outgoing mail queue. Messages are written by the transaction that causes them (a submission, a
// decision, a sign-in request) and sent by the mail worker (scripts/mail-worker.ts), which claims due rows
// with a short lease (FOR UPDATE SKIP LOCKED, next_attempt_at pushed forward), so two workers never send the
// same message twice. An insert wakes the worker when its transaction commits (the mail_outbox_notify trigger).
import "server-only";
import { and, eq, isNull, lt, lte, sql } from "drizzle-orm";
import { db, type Executor } from "@/db";
import { auditEvents, mailOutbox } from "@/db/schema";
import { AppError } from "@/lib/errors";

export type OutboxMessage = typeof mailOutbox.$inferSelect;
export type NewOutboxMessage = { to: string; subject: string; text: string; html: string | null; sensitive: boolean };

/** Queue messages in the caller's transaction (or on their own). One statement, however many rows. */
export async function queueMail(exec: Executor, messages: readonly NewOutboxMessage[]): Promise<number[]> {
  if (messages.length === 0) return [];
  const rows = await exec
    .insert(mailOutbox)
    .values([...messages])
    .returning({ id: mailOutbox.id });
  return rows.map((r) => r.id);
}

/** Claim up to `limit` unsent messages that are due and have attempts left, leasing them for `leaseS`. */
export async function claimDueMail(limit: number, leaseS: number, maxAttempts: number): Promise<OutboxMessage[]> {
  const due = db
    .select({ id: mailOutbox.id })
    .from(mailOutbox)
    .where(
      and(isNull(mailOutbox.sentAt), lte(mailOutbox.nextAttemptAt, sql`now()`), lt(mailOutbox.attempts, maxAttempts)),
    )
    .orderBy(mailOutbox.nextAttemptAt, mailOutbox.id)
    .limit(limit)
    .for("update", { skipLocked: true });
  return db
    .update(mailOutbox)
    .set({ nextAttemptAt: sql`now() + make_interval(secs => ${leaseS})` })
    .where(sql`${mailOutbox.id} in ${due}`)
    .returning();
}

export async function markMailSent(id: number, wipeBody: boolean): Promise<void> {
  await db
    .update(mailOutbox)
    .set({
      sentAt: new Date(),
      attempts: sql`${mailOutbox.attempts} + 1`,
      lastError: null,
      ...(wipeBody ? { text: "[removed after sending]", html: null } : {}),
    })
    .where(eq(mailOutbox.id, id));
}

export async function markMailFailed(id: number, error: string, nextAttemptAt: Date): Promise<void> {
  await db
    .update(mailOutbox)
    .set({ attempts: sql`${mailOutbox.attempts} + 1`, lastError: error.slice(0, 500), nextAttemptAt })
    .where(eq(mailOutbox.id, id));
}

/**
 * An admin sends an unsent message again: its attempts start over and it is due now (the worker is woken).
 * The last error stays until a send succeeds. Audited.
 */
export async function retryMail(actorId: string, id: number): Promise<{ id: number; to: string }> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .select({ id: mailOutbox.id, to: mailOutbox.to, sentAt: mailOutbox.sentAt, attempts: mailOutbox.attempts })
      .from(mailOutbox)
      .where(eq(mailOutbox.id, id))
      .for("update");
    if (!row) throw new AppError("not_found", "That message is not in the outbox.");
    if (row.sentAt) throw new AppError("conflict", "That message has been sent already.");
    await tx
      .update(mailOutbox)
      .set({ attempts: 0, nextAttemptAt: sql`now()` })
      .where(eq(mailOutbox.id, id));
    await tx.insert(auditEvents).values({
      actorId,
      action: "mail.retry",
      entityType: "mail",
      entityId: String(id),
      data: { to: row.to, attemptsBefore: row.attempts },
    });
    await tx.execute(sql`select pg_notify('mail_outbox', '')`);
    return { id: row.id, to: row.to };
  });
}
