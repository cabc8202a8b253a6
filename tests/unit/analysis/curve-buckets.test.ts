import { describe, expect, it } from "vitest";
import { CurveBuckets } from "@/lib/analysis/curve-buckets";

describe("bounded streaming curve (bucket first/min/max, then LTTB)", () => {
  it("keeps at most 3 samples per bucket however long the log", () => {
    const c = new CurveBuckets(64);
    for (let k = 0; k < 200_000; k++) c.push(k * 0.01, 4 + Math.sin(k / 1000), 1, 25, k, 0);
    const points = c.points(null);
    expect(points.length).toBeLessThanOrEqual(3 * 64);
    expect(points.length).toBeGreaterThan(64);
  });

  it("keeps the lowest and highest voltage samples (a one-sample sag survives)", () => {
    const c = new CurveBuckets(32);
    for (let k = 0; k < 100_000; k++) c.push(k, k === 54_321 ? 2.5 : k === 777 ? 9 : 4, 1, 25, 0, 0);
    const volts = c.points(null).map((p) => p.voltageV);
    expect(Math.min(...volts)).toBe(2.5);
    expect(Math.max(...volts)).toBe(9);
  });

  it("returns time-ordered points starting at the first sample and ending with the given last sample", () => {
    const c = new CurveBuckets(16);
    for (let k = 0; k < 1000; k++) c.push(k * 0.5, 4 - k / 1000, 2, 25, k, 0);
    const last = {
      timeS: 499.5,
      voltageV: 3.001,
      currentA: 2,
      temperatureC: 25,
      positiveChargeAs: 999,
      negativeChargeAs: 0,
    };
    const points = c.points(last);
    expect(points[0]?.timeS).toBe(0);
    expect(points[points.length - 1]).toEqual(last);
    for (let k = 1; k < points.length; k++) expect(points[k]?.timeS).toBeGreaterThanOrEqual(points[k - 1]?.timeS ?? 0);
  });
});
