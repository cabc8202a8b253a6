import type { Metadata } from "next";
import { listUndeliveredMail } from "@/db/queries/mail-outbox";
import { fmt } from "@/lib/format";
import { MAX_ATTEMPTS } from "@/server/mail/outbox";
import { requirePageUser } from "@/server/page-auth";
import { RetryButton } from "./_components/retry-button-client";

export const metadata: Metadata = { title: "Mail" };
export const dynamic = "force-dynamic";

const when = (d: Date) =>
  d.toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" }) + " UTC";

// Mail that has not gone out: what the mail worker gave up on (every attempt failed) and what it is still
// retrying, each with the relay's last error. An admin can send a message again (audited).
export default async function AdminMailPage() {
  await requirePageUser("mail.retry", "/admin/mail");
  const { rows, givenUp, retrying, waiting } = await listUndeliveredMail(MAX_ATTEMPTS);
  return (
    <div className="space-y-4">
      <h1>Mail</h1>
      <p className="text-sm" data-testid="mail-counts">
        {fmt(givenUp)} given up after {MAX_ATTEMPTS} attempts · {fmt(retrying)} failing and retried with backoff ·{" "}
        {fmt(waiting)} waiting for their first attempt.
      </p>
      <p className="muted text-sm">
        The mail worker sends every queued message and retries a failed one after 1 minute, doubling up to 6 hours.
        Sign-in links expire after 24 hours: sending an older one again gives the person a link that no longer works.
      </p>
      {rows.length === 0 ? (
        <p>Nothing is failing: every message has gone out or is on its way.</p>
      ) : (
        <ul className="space-y-2" data-testid="undelivered-mail">
          {rows.map((m) => (
            <li key={m.id} className="card flex flex-wrap items-start justify-between gap-3" data-mail-id={m.id}>
              <div className="min-w-0 space-y-1 text-sm">
                <p className="font-medium">
                  {m.subject} <span className="muted">to {m.to}</span>
                </p>
                <p className="muted">
                  #{m.id} · queued {when(m.createdAt)} · {m.attempts} attempt{m.attempts === 1 ? "" : "s"} ·{" "}
                  {m.givenUp ? <strong>given up</strong> : `next try ${when(m.nextAttemptAt)}`}
                </p>
                <p className="break-words font-mono text-xs">{m.lastError ?? "no error recorded"}</p>
              </div>
              <RetryButton mailId={m.id} />
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
