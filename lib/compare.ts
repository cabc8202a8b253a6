// Pure side-by-side preparation for /compare: one like-for-like group at a time, never mixed. Picks the
// group, summarises each pack inside it, says what was left out and why, and marks differences.
import { summariseExclusions, type DescribedGroup, type Exclusion } from "@/lib/like-for-like";
import { describeResultGroup, summariseFigures, sustainedC, type PublicResultRow, type Summary, type SummaryFigure } from "@/lib/pack-summary";

export const MIN_COMPARE = 2;
export const MAX_COMPARE = 6;

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
      sustainedC: sustainedC(inGroup)?.rateC ?? null,
      curveResultId,
      excluded: summariseExclusions(group, outside.map((r) => ({ ...describeResultGroup(r), key: r.groupKey }))),
      excludedCount: outside.length,
    };
  });
}

export type Direction = "higher" | "lower";
export type Mark = { best: boolean; /** Fraction worse than the best (0.12 = 12 % worse); null when missing or best. */ worseBy: number | null };

/** Marks the best value in a row and how far behind each other value is. Missing values get no mark. */
export function markDifferences(values: (number | null)[], direction: Direction): Mark[] {
  const present = values.filter((v): v is number => v !== null && Number.isFinite(v));
  if (present.length < 2) return values.map(() => ({ best: false, worseBy: null }));
  const best = direction === "higher" ? Math.max(...present) : Math.min(...present);
  return values.map((v) => {
    if (v === null || !Number.isFinite(v)) return { best: false, worseBy: null };
    if (v === best) return { best: true, worseBy: null };
    const worseBy = best === 0 ? null : Math.abs(v - best) / Math.abs(best);
    return { best: false, worseBy };
  });
}

/** A difference a reader should notice (more than 10 % from the best). */
export const NOTABLE_DIFFERENCE = 0.1;
