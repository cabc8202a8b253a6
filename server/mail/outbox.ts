// sendMail: every message is written to the mail_outbox table first and sent at once; when the relay is
// down it stays queued with attempts, lastError and nextAttemptAt (exponential backoff), and flushOutbox()
// — called after each send and by scripts/flush-mail.ts — retries what is due. A mail outage never loses
// a message, and never fails the request that caused it.
import "server-only";
import {
  claimDueMail,
  enqueueClaimedMail,
  markMailFailed,
  markMailSent,
  type OutboxMessage,
} from "@/db/mutations/mail-outbox";
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

export type SendOptions = { transport?: MailTransport; sensitive?: boolean; flush?: boolean };
export type SendOutcome = { id: number; sent: boolean; error?: string };

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

/** Queue a message and try to send it now. Resolves either way; `sent` says whether it left already. */
export async function sendMail(to: string, content: MailContent, opts: SendOptions = {}): Promise<SendOutcome> {
  const transport = opts.transport ?? mailTransport();
  const row = await enqueueClaimedMail(
    { to, subject: content.subject, text: content.text, html: content.html, sensitive: opts.sensitive ?? false },
    LEASE_S,
  );
  const outcome = await attempt(row, transport);
  // The relay just worked: a good moment to send anything still waiting.
  if (outcome.sent && (opts.flush ?? true)) await flushOutbox({ transport }).catch(() => undefined);
  return outcome;
}

/** Retry due messages (oldest first). Safe to run from several processes at once. */
export async function flushOutbox(
  opts: { transport?: MailTransport; limit?: number } = {},
): Promise<{ sent: number; failed: number }> {
  const transport = opts.transport ?? mailTransport();
  const rows = await claimDueMail(opts.limit ?? 50, LEASE_S, MAX_ATTEMPTS);
  let sent = 0;
  let failed = 0;
  for (const row of rows) {
    if ((await attempt(row, transport)).sent) sent++;
    else failed++;
  }
  return { sent, failed };
}
