// Reads what the local mail catcher (started by scripts/test.sh) stored for an address.
import fs from "node:fs";
import path from "node:path";

const dir = path.resolve(process.cwd(), process.env.MAIL_CATCHER_DIR ?? ".mail");

export type Caught = {
  id: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  receivedAt: string;
};

export function caughtFor(address: string): Caught[] {
  if (!fs.existsSync(dir)) return [];
  return fs
    .readdirSync(dir)
    .filter((f) => f.endsWith(".json"))
    .map((f) => JSON.parse(fs.readFileSync(path.join(dir, f), "utf8")) as Caught)
    .filter((m) => m.to.includes(address))
    .sort((a, b) => b.id.localeCompare(a.id, "en", { numeric: true }));
}

/** Waits for the newest message to an address (the catcher writes it a moment after SMTP says OK), or the newest
 * whose subject matches. */
export async function newestMailFor(address: string, timeoutMs = 5000, subject?: RegExp): Promise<Caught> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    // With a subject, wait for that message: an earlier one to the same address may be all that is written yet.
    const [m] = caughtFor(address).filter((c) => !subject || subject.test(c.subject));
    if (m) return m;
    if (Date.now() > until) throw new Error(`no mail caught for ${address}`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

export function firstLink(text: string): string {
  const m = /https?:\/\/\S+/.exec(text);
  if (!m) throw new Error("no link in the message");
  return m[0];
}

/**
 * What the mail worker does when it wakes, done here in the test's process against the test's database: send
 * every due message in the outbox through the local mail catcher (SMTP_URL). Integration tests call it where
 * a running app would have its worker (scripts/mail-worker.ts) send the mail.
 */
export async function deliverQueuedMail(): Promise<{ sent: number; failed: number }> {
  const { deliverDueMail } = await import("@/server/mail/outbox");
  const total = { sent: 0, failed: 0 };
  for (;;) {
    const round = await deliverDueMail();
    total.sent += round.sent;
    total.failed += round.failed;
    if (round.sent + round.failed === 0) return total;
  }
}
