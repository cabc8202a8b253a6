// The mail outbox: a message that cannot be sent stays queued with attempts, lastError and a backoff; a
// later flush sends it through the local mail catcher; concurrent flushes never send twice.
import { describe, expect, it } from "vitest";
import net from "node:net";
import { randomUUID } from "node:crypto";
import { eq, inArray, sql } from "drizzle-orm";
import { db } from "@/db";
import { mailOutbox } from "@/db/schema";
import { flushOutbox, MAX_ATTEMPTS, retryDelayS, sendMail } from "@/server/mail/outbox";
import { mailTransport, type MailTransport } from "@/server/mail/transport";
import { signInLinkMail, submissionReceiptMail } from "@/server/mail/templates";
import { newestMailFor } from "../helpers/mail";

async function closedPort(): Promise<number> {
  const srv = net.createServer();
  await new Promise<void>((r) => srv.listen(0, "127.0.0.1", r));
  const { port } = srv.address() as net.AddressInfo;
  await new Promise<void>((r) => srv.close(() => r()));
  return port;
}

const catcher = () => mailTransport(process.env.SMTP_URL);
const address = (label: string) => `${label}-${randomUUID().slice(0, 8)}@test.sagline.localhost`;
const receipt = (title: string) =>
  submissionReceiptMail({ packTitle: title, resultUrl: "http://localhost:3011/results/1", submittedAt: new Date() });

async function row(id: number) {
  const [r] = await db.select().from(mailOutbox).where(eq(mailOutbox.id, id));
  if (!r) throw new Error("outbox row missing");
  return r;
}

async function makeDue(ids: number[]) {
  await db
    .update(mailOutbox)
    .set({ nextAttemptAt: sql`now() - interval '1 second'` })
    .where(inArray(mailOutbox.id, ids));
}

describe("mail outbox", () => {
  it("keeps a message queued when the relay is down, then sends it on a later flush", async () => {
    const down = mailTransport(`smtp://127.0.0.1:${await closedPort()}`);
    const to = address("queued");
    const before = Date.now();
    const outcome = await sendMail(to, receipt("Queued Pack 1300"), { transport: down });
    expect(outcome.sent).toBe(false);
    let r = await row(outcome.id);
    expect(r.sentAt).toBeNull();
    expect(r.attempts).toBe(1);
    expect(r.lastError).toMatch(/ECONNREFUSED|connect/i);
    // First retry one minute later.
    expect(r.nextAttemptAt.getTime()).toBeGreaterThanOrEqual(before + 59_000);
    expect(r.nextAttemptAt.getTime()).toBeLessThanOrEqual(Date.now() + 61_000);

    // Not due yet: a flush leaves it alone.
    await flushOutbox({ transport: catcher() });
    expect((await row(outcome.id)).sentAt).toBeNull();

    // A second failure doubles the wait.
    await makeDue([outcome.id]);
    await flushOutbox({ transport: down });
    r = await row(outcome.id);
    expect(r.attempts).toBe(2);
    expect(r.nextAttemptAt.getTime() - Date.now()).toBeGreaterThan(110_000);

    await makeDue([outcome.id]);
    const flushed = await flushOutbox({ transport: catcher() });
    expect(flushed.sent).toBeGreaterThanOrEqual(1);
    r = await row(outcome.id);
    expect(r.sentAt).not.toBeNull();
    expect(r.attempts).toBe(3);
    expect(r.lastError).toBeNull();
    const caught = await newestMailFor(to);
    expect(caught.subject).toBe("Result received: Queued Pack 1300");
    expect(caught.html).toContain("View your result");
  });

  it("wipes a sensitive message's body once it is sent, and only then", async () => {
    const down = mailTransport(`smtp://127.0.0.1:${await closedPort()}`);
    const to = address("sensitive");
    const url = "http://localhost:3011/api/auth/callback/nodemailer?token=secret-token-123";
    const content = signInLinkMail({ url, expires: new Date(Date.now() + 86_400_000) });
    const failed = await sendMail(to, content, { transport: down, sensitive: true });
    expect((await row(failed.id)).text).toContain("secret-token-123"); // still needed for the retry
    await makeDue([failed.id]);
    await flushOutbox({ transport: catcher() });
    const r = await row(failed.id);
    expect(r.sentAt).not.toBeNull();
    expect(r.text).not.toContain("secret-token-123");
    expect(r.html).toBeNull();
    expect((await newestMailFor(to)).text).toContain(url);
  });

  it("gives up after the last attempt", async () => {
    const down = mailTransport(`smtp://127.0.0.1:${await closedPort()}`);
    const outcome = await sendMail(address("hopeless"), receipt("Hopeless Pack"), { transport: down });
    await db
      .update(mailOutbox)
      .set({ attempts: MAX_ATTEMPTS, nextAttemptAt: sql`now() - interval '1 second'` })
      .where(eq(mailOutbox.id, outcome.id));
    await flushOutbox({ transport: catcher() });
    expect((await row(outcome.id)).sentAt).toBeNull();
  });

  it("never sends a message twice when two flushes run at once", async () => {
    const down = mailTransport(`smtp://127.0.0.1:${await closedPort()}`);
    const ids: number[] = [];
    for (let i = 0; i < 6; i++)
      ids.push((await sendMail(address(`race${i}`), receipt(`Race Pack ${i}`), { transport: down })).id);
    await makeDue(ids);
    const sentTo: string[] = [];
    const counting: MailTransport = {
      sendMail: async (m: { to?: unknown }) => {
        await new Promise((r) => setTimeout(r, 20));
        sentTo.push(String(m.to));
        return {
          accepted: [String(m.to)],
          rejected: [],
          pending: [],
          envelope: { from: "", to: [] },
          messageId: "x",
          response: "250",
        };
      },
    } as unknown as MailTransport;
    await Promise.all([
      flushOutbox({ transport: counting }),
      flushOutbox({ transport: counting }),
      flushOutbox({ transport: counting }),
    ]);
    const mine = sentTo.filter((t) => t.includes("race"));
    expect(mine).toHaveLength(6);
    expect(new Set(mine).size).toBe(6);
  });

  it("backs off exponentially from one minute up to six hours", () => {
    expect([1, 2, 3, 4].map(retryDelayS)).toEqual([60, 120, 240, 480]);
    expect(retryDelayS(20)).toBe(6 * 3600);
  });
});
