import * as ss from "simple-statistics";
import { describe, expect, it } from "vitest";
import {
  drawNormal,
  drawRectangular,
  monteCarlo,
  seededRng,
  shareWithin,
} from "@/lib/analysis/uncertainty/monte-carlo";

describe("seeded generator and draws used by the Monte Carlo checks", () => {
  it("is repeatable for a seed and differs between seeds", () => {
    const a = seededRng(7);
    const b = seededRng(7);
    const c = seededRng(8);
    const xs = Array.from({ length: 5 }, () => a());
    expect(Array.from({ length: 5 }, () => b())).toEqual(xs);
    expect(Array.from({ length: 5 }, () => c())).not.toEqual(xs);
  });

  it("uniform on [0, 1): mean 1/2, variance 1/12 (moments of the uniform distribution), checked with simple-statistics", () => {
    const rng = seededRng(1);
    const xs = Array.from({ length: 200_000 }, () => rng());
    expect(ss.min(xs)).toBeGreaterThanOrEqual(0);
    expect(ss.max(xs)).toBeLessThan(1);
    expect(ss.mean(xs)).toBeCloseTo(0.5, 2);
    expect(ss.variance(xs)).toBeCloseTo(1 / 12, 3);
  });

  it("rectangular ±a has standard deviation a/√3 (JCGM 100:2008 4.3.7); Box–Muller normal has the sd asked for", () => {
    const rng = seededRng(2);
    const rect = Array.from({ length: 100_000 }, () => drawRectangular(rng, 3));
    expect(ss.standardDeviation(rect) / Math.sqrt(3)).toBeCloseTo(1, 2);
    const norm = Array.from({ length: 100_000 }, () => drawNormal(rng, 2));
    expect(ss.standardDeviation(norm)).toBeCloseTo(2, 1);
    expect(ss.mean(norm)).toBeCloseTo(0, 1);
  });
});

describe("monteCarlo summary (JCGM 101:2008: sd as standard uncertainty, 2.5 %/97.5 % quantiles as the 95 % interval)", () => {
  it("a normal output: sd σ and the 95 % interval ±1.96σ (the standard normal 97.5 % quantile, simple-statistics probit)", () => {
    const r = monteCarlo(100_000, (rng) => 10 + drawNormal(rng, 0.5), 3);
    expect(r.mean).toBeCloseTo(10, 2);
    expect(r.sd).toBeCloseTo(0.5, 2);
    const z975 = ss.probit(0.975);
    expect(r.high95).toBeCloseTo(10 + z975 * 0.5, 1);
    expect(r.low95).toBeCloseTo(10 - z975 * 0.5, 1);
    expect(shareWithin(r.values, r.low95, r.high95)).toBeCloseTo(0.95, 2);
  });

  it("a rectangular output: 95 % interval ±0.95a (the 2.5 % and 97.5 % quantiles of a uniform distribution), narrower than ±2u = ±1.155a", () => {
    const r = monteCarlo(100_000, (rng) => drawRectangular(rng, 1), 4);
    expect(r.high95).toBeCloseTo(0.95, 2);
    expect(r.low95).toBeCloseTo(-0.95, 2);
  });

  it("refuses fewer than two trials", () => {
    expect(() => monteCarlo(1, () => 0)).toThrow(RangeError);
  });
});
