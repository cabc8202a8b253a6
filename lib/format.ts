// Number formatting used across pages, charts and downloads. Missing values show as an em dash, never 0.
const MISSING = "—";

export function fmt(value: number | null | undefined, digits = 0, unit = ""): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  const s = value.toLocaleString("en-GB", { minimumFractionDigits: digits, maximumFractionDigits: digits });
  return unit ? `${s} ${unit}` : s;
}

export function packTitle(p: { makerName: string; model: string }): string {
  return `${p.makerName} ${p.model}`;
}

export function labelSpec(p: {
  cellsInSeries: number;
  ratedCapacityMah: number;
  labelledContinuousC: number;
  labelledBurstC: number | null;
}): string {
  const burst = p.labelledBurstC ? `/${fmt(p.labelledBurstC)}C` : "";
  return `${p.cellsInSeries}S ${fmt(p.ratedCapacityMah)} mAh ${fmt(p.labelledContinuousC)}C${burst}`;
}

/** "1,234 mAh" style, or the em dash; ratios as 0.82. */
export function fmtRatio(value: number | null | undefined): string {
  return fmt(value, 2);
}

export function fmtDate(iso: string | null | undefined): string {
  if (!iso) return MISSING;
  const d = new Date(iso);
  return Number.isNaN(d.getTime())
    ? MISSING
    : d.toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
}

/** Where the 25 °C resistance estimate comes from; shown beside every such value. */
export const RESISTANCE_25C_SOURCE =
  "Arrhenius correction, activation energy 17.1 kJ/mol (Ecker et al., J. Electrochem. Soc. 162 (2015) A1836)";
