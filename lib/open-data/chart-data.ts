// What one chart draws, prepared from its state (server/open-data/load-chart-data.ts): one like-for-like
// group at a time, saying what was left out and why. The drawings in components/charts/draw/ take these shapes.
import type { ChartState } from "./chart-state";

/** One pack on the label check: its labelled C and the rating drawn up the y axis (medians in the group). */
export type LabelCheckPoint = {
  /** The pack's slug (ids and links). */
  id: string;
  /** "Maker Model". */
  label: string;
  labelledC: number;
  ratingC: number;
  n: number;
};
export type CurveLine = { label: string; points: { capacityPercent: number; voltagePerCellV: number }[] };
export type RankingBar = { label: string; labelRatio: number; packCount: number; resultCount: number };

export type ChartData = {
  state: ChartState;
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
