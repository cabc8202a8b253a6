// The mail outbox: requests queue messages; the worker's step (deliverDueMail) sends them. A message that
// cannot be sent stays queued with attempts, lastError and a backoff; a later step sends it through the local
// mail catcher; concurrent steps never send twice; one given up on is listed for admins, who can send it again.
import { describe, expect, it } from "vitest";
import net from "node:net";
import { randomUUID } from "node:crypto";
import { eq, inArray, sql } from "drizzle-orm";
import { db } from "@/db";
import { auditEvents, mailOutbox } from "@/db/schema";
import { retryMail } from "@/db/mutations/mail-outbox";
import { listUndeliveredMail } from "@/db/queries/mail-outbox";
import { deliverDueMail, MAX_ATTEMPTS, queueMail, retryDelayS } from "@/server/mail/outbox";
import type { MailContent } from "@/server/mail/templates";
import { createUser } from "../helpers/users";
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
  submissionReceiptMail({
    resultId: 1,
    packTitle: title,
    resultUrl: "http://localhost:3011/account/results/1",
    submittedAt: new Date(),
  });

/**
 * The worker's step until nothing due is left (other test files may have left due messages in this database;
 * each step takes 50, oldest first).
 */
async function flushOutbox(opts: { transport: MailTransport }): Promise<{ sent: number; failed: number }> {
  const total = { sent: 0, failed: 0 };
  for (;;) {
    const round = await deliverDueMail(opts);
    total.sent += round.sent;
    total.failed += round.failed;
    if (round.sent + round.failed === 0) return total;
  }
}

/** Queue a message and make one delivery attempt through `transport`, as the worker would on waking. */
async function sendMail(
  to: string,
  content: MailContent,
  opts: { transport: MailTransport; sensitive?: boolean },
): Promise<{ id: number; sent: boolean }> {
  const id = await queueMail(to, content, { sensitive: opts.sensitive ?? false });
  const queued = await row(id);
  expect(queued).toMatchObject({ sentAt: null, attempts: 0 }); // queuing sends nothing
  await flushOutbox({ transport: opts.transport });
  return { id, sent: (await row(id)).sentAt !== null };
}

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
    expect(caught.subject).toBe("Result #1 received: Queued Pack 1300");
    expect(caught.html).toContain("Follow result #1");
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

  it("lists a message given up on for admins, with its error, and an admin's retry sends it (audited)", async () => {
    const down = mailTransport(`smtp://127.0.0.1:${await closedPort()}`);
    const to = address("given-up");
    const outcome = await sendMail(to, receipt("Given Up Pack"), { transport: down });
    await db.update(mailOutbox).set({ attempts: MAX_ATTEMPTS }).where(eq(mailOutbox.id, outcome.id));
    const listed = await listUndeliveredMail(MAX_ATTEMPTS);
    const mine = listed.rows.find((r) => r.id === outcome.id);
    expect(mine).toMatchObject({ to, givenUp: true });
    expect(mine?.lastError).toMatch(/ECONNREFUSED|connect/i);
    expect(listed.givenUp).toBeGreaterThanOrEqual(1);

    const admin = await createUser("admin");
    expect(await retryMail(admin.id, outcome.id)).toEqual({ id: outcome.id, to });
    expect(await row(outcome.id)).toMatchObject({ attempts: 0, sentAt: null });
    const audit = await db
      .select()
      .from(auditEvents)
      .where(eq(auditEvents.entityId, String(outcome.id)));
    expect(audit.filter((a) => a.action === "mail.retry")).toMatchObject([
      { actorId: admin.id, entityType: "mail", data: { to, attemptsBefore: MAX_ATTEMPTS } },
    ]);
    await flushOutbox({ transport: catcher() });
    expect((await row(outcome.id)).sentAt).not.toBeNull();
    expect((await newestMailFor(to)).subject).toBe("Result #1 received: Given Up Pack");
    // A sent message is not sent again.
    await expect(retryMail(admin.id, outcome.id)).rejects.toMatchObject({ code: "conflict" });
  });

  it("backs off exponentially from one minute up to six hours", () => {
    expect([1, 2, 3, 4].map(retryDelayS)).toEqual([60, 120, 240, 480]);
    expect(retryDelayS(20)).toBe(6 * 3600);
  });
});
