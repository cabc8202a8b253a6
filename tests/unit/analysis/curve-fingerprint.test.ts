// Fakes and copies (issue 13): a log that is another result's samples scaled or shifted is flagged
// "copied-curve" with the other result's id; a log with no measurement noise is flagged "no-noise"; a
// genuinely different test of the same pack is neither. Logs come from the equivalent-circuit generator
// (lib/synthetic) and go through the real analysis, so the stored curve is the one the app keeps.
// Thresholds are ours (curve-fingerprint.ts, log-noise.ts); the statistics are textbook: z-scores and
// Pearson's correlation, and the variance q²/12 of uniform rounding to a step q (W. R. Bennett, "Spectra of
// quantized signals", Bell System Technical Journal 27, 1948 — from memory).
import { describe, expect, it } from "vitest";
import { analyseText, type CurvePoint } from "@/lib/analysis";
import {
  compareFingerprints,
  curveFingerprint,
  curveKey,
  CURVE_KEY_TOLERANCE,
  SHAPE_POINTS,
  type CurveFingerprint,
} from "@/lib/analysis/curve-fingerprint";
import { plausibilityFlags, type PlausibilityInput } from "@/lib/analysis/plausibility";
import { generateLog, toCsv, type CsvDialect, type EcmRow } from "@/lib/synthetic/equivalent-circuit";
import { SAMPLE_PACK } from "../../helpers/logs";

/** A 4S 1300 mAh pack at 10C, 1 Hz, with 4 mV of voltage noise (a typical hobby logger). */
const PACK = SAMPLE_PACK;

async function curveOf(rows: EcmRow[], dialect: CsvDialect = {}): Promise<CurvePoint[]> {
  return (await analyseText(toCsv(rows, dialect), { cells: 4 })).curve;
}
function fp(curve: CurvePoint[]): CurveFingerprint {
  const f = curveFingerprint(curve);
  if (!f) throw new Error("no fingerprint");
  return f;
}
function input(
  curve: CurvePoint[],
  candidates: { resultId: number; fingerprint: CurveFingerprint }[],
): PlausibilityInput {
  return {
    figures: {
      capacityMah: 1280,
      capacityRatio: 1280 / 1300,
      labelRatio: 0.5,
      sagLimitedC: 50,
      minVoltagePerCellV: 3.3,
      startTemperatureC: 22,
      cells: 4,
      timeToStopTemperatureS: null,
    },
    method: { ambientTemperatureC: 22, cutoffVPerCell: 3.3 },
    pack: { cellsInSeries: 4, ratedCapacityMah: 1300 },
    group: { labelRatios: [], sagLimitedCs: [], capacityRatios: [] },
    duplicateLogResultIds: [],
    makerProposed: false,
    packProposed: false,
    curve,
    curveCandidates: candidates,
  };
}
const codes = (i: PlausibilityInput) => plausibilityFlags(i).map((f) => f.code);

const original = generateLog(PACK).rows;
const originalCurve = await curveOf(original);
const originalFp = fp(originalCurve);
const candidates = [{ resultId: 7, fingerprint: originalFp }];

describe("curve fingerprint", () => {
  it("is the z-scored voltage under load at SHAPE_POINTS even steps: mean 0, spread 1, falling", () => {
    expect(originalFp.shape).toHaveLength(SHAPE_POINTS);
    const mean = originalFp.shape.reduce((a, b) => a + b, 0) / SHAPE_POINTS;
    expect(Math.abs(mean)).toBeLessThan(0.1); // resampled evenly in time, so close to (not exactly) 0
    expect(originalFp.shape[0]).toBeGreaterThan(originalFp.shape[SHAPE_POINTS - 1] ?? 0);
    expect(originalFp.loadedShare).toBeGreaterThan(0.9);
    expect(originalFp.loadedShare).toBeLessThan(1);
  });

  it("needs enough points under load", () => {
    expect(curveFingerprint(originalCurve.slice(0, 10))).toBeNull();
    expect(curveFingerprint(originalCurve.map((p) => ({ ...p, currentA: 0 })))).toBeNull();
  });
});

describe("copies of another result's log are flagged with a link to it", () => {
  it("an exact copy (same samples re-written): same fingerprint, flagged", async () => {
    const copy = await curveOf(original);
    expect(compareFingerprints(fp(copy), originalFp)).toMatchObject({ shapeRms: 0, same: true });
    const flag = plausibilityFlags(input(copy, candidates)).find((f) => f.code === "copied-curve");
    expect(flag).toMatchObject({ resultIds: [7], message: expect.stringMatching(/#7/) });
  });

  it("a scaled copy: voltage × 1.5 (passed off as a 6S pack) and current × 0.8, written at 3 decimals", async () => {
    const rows = original.map((r) => ({ ...r, voltageV: r.voltageV * 1.5, currentA: r.currentA * 0.8 }));
    const copy = await curveOf(rows, { decimals: { voltage: 3 } });
    const c = compareFingerprints(fp(copy), originalFp);
    expect(c.same).toBe(true);
    expect(c.noiseCorrelation).toBeGreaterThan(0.99);
    expect(codes(input(copy, candidates))).toContain("copied-curve");
  });

  it("a shifted copy: voltage + 0.15 V and the clock started 10 minutes later", async () => {
    const rows = original.map((r) => ({ ...r, voltageV: r.voltageV + 0.15, timeS: r.timeS + 600 }));
    const copy = await curveOf(rows);
    expect(compareFingerprints(fp(copy), originalFp).same).toBe(true);
    expect(codes(input(copy, candidates))).toContain("copied-curve");
  });

  it("a stretched copy: time × 1.1 (10 % more capacity claimed) is still the same curve", async () => {
    const copy = await curveOf(original.map((r) => ({ ...r, timeS: r.timeS * 1.1 })));
    expect(compareFingerprints(fp(copy), originalFp).same).toBe(true);
    expect(curveKey(fp(copy))).toBeCloseTo(curveKey(originalFp), 3);
  });

  it("a copy's key is within the search tolerance of the original's", async () => {
    const rows = original.map((r) => ({ ...r, voltageV: r.voltageV * 1.02 + 0.05 }));
    expect(Math.abs(curveKey(fp(await curveOf(rows))) - curveKey(originalFp))).toBeLessThan(CURVE_KEY_TOLERANCE / 10);
  });
});

describe("genuine tests are not flagged", () => {
  it("another test of the same pack (its own noise, a warmer day, 1.5 % less capacity) is a different curve", async () => {
    const other = await curveOf(generateLog({ ...PACK, seed: 43, ambientC: 25, capacityMah: 1280 }).rows);
    const c = compareFingerprints(fp(other), originalFp);
    expect(c.same).toBe(false);
    expect(c.shapeRms).toBeGreaterThan(0.002); // ten times the rounding-only threshold
    expect(c.noiseCorrelation).toBeLessThan(0.6);
    expect(plausibilityFlags(input(other, candidates))).toEqual([]);
  });

  it("even a second run identical but for its noise (the same seed-free model) differs: independent noise", async () => {
    const other = await curveOf(generateLog({ ...PACK, seed: 99 }).rows);
    const c = compareFingerprints(fp(other), originalFp);
    expect(c.same).toBe(false);
    expect(Math.abs(c.noiseCorrelation)).toBeLessThan(0.6);
  });

  it("two low-noise loggers (0.3 mV) testing one pack are still told apart", async () => {
    const quiet = { ...PACK, noise: { voltageV: 0.0003 } };
    const a = fp(await curveOf(generateLog({ ...quiet, seed: 1 }).rows));
    const b = fp(await curveOf(generateLog({ ...quiet, seed: 2 }).rows));
    expect(compareFingerprints(a, b).same).toBe(false);
  });
});

describe("a log with no measurement noise is flagged", () => {
  it("a computed log (the model without noise, 4 decimals) is flagged no-noise; the noisy original is not", async () => {
    const smooth = await curveOf(generateLog({ ...PACK, noise: {} }).rows);
    expect(codes(input(smooth, []))).toEqual(["no-noise"]);
    expect(plausibilityFlags(input(smooth, []))[0]?.message).toMatch(/computed rather than measured/);
    expect(codes(input(originalCurve, []))).toEqual([]);
  });
});

describe("/methods states the thresholds the code uses (content/methods/checks.md)", () => {
  it("names every constant of the copy and noise tests", async () => {
    const fs = await import("node:fs");
    const text = fs.readFileSync("content/methods/checks.md", "utf8").replace(/\s+/g, " ");
    const noise = await import("@/lib/analysis/log-noise");
    const f = await import("@/lib/analysis/curve-fingerprint");
    expect(text).toContain(`${f.SHAPE_POINTS} even`);
    expect(text).toContain(`under ${f.SAME_SHAPE_RMS}`);
    expect(text).toContain(`under ${f.NEAR_SHAPE_RMS}`);
    expect(text).toContain(`at least ${f.NOISE_CORRELATION}`);
    expect(text).toContain(`under ${noise.SMOOTH_RATIO} of a`);
    expect(text).toContain(`${["", "one", "two", "three", "four"][noise.FIT_HALF_WIDTH]} neighbours on each side`);
    expect(text).toContain(`coarser than ${noise.MAX_JUDGED_RESOLUTION_V * 1000} mV`);
  });
});
