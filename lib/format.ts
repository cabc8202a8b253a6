// Number formatting used across pages, charts and downloads. Missing values show as an em dash, never 0.
const MISSING = "—";

export function fmt(value: number | null | undefined, digits = 0, unit = ""): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  const s = value.toLocaleString("en-GB", { minimumFractionDigits: digits, maximumFractionDigits: digits });
  // C ratings are written as the trade prints them, "42.3C"; every other unit after a space ("1,300 mAh").
  return unit === "C" ? `${s}C` : unit ? `${s} ${unit}` : s;
}

/** A C rating, one spelling everywhere: "42.3C" (no space, as the trade prints it on labels). */
export function fmtC(value: number | null | undefined, digits = 1): string {
  return fmt(value, digits, "C");
}

/** A labelled C as printed: whole numbers without decimals ("75C"), others with one ("37.5C"). */
export function fmtLabelledC(value: number): string {
  return fmtC(value, Number.isInteger(value) ? 0 : 1);
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
  const burst = p.labelledBurstC ? `/${fmtLabelledC(p.labelledBurstC)}` : "";
  return `${p.cellsInSeries}S ${fmt(p.ratedCapacityMah)} mAh ${fmtLabelledC(p.labelledContinuousC)}${burst}`;
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
