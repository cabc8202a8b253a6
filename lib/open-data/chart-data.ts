// What one chart draws, prepared from its state (server/open-data/load-chart-data.ts): one like-for-like
// group at a time, saying what was left out and why.
import type { ChartState } from "./chart-state";

type LabelPoint = { label: string; labelledC: number; measuredC: number; n: number };
export type CurveLine = { label: string; points: { capacityPercent: number; voltagePerCellV: number }[] };
type RankingBar = { label: string; labelRatio: number; packCount: number; resultCount: number };

export type ChartData = {
  state: ChartState;
  groupLabel: string;
  counts: { packs: number; results: number };
  leftOut: string[];
  labelCheck?: LabelPoint[];
  curves?: CurveLine[];
  ranking?: RankingBar[];
};

export const MAX_CURVES = 8;
