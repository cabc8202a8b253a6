// The mail worker as npm start runs it (scripts/mail-worker.ts, its own process), against this test's
// database and a mail catcher this test starts on a port of its own: a sign-in link queued by a request is
// sent within moments (woken by the insert's notification); the catcher killed during a decision loses no
// e-mail — the worker's attempts fail and wait with backoff, and once the catcher is back and the backoff
// has passed, every message arrives exactly once; SIGTERM stops it cleanly.
import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, inject, it, vi } from "vitest";
import { inArray, sql } from "drizzle-orm";
import { db } from "@/db";
import { mailOutbox, packEmails, users } from "@/db/schema";
import { queueMail } from "@/server/mail/outbox";
import { signInLinkMail } from "@/server/mail/templates";
import { makePack, makeResult } from "../helpers/review-fixtures";
import { createUser } from "../helpers/users";

vi.mock("@/server/revalidate", () => ({ revalidateTags: vi.fn() }));
const { decideResult } = await import("@/server/review");

const root = path.resolve(__dirname, "../..");
const mailDir = fs.mkdtempSync(path.join(os.tmpdir(), "sagline-worker-mail-"));
let smtpPort = 0;
let catcher: ChildProcess | null = null;
let worker: ChildProcess | null = null;
let workerLog = "";

async function freePort(): Promise<number> {
  const srv = net.createServer();
  await new Promise<void>((r) => srv.listen(0, "127.0.0.1", r));
  const { port } = srv.address() as net.AddressInfo;
  await new Promise<void>((r) => srv.close(() => r()));
  return port;
}

async function until(what: string, ok: () => boolean | Promise<boolean>, timeoutMs = 20_000): Promise<void> {
  const end = Date.now() + timeoutMs;
  while (!(await ok())) {
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}; worker log:\n${workerLog}`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

const portOpen = (port: number) =>
  new Promise<boolean>((resolve) => {
    const s = net.connect(port, "127.0.0.1");
    s.once("connect", () => (s.destroy(), resolve(true)));
    s.once("error", () => resolve(false));
  });

async function startCatcher(): Promise<void> {
  catcher = spawn(process.execPath, ["scripts/services/mail-catcher.mjs"], {
    cwd: root,
    env: { ...process.env, SMTP_PORT: String(smtpPort), MAIL_CATCHER_DIR: mailDir },
    stdio: "ignore",
  });
  await until("the test's mail catcher", () => portOpen(smtpPort));
}

async function killCatcher(): Promise<void> {
  const c = catcher;
  if (!c || c.exitCode !== null) return;
  const gone = new Promise((r) => c.once("exit", r));
  c.kill("SIGKILL");
  await gone;
  catcher = null;
}

/** Messages the test's catcher stored for an address. */
function caught(address: string): { subject: string }[] {
  return fs
    .readdirSync(mailDir)
    .filter((f) => f.endsWith(".json"))
    .map((f) => JSON.parse(fs.readFileSync(path.join(mailDir, f), "utf8")) as { to: string[]; subject: string })
    .filter((m) => m.to.includes(address));
}

beforeAll(async () => {
  smtpPort = await freePort();
  await startCatcher();
  worker = spawn(path.join(root, "node_modules/.bin/tsx"), ["--conditions=react-server", "scripts/mail-worker.ts"], {
    cwd: root,
    env: { ...process.env, DATABASE_URL: inject("databaseUrl"), SMTP_URL: `smtp://127.0.0.1:${smtpPort}` },
    stdio: ["ignore", "pipe", "pipe"],
  });
  worker.stdout?.on("data", (d: Buffer) => (workerLog += d.toString()));
  worker.stderr?.on("data", (d: Buffer) => (workerLog += d.toString()));
  await until("the worker to listen", () => workerLog.includes("mail worker listening"), 30_000);
});

afterAll(async () => {
  if (worker && worker.exitCode === null) worker.kill("SIGKILL");
  await killCatcher();
  fs.rmSync(mailDir, { recursive: true, force: true });
});

describe("the mail worker process", () => {
  it("sends a queued sign-in link within moments, woken by the insert", async () => {
    const to = `worker-link-${Date.now()}@test.sagline.localhost`;
    const url = "http://localhost:3011/api/auth/callback/nodemailer?token=worker-test";
    await queueMail(to, signInLinkMail({ url, expires: new Date(Date.now() + 3_600_000) }), { sensitive: true });
    await until("the sign-in link to arrive", () => caught(to).length === 1, 10_000);
    expect(caught(to)[0]?.subject).toBe("Your Sagline sign-in link");
  });

  it("loses no e-mail when the mail catcher dies during a decision: sent once it is back", async () => {
    const contributor = await createUser("contributor", "outage");
    const mod = await createUser("moderator", "outage-mod");
    const { pack } = await makePack();
    const readers = await db
      .insert(users)
      .values([1, 2, 3].map((i) => ({ email: `outage-reader-${i}-${pack.id}@test.sagline.localhost` })))
      .returning({ id: users.id, email: users.email });
    await db.insert(packEmails).values(readers.map((u) => ({ userId: u.id, packId: pack.id })));
    const r = await makeResult({ packId: pack.id, contributorId: contributor.id });
    const addresses = [contributor.email, ...readers.flatMap((u) => (u.email ? [u.email] : []))];

    await killCatcher();
    const out = await decideResult(mod.id, r.id, {
      kind: "approve",
      note: null,
      catalogue: { intoPackId: null, intoMakerId: null },
    });
    expect(out.queuedMail).toBe(4);

    // The worker tries at once and fails: each message keeps its error and waits for a retry.
    const rows = () => db.select().from(mailOutbox).where(inArray(mailOutbox.to, addresses));
    await until("the worker's failed attempts", async () =>
      (await rows()).every((m) => m.attempts === 1 && m.lastError !== null),
    );
    expect((await rows()).every((m) => m.sentAt === null && m.nextAttemptAt.getTime() > Date.now() + 30_000)).toBe(
      true,
    );

    // The catcher comes back; the backoff passes (moved to now here, rather than waiting a minute); the worker is
    // told, as an insert or an admin's retry would tell it.
    await startCatcher();
    await db
      .update(mailOutbox)
      .set({ nextAttemptAt: sql`now()` })
      .where(inArray(mailOutbox.to, addresses));
    await db.execute(sql`select pg_notify('mail_outbox', '')`);
    await until("every message to arrive", () => addresses.every((a) => caught(a).length >= 1));
    for (const a of addresses) expect(caught(a)).toHaveLength(1);
    expect((await rows()).every((m) => m.sentAt !== null && m.attempts === 2 && m.lastError === null)).toBe(true);
    expect(workerLog).toMatch(/to retry later/);
  });

  it("stops cleanly on SIGTERM (npm run stop)", async () => {
    const w = worker;
    if (!w) throw new Error("no worker");
    const exited = new Promise<number | null>((r) => w.once("exit", (code) => r(code)));
    w.kill("SIGTERM");
    expect(await exited).toBe(0);
    expect(workerLog).toContain("mail worker stopped");
  });
});
