/**
 * Whether two packs' medians can be told apart, in words a page can show. Two packs are "distinguishable" only
 * when both have a 95 % median interval (medianInterval, ≥ 6 results each) and the intervals do not overlap;
 * touching intervals count as overlapping.
 *
 * Non-overlap of two 95 % intervals is a cautious rule: it corresponds to a test at well below the 5 % level,
 * so some real differences will be called "not distinguishable" (N. Schenker and J. F. Gentleman, "On judging
 * the significance of differences by examining the overlap between confidence intervals", The American
 * Statistician 55 (2001) 182–186; from memory). We accept that: "best" on a page must mean something.
 */
import type { MedianInterval } from "./median-interval";

export type ComparisonVerdict = "higher" | "lower" | "not distinguishable";
export type ComparisonReason = "intervals-apart" | "intervals-overlap" | "too-few-results" | "no-results";

export type MedianComparison = {
  /** How the first pack stands against the second. */
  verdict: ComparisonVerdict;
  reason: ComparisonReason;
  words: string;
};

/** Compare pack A's median interval with pack B's (null = no result in the group). */
export function compareMedianIntervals(a: MedianInterval | null, b: MedianInterval | null): MedianComparison {
  if (a === null || b === null) {
    return {
      verdict: "not distinguishable",
      reason: "no-results",
      words: "Not distinguishable: one of the packs has no result in this group.",
    };
  }
  if (!a.meets || !b.meets) {
    return {
      verdict: "not distinguishable",
      reason: "too-few-results",
      words: "Not distinguishable: one of the packs has too few results for a 95 % interval (6 are needed).",
    };
  }
  if (a.lower > b.upper)
    return { verdict: "higher", reason: "intervals-apart", words: "Higher: the two 95 % intervals do not overlap." };
  if (a.upper < b.lower)
    return { verdict: "lower", reason: "intervals-apart", words: "Lower: the two 95 % intervals do not overlap." };
  return {
    verdict: "not distinguishable",
    reason: "intervals-overlap",
    words: "Not distinguishable: the two 95 % intervals overlap.",
  };
}

export type BestDirection = "higher-is-better" | "lower-is-better";

/**
 * The index of the one pack that beats every other pack distinguishably (for "best" on /compare and the maker
 * ranking), or null when no pack does — then no pack may be called best. Packs without a result in the group
 * (null) are not contenders; at least two contenders are needed.
 */
export function distinguishedBest(
  intervals: readonly (MedianInterval | null)[],
  direction: BestDirection,
): number | null {
  const wanted: ComparisonVerdict = direction === "higher-is-better" ? "higher" : "lower";
  const contenders = intervals.flatMap((m, index) => (m === null ? [] : [{ m, index }]));
  if (contenders.length < 2) return null;
  const best = contenders.find(({ m, index }) =>
    contenders.every((o) => o.index === index || compareMedianIntervals(m, o.m).verdict === wanted),
  );
  return best ? best.index : null;
}
