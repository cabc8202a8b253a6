// Fault: PostgreSQL really stops in the middle of a submission (after the log upload, before the
// write). The contributor gets a clear "try again" error, nothing half-written exists, the uploaded log
// (the draft's file) survives, and once the database is back the same submission goes through without
// restarting anything.
import { execFileSync } from "node:child_process";
import path from "node:path";
import { eq } from "drizzle-orm";
import { afterAll, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { results, reviewEvents } from "@/db/schema";
import { sampleLog } from "../helpers/logs";
import { requestState } from "../helpers/next-mocks";
import { keysUnder } from "../helpers/storage";
import { makePack, submission, uploadLog } from "../helpers/submission";
import { signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { submitResult } = await import("@/app/(contributor)/submit/actions/submit-result");
const root = path.resolve(__dirname, "../..");
const pg = (what: "pg_stop" | "pg_start") =>
  execFileSync("bash", ["-c", `source scripts/lib.sh && ${what}`], {
    cwd: root,
    env: process.env,
    stdio: "pipe",
    timeout: 90_000,
  });

afterAll(() => {
  pg("pg_start"); // never leave the shared cluster down, whatever happened above
});

describe("PostgreSQL stops mid-submission", () => {
  it("fails clearly, writes nothing, keeps the upload, and recovers by itself", async () => {
    const { packId } = await makePack();
    const me = await signedIn("contributor", "db-down");
    requestState.token = me.token;
    const log = await uploadLog(me.token, sampleLog({ seed: 4242 }).csv);
    const input = submission(packId, log);
    const quiet = vi.spyOn(console, "error").mockImplementation(() => {});

    pg("pg_stop");
    const failed = await submitResult(null, input);
    expect(failed).toMatchObject({ ok: false, code: "unavailable" });
    expect(failed.ok ? "" : failed.error).toMatch(/database is not reachable.*Nothing was saved/i);
    expect(JSON.stringify(failed)).not.toMatch(/ECONNREFUSED|at .*\.ts/);

    pg("pg_start");
    quiet.mockRestore();
    // Nothing half-written, and the draft's uploaded log is still in storage.
    expect(await db.select().from(results).where(eq(results.contributorId, me.id))).toHaveLength(0);
    expect(await keysUnder(`incoming/${me.id}/`)).toContain(log.key);

    // The same pool reconnects on its own: the retry succeeds with one result and one review event.
    const retried = await submitResult(null, input);
    expect(retried.ok).toBe(true);
    const rows = await db.select().from(results).where(eq(results.contributorId, me.id));
    expect(rows).toHaveLength(1);
    const events = await db
      .select()
      .from(reviewEvents)
      .where(eq(reviewEvents.resultId, rows[0]?.id ?? -1));
    expect(events.map((e) => e.toStatus)).toEqual(["pending"]);
  });
});
