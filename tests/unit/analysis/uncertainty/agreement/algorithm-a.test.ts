import * as ss from "simple-statistics";
import { describe, expect, it } from "vitest";
import {
  ALGORITHM_A_MAD_FACTOR,
  ALGORITHM_A_SD_FACTOR,
  ALGORITHM_A_WINSOR_FACTOR,
  CONSENSUS_U_FACTOR,
  algorithmA,
  algorithmAStep,
} from "@/lib/analysis/agreement/algorithm-a";
import { drawNormal, seededRng } from "@/lib/analysis/uncertainty/monte-carlo";

// ISO 13528:2015, Annex C.3 (Algorithm A): start x* = median, s* = 1.483·MAD; δ = 1.5·s*; winsorise to x* ± δ;
// x* = mean, s* = 1.134·sd of the winsorised values; repeat to convergence. u(x*) = 1.25·s*/√p (7.7.3).
describe("Algorithm A constants are the published ones", () => {
  it("1.483, 1.5, 1.134 (ISO 13528:2015 C.3) and 1.25 (7.7.3)", () => {
    expect(ALGORITHM_A_MAD_FACTOR).toBe(1.483);
    expect(ALGORITHM_A_WINSOR_FACTOR).toBe(1.5);
    expect(ALGORITHM_A_SD_FACTOR).toBe(1.134);
    expect(CONSENSUS_U_FACTOR).toBe(1.25);
  });
});

// Hand-computed example: one pack's capacity (mAh) from seven benches, one of them far off.
//   values: 4790, 4820, 4835, 4850, 4860, 4880, 5100
//   start:  median = 4850; |x − 4850| = 60, 30, 15, 0, 10, 30, 250 → sorted 0, 10, 15, 30, 30, 60, 250 → MAD = 30
//           s* = 1.483 × 30 = 44.49
//   step 1: δ = 1.5 × 44.49 = 66.735; limits 4783.265 … 4916.735; only 5100 is outside → 4916.735
//           x* = (4790 + 4820 + 4835 + 4850 + 4860 + 4880 + 4916.735) / 7 = 33951.735 / 7 = 4850.2479
//           deviations −60.2479, −30.2479, −15.2479, −0.2479, 9.7521, 29.7521, 66.4871
//           squares 3629.80 + 914.93 + 232.50 + 0.06 + 95.10 + 885.19 + 4420.54 = 10178.13
//           sd = √(10178.13 / 6) = 41.1868;  s* = 1.134 × 41.1868 = 46.7059
//   limit:  5100 stays above x* + 1.5 s* and the six others inside (4790 stays above x* − 1.5 s* ≈ 4777) at every
//           step, so the fixed point solves by hand. With S₆ = 29035 the sum of the six others and m₆ = S₆/6 = 4839.1667:
//             7x* = S₆ + x* + 1.5 s*            →  x* = m₆ + 0.25 s*
//             s*² = 1.134² [SS₆ + 6(0.25 s*)² + (1.5 s*)²] / 6,   SS₆ = Σ(xᵢ − m₆)² over the six = 5020.8333
//                 = 0.214326 × (5020.8333 + 2.625 s*²)
//             s*² (1 − 0.562606) = 1076.0951  →  s*² = 2460.2407,  s* = 49.6008,  x* = 4839.1667 + 12.4002 = 4851.5669
const hand = [4790, 4820, 4835, 4850, 4860, 4880, 5100];

describe("Algorithm A on the hand-computed example", () => {
  it("first step matches the hand computation", () => {
    const step = algorithmAStep(hand, 4850, 44.49);
    expect(step.winsorised).toBe(1);
    expect(step.x).toBeCloseTo(4850.2479, 4);
    expect(step.s).toBeCloseTo(46.7059, 4);
  });

  it("converges to the hand-solved fixed point", () => {
    const r = algorithmA([...hand].reverse());
    expect(r?.converged).toBe(true);
    expect(r?.x).toBeCloseTo(4851.5669, 3);
    expect(r?.s).toBeCloseTo(49.6008, 3);
    expect(r?.winsorised).toBe(1);
    expect(r?.p).toBe(7);
    expect(r?.uX).toBeCloseTo((1.25 * 49.6008) / Math.sqrt(7), 3);
    expect(r?.degenerate).toBe(false);
  });
});

describe("Algorithm A with planted outliers", () => {
  const rng = seededRng(13528);
  const clean = Array.from({ length: 20 }, () => 4850 + drawNormal(rng, 30));
  const planted = [...clean, 5500, 5600, 5700];

  it("the plain mean and standard deviation are dragged away (simple-statistics)", () => {
    expect(ss.mean(planted) - ss.mean(clean)).toBeGreaterThan(80);
    expect(ss.sampleStandardDeviation(planted)).toBeGreaterThan(200);
  });

  it("x* stays with the clean values and s* near their spread", () => {
    const r = algorithmA(planted);
    expect(Math.abs((r?.x ?? 0) - ss.mean(clean))).toBeLessThan(15);
    expect(r?.s).toBeGreaterThan(0.7 * 30);
    expect(r?.s).toBeLessThan(1.5 * 30);
    expect(r?.winsorised).toBeGreaterThanOrEqual(3);
  });

  it("1.134 makes s* estimate σ for normal data (the consistency factor's purpose, ISO 13528:2015 C.3)", () => {
    const big = seededRng(7);
    const xs = Array.from({ length: 5000 }, () => drawNormal(big, 1));
    const r = algorithmA(xs);
    expect(Math.abs(r?.x ?? 1)).toBeLessThan(0.05);
    expect(r?.s).toBeGreaterThan(0.97);
    expect(r?.s).toBeLessThan(1.03);
  });
});

describe("edge cases", () => {
  it("fewer than two values: null; non-finite values are dropped", () => {
    expect(algorithmA([4800])).toBeNull();
    expect(algorithmA([4800, Number.NaN])).toBeNull();
  });

  it("more than half equal: MAD = 0, reported as degenerate with x* = median and s* = 0", () => {
    expect(algorithmA([5, 5, 5, 6])).toMatchObject({ x: 5, s: 0, degenerate: true, iterations: 0 });
  });
});
