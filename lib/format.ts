// Number formatting used across pages, charts and downloads. Missing values show as an em dash, never 0.
export const MISSING = "—";

export function fmt(value: number | null | undefined, digits = 0, unit = ""): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  const s = value.toLocaleString("en-GB", { minimumFractionDigits: digits, maximumFractionDigits: digits });
  return unit ? `${s} ${unit}` : s;
}

export function packTitle(p: { makerName: string; model: string }): string {
  return `${p.makerName} ${p.model}`;
}

export function labelSpec(p: { cellsInSeries: number; ratedCapacityMah: number; labelledContinuousC: number; labelledBurstC: number | null }): string {
  const burst = p.labelledBurstC ? `/${fmt(p.labelledBurstC)}C` : "";
  return `${p.cellsInSeries}S ${fmt(p.ratedCapacityMah)} mAh ${fmt(p.labelledContinuousC)}C${burst}`;
}
