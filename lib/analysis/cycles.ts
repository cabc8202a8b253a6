/**
 * Capacity kept over cycles: retained fraction = capacity ÷ reference (rated, or the first
 * result), a least-squares straight line through (cycles, retained), and where that line
 * crosses 80 %, the usual end-of-life mark for lithium cells (common practice), projected only as far
 * as the data supports (projectTo80).
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

export function retentionTrend(
  points: { cycles: number; capacityMah: number }[],
  ratedOrFirstMah: number,
): RetentionTrend | null {
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

/**
 * How far a projection to 80 % may reach: at most half the observed span of cycles past the last
 * one, from at least 3 points (Sagline's own rule: a straight line fitted to a few cycles says little
 * about many more; capacity fade of lithium cells often speeds up late, so far projections flatter).
 */
export const MAX_PROJECTION_BEYOND_SPAN = 0.5;
export const MIN_POINTS_FOR_PROJECTION = 3;

export type Projection = { cyclesTo80: number | null; extrapolated: boolean; projectionNote: string };

/** The 80 % crossing of a fitted line, only where the data supports it, with a note saying which case applies. */
export function projectTo80(
  trend: RetentionTrend | null,
  firstCycle: number,
  lastCycle: number,
  points: number,
): Projection {
  const none = (projectionNote: string): Projection => ({ cyclesTo80: null, extrapolated: false, projectionNote });
  if (!trend || points < MIN_POINTS_FOR_PROJECTION)
    return none(`No projection: at least ${MIN_POINTS_FOR_PROJECTION} cycles are needed.`);
  const c80 = trend.cyclesTo80;
  if (c80 === null) return none("No projection: capacity does not fall over these cycles.");
  if (c80 < firstCycle) return none("No projection: the fitted line is below 80 % before the first cycle measured.");
  if (c80 <= lastCycle)
    return {
      cyclesTo80: c80,
      extrapolated: false,
      projectionNote: "The fitted line reaches 80 % within the cycles measured.",
    };
  const limit = lastCycle + MAX_PROJECTION_BEYOND_SPAN * (lastCycle - firstCycle);
  if (c80 <= limit) {
    return {
      cyclesTo80: c80,
      extrapolated: true,
      projectionNote: `Projected past the last cycle measured (${lastCycle}), by at most half the span of cycles observed.`,
    };
  }
  return none(
    `No projection: the fitted line reaches 80 % only after cycle ${Math.round(c80)}, more than half the observed span past the last cycle measured (${lastCycle}).`,
  );
}

export type RetentionPoint = { cycle: number; capacityMah: number; retained: number };

/** Capacity kept over the cycles of one pack (one log with several discharges to the cut-off). */
export type RetentionSeries = {
  /** Retained fractions are of the rated capacity when it is known, else of the first cycle's. */
  reference: "rated" | "first";
  referenceMah: number;
  points: RetentionPoint[];
  trend: RetentionTrend | null;
} & Projection;

export function retentionSeries(
  cycles: { cycle: number; capacityMah: number }[],
  ratedMah?: number,
): RetentionSeries | null {
  const usable = cycles.filter((c) => Number.isFinite(c.cycle) && c.capacityMah > 0);
  const first = usable[0];
  if (usable.length < 2 || !first) return null;
  const reference = ratedMah !== undefined && ratedMah > 0 ? "rated" : "first";
  const referenceMah = reference === "rated" ? (ratedMah as number) : first.capacityMah;
  const points = usable.map((c) => ({
    cycle: c.cycle,
    capacityMah: c.capacityMah,
    retained: c.capacityMah / referenceMah,
  }));
  const trend = retentionTrend(
    usable.map((c) => ({ cycles: c.cycle, capacityMah: c.capacityMah })),
    referenceMah,
  );
  const last = usable[usable.length - 1] as { cycle: number };
  return { reference, referenceMah, points, trend, ...projectTo80(trend, first.cycle, last.cycle, usable.length) };
}
