// Reads of the mail outbox: what has not gone out (for admins at /admin/mail) and when the next message
// falls due (for the mail worker's sleep).
import "server-only";
import { and, count, desc, gt, isNull, lt, min, sql } from "drizzle-orm";
import { db } from "@/db";
import { mailOutbox } from "@/db/schema";

export type UndeliveredMail = {
  id: number;
  to: string;
  subject: string;
  attempts: number;
  lastError: string | null;
  nextAttemptAt: Date;
  createdAt: Date;
  /** Every attempt failed: the worker will not try again unless an admin asks. */
  givenUp: boolean;
};

/**
 * Unsent messages that failed at least once, the ones given up on first, newest first. Messages not yet tried
 * are simply waiting for the worker and not listed.
 */
export async function listUndeliveredMail(
  maxAttempts: number,
  limit = 200,
): Promise<{ rows: UndeliveredMail[]; givenUp: number; retrying: number; waiting: number }> {
  const rows = await db
    .select({
      id: mailOutbox.id,
      to: mailOutbox.to,
      subject: mailOutbox.subject,
      attempts: mailOutbox.attempts,
      lastError: mailOutbox.lastError,
      nextAttemptAt: mailOutbox.nextAttemptAt,
      createdAt: mailOutbox.createdAt,
    })
    .from(mailOutbox)
    .where(and(isNull(mailOutbox.sentAt), gt(mailOutbox.attempts, 0)))
    .orderBy(desc(sql`${mailOutbox.attempts} >= ${maxAttempts}`), desc(mailOutbox.createdAt), desc(mailOutbox.id))
    .limit(limit);
  const [counts] = await db
    .select({
      givenUp: count(sql`case when ${mailOutbox.attempts} >= ${maxAttempts} then 1 end`),
      retrying: count(sql`case when ${mailOutbox.attempts} > 0 and ${mailOutbox.attempts} < ${maxAttempts} then 1 end`),
      waiting: count(sql`case when ${mailOutbox.attempts} = 0 then 1 end`),
    })
    .from(mailOutbox)
    .where(isNull(mailOutbox.sentAt));
  return {
    rows: rows.map((r) => ({ ...r, givenUp: r.attempts >= maxAttempts })),
    givenUp: counts?.givenUp ?? 0,
    retrying: counts?.retrying ?? 0,
    waiting: counts?.waiting ?? 0,
  };
}

/** When the earliest unsent message with attempts left falls due (null: none is waiting). */
export async function nextMailDueAt(maxAttempts: number): Promise<Date | null> {
  const [row] = await db
    .select({ at: min(mailOutbox.nextAttemptAt) })
    .from(mailOutbox)
    .where(and(isNull(mailOutbox.sentAt), lt(mailOutbox.attempts, maxAttempts)));
  return row?.at ?? null;
}
