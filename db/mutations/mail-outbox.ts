// The outgoing mail queue. A message is claimed with a short lease (next_attempt_at pushed forward) before
// it is sent, so two app instances flushing at once never send the same message twice.
import "server-only";
import { and, eq, isNull, lt, lte, sql } from "drizzle-orm";
import { db } from "@/db";
import { mailOutbox } from "@/db/schema";

export type OutboxMessage = typeof mailOutbox.$inferSelect;
export type NewOutboxMessage = { to: string; subject: string; text: string; html: string | null; sensitive: boolean };

/** Queue a message already claimed by the caller for `leaseS` seconds (it is about to try sending it). */
export async function enqueueClaimedMail(message: NewOutboxMessage, leaseS: number): Promise<OutboxMessage> {
  const [row] = await db
    .insert(mailOutbox)
    .values({ ...message, nextAttemptAt: new Date(Date.now() + leaseS * 1000) })
    .returning();
  if (!row) throw new Error("mail outbox insert returned nothing");
  return row;
}

/** Claim up to `limit` unsent messages that are due and have attempts left, leasing them for `leaseS`. */
export async function claimDueMail(limit: number, leaseS: number, maxAttempts: number): Promise<OutboxMessage[]> {
  const due = db
    .select({ id: mailOutbox.id })
    .from(mailOutbox)
    .where(
      and(isNull(mailOutbox.sentAt), lte(mailOutbox.nextAttemptAt, sql`now()`), lt(mailOutbox.attempts, maxAttempts)),
    )
    .orderBy(mailOutbox.nextAttemptAt)
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
