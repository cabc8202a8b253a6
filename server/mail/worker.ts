// The mail worker's loop (run by scripts/mail-worker.ts, started by npm start and by npm test's browser
// run). It LISTENs on the "mail_outbox" channel — every insert into mail_outbox notifies when its transaction
// commits — and otherwise sleeps until the next queued message falls due (a retry's backoff), at most
// `pollMs`. Each wake-up sends everything due. When the database or the relay is down it keeps going: a
// failed send waits with backoff in the outbox; a lost database connection is retried every few seconds.
import "server-only";
import { Client } from "pg";
import { nextMailDueAt } from "@/db/queries/mail-outbox";
import { deliverDueMail, MAX_ATTEMPTS } from "./outbox";
import type { MailTransport } from "./transport";

export type WorkerOptions = {
  databaseUrl: string;
  /** Stops the loop; the worker finishes the send in hand and closes its connections. */
  signal: AbortSignal;
  transport?: MailTransport;
  /** Longest sleep without a notification (a safety net; a notification or a due retry wakes it sooner). */
  pollMs?: number;
  log?: (line: string) => void;
  onListening?: () => void;
};

const RECONNECT_MS = 3000;

function sleep(ms: number, signal: AbortSignal, wake: { fn: (() => void) | null }): Promise<void> {
  return new Promise((resolve) => {
    const done = () => {
      clearTimeout(timer);
      signal.removeEventListener("abort", done);
      wake.fn = null;
      resolve();
    };
    const timer = setTimeout(done, Math.max(0, ms));
    signal.addEventListener("abort", done, { once: true });
    wake.fn = done;
  });
}

async function listen(url: string, onNotify: () => void, onLost: (err: Error) => void): Promise<Client> {
  const client = new Client({ connectionString: url });
  client.on("notification", onNotify);
  client.on("error", onLost);
  client.on("end", () => onLost(new Error("connection closed")));
  await client.connect();
  await client.query("LISTEN mail_outbox");
  return client;
}

export async function runMailWorker(opts: WorkerOptions): Promise<void> {
  const log = opts.log ?? ((line: string) => console.log(line));
  const pollMs = opts.pollMs ?? 30_000;
  const wake: { fn: (() => void) | null } = { fn: null };
  let pending = true; // a notification arrived (or we just started): there may be mail to send
  let listener: Client | null = null;
  let lost = true;
  const notify = () => {
    pending = true;
    wake.fn?.();
  };
  const onLost = (err: Error) => {
    if (opts.signal.aborted || lost) return;
    lost = true;
    log(`sagline: mail worker lost its database connection (${err.message}); reconnecting`);
    wake.fn?.();
  };

  while (!opts.signal.aborted) {
    try {
      if (lost) {
        await listener?.end().catch(() => undefined);
        listener = null;
        listener = await listen(opts.databaseUrl, notify, onLost);
        lost = false;
        pending = true; // anything queued while we were away
        opts.onListening?.();
      }
      let handled = 0;
      if (pending) {
        pending = false;
        for (;;) {
          const { sent, failed } = await deliverDueMail({ ...(opts.transport ? { transport: opts.transport } : {}) });
          handled += sent + failed;
          if (sent + failed > 0) log(`sagline: mail worker sent ${sent}, ${failed} to retry later`);
          if (sent + failed === 0 || opts.signal.aborted) break;
        }
      }
      // A notification that arrived while sending (no sleep to cut short then) is handled before sleeping.
      if (pending) continue;
      const due = await nextMailDueAt(MAX_ATTEMPTS);
      const untilDue = due ? due.getTime() - Date.now() + 50 : pollMs;
      if (untilDue <= 0 && handled > 0) {
        pending = true;
        continue;
      }
      // Due but not claimable (another worker holds it for a moment): look again shortly, not in a busy loop.
      await sleep(untilDue <= 0 ? 200 : Math.min(pollMs, untilDue), opts.signal, wake);
      if (!pending) pending = due !== null && due.getTime() <= Date.now() + 50;
      // The poll interval passing with nothing due still looks once: a lost notification costs at most pollMs.
      if (!pending && !due) pending = true;
    } catch (err) {
      log(`sagline: mail worker: ${err instanceof Error ? err.message : String(err)}; trying again shortly`);
      lost = true;
      await sleep(RECONNECT_MS, opts.signal, wake);
    }
  }
  await listener?.end().catch(() => undefined);
}
