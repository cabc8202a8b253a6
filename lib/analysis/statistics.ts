/**
 * Robust statistics for like-for-like groups: median, median absolute deviation (MAD),
 * quartiles, and the modified z-score of Iglewicz & Hoaglin (B. Iglewicz and D. C. Hoaglin,
 * "How to Detect and Handle Outliers", ASQC Quality Press, 1993):
 *   Mᵢ = 0.6745 · (xᵢ − median) / MAD,  flag |Mᵢ| > 3.5.
 * 0.6745 is the 0.75 quantile of the standard normal distribution, which makes MAD/0.6745
 * estimate the standard deviation for normal data.
 */
export const MODIFIED_Z_CONSTANT = 0.6745;
export const MODIFIED_Z_THRESHOLD = 3.5;
/**
 * When more than half the values are equal, MAD is 0. We then fall back to the mean absolute
 * deviation from the median, scaled by √(π/2) ≈ 1.2533 so it estimates the standard deviation of
 * normal data too (common practice in statistics packages; the constant is from memory).
 */
export const MEAN_AD_CONSTANT = 1.253314;

function sorted(values: number[]): number[] {
  return values.filter((v) => Number.isFinite(v)).sort((a, b) => a - b);
}

/** Quantile by linear interpolation between order statistics (Hyndman & Fan 1996, type 7). */
export function quantileSorted(sortedValues: number[], p: number): number {
  const n = sortedValues.length;
  if (n === 0) return Number.NaN;
  const h = (n - 1) * Math.min(1, Math.max(0, p));
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, n - 1);
  const a = sortedValues[lo] as number;
  const b = sortedValues[hi] as number;
  return a + (h - lo) * (b - a);
}

export function median(values: number[]): number {
  return quantileSorted(sorted(values), 0.5);
}

/** Median of absolute deviations from the median, unscaled. */
export function medianAbsoluteDeviation(values: number[]): number {
  const m = median(values);
  return median(values.filter((v) => Number.isFinite(v)).map((v) => Math.abs(v - m)));
}

/**
 * Modified z-score of every value (same order). 0 for a value equal to the median when the
 * spread is 0; non-finite inputs score 0.
 */
export function modifiedZScores(values: number[]): number[] {
  const finite = values.filter((v) => Number.isFinite(v));
  if (finite.length === 0) return values.map(() => 0);
  const m = median(finite);
  const mad = medianAbsoluteDeviation(finite);
  if (mad > 0) return values.map((v) => (Number.isFinite(v) ? (MODIFIED_Z_CONSTANT * (v - m)) / mad : 0));
  const meanAd = finite.reduce((s, v) => s + Math.abs(v - m), 0) / finite.length;
  if (!(meanAd > 0)) return values.map(() => 0);
  return values.map((v) => (Number.isFinite(v) ? (v - m) / (MEAN_AD_CONSTANT * meanAd) : 0));
}

/** Indexes of values whose |modified z| exceeds the threshold (3.5 by default). */
export function outlierIndexes(values: number[], threshold = MODIFIED_Z_THRESHOLD): number[] {
  const scores = modifiedZScores(values);
  const out: number[] = [];
  scores.forEach((z, k) => {
    if (Math.abs(z) > threshold) out.push(k);
  });
  return out;
}

/** Median, count and spread of a group's values; null when there is no finite value. */
export function summarise(
  values: number[],
): { median: number; n: number; min: number; max: number; q1: number; q3: number } | null {
  const s = sorted(values);
  if (s.length === 0) return null;
  return {
    median: quantileSorted(s, 0.5),
    n: s.length,
    min: s[0] as number,
    max: s[s.length - 1] as number,
    q1: quantileSorted(s, 0.25),
    q3: quantileSorted(s, 0.75),
  };
}
