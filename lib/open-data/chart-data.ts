// What one chart draws, prepared from its state (server/open-data/load-chart-data.ts): one like-for-like
// group at a time, saying what was left out and why. The drawings in components/charts/draw/ take these shapes.
import type { ChartRating, ChartState } from "./chart-state";

/** One pack on the label check: its labelled C and the rating drawn up the y axis (medians in the group). */
export type LabelCheckPoint = {
  /** The pack's slug (ids and links). */
  id: string;
  /** "Maker Model". */
  label: string;
  labelledC: number;
  ratingC: number;
  n: number;
  /** The 95 % interval of the pack's median rating (order statistics), drawn as an error bar; absent below 6 results. */
  lowC?: number;
  highC?: number;
};
export type CurveLine = { label: string; points: { capacityPercent: number; voltagePerCellV: number }[] };
export type RankingBar = { label: string; labelRatio: number; packCount: number; resultCount: number };

export type ChartData = {
  state: ChartState;
  /** The rating the label check's y values and the ranking's label ratios are of (state.rating, else "estimate"). */
  rating: ChartRating;
  groupLabel: string;
  counts: { packs: number; results: number };
  leftOut: string[];
  labelCheck?: LabelCheckPoint[];
  curves?: CurveLine[];
  /** Curves of one pack size drawn per pack (the reader's units, `units: "pack"`): voltages are the pack's. */
  curvesPerPack?: { cells: number };
  ranking?: RankingBar[];
};

/** One line style each (components/charts/palette.ts has seven). */
export const MAX_CURVES = 7;

/** How a drawing names its rating: the label check's legend and y axis, the ranking's x axis. */
export const CHART_RATING_WORDS: Record<
  ChartRating,
  { legend: string; parity: string; axis: [string, string]; point: string; ranking: [string, string, string] }
> = {
  measured: {
    legend: "Pack (its sustained C, measured)",
    parity: "Parity: sustained C = labelled C",
    axis: ["Sustained C, measured (C)", "Sustained C (C)"],
    point: "sustained C measured",
    ranking: [
      "Median label ratio (sustained C measured ÷ labelled C) of the maker's packs",
      "Median label ratio (sustained C measured ÷ labelled C)",
      "Median label ratio (measured)",
    ],
  },
  estimate: {
    legend: "Pack (median sag-limited C, an estimate)",
    parity: "Parity: estimate = labelled C",
    axis: ["Sag-limited C, an estimate (C)", "Sag-limited C, est. (C)"],
    point: "sag-limited C estimate",
    ranking: [
      "Median label ratio (sag-limited C estimate ÷ labelled C) of the maker's packs",
      "Median label ratio (sag-limited C estimate ÷ labelled C)",
      "Median label ratio (estimate)",
    ],
  },
};
