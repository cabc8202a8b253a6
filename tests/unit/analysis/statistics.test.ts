import * as ss from "simple-statistics";
import { describe, expect, it } from "vitest";
import {
  MEAN_AD_CONSTANT,
  MODIFIED_Z_CONSTANT,
  MODIFIED_Z_THRESHOLD,
  median,
  medianAbsoluteDeviation,
  modifiedZScores,
  outlierIndexes,
  quantileSorted,
  summarise,
} from "@/lib/analysis/statistics";

const groups = [
  [12.1, 11.8, 12.4, 12.0, 11.9, 12.2, 19.5],
  [3, 1, 4, 1, 5, 9, 2, 6, 5, 3, 5],
  [100, 101, 99, 102, 98, 100.5, 40],
  [0.91, 0.93, 0.95, 0.88, 0.97],
];

describe("median and MAD against simple-statistics (general-purpose reference library)", () => {
  it.each(groups.map((g) => [g]))("median of %j equals ss.median", (g) => {
    expect(median(g)).toBeCloseTo(ss.median(g), 12);
  });
  it.each(groups.map((g) => [g]))("MAD of %j equals ss.medianAbsoluteDeviation", (g) => {
    expect(medianAbsoluteDeviation(g)).toBeCloseTo(ss.medianAbsoluteDeviation(g), 12);
  });
});

describe("modified z-score, Iglewicz & Hoaglin (1993): Mᵢ = 0.6745 (xᵢ − x̃) / MAD, flag |Mᵢ| > 3.5", () => {
  it("uses the published constant and threshold", () => {
    expect(MODIFIED_Z_CONSTANT).toBe(0.6745);
    expect(MODIFIED_Z_THRESHOLD).toBe(3.5);
  });

  it.each(groups.map((g) => [g]))(
    "scores of %j equal the published definition computed with simple-statistics",
    (g) => {
      const med = ss.median(g);
      const mad = ss.medianAbsoluteDeviation(g);
      const expected = g.map((x) => (0.6745 * (x - med)) / mad);
      modifiedZScores(g).forEach((z, k) => expect(z).toBeCloseTo(expected[k] as number, 10));
    },
  );

  it("hand-worked example: [1, 2, 3, 4, 100] → median 3, MAD 1, score of 100 = 0.6745 × 97 = 65.4265", () => {
    const z = modifiedZScores([1, 2, 3, 4, 100]);
    expect(z[4]).toBeCloseTo(65.4265, 10);
    expect(z[2]).toBe(0);
    expect(outlierIndexes([1, 2, 3, 4, 100])).toEqual([4]);
  });

  it("flags the one pack that is far from its group and no other", () => {
    expect(outlierIndexes(groups[0] as number[])).toEqual([6]);
    expect(outlierIndexes(groups[2] as number[])).toEqual([6]);
    expect(outlierIndexes(groups[3] as number[])).toEqual([]);
  });

  it("scores 0 where MAD is 0 and the value equals the median", () => {
    expect(modifiedZScores([5, 5, 5, 5])).toEqual([0, 0, 0, 0]);
  });

  it("falls back to 1.2533 × mean absolute deviation when MAD is 0 but values differ (common practice; √(π/2), from memory)", () => {
    expect(MEAN_AD_CONSTANT).toBeCloseTo(Math.sqrt(Math.PI / 2), 6);
    const values = [5, 5, 5, 5, 9];
    const meanAd = ss.mean(values.map((v) => Math.abs(v - 5)));
    const z = modifiedZScores(values);
    expect(z[4]).toBeCloseTo(4 / (MEAN_AD_CONSTANT * meanAd), 10);
    expect(z.every(Number.isFinite)).toBe(true);
  });

  it("never returns NaN or Infinity, even for empty or non-finite input", () => {
    expect(modifiedZScores([])).toEqual([]);
    expect(modifiedZScores([Number.NaN, 1, 2, 3]).every(Number.isFinite)).toBe(true);
  });
});

describe("quantiles by linear interpolation (Hyndman & Fan 1996, type 7 — the default of R and NumPy)", () => {
  it("quantile(1:10, c(.25, .5, .75)) = 3.25, 5.5, 7.75 as in R (from memory)", () => {
    const s = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10];
    expect(quantileSorted(s, 0.25)).toBeCloseTo(3.25, 12);
    expect(quantileSorted(s, 0.5)).toBeCloseTo(5.5, 12);
    expect(quantileSorted(s, 0.75)).toBeCloseTo(7.75, 12);
  });

  it("agrees with simple-statistics at the median and the extremes", () => {
    for (const g of groups) {
      const sorted = [...g].sort((a, b) => a - b);
      expect(quantileSorted(sorted, 0.5)).toBeCloseTo(ss.median(g), 12);
      expect(quantileSorted(sorted, 0)).toBe(ss.min(g));
      expect(quantileSorted(sorted, 1)).toBe(ss.max(g));
    }
  });
});

describe("summarise (group figure = median with n and spread)", () => {
  it("returns median, n, min, max and quartiles", () => {
    expect(summarise([4, 1, 3, 2])).toEqual({ median: 2.5, n: 4, min: 1, max: 4, q1: 1.75, q3: 3.25 });
  });
  it("is null for no finite value and ignores NaN", () => {
    expect(summarise([])).toBeNull();
    expect(summarise([Number.NaN])).toBeNull();
    expect(summarise([Number.NaN, 2])?.n).toBe(1);
  });
});
