// The storage sweep against the S3 stand-in's test bucket and the throwaway database: abandoned draft
// uploads go, files a result points at or a reopened draft still uses stay, and a dry run removes nothing.
import { execFile } from "node:child_process";
import path from "node:path";
import { promisify } from "node:util";
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { results } from "@/db/schema";
import { getObjectText, incomingLogKey, incomingPhotoKey, objectInfo, putObject } from "@/server/storage";
import { sweepIncomingUploads } from "@/server/storage/sweep";
import { seedOpenData } from "../helpers/open-data-fixtures";
import { requestState } from "../helpers/next-mocks";
import { keysUnder, PNG_BYTES } from "../helpers/storage";
import { signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);
const { keepDraftFiles } = await import("@/app/(contributor)/submit/actions/keep-draft-files");

const DAY_MS = 24 * 60 * 60 * 1000;
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
/** S3 listings state LastModified in whole seconds: wait into the next second and return its start. */
async function nextSecond(): Promise<number> {
  await sleep(1000 - (Date.now() % 1000) + 50);
  return Math.floor(Date.now() / 1000) * 1000;
}

let me: Awaited<ReturnType<typeof signedIn>>;
let other: Awaited<ReturnType<typeof signedIn>>;
const k = {} as Record<
  "oldLog" | "oldPhoto" | "refLog" | "refPhoto" | "reopenedLog" | "reopenedPhoto" | "recentLog" | "othersOld",
  string
>;
/** The moment between the "old" uploads and the "recent" one; sweeping at cutoff + 7 days puts the cut-off here. */
let cutoff = 0;
const sweepMine = (dryRun: boolean) =>
  sweepIncomingUploads({ maxAgeDays: 7, now: new Date(cutoff + 7 * DAY_MS), dryRun, prefix: `incoming/${me.id}/` });

beforeAll(async () => {
  me = await signedIn("contributor", "sweep-me");
  other = await signedIn("contributor", "sweep-other");
  Object.assign(k, {
    oldLog: incomingLogKey(me.id),
    oldPhoto: incomingPhotoKey(me.id, "png"),
    refLog: incomingLogKey(me.id),
    refPhoto: incomingPhotoKey(me.id, "png"),
    reopenedLog: incomingLogKey(me.id),
    reopenedPhoto: incomingPhotoKey(me.id, "png"),
    othersOld: incomingLogKey(other.id),
  });
  for (const key of [k.oldLog, k.refLog, k.reopenedLog, k.othersOld])
    await putObject(key, "time_s,voltage_v,current_a\n0,16.8,0\n", "text/csv");
  for (const key of [k.oldPhoto, k.refPhoto, k.reopenedPhoto]) await putObject(key, PNG_BYTES, "image/png");
  cutoff = await nextSecond();
  k.recentLog = incomingLogKey(me.id);
  await putObject(k.recentLog, "time_s,voltage_v,current_a\n", "text/csv");
  // A result (still pending review) that points at two of the old uploads.
  const fx = await seedOpenData("swp");
  const pending = fx.results.find((r) => r.status === "pending");
  if (!pending) throw new Error("the fixture has a pending result");
  await db
    .update(results)
    .set({ logKey: k.refLog, photoKeys: [k.refPhoto] })
    .where(eq(results.id, pending.id));
});

describe("keepDraftFiles (the form reopens a draft)", () => {
  it("renews the draft's own files, keeps their bytes and type, and reports foreign or missing ones as gone", async () => {
    requestState.token = me.token;
    const gone = incomingPhotoKey(me.id, "jpg");
    const out = await keepDraftFiles(null, { logKey: k.reopenedLog, photoKeys: [k.reopenedPhoto, gone] });
    expect(out).toEqual({ ok: true, data: { logMissing: false, missingPhotoKeys: [gone] } });
    const info = await objectInfo(k.reopenedLog);
    expect(info?.lastUsedAt.getTime()).toBeGreaterThanOrEqual(cutoff);
    expect(info?.contentType).toBe("text/csv");
    expect(await getObjectText(k.reopenedLog)).toBe("time_s,voltage_v,current_a\n0,16.8,0\n");
    expect((await objectInfo(k.reopenedPhoto))?.contentType).toBe("image/png");

    // Another contributor's key is never touched, and is reported as missing.
    const before = await objectInfo(k.othersOld);
    expect(await keepDraftFiles(null, { logKey: k.othersOld, photoKeys: [] })).toEqual({
      ok: true,
      data: { logMissing: true, missingPhotoKeys: [] },
    });
    expect((await objectInfo(k.othersOld))?.lastUsedAt).toEqual(before?.lastUsedAt);
    expect(before?.lastUsedAt.getTime()).toBeLessThan(cutoff);
  });

  it("refuses keys that are not draft uploads (422)", async () => {
    requestState.token = me.token;
    expect(await keepDraftFiles(null, { logKey: "logs/ab/abc.csv", photoKeys: [] })).toMatchObject({
      ok: false,
      code: "validation",
    });
  });
});

describe("sweepIncomingUploads", () => {
  it("refuses to look outside incoming/", async () => {
    await expect(sweepIncomingUploads({ maxAgeDays: 7, prefix: "logs/" })).rejects.toThrow(
      /only looks under incoming\//,
    );
  });

  it("in a dry run reports what it would remove and removes nothing", async () => {
    const before = (await keysUnder(`incoming/${me.id}/`)).sort();
    const report = await sweepMine(true);
    expect(report.dryRun).toBe(true);
    expect(report.removed.map((o) => o.key).sort()).toEqual([k.oldLog, k.oldPhoto].sort());
    expect((await keysUnder(`incoming/${me.id}/`)).sort()).toEqual(before);
  });

  it("removes old unreferenced uploads; keeps those a result points at, a reopened draft uses, or that are recent", async () => {
    const report = await sweepMine(false);
    expect(report.cutoff.getTime()).toBe(cutoff);
    expect(report.examined).toBe(7);
    expect(report.removed.map((o) => o.key).sort()).toEqual([k.oldLog, k.oldPhoto].sort());
    expect(report.removed.every((o) => o.lastUsedAt.getTime() < cutoff && o.bytes > 0)).toBe(true);
    expect(report.keptReferenced.sort()).toEqual([k.refLog, k.refPhoto].sort());
    expect(report.keptRecent).toBe(3); // the reopened log and photo, the recent log
    expect((await keysUnder(`incoming/${me.id}/`)).sort()).toEqual(
      [k.refLog, k.refPhoto, k.reopenedLog, k.reopenedPhoto, k.recentLog].sort(),
    );
    // Another contributor's prefix was not part of this sweep.
    expect(await keysUnder(`incoming/${other.id}/`)).toEqual([k.othersOld]);
    // Nothing is left to remove.
    expect((await sweepMine(false)).removed).toEqual([]);
  });

  it("keeps everything when the age has not passed", async () => {
    const report = await sweepIncomingUploads({ maxAgeDays: 7, prefix: `incoming/${other.id}/` });
    expect(report).toMatchObject({ examined: 1, removed: [], keptRecent: 1 });
    expect(await keysUnder(`incoming/${other.id}/`)).toEqual([k.othersOld]);
  });
});

describe("npm run storage:sweep (scripts/storage-sweep.ts)", () => {
  const root = path.resolve(__dirname, "../..");
  const run = (...args: string[]) =>
    promisify(execFile)(
      path.join(root, "node_modules/.bin/tsx"),
      ["--conditions=react-server", "scripts/storage-sweep.ts", ...args],
      {
        cwd: root,
        env: { ...process.env, AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: "true" },
      },
    ).then(
      (r) => ({ code: 0, ...r }),
      (e: { code: number; stdout: string; stderr: string }) => e,
    );

  it("prints a summary in a dry run and deletes nothing; refuses bad options with one line and a non-zero exit", async () => {
    const before = (await keysUnder(`incoming/${other.id}/`)).length;
    const dry = await run("--dry-run", "--max-age-days", "1");
    expect(dry.code).toBe(0);
    expect(dry.stdout).toMatch(
      /^sagline: storage sweep of incoming\/ in sagline-test: uploads unused since .+ UTC \(1 day\) — dry run, nothing is deleted$/m,
    );
    expect(dry.stdout).toMatch(
      /^sagline: \d+ would be removed \([\d.]+ [kM]B\), \d+ kept \(used recently\), \d+ kept \(a result points at them\), \d+ looked at$/m,
    );
    expect((await keysUnder(`incoming/${other.id}/`)).length).toBe(before);
    for (const bad of [["--max-age-days", "0"], ["--max-age-days", "week"], ["--everything"]]) {
      const out = await run(...bad);
      expect(out.code, bad.join(" ")).toBe(1);
      expect(out.stderr.trim().split("\n")).toEqual([
        expect.stringMatching(/^sagline: error: storage sweep stopped: /),
      ]);
    }
  });
});
