// The catalogue's shapes: a pack's label as printed, a pack as every page names it, and a row of the packs
// table. The data layer (db/queries/packs.ts) fills them; pages, the pack filter and the API read them.

/** A pack's label as printed (cells, capacity, C ratings, weight, connector): shared by every catalogue read. */
export type PackLabelFields = {
  cellsInSeries: number;
  ratedCapacityMah: number;
  labelledContinuousC: number;
  labelledBurstC: number | null;
  weightG: number | null;
  connector: string;
};

export type PackSummary = {
  id: number;
  slug: string;
  makerId: number;
  model: string;
  makerName: string;
  makerSlug: string;
} & PackLabelFields;

/** A row of the packs table: the label, how many published results, and (for a chosen group) medians. */
export type PackRow = PackSummary & {
  resultCount: number;
  groupCount: number;
  /** Medians inside the chosen like-for-like group; null without a group or without results in it. */
  measuredC: number | null;
  labelRatio: number | null;
  capacityRatio: number | null;
  groupN: number;
};
