// The no-noise test (lib/analysis/log-noise.ts): residuals of a local quadratic fit against the log's own
// resolution. Rounding to a step q alone leaves errors uniform on ±q/2, standard deviation q/√12 (W. R.
// Bennett, Bell System Technical Journal 27, 1948 — from memory), so a median |residual| under 0.3 q means
// nothing but rounding. Logs from the equivalent-circuit generator through the real analysis.
import { describe, expect, it } from "vitest";
import { analyseText, type CurvePoint } from "@/lib/analysis";
import { decimalPlaces, noiseCheck, quadraticResidual, SMOOTH_RATIO } from "@/lib/analysis/log-noise";
import { generateLog, toCsv, type CsvDialect, type EcmOptions } from "@/lib/synthetic/equivalent-circuit";
import { SAMPLE_PACK } from "../../helpers/logs";

// The usual test pack without a logger's noise: the noise each test studies is its own.
const PACK: EcmOptions = { ...SAMPLE_PACK, noise: {} };
async function check(o: EcmOptions, d: CsvDialect = {}) {
  const curve: CurvePoint[] = (
    await analyseText(toCsv(generateLog({ ...PACK, ...o }).rows, d), { cells: o.cells ?? 4 })
  ).curve;
  return noiseCheck(curve);
}

describe("pieces", () => {
  it("decimal places: the fewest that write a value exactly", () => {
    expect(decimalPlaces(16.8)).toBe(1);
    expect(decimalPlaces(16.8123)).toBe(4);
    expect(decimalPlaces(3)).toBe(0);
    expect(decimalPlaces(Math.PI)).toBe(7); // more than 6: "full precision"
  });

  it("a quadratic's residual is zero on a parabola (least squares reproduces it), and picks up a bump", () => {
    const t = [0, 1, 2.5, 3, 4.2, 5, 6.1, 7, 8];
    const v = t.map((x) => 16 - 0.01 * x - 0.002 * x * x);
    expect(Math.abs(quadraticResidual(t, v, 4, 4))).toBeLessThan(1e-12);
    const bumped = v.map((y, i) => (i === 4 ? y + 0.001 : y));
    expect(quadraticResidual(t, bumped, 4, 4)).toBeGreaterThan(0.0005);
  });
});

describe("no measurement noise", () => {
  it.each([
    ["4 decimals", {}, {}],
    ["3 decimals", {}, { decimals: { voltage: 3 } }],
    ["6 decimals", {}, { decimals: { voltage: 6 } }],
    ["millivolts", {}, { voltageUnit: "mV" as const }],
    ["irregular sampling", { jitter: 0.3 }, {}],
    ["1C, an hour long", { loadCurrentA: 1.3 }, { decimals: { voltage: 3 } }],
    ["6S at 30C", { cells: 6, loadCurrentA: 39, sampleIntervalS: 0.5 }, {}],
  ])("a computed log (%s) is smooth down to its last digit", async (_name, o, d) => {
    const c = await check({ ...o, noise: {} }, d);
    expect(c).toMatchObject({ judged: true, noiseless: true });
    if (c.judged) expect(c.medianResidualV).toBeLessThanOrEqual(SMOOTH_RATIO * c.resolutionV);
  });

  it.each([
    ["0.3 mV at 4 decimals", { noise: { voltageV: 0.0003 } }, {}],
    ["1 mV at 3 decimals", { noise: { voltageV: 0.001 } }, { decimals: { voltage: 3 } }],
    ["4 mV", { noise: { voltageV: 0.004 } }, {}],
    ["2 mV, 6S at 30C", { noise: { voltageV: 0.002 }, cells: 6, loadCurrentA: 39, sampleIntervalS: 0.5 }, {}],
    ["1 mV at 0.5C, two hours", { noise: { voltageV: 0.001 }, loadCurrentA: 0.65 }, {}],
  ])("a measured log (%s) carries noise", async (_name, o, d) => {
    expect(await check(o, d)).toMatchObject({ judged: true, noiseless: false });
  });

  it("a logger coarser than 1 mV is not judged (its steps hide its noise), nor a curve too short", async () => {
    expect(await check({ noise: {} }, { decimals: { voltage: 2 } })).toEqual({ judged: false, reason: "too-coarse" });
    expect(await check({ noise: { voltageV: 0.004 } }, { decimals: { voltage: 2 } })).toEqual({
      judged: false,
      reason: "too-coarse",
    });
    expect(noiseCheck([])).toEqual({ judged: false, reason: "too-few-points" });
  });
});
