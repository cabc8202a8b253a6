/**
 * A distribution-free confidence interval for a median, from order statistics (W. J. Conover, "Practical
 * Nonparametric Statistics", 3rd ed., Wiley 1999, §3.2, the quantile test's confidence interval; also
 * M. Hollander and D. A. Wolfe, "Nonparametric Statistical Methods"): with x₍₁₎ ≤ … ≤ x₍ₙ₎ sorted,
 *   P(x₍ᵣ₎ ≤ median ≤ x₍ₙ₋ᵣ₊₁₎) = 1 − 2·P(B ≤ r − 1),   B ~ Binomial(n, ½),
 * for any continuous distribution (with ties the coverage can only be higher). We take the largest r whose
 * coverage is still at least 95 %: the narrowest such interval.
 *
 * Fewer than 6 values: no pair of order statistics reaches 95 % (n = 5 gives at most 1 − 2/32 = 93.75 %).
 * Our choice: return the range (lowest to highest) with its achieved confidence, `meets: false` and the reason
 * in words, so pages can show "too few results for a 95 % interval" beside the range. Null only when there is
 * no finite value at all.
 */
export const MEDIAN_INTERVAL_LEVEL = 0.95;

export type MedianInterval = {
  n: number;
  median: number;
  lower: number;
  upper: number;
  /** 1-based ranks of the bounds in the sorted values: lower = x₍lowerRank₎, upper = x₍upperRank₎. */
  lowerRank: number;
  upperRank: number;
  /** The interval's exact coverage, 1 − 2·P(B ≤ lowerRank − 1). */
  confidence: number;
  /** Whether the confidence reaches the level asked for (95 % by default). */
  meets: boolean;
  level: number;
  /** Plain words for pages. */
  words: string;
};

/** P(B ≤ k) for B ~ Binomial(n, ½), summed in log space so n in the thousands does not underflow. */
export function binomialHalfCdf(k: number, n: number): number {
  if (!(Number.isInteger(n) && n >= 0) || !Number.isInteger(k)) return Number.NaN;
  if (k < 0) return 0;
  if (k >= n) return 1;
  let logPmf = -n * Math.LN2; // P(B = 0)
  let total = 0;
  for (let i = 0; i <= k; i++) {
    total += Math.exp(logPmf);
    logPmf += Math.log(n - i) - Math.log(i + 1);
  }
  return Math.min(1, total);
}

/** Coverage of [x₍ᵣ₎, x₍ₙ₋ᵣ₊₁₎] for the median of n values. */
export function orderStatisticCoverage(r: number, n: number): number {
  return 1 - 2 * binomialHalfCdf(r - 1, n);
}

/** Smallest n for which some pair of order statistics covers the median with at least `level`. */
export function minimumCountFor(level = MEDIAN_INTERVAL_LEVEL): number {
  let n = 1;
  while (orderStatisticCoverage(1, n) < level) n++;
  return n;
}

function pct(x: number): string {
  return `${Number((x * 100).toFixed(1))} %`;
}

/** The median of `values` (any order; non-finite values are ignored) with its order-statistic interval. */
export function medianInterval(values: readonly number[], level = MEDIAN_INTERVAL_LEVEL): MedianInterval | null {
  if (!(level > 0 && level < 1)) throw new RangeError("The confidence level must lie between 0 and 1.");
  const sorted = values.filter((v) => Number.isFinite(v)).sort((a, b) => a - b);
  const n = sorted.length;
  if (n === 0) return null;
  let r = 1;
  while (r + 1 <= Math.floor((n + 1) / 2) && orderStatisticCoverage(r + 1, n) >= level) r++;
  const confidence = orderStatisticCoverage(r, n);
  const meets = confidence >= level;
  const lower = sorted[r - 1] as number;
  const upper = sorted[n - r] as number;
  const ranks = r === 1 ? "the lowest to the highest" : `the ${ordinal(r)} lowest to the ${ordinal(r)} highest`;
  const words = meets
    ? `${pct(level)} interval: ${ranks} of ${n} results (exact confidence ${pct(confidence)}).`
    : n === 1
      ? `One result: no interval; ${minimumCountFor(level)} results are needed for a ${pct(level)} interval.`
      : `Too few results for a ${pct(level)} interval: the range of ${n} results covers the median with ${pct(confidence)} confidence; ${minimumCountFor(level)} results are needed.`;
  const mid = (n - 1) / 2;
  const med = ((sorted[Math.floor(mid)] as number) + (sorted[Math.ceil(mid)] as number)) / 2;
  return { n, median: med, lower, upper, lowerRank: r, upperRank: n - r + 1, confidence, meets, level, words };
}

function ordinal(k: number): string {
  const tail = k % 100 >= 11 && k % 100 <= 13 ? "th" : (["th", "st", "nd", "rd"][k % 10] ?? "th");
  return `${k}${tail}`;
}
