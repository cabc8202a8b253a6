// Chart-ready discharge curves: downsampled on the server (LTTB from lib/analysis) and rounded, so a
// browser receives a few kilobytes per curve, never the raw log.
import { lttb, type CurvePoint, type Discharge } from "@/lib/analysis";

/** One prepared point: capacity delivered (mAh), voltage per cell (V), time (s), pack temperature (°C). */
export type ChartPoint = { mah: number; vpc: number; s: number; tc: number | null };

// Sixty points draw a discharge curve without a visible corner at any page width (largest-triangle
// downsampling keeps the knee); more only adds bytes to the page.
export const PACK_PAGE_CURVE_POINTS = 60;
export const COMPARE_CURVE_POINTS = 60;

const round = (v: number, digits: number) => Math.round(v * 10 ** digits) / 10 ** digits;

/**
 * The part of a stored curve the headline figures describe: the headline discharge only, its capacity counted
 * from its own start — so a log of ten cycles draws one discharge, not ten laid end to end. The curve's times
 * are the log's own; a discharge's start counts from the log's first sample, which is the curve's first point.
 * A log of one discharge (or figures stored before discharges were listed) gives the curve back whole.
 */
export function headlineCurve(
  curve: CurvePoint[],
  figures: { discharges?: Discharge[] | null; headlineDischarge?: number | null } | null,
): CurvePoint[] {
  const list = figures?.discharges ?? [];
  const d = list.find((x) => x.index === figures?.headlineDischarge);
  const t0 = curve[0]?.timeS;
  if (list.length <= 1 || !d || t0 === undefined) return curve;
  const from = t0 + d.startS;
  const to = from + d.durationS;
  const before = curve.filter((p) => p.timeS <= from);
  const base = before[before.length - 1]?.capacityMah ?? 0;
  return curve
    .filter((p) => p.timeS >= from && p.timeS <= to)
    .map((p) => ({ ...p, capacityMah: Math.max(0, p.capacityMah - base) }));
}

/** Load part of a stored curve (positive current), downsampled on voltage against capacity. */
export function prepareCurve(curve: CurvePoint[], cells: number, maxPoints: number): ChartPoint[] {
  const load = curve.filter((p) => p.currentA > 0.05 && Number.isFinite(p.voltageV) && Number.isFinite(p.capacityMah));
  const picked = lttb(
    load,
    maxPoints,
    (p) => p.capacityMah,
    (p) => p.voltageV,
  );
  return picked.map((p) => ({
    mah: round(p.capacityMah, 0),
    vpc: round(p.voltageV / Math.max(1, cells), 3),
    s: round(p.timeS, 0),
    tc: p.temperatureC === null || !Number.isFinite(p.temperatureC) ? null : round(p.temperatureC, 1),
  }));
}

/** The whole log (rest included) against time, for one result's page. */
export function prepareTimeCurve(
  curve: CurvePoint[],
  cells: number,
  maxPoints: number,
): { s: number; vpc: number; a: number; tc: number | null }[] {
  const picked = lttb(
    curve,
    maxPoints,
    (p) => p.timeS,
    (p) => p.voltageV,
  );
  return picked.map((p) => ({
    s: round(p.timeS, 1),
    vpc: round(p.voltageV / Math.max(1, cells), 3),
    a: round(p.currentA, 2),
    tc: p.temperatureC === null || !Number.isFinite(p.temperatureC) ? null : round(p.temperatureC, 1),
  }));
}
