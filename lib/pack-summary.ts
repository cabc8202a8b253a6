// Pure preparation of a pack's published results for pages: per-group figure summaries, sustained C (the
// measured rating), and the ageing figures — one physical pack's retention series where a result's log holds
// several cycles, and, labelled as such, results at different cycle counts. Statistics come from lib/analysis.
import {
  projectTo80,
  retentionTrend,
  summarise,
  type Projection,
  type RetentionSeries,
  type RetentionTrend,
} from "@/lib/analysis";
import { medianInterval, type MedianInterval } from "@/lib/analysis/uncertainty";
import { describeStoredGroup, keyWithoutAge, type DescribedGroup } from "@/lib/like-for-like";

export type Summary = NonNullable<ReturnType<typeof summarise>>;

/** A published result with its method card and headline figures (no curve). */
export type PublicResultRow = {
  id: number;
  packId: number;
  /** A reader asked moderators to check it and they have not decided yet (it still counts meanwhile). */
  openCase: boolean;
  groupKey: string;
  ratedCapacityMah: number;
  ambientTemperatureC: number;
  packStartTemperatureC: number | null;
  loadMode: "constant-current" | "constant-power" | "constant-resistance";
  loadCurrentA: number;
  loadRateC: number;
  cutoffVPerCell: number;
  stopTemperatureC: number;
  resistanceMethod: string;
  equipment: string;
  sampleRateHz: number | null;
  cyclesBeforeTest: number;
  testedOn: string | null;
  publishedAt: string | null;
  capacityMah: number | null;
  energyWh: number | null;
  dcResistanceMohm: number | null;
  resistanceAt25CMohm: number | null;
  holdVoltagePerCellV: number | null;
  temperatureRiseC: number | null;
  /** Sag-limited C, an ESTIMATE (see figures.sagLimitedCAssumptions). */
  sagLimitedC: number | null;
  /** Sag-limited C estimate ÷ labelled C. */
  labelRatio: number | null;
  /** Sustained C MEASURED from the run; null when it did not qualify (or was analysed before issue 12). */
  sustainedCMeasured: number | null;
  /** Measured sustained C ÷ labelled C. */
  sustainedLabelRatio: number | null;
  capacityRatio: number | null;
  /** Capacity over the cycles of this result's own log (one physical pack); null with fewer than two. */
  retention: RetentionSeries | null;
  /** The log reached the cut-off voltage (figures.reachedCutoff, or timeToCutoffS for older results). */
  reachedCutoff: boolean;
  /** The pack passed the stop temperature during the test (figures.timeToStopTemperatureS is set). */
  passedStopTemperature: boolean;
};

const SUMMARY_FIGURES = [
  "sagLimitedC",
  "labelRatio",
  "sustainedCMeasured",
  "sustainedLabelRatio",
  "capacityMah",
  "capacityRatio",
  "holdVoltagePerCellV",
  "dcResistanceMohm",
  "resistanceAt25CMohm",
  "temperatureRiseC",
  "energyWh",
] as const;
export type SummaryFigure = (typeof SUMMARY_FIGURES)[number];

export type GroupFigures = {
  group: DescribedGroup;
  /** Published results in the group. */
  n: number;
  /** Of those, results a reader asked moderators to check (still counted until they decide). */
  openCases: number;
  figures: Record<SummaryFigure, Summary | null>;
  /** Each median's 95 % distribution-free interval (order statistics); null below the count it needs. */
  intervals: Record<SummaryFigure, MedianInterval | null>;
  /** The pack's sustained C in this group: the highest measured value among its approved results. */
  sustainedC: number | null;
};

/** A result's group as stored: the key's resistance part is what the log showed, the rest from the card. */
export function describeResultGroup(
  r: Pick<
    PublicResultRow,
    | "groupKey"
    | "resistanceMethod"
    | "ambientTemperatureC"
    | "cutoffVPerCell"
    | "loadCurrentA"
    | "ratedCapacityMah"
    | "cyclesBeforeTest"
  >,
): DescribedGroup {
  return describeStoredGroup(r.groupKey, {
    resistanceMethod: r.resistanceMethod,
    ambientC: r.ambientTemperatureC,
    cutoffVPerCell: r.cutoffVPerCell,
    loadCurrentA: r.loadCurrentA,
    ratedMah: r.ratedCapacityMah,
    cyclesBeforeTest: r.cyclesBeforeTest,
  });
}

export function summariseFigures(rows: PublicResultRow[]): Record<SummaryFigure, Summary | null> {
  const out = {} as Record<SummaryFigure, Summary | null>;
  for (const f of SUMMARY_FIGURES) out[f] = summarise(rows.map((r) => r[f]).filter((v): v is number => v !== null));
  return out;
}

/** The 95 % interval of each figure's median (order statistics; lib/analysis/uncertainty medianInterval). */
export function medianIntervals(rows: PublicResultRow[]): Record<SummaryFigure, MedianInterval | null> {
  const out = {} as Record<SummaryFigure, MedianInterval | null>;
  for (const f of SUMMARY_FIGURES)
    out[f] = medianInterval(rows.map((r) => r[f]).filter((v): v is number => v !== null));
  return out;
}

/**
 * Sustained C of a pack: the highest MEASURED sustained C (the current the run actually drew, when the run
 * qualified — figures.sustainedCRule) among its published (approved) results; one with an open reader case
 * counts until moderators decide. Call it with one like-for-like group's rows for the group's value
 * (content/methods/figures.md).
 */
export function sustainedC(rows: PublicResultRow[]): { rateC: number; resultId: number } | null {
  let best: { rateC: number; resultId: number } | null = null;
  for (const r of rows) {
    if (r.sustainedCMeasured === null || !Number.isFinite(r.sustainedCMeasured)) continue;
    if (!best || r.sustainedCMeasured > best.rateC) best = { rateC: r.sustainedCMeasured, resultId: r.id };
  }
  return best;
}

/** One pack's published results split by like-for-like group, most results first. */
export function figuresByGroup(rows: PublicResultRow[]): GroupFigures[] {
  const byKey = new Map<string, PublicResultRow[]>();
  for (const r of rows) byKey.set(r.groupKey, [...(byKey.get(r.groupKey) ?? []), r]);
  const out: GroupFigures[] = [];
  for (const [, list] of byKey) {
    const first = list[0];
    if (!first) continue;
    out.push({
      group: describeResultGroup(first),
      n: list.length,
      openCases: list.filter((r) => r.openCase).length,
      figures: summariseFigures(list),
      intervals: medianIntervals(list),
      sustainedC: sustainedC(list)?.rateC ?? null,
    });
  }
  return out.sort((a, b) => b.n - a.n || a.group.key.localeCompare(b.group.key));
}

type CyclePoint = { resultId: number; cycles: number; capacityMah: number | null; dcResistanceMohm: number | null };
/** Results of one pack at different cycle counts: separate tests, possibly of different physical packs. */
export type CycleSeries = {
  label: string;
  points: CyclePoint[];
  trend: RetentionTrend | null;
  projection: Projection;
  ratedCapacityMah: number;
};

/** One physical pack's capacity over the cycles of one result's log. */
export type OnePackSeries = { resultId: number; groupLabel: string; retention: RetentionSeries; otherSeries: number };

export type PackAgeing = { onePack: OnePackSeries | null; acrossResults: CycleSeries | null };

/** The published result whose log holds the longest retention series (the newest on a tie). */
export function onePackSeries(rows: PublicResultRow[]): OnePackSeries | null {
  const withSeries = rows.filter((r): r is PublicResultRow & { retention: RetentionSeries } => r.retention !== null);
  const best = [...withSeries].sort((a, b) => b.retention.points.length - a.retention.points.length || b.id - a.id)[0];
  if (!best) return null;
  return {
    resultId: best.id,
    groupLabel: describeResultGroup(best).label,
    retention: best.retention,
    otherSeries: withSeries.length - 1,
  };
}

/**
 * Capacity and resistance over cycles ACROSS results. Ageing moves a result into another age band, so the
 * series takes results that share every group part except age (same method, ambient, cut-off and rate) — the
 * series with the most distinct cycle counts. These are separate tests, possibly of different physical packs
 * of one model, so pages say so. Published (approved) results only; null when no series has two cycle counts.
 */
export function cycleSeries(rows: PublicResultRow[]): CycleSeries | null {
  const series = new Map<string, { label: string; rows: PublicResultRow[] }>();
  for (const r of rows) {
    const g = describeResultGroup(r);
    const k = keyWithoutAge(g);
    const label = [g.parts.resistance.label, g.parts.ambient.label, g.parts.cutoff.label, g.parts.rate.label].join(
      " · ",
    );
    const entry = series.get(k) ?? { label, rows: [] };
    entry.rows.push(r);
    series.set(k, entry);
  }
  let best: { label: string; rows: PublicResultRow[] } | null = null;
  let bestCycles = 1;
  for (const s of series.values()) {
    const distinct = new Set(s.rows.map((r) => r.cyclesBeforeTest)).size;
    if (distinct > bestCycles || (best && distinct === bestCycles && s.rows.length > best.rows.length)) {
      best = s;
      bestCycles = distinct;
    }
  }
  if (!best || bestCycles < 2) return null;
  const first = best.rows[0];
  if (!first) return null;
  const points = best.rows
    .map((r) => ({
      resultId: r.id,
      cycles: r.cyclesBeforeTest,
      capacityMah: r.capacityMah,
      dcResistanceMohm: r.dcResistanceMohm,
    }))
    .sort((a, b) => a.cycles - b.cycles || a.resultId - b.resultId);
  const withCapacity = points.filter((p): p is CyclePoint & { capacityMah: number } => p.capacityMah !== null);
  const trend = retentionTrend(withCapacity, first.ratedCapacityMah);
  const cycles = withCapacity.map((p) => p.cycles);
  const projection = projectTo80(trend, Math.min(...cycles), Math.max(...cycles), new Set(cycles).size);
  return { label: best.label, points, trend, projection, ratedCapacityMah: first.ratedCapacityMah };
}

/** Both ageing views of a pack: one physical pack's series first, results across cycle counts beside it. */
export function packAgeing(rows: PublicResultRow[]): PackAgeing {
  return { onePack: onePackSeries(rows), acrossResults: cycleSeries(rows) };
}
