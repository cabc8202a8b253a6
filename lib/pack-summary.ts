// Pure preparation of a pack's published results for pages: per-group figure summaries, sustained C,
// and the capacity/resistance-over-cycles series. Statistics come from lib/analysis; no I/O here.
import { retentionTrend, summarise, type RetentionTrend } from "@/lib/analysis";
import { describeGroup, keyWithoutAge, type DescribedGroup } from "@/lib/like-for-like";

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
  sagLimitedC: number | null;
  labelRatio: number | null;
  capacityRatio: number | null;
  /** The log reached the cut-off voltage (figures.timeToCutoffS is set). */
  reachedCutoff: boolean;
  /** The pack passed the stop temperature during the test (figures.timeToStopTemperatureS is set). */
  passedStopTemperature: boolean;
};

const SUMMARY_FIGURES = [
  "sagLimitedC",
  "labelRatio",
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
  /** Sustained C inside this group, from approved results only. */
  sustainedC: number | null;
};

export function describeResultGroup(
  r: Pick<
    PublicResultRow,
    | "resistanceMethod"
    | "ambientTemperatureC"
    | "cutoffVPerCell"
    | "loadCurrentA"
    | "ratedCapacityMah"
    | "cyclesBeforeTest"
  >,
): DescribedGroup {
  return describeGroup({
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

/**
 * Sustained C: the highest constant-current rate completed to cut-off without passing the stop
 * temperature, from published (approved) results — one with an open reader case counts until moderators decide.
 */
export function sustainedC(rows: PublicResultRow[]): { rateC: number; resultId: number } | null {
  let best: { rateC: number; resultId: number } | null = null;
  for (const r of rows) {
    if (r.loadMode !== "constant-current" || !r.reachedCutoff || r.passedStopTemperature) continue;
    if (!best || r.loadRateC > best.rateC) best = { rateC: r.loadRateC, resultId: r.id };
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
      group: { ...describeResultGroup(first), key: first.groupKey },
      n: list.length,
      openCases: list.filter((r) => r.openCase).length,
      figures: summariseFigures(list),
      sustainedC: sustainedC(list)?.rateC ?? null,
    });
  }
  return out.sort((a, b) => b.n - a.n || a.group.key.localeCompare(b.group.key));
}

type CyclePoint = { resultId: number; cycles: number; capacityMah: number | null; dcResistanceMohm: number | null };
export type CycleSeries = {
  label: string;
  points: CyclePoint[];
  trend: RetentionTrend | null;
  ratedCapacityMah: number;
};

/**
 * Capacity and resistance over cycles. Ageing moves a result into another age band, so the series takes
 * results that share every group part except age (same method, ambient, cut-off and rate) — the series
 * with the most distinct cycle counts. Published results only (the rows are); null when no series has two cycle counts.
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
  const trend = retentionTrend(
    points.filter((p): p is CyclePoint & { capacityMah: number } => p.capacityMah !== null),
    first.ratedCapacityMah,
  );
  return { label: best.label, points, trend, ratedCapacityMah: first.ratedCapacityMah };
}
