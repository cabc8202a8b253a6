// Per-pack aggregates inside one like-for-like group: the median of approved results with n and spread
// (pure; fed by db/queries/open-data/groups.ts).
import { groupKey as computeGroupKey, labelForGroupKey, summarise } from "@/lib/analysis";
import { roundTo } from "./field-kit";
import { figureDigits } from "./result-fields";

export const AGGREGATE_FIGURES = [
  "capacityMah",
  "dcResistanceMohm",
  "resistanceAt25CMohm",
  "holdVoltagePerCellV",
  "temperatureRiseC",
  "sagLimitedC",
  "labelRatio",
  "sustainedCMeasured",
  "sustainedLabelRatio",
  "capacityRatio",
] as const;
type AggregateFigure = (typeof AGGREGATE_FIGURES)[number];

type Summary = { median: number; n: number; min: number; max: number } | null;

/** A summary as published: median, min and max rounded to the figure's digits. */
function roundSummary(s: Summary, figure: AggregateFigure): Summary {
  const digits = figureDigits(figure);
  if (!s || digits === undefined) return s;
  return { median: roundTo(s.median, digits), n: s.n, min: roundTo(s.min, digits), max: roundTo(s.max, digits) };
}

/** A pack's aggregates as the API publishes them. */
export function publishedAggregate(p: PackAggregate): PackAggregate {
  const figures = { ...p.figures };
  for (const f of AGGREGATE_FIGURES) figures[f] = roundSummary(p.figures[f], f);
  return { ...p, figures };
}

type Sample = {
  packId: number;
  packSlug: string;
  makerSlug: string;
  makerName: string;
  model: string;
  cellsInSeries: number;
  ratedCapacityMah: number;
  labelledContinuousC: number;
} & Record<AggregateFigure, number | null>;

export type PackAggregate = {
  packSlug: string;
  makerSlug: string;
  makerName: string;
  model: string;
  cellsInSeries: number;
  ratedCapacityMah: number;
  labelledContinuousC: number;
  resultCount: number;
  figures: Record<AggregateFigure, Summary>;
};

function summary(values: (number | null)[]): Summary {
  const s = summarise(values.filter((v): v is number => v !== null && Number.isFinite(v)));
  return s ? { median: s.median, n: s.n, min: s.min, max: s.max } : null;
}

export function aggregateByPack(samples: Sample[]): PackAggregate[] {
  const byPack = new Map<number, Sample[]>();
  // Appended in place: copying a pack's list for every sample was quadratic in its results.
  for (const s of samples) {
    const list = byPack.get(s.packId);
    if (list) list.push(s);
    else byPack.set(s.packId, [s]);
  }
  return [...byPack.values()].map((list) => {
    const first = list[0] as Sample;
    const figures = Object.fromEntries(AGGREGATE_FIGURES.map((f) => [f, summary(list.map((s) => s[f]))])) as Record<
      AggregateFigure,
      Summary
    >;
    return {
      packSlug: first.packSlug,
      makerSlug: first.makerSlug,
      makerName: first.makerName,
      model: first.model,
      cellsInSeries: first.cellsInSeries,
      ratedCapacityMah: first.ratedCapacityMah,
      labelledContinuousC: first.labelledContinuousC,
      resultCount: list.length,
      figures,
    };
  });
}

export type MakerAggregate = {
  makerSlug: string;
  makerName: string;
  packCount: number;
  resultCount: number;
  labelRatio: Summary;
  /** Each pack's value once: what the maker's median (and its interval) is taken over. */
  packValues: number[];
};

/**
 * A pack's label ratio for a maker ranking: the median of its estimate ratios, or — for the measured rating — its
 * sustained C ÷ labelled C, the highest among its approved results (content/methods/figures.md).
 */
function packRatio(p: PackAggregate, rating: "estimate" | "measured"): number | null {
  return rating === "measured" ? (p.figures.sustainedLabelRatio?.max ?? null) : (p.figures.labelRatio?.median ?? null);
}

/** Maker ranking: the median over a maker's packs of each pack's label ratio (of the estimate unless told). */
export function aggregateByMaker(
  packsAgg: PackAggregate[],
  rating: "estimate" | "measured" = "estimate",
): MakerAggregate[] {
  const byMaker = new Map<string, PackAggregate[]>();
  for (const p of packsAgg) byMaker.set(p.makerSlug, [...(byMaker.get(p.makerSlug) ?? []), p]);
  return [...byMaker.values()]
    .map((list) => {
      const first = list[0] as PackAggregate;
      return {
        makerSlug: first.makerSlug,
        makerName: first.makerName,
        packCount: list.length,
        resultCount: list.reduce((n, p) => n + p.resultCount, 0),
        labelRatio: summary(list.map((p) => packRatio(p, rating))),
        packValues: list.map((p) => packRatio(p, rating)).filter((v): v is number => v !== null),
      };
    })
    .sort((a, b) => (b.labelRatio?.median ?? -1) - (a.labelRatio?.median ?? -1));
}

/**
 * A human label for a group key: read from the key itself (its resistance part is what the logs showed), or,
 * for a key the band functions do not produce, recomputed from one of its results' method card.
 */
export function groupLabel(
  key: string,
  sample:
    | {
        resistanceMethod: string;
        ambientTemperatureC: number;
        cutoffVPerCell: number;
        loadCurrentA: number;
        ratedCapacityMah: number;
        cyclesBeforeTest: number;
      }
    | undefined,
): string | null {
  const fromKey = labelForGroupKey(key);
  if (fromKey !== null) return fromKey;
  if (!sample) return null;
  return computeGroupKey({
    resistanceMethod: sample.resistanceMethod,
    ambientC: sample.ambientTemperatureC,
    cutoffVPerCell: sample.cutoffVPerCell,
    loadCurrentA: sample.loadCurrentA,
    ratedMah: sample.ratedCapacityMah,
    cyclesBeforeTest: sample.cyclesBeforeTest,
  }).label;
}
