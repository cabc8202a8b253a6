// Whether a maker ranking may name a leader: only when one maker's median (over its packs, each counted once)
// is distinguishably above every other maker's — their 95 % median intervals (order statistics) do not
// overlap (lib/analysis/uncertainty: medianInterval, distinguishedBest; content/methods/uncertainty.md).
// Otherwise the order is a listing, and pages say so instead of crowning a winner.
import { distinguishedBest, medianInterval, type MedianInterval } from "@/lib/analysis/uncertainty";

export type RankingVerdict = {
  /** Index of the maker ahead of every other, or null when no maker is distinguishably ahead. */
  leader: number | null;
  /** Each maker's 95 % interval of its median over its packs (its range, meets = false, below 6 packs). */
  intervals: (MedianInterval | null)[];
  words: string;
};

export function rankingVerdict(makers: { makerName: string; packValues: number[] }[]): RankingVerdict {
  const intervals = makers.map((m) => medianInterval(m.packValues));
  const leader = distinguishedBest(intervals, "higher-is-better");
  const name = leader === null ? null : (makers[leader]?.makerName ?? null);
  const words =
    name !== null
      ? `${name} is ahead of every other maker here: the 95 % intervals of the makers' medians do not overlap.`
      : makers.length < 2
        ? "One maker only: nothing to rank."
        : "No maker is distinguishably ahead: the 95 % intervals of the makers' medians overlap, or a maker has fewer than 6 packs for an interval. The order is a listing, not a ranking.";
  return { leader, intervals, words };
}
