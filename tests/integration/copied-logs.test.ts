// Fakes and copies (issue 13, item 6) through the real submission: logs are uploaded through the upload route
// and submitted with submitResult, which stores each result's curve fingerprint and its plausibility flags in
// one transaction. A byte-identical log is "duplicate-log", the same samples scaled or shifted are
// "copied-curve", a log without measurement noise is "no-noise" — each pointing at the other result by id
// (the review page links it) — and a genuinely different test of the same pack raises none of them.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { results } from "@/db/schema";
import { backfillCurveFingerprints } from "@/db/mutations/curve-fingerprints";
import { generateLog, toCsv } from "@/lib/synthetic/equivalent-circuit";
import { SAMPLE_PACK } from "../helpers/logs";
import { requestState } from "../helpers/next-mocks";
import { makePack, submission, uploadLog } from "../helpers/submission";
import { signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { submitResult } = await import("@/app/(contributor)/submit/actions/submit-result");

/** The helper's 4S 1300 mAh pack at 13 A (10C), 1 Hz, 4 mV of voltage noise. */
const PACK = SAMPLE_PACK;
const original = generateLog(PACK).rows;

let packId = 0;
let originalId = 0;

async function submitCsv(csv: string): Promise<{ id: number; flags: { code: string; resultIds?: number[] }[] }> {
  const me = await signedIn("contributor", "copier");
  const log = await uploadLog(me.token, csv);
  requestState.token = me.token;
  const out = await submitResult(null, submission(packId, log));
  if (!out.ok) throw new Error(`submit failed: ${out.error}`);
  const [row] = await db.select({ flags: results.flags }).from(results).where(eq(results.id, out.data.resultId));
  return { id: out.data.resultId, flags: row?.flags ?? [] };
}
const flagOf = (r: { flags: { code: string; resultIds?: number[] }[] }, code: string) =>
  r.flags.find((f) => f.code === code);

beforeAll(async () => {
  ({ packId } = await makePack());
  originalId = (await submitCsv(toCsv(original))).id;
});

describe("copies and fakes in the review queue", () => {
  it("the original carries its fingerprint and no copy or noise flag", async () => {
    const [row] = await db
      .select({ key: results.curveKey, fp: results.curveFingerprint, flags: results.flags })
      .from(results)
      .where(eq(results.id, originalId));
    expect(row?.key).toEqual(expect.any(Number));
    expect(row?.fp?.shape).toHaveLength(128);
    expect(row?.flags.map((f) => f.code)).not.toContain("copied-curve");
    expect(row?.flags.map((f) => f.code)).not.toContain("no-noise");
  });

  it("an exact copy (the same file): duplicate-log with a link to the original", async () => {
    const copy = await submitCsv(toCsv(original));
    expect(flagOf(copy, "duplicate-log")?.resultIds).toContain(originalId);
  });

  it("a scaled copy (voltage × 1.02, current × 1.02): copied-curve with a link to the original", async () => {
    const rows = original.map((r) => ({ ...r, voltageV: r.voltageV * 1.02, currentA: r.currentA * 1.02 }));
    const copy = await submitCsv(toCsv(rows));
    expect(flagOf(copy, "duplicate-log")).toBeUndefined();
    expect(flagOf(copy, "copied-curve")?.resultIds).toContain(originalId);
  });

  it("a shifted copy (voltage + 0.08 V, the clock 20 minutes later): copied-curve", async () => {
    const rows = original.map((r) => ({ ...r, voltageV: r.voltageV + 0.08, timeS: r.timeS + 1200 }));
    const copy = await submitCsv(toCsv(rows));
    expect(flagOf(copy, "copied-curve")?.resultIds).toContain(originalId);
  });

  it("a log with no measurement noise: no-noise", async () => {
    const smooth = await submitCsv(toCsv(generateLog({ ...PACK, seed: 5, noise: {} }).rows));
    expect(flagOf(smooth, "no-noise")).toBeDefined();
    expect(flagOf(smooth, "copied-curve")).toBeUndefined();
  });

  it("a genuinely different test of the same pack (its own noise, a warmer day) raises none of them", async () => {
    const other = await submitCsv(toCsv(generateLog({ ...PACK, seed: 77, ambientC: 24, capacityMah: 1290 }).rows));
    for (const code of ["duplicate-log", "copied-curve", "no-noise"]) expect(flagOf(other, code), code).toBeUndefined();
  });

  it("results stored before fingerprints existed are fingerprinted by the backfill (migrate and seed run it)", async () => {
    await db.update(results).set({ curveFingerprint: null, curveKey: null }).where(eq(results.id, originalId));
    expect(await backfillCurveFingerprints()).toBeGreaterThanOrEqual(1);
    const [row] = await db.select({ key: results.curveKey }).from(results).where(eq(results.id, originalId));
    expect(row?.key).toEqual(expect.any(Number));
    expect(await backfillCurveFingerprints()).toBe(0);
  });
});
