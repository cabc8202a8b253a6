// Mail never runs inside a request. A request (or the transaction that causes the mail: a submission, a
// decision) writes rows to mail_outbox; the mail worker (scripts/mail-worker.ts → ./worker.ts) claims the due
// ones and sends them through SMTP. A failed send waits with exponential backoff (1 min doubling to 6 h) for
// MAX_ATTEMPTS attempts, then stays visible to admins at /admin/mail, who can send it again.
import "server-only";
import {
  claimDueMail,
  markMailFailed,
  markMailSent,
  queueMail as queueRows,
  type NewOutboxMessage,
  type OutboxMessage,
} from "@/db/mutations/mail-outbox";
import { db } from "@/db";
import { env } from "@/server/env";
import { mailTransport, type MailTransport } from "./transport";
import type { MailContent } from "./templates";

export const MAX_ATTEMPTS = 10;
const LEASE_S = 120;
const FIRST_RETRY_S = 60;
const MAX_RETRY_S = 6 * 60 * 60;

/** Seconds to wait after the n-th failed attempt: 1 min, 2 min, 4 min … capped at 6 h. */
export function retryDelayS(failedAttempts: number): number {
  const n = Math.max(1, Math.floor(failedAttempts));
  return Math.min(MAX_RETRY_S, FIRST_RETRY_S * 2 ** (n - 1));
}

/** An outbox row for a message; queue it in the transaction that causes it. */
export function outboxMessage(to: string, content: MailContent, sensitive = false): NewOutboxMessage {
  return { to, subject: content.subject, text: content.text, html: content.html, sensitive };
}

/**
 * Queue one message on its own (nothing else to commit with it, e.g. a sign-in link). Returns at once; the
 * worker sends it when the insert commits.
 */
export async function queueMail(to: string, content: MailContent, opts: { sensitive?: boolean } = {}): Promise<number> {
  const [id] = await queueRows(db, [outboxMessage(to, content, opts.sensitive ?? false)]);
  if (id === undefined) throw new Error("mail outbox insert returned nothing");
  return id;
}

type SendOutcome = { id: number; sent: boolean; error?: string };

async function attempt(row: OutboxMessage, transport: MailTransport): Promise<SendOutcome> {
  try {
    const info = await transport.sendMail({
      from: env().MAIL_FROM,
      to: row.to,
      subject: row.subject,
      text: row.text,
      ...(row.html ? { html: row.html } : {}),
    });
    const rejected = [...(info.rejected ?? []), ...(info.pending ?? [])];
    if (rejected.length) throw new Error(`the relay refused ${rejected.length} recipient(s)`);
    await markMailSent(row.id, row.sensitive);
    return { id: row.id, sent: true };
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    await markMailFailed(row.id, message, new Date(Date.now() + retryDelayS(row.attempts + 1) * 1000));
    console.warn(`[mail] message ${row.id} not sent (attempt ${row.attempts + 1}): ${message}`);
    return { id: row.id, sent: false, error: message };
  }
}

/**
 * Send the due messages once, oldest first, a few at a time; safe to run from several processes at once.
 * The worker calls this whenever it wakes; `npm run mail:flush` calls it once.
 */
export async function deliverDueMail(
  opts: { transport?: MailTransport; limit?: number; concurrency?: number } = {},
): Promise<{ sent: number; failed: number }> {
  const transport = opts.transport ?? mailTransport();
  const rows = await claimDueMail(opts.limit ?? 50, LEASE_S, MAX_ATTEMPTS);
  let sent = 0;
  let failed = 0;
  const queue = [...rows];
  const lanes = Array.from({ length: Math.min(opts.concurrency ?? 4, queue.length) }, async () => {
    for (let row = queue.shift(); row; row = queue.shift()) {
      if ((await attempt(row, transport)).sent) sent++;
      else failed++;
    }
  });
  await Promise.all(lanes);
  return { sent, failed };
}
