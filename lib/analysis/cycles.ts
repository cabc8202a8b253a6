/**
 * Capacity kept over cycles: retained fraction = capacity ÷ reference (rated, or the first
 * result), a least-squares straight line through (cycles, retained), and where that line
 * crosses 80 %, the usual end-of-life mark for lithium cells (common practice).
 */
export const END_OF_LIFE_RETAINED = 0.8;

export type RetentionTrend = {
  /** Change of retained fraction per cycle (−0.001 = −0.1 % per cycle). */
  slopePerCycle: number;
  /** Retained fraction the line gives at cycle 0. */
  intercept: number;
  /** Cycle count where the line reaches 80 %; null when it never falls (slope ≥ 0). */
  cyclesTo80: number | null;
  /** Coefficient of determination; null with fewer than 3 points or no spread in capacity. */
  r2: number | null;
};

export function retentionTrend(points: { cycles: number; capacityMah: number }[], ratedOrFirstMah: number): RetentionTrend | null {
  if (!(ratedOrFirstMah > 0)) return null;
  const xs: number[] = [];
  const ys: number[] = [];
  for (const p of points) {
    if (Number.isFinite(p.cycles) && Number.isFinite(p.capacityMah)) {
      xs.push(p.cycles);
      ys.push(p.capacityMah / ratedOrFirstMah);
    }
  }
  const n = xs.length;
  if (n < 2) return null;
  const meanX = xs.reduce((a, b) => a + b, 0) / n;
  const meanY = ys.reduce((a, b) => a + b, 0) / n;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let k = 0; k < n; k++) {
    const dx = (xs[k] as number) - meanX;
    const dy = (ys[k] as number) - meanY;
    sxx += dx * dx;
    sxy += dx * dy;
    syy += dy * dy;
  }
  if (!(sxx > 0)) return null; // every point at the same cycle count: no trend
  const slopePerCycle = sxy / sxx;
  const intercept = meanY - slopePerCycle * meanX;
  let sse = 0;
  for (let k = 0; k < n; k++) {
    const r = (ys[k] as number) - (intercept + slopePerCycle * (xs[k] as number));
    sse += r * r;
  }
  const r2 = n >= 3 && syy > 0 ? 1 - sse / syy : null;
  const cyclesTo80 = slopePerCycle < 0 ? (END_OF_LIFE_RETAINED - intercept) / slopePerCycle : null;
  return { slopePerCycle, intercept, cyclesTo80, r2 };
}
