import { describe, expect, it } from "vitest";
import { compareMedianIntervals, distinguishedBest } from "@/lib/analysis/uncertainty/compare";
import { medianInterval, type MedianInterval } from "@/lib/analysis/uncertainty/median-interval";

// The rule (Sagline's, documented in compare.ts): distinguishable only when both packs have a 95 % order-statistic
// interval and the intervals do not overlap (a cautious rule: Schenker & Gentleman, Am. Stat. 55 (2001) 182).
function interval(values: number[]): MedianInterval {
  const m = medianInterval(values);
  if (!m) throw new Error("no interval");
  return m;
}

// Ten results each: the interval is the 2nd lowest to the 2nd highest (97.9 %).
const low = interval([4700, 4710, 4720, 4730, 4740, 4750, 4760, 4770, 4780, 4790]); // 4710–4780
const high = interval([4800, 4810, 4820, 4830, 4840, 4850, 4860, 4870, 4880, 4890]); // 4810–4880
const overlapping = interval([4770, 4775, 4780, 4790, 4800, 4805, 4810, 4815, 4820, 4830]); // 4775–4820
const touching = interval([4700, 4780, 4790, 4800, 4810, 4820, 4830, 4840, 4850, 4900]); // 4780–4850: touches low's 4780
const few = interval([4900, 4950, 4990]); // 3 results: no 95 % interval

describe("compareMedianIntervals", () => {
  it("apart → higher / lower", () => {
    expect(low).toMatchObject({ lower: 4710, upper: 4780 });
    expect(high).toMatchObject({ lower: 4810, upper: 4880 });
    expect(compareMedianIntervals(high, low)).toMatchObject({ verdict: "higher", reason: "intervals-apart" });
    expect(compareMedianIntervals(low, high)).toMatchObject({ verdict: "lower", reason: "intervals-apart" });
    expect(compareMedianIntervals(high, low).words).toBe("Higher: the two 95 % intervals do not overlap.");
  });

  it("overlap, even by touching → not distinguishable", () => {
    expect(compareMedianIntervals(overlapping, low)).toMatchObject({
      verdict: "not distinguishable",
      reason: "intervals-overlap",
    });
    expect(compareMedianIntervals(touching, low)).toMatchObject({
      verdict: "not distinguishable",
      reason: "intervals-overlap",
    });
  });

  it("too few results on either side → not distinguishable, even when the ranges lie far apart", () => {
    expect(compareMedianIntervals(few, low)).toMatchObject({
      verdict: "not distinguishable",
      reason: "too-few-results",
    });
    expect(compareMedianIntervals(low, few).words).toMatch(/6 are needed/);
    expect(compareMedianIntervals(null, low)).toMatchObject({ verdict: "not distinguishable", reason: "no-results" });
  });
});

describe("distinguishedBest: 'best' only for a pack that beats every other distinguishably", () => {
  it("finds it for higher-is-better (capacity) and lower-is-better (resistance)", () => {
    expect(distinguishedBest([low, high], "higher-is-better")).toBe(1);
    expect(distinguishedBest([low, high], "lower-is-better")).toBe(0);
  });

  it("no best when the leader overlaps any other pack", () => {
    expect(
      distinguishedBest(
        [low, high, interval([4860, 4870, 4880, 4890, 4900, 4910, 4920, 4930, 4940, 4950])],
        "higher-is-better",
      ),
    ).toBeNull();
    expect(distinguishedBest([overlapping, high], "higher-is-better")).toBeNull();
  });

  it("packs without results are not contenders; one contender is no comparison", () => {
    expect(distinguishedBest([null, low, high], "higher-is-better")).toBe(2);
    expect(distinguishedBest([null, high], "higher-is-better")).toBeNull();
    expect(distinguishedBest([few, high], "higher-is-better")).toBeNull();
  });
});
