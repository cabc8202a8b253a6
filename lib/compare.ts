// Pure side-by-side preparation for /compare: one like-for-like group at a time, never mixed. Picks the
// group, summarises each pack inside it, says what was left out and why, and marks "best" only where a pack's
// median is distinguishably ahead of every other's (95 % median intervals, lib/analysis/uncertainty).
import { compareMedianIntervals, distinguishedBest, type MedianInterval } from "@/lib/analysis/uncertainty";
import type { PackSummary } from "@/lib/catalogue";
import type { ChartPoint } from "@/lib/curves";
import { summariseExclusions, type DescribedGroup, type Exclusion } from "@/lib/like-for-like";
import {
  describeResultGroup,
  medianIntervals,
  summariseFigures,
  sustainedC,
  type PublicResultRow,
  type Summary,
  type SummaryFigure,
} from "@/lib/pack-summary";

import { MAX_COMPARE, MIN_COMPARE } from "@/lib/compare-limits";

export { MAX_COMPARE, MIN_COMPARE } from "@/lib/compare-limits";

export type CompareGroupOption = { key: string; label: string; packsCovered: number; results: number };

/** Groups the chosen packs have results in, the one covering most packs first. */
export function groupOptions(rows: PublicResultRow[]): CompareGroupOption[] {
  const by = new Map<string, { label: string; packs: Set<number>; results: number }>();
  for (const r of rows) {
    const e = by.get(r.groupKey) ?? { label: describeResultGroup(r).label, packs: new Set<number>(), results: 0 };
    e.packs.add(r.packId);
    e.results++;
    by.set(r.groupKey, e);
  }
  return [...by.entries()]
    .map(([key, e]) => ({ key, label: e.label, packsCovered: e.packs.size, results: e.results }))
    .sort((a, b) => b.packsCovered - a.packsCovered || b.results - a.results || a.key.localeCompare(b.key));
}

export type ComparedPack = {
  packId: number;
  /** Results of this pack inside the chosen group. */
  n: number;
  figures: Record<SummaryFigure, Summary | null>;
  /** The 95 % interval of each figure's median in the group (order statistics; meets = false below 6 results). */
  intervals: Record<SummaryFigure, MedianInterval | null>;
  /** The pack's sustained C in the group: the highest measured among its approved results. */
  sustainedC: number | null;
  /** The result whose curve stands for the pack: delivered capacity closest to the pack's median. */
  curveResultId: number | null;
  excluded: Exclusion[];
  excludedCount: number;
};

export function comparePacks(rows: PublicResultRow[], packIds: number[], group: DescribedGroup): ComparedPack[] {
  return packIds.map((packId) => {
    const mine = rows.filter((r) => r.packId === packId);
    const inGroup = mine.filter((r) => r.groupKey === group.key);
    const outside = mine.filter((r) => r.groupKey !== group.key);
    const figures = summariseFigures(inGroup);
    const intervals = medianIntervals(inGroup);
    const med = figures.capacityMah?.median ?? null;
    let curveResultId: number | null = null;
    let bestGap = Number.POSITIVE_INFINITY;
    for (const r of inGroup) {
      const gap = med === null || r.capacityMah === null ? Number.MAX_VALUE : Math.abs(r.capacityMah - med);
      if (gap < bestGap) {
        bestGap = gap;
        curveResultId = r.id;
      }
    }
    return {
      packId,
      n: inGroup.length,
      figures,
      intervals,
      sustainedC: sustainedC(inGroup)?.rateC ?? null,
      curveResultId,
      excluded: summariseExclusions(
        group,
        outside.map((r) => ({ ...describeResultGroup(r), key: r.groupKey })),
      ),
      excludedCount: outside.length,
    };
  });
}

export type Direction = "higher" | "lower";
export type Mark = { best: boolean; note: string | null };
export type RowMarks = { marks: Mark[]; note: string | null };

/**
 * "Best" only where it means something: the one pack whose 95 % median interval lies wholly beyond every other
 * pack's (distinguishedBest). Then the others are marked as behind it. Otherwise no pack is marked and the row
 * says why the packs are not distinguishable. Packs without results in the group get no mark.
 */
export function markDistinguished(intervals: (MedianInterval | null)[], direction: Direction): RowMarks {
  const blank = intervals.map(() => ({ best: false, note: null }));
  const present = intervals.filter((m): m is MedianInterval => m !== null);
  if (present.length < 2) return { marks: blank, note: null };
  const best = distinguishedBest(intervals, direction === "higher" ? "higher-is-better" : "lower-is-better");
  if (best === null) {
    const tooFew = present.some((m) => !m.meets);
    return {
      marks: blank,
      note: tooFew
        ? "Not distinguishable: a pack has too few results for a 95 % interval of its median (6 are needed)."
        : "Not distinguishable: the 95 % intervals of the medians overlap.",
    };
  }
  const leader = intervals[best] ?? null;
  return {
    marks: intervals.map((m, i) =>
      i === best
        ? { best: true, note: null }
        : m === null
          ? { best: false, note: null }
          : {
              best: false,
              note: compareMedianIntervals(m, leader).verdict === "not distinguishable" ? null : "behind",
            },
    ),
    note: null,
  };
}

export type CompareSuggestion = {
  group: { key: string; label: string };
  cells: number;
  capacityMah: number;
  packs: { slug: string; title: string }[];
};

/**
 * Ready-made comparisons for an empty /compare: in each of the most populated groups, the packs that a
 * shopper would put side by side — same cells in series and same rated capacity — when at least two of
 * them have results there. One suggestion per group, at most `limit`, never two of the same size class.
 */
export function suggestComparisons(
  groups: { key: string; label: string; packSlugs: string[] }[],
  packs: { slug: string; makerName: string; model: string; cellsInSeries: number; ratedCapacityMah: number }[],
  limit = 3,
): CompareSuggestion[] {
  const bySlug = new Map(packs.map((p) => [p.slug, p]));
  const used = new Set<string>();
  const out: CompareSuggestion[] = [];
  for (const g of groups) {
    if (out.length >= limit) break;
    const classes = new Map<string, typeof packs>();
    for (const slug of g.packSlugs) {
      const p = bySlug.get(slug);
      if (!p) continue;
      const k = `${p.cellsInSeries}:${p.ratedCapacityMah}`;
      classes.set(k, [...(classes.get(k) ?? []), p]);
    }
    const best = [...classes.entries()]
      .filter(([k, list]) => list.length >= MIN_COMPARE && !used.has(k))
      .sort((a, b) => b[1].length - a[1].length || a[0].localeCompare(b[0]))[0];
    if (!best) continue;
    const [k, list] = best;
    used.add(k);
    const chosen = [...list].sort((a, b) => a.slug.localeCompare(b.slug)).slice(0, Math.min(4, MAX_COMPARE));
    const first = chosen[0];
    if (!first) continue;
    out.push({
      group: { key: g.key, label: g.label },
      cells: first.cellsInSeries,
      capacityMah: first.ratedCapacityMah,
      packs: chosen.map((p) => ({ slug: p.slug, title: `${p.makerName} ${p.model}` })),
    });
  }
  return out;
}

/** Everything /compare shows for 2–6 packs in one like-for-like group (db/queries/compare.ts reads it). */
export type Comparison = {
  packs: PackSummary[];
  unknownSlugs: string[];
  groups: CompareGroupOption[];
  group: DescribedGroup | null;
  compared: ComparedPack[];
  curves: { packSlug: string; resultId: number; points: ChartPoint[] }[];
};
