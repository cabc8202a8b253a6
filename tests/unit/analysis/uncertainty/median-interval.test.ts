import { describe, expect, it } from "vitest";
import {
  binomialHalfCdf,
  medianInterval,
  minimumCountFor,
  orderStatisticCoverage,
} from "@/lib/analysis/uncertainty/median-interval";
import { seededRng } from "@/lib/analysis/uncertainty/monte-carlo";

// The order-statistic interval for a median (W. J. Conover, Practical Nonparametric Statistics, 3rd ed. 1999,
// §3.2; M. Hollander & D. A. Wolfe, Nonparametric Statistical Methods): P(x₍ᵣ₎ ≤ m ≤ x₍ₙ₋ᵣ₊₁₎) = 1 − 2·P(B ≤ r−1),
// B ~ Binomial(n, ½). The test computes the binomial CDF exactly with BigInt: Σ C(n, i) over 2ⁿ.

function exactTail(k: number, n: number): { num: bigint; den: bigint } {
  let c = 1n; // C(n, 0)
  let num = 0n;
  for (let i = 0; i <= k; i++) {
    num += c;
    c = (c * BigInt(n - i)) / BigInt(i + 1);
  }
  return { num, den: 1n << BigInt(n) };
}

/** Largest r with 1 − 2·P(B ≤ r−1) ≥ 0.95, decided in exact integers: 20·(den − 2·num) ≥ 19·den. */
function exactBestRank(n: number): { r: number; confidence: number } | null {
  let best: { r: number; confidence: number } | null = null;
  for (let r = 1; r <= Math.floor((n + 1) / 2); r++) {
    const { num, den } = exactTail(r - 1, n);
    if (20n * (den - 2n * num) >= 19n * den)
      best = { r, confidence: 1 - 2 * (Number((num * 10n ** 18n) / den) / 1e18) };
  }
  return best;
}

function shuffled(n: number, seed: number): number[] {
  const rng = seededRng(seed);
  const xs = Array.from({ length: n }, (_, i) => 100 + 3 * i); // distinct values, x₍ᵢ₎ = 100 + 3(i − 1)
  for (let i = n - 1; i > 0; i--) {
    const j = Math.floor(rng() * (i + 1));
    [xs[i], xs[j]] = [xs[j] as number, xs[i] as number];
  }
  return xs;
}

describe("binomial CDF for p = ½", () => {
  it("matches the exact BigInt sum for n = 200 (log-space summation does not lose precision)", () => {
    for (const k of [0, 50, 85, 99, 100, 120]) {
      const { num, den } = exactTail(k, 200);
      expect(binomialHalfCdf(k, 200)).toBeCloseTo(Number((num * 10n ** 18n) / den) / 1e18, 12);
    }
  });

  it("is symmetric for large n: P(B ≤ 999) + P(B ≤ 1000) = 1 for n = 2000 (B and n − B have the same law)", () => {
    expect(binomialHalfCdf(999, 2000) + binomialHalfCdf(1000, 2000)).toBeCloseTo(1, 10);
    expect(binomialHalfCdf(-1, 10)).toBe(0);
    expect(binomialHalfCdf(10, 10)).toBe(1);
  });
});

describe("95 % interval for a median against the exact binomial order-statistic formula, n = 5..50", () => {
  const ns = Array.from({ length: 46 }, (_, i) => i + 5);
  it.each(ns.map((n) => [n]))("n = %i", (n) => {
    const got = medianInterval(shuffled(n, n));
    const exact = exactBestRank(n);
    expect(got).not.toBeNull();
    if (exact === null) {
      // No pair of order statistics reaches 95 %: the range, with its own confidence 1 − 2/2ⁿ.
      expect(n).toBeLessThan(6);
      expect(got?.meets).toBe(false);
      expect(got?.lowerRank).toBe(1);
      expect(got?.confidence).toBeCloseTo(1 - 2 / 2 ** n, 15);
      return;
    }
    expect(got?.meets).toBe(true);
    expect(got?.lowerRank).toBe(exact.r);
    expect(got?.upperRank).toBe(n - exact.r + 1);
    expect(got?.lower).toBe(100 + 3 * (exact.r - 1));
    expect(got?.upper).toBe(100 + 3 * (n - exact.r));
    expect(got?.confidence).toBeCloseTo(exact.confidence, 12);
    // The next narrower interval would fall below 95 % (so this one is the narrowest that reaches it).
    if (exact.r + 1 <= Math.floor((n + 1) / 2)) expect(orderStatisticCoverage(exact.r + 1, n)).toBeLessThan(0.95);
  });

  // The same ranks and confidences from SciPy 1.17 (scipy.stats.binom.cdf), computed outside the project; they
  // agree with the tables printed in textbooks (from memory: n = 10 → x₍₂₎–x₍₉₎, 97.9 %; n = 20 → x₍₆₎–x₍₁₅₎, 95.9 %).
  it.each([
    [6, 1, 0.96875],
    [9, 2, 0.9609375],
    [10, 2, 0.978515625],
    [12, 3, 0.96142578125],
    [17, 5, 0.950958251953125],
    [20, 6, 0.9586105346679688],
    [25, 8, 0.9567147493362427],
    [30, 10, 0.9572260547429323],
    [37, 13, 0.952968972560484],
    [44, 16, 0.9512332340955254],
    [50, 18, 0.9671608624357315],
  ])("n = %i: rank %i, confidence %f (SciPy reference)", (n, r, confidence) => {
    const got = medianInterval(shuffled(n, 99));
    expect(got?.lowerRank).toBe(r);
    expect(got?.confidence).toBeCloseTo(confidence, 12);
  });
});

describe("fewer than 6 results: no 95 % interval exists; we return the range and its confidence", () => {
  it("6 is the smallest count that reaches 95 % (1 − 2/2⁵ = 93.75 % < 95 % ≤ 1 − 2/2⁶ = 96.875 %)", () => {
    expect(minimumCountFor(0.95)).toBe(6);
  });

  it.each([
    [2, 0.5],
    [3, 0.75],
    [4, 0.875],
    [5, 0.9375],
  ])("n = %i: range with confidence %f, meets false, words say why", (n, confidence) => {
    const got = medianInterval(shuffled(n, 5));
    expect(got?.lower).toBe(100);
    expect(got?.upper).toBe(100 + 3 * (n - 1));
    expect(got?.confidence).toBeCloseTo(confidence, 15);
    expect(got?.meets).toBe(false);
    expect(got?.words).toMatch(/^Too few results for a 95 % interval: .* 6 results are needed\.$/);
  });

  it("one result: no interval, confidence 0; no finite value: null", () => {
    expect(medianInterval([4800])).toMatchObject({ n: 1, lower: 4800, upper: 4800, confidence: 0, meets: false });
    expect(medianInterval([])).toBeNull();
    expect(medianInterval([Number.NaN])).toBeNull();
  });
});

describe("the interval in use", () => {
  it("ignores non-finite values, sorts, and gives the median and plain words", () => {
    const got = medianInterval([4810, Number.NaN, 4790, 4850, 4830, 4800, 4820, 4840, 4860, 4780, 4870]);
    expect(got).toMatchObject({ n: 10, median: 4825, lower: 4790, upper: 4860, lowerRank: 2, upperRank: 9 });
    expect(got?.words).toBe(
      "95 % interval: the 2nd lowest to the 2nd highest of 10 results (exact confidence 97.9 %).",
    );
  });

  it("is distribution-free: on a skewed (exponential) population it covers the true median ln 2 at least as often as it says (simulation, n = 20)", () => {
    const rng = seededRng(11);
    let covered = 0;
    const trials = 20000;
    for (let t = 0; t < trials; t++) {
      const xs = Array.from({ length: 20 }, () => -Math.log(1 - rng()));
      const m = medianInterval(xs);
      if (m && m.lower <= Math.LN2 && Math.LN2 <= m.upper) covered++;
    }
    // Exact coverage 95.86 %; 3 standard errors of a proportion over 20 000 trials ≈ 0.42 %.
    expect(covered / trials).toBeGreaterThan(0.9586 - 0.0042);
    expect(covered / trials).toBeLessThan(0.9586 + 0.0042);
  });

  it("refuses a level outside (0, 1)", () => {
    expect(() => medianInterval([1, 2, 3], 1)).toThrow(RangeError);
  });
});
