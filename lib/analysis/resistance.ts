/**
 * DC resistance from a current step, and the rate a pack could hold before sagging to a floor.
 *
 * Two-level method (IEC 61960-3, DC internal resistance): discharge at ≈0.2 It until the
 * voltage settles (the standard holds it 10 s), then at ≈1 It for 1 s. With U1, I1 read at the
 * end of the low step and U2, I2 read 1 s into the high step, R = (U1 − U2) / (I2 − I1).
 * It is the rated capacity divided by one hour (5000 mAh → It = 5 A).
 * Step method (our fallback, labelled as such): the same formula across the rest → load step
 * of the main discharge, U1/I1 the last rest sample, U2/I2 1 s after the current edge.
 * Both read U2 at 1 s after the edge, interpolated (readings.ts).
 */
import { PointReading } from "./readings";

/** R = (U1 − U2) / (I2 − I1), in ohms. NaN when the step carries no current change. */
export function twoLevelResistanceOhm(u1V: number, i1A: number, u2V: number, i2A: number): number {
  const di = i2A - i1A;
  if (!(Math.abs(di) > 0)) return Number.NaN;
  return (u1V - u2V) / di;
}

export type TwoLevelReading = {
  lowStartT: number;
  /** The current edge between the levels: midway between the last low and the first high sample. */
  stepT: number;
  /** Sample interval around that edge. */
  edgeIntervalS: number;
  /** The last sample of the low level, and the means over its last second (for a rippling current). */
  u1V: number;
  i1A: number;
  u1MeanV: number;
  i1MeanA: number;
  lowWindowSamples: number;
  /** The high level read 1 s after the edge. */
  high: PointReading;
};

export const TWO_LEVEL_MIN_LOW_S = 5;
/** A first level longer than this is a discharge, not the low step of a two-level test (IEC holds it 10 s). */
export const TWO_LEVEL_MAX_LOW_S = 60;
export const TWO_LEVEL_RATIO_MIN = 3;
export const TWO_LEVEL_RATIO_MAX = 8;
/** Samples of the current level kept for the means over its last second. */
const RING = 64;

function levelTolerance(currentA: number, thresholdA: number): number {
  return Math.max(0.25 * Math.abs(currentA), 2 * thresholdA);
}

type Pending = {
  lowStartT: number;
  lastLowT: number;
  u1: number;
  i1: number;
  u1Mean: number;
  i1Mean: number;
  lowN: number;
  high: PointReading;
  pT: number;
  pV: number;
  pI: number;
  pTemp: number;
};

/**
 * Watches the samples of one load stretch for a low current level held at least 5 s followed
 * by a level 3–8 times higher (a low step of 5–60 s) (nominally 0.2 It → 1 It, a ratio of 5), and reads U1, I1, U2, I2.
 * A level is a run of samples within ±25 % (at least twice the load threshold) of its first
 * current: wide enough for a noisy logger at 0.2 It, narrow enough that the ×5 step always leaves it.
 * IEC 61960-3 starts the low step from rest, so only the start of a stretch is searched: the
 * detector finishes at the first level of 1 s or more that is not followed by a valid high step
 * (shorter levels are taken as the load settling).
 */
export class TwoLevelDetector {
  private n = 0;
  private sumA = 0;
  private lowA = Number.POSITIVE_INFINITY;
  private highA = Number.NEGATIVE_INFINITY;
  private levelStartS: number;
  private lastTimeS = Number.NaN;
  private lastVoltageV = Number.NaN;
  private lastCurrentA = Number.NaN;
  private readonly ringT = new Float64Array(RING);
  private readonly ringV = new Float64Array(RING);
  private readonly ringA = new Float64Array(RING);
  private ringAt = 0;
  private pending: Pending | null = null;
  private pendingLowA = 0;
  private pendingHighA = 0;
  /** Nothing more to look for in this stretch. */
  finished = false;

  constructor(
    private readonly thresholdA: number,
    onsetTimeS = 0,
  ) {
    this.levelStartS = onsetTimeS;
  }

  add(t: number, v: number, i: number, temp: number): TwoLevelReading | null {
    if (this.pending === null && i >= this.lowA && i <= this.highA) {
      if (t - this.levelStartS > TWO_LEVEL_MAX_LOW_S) this.finished = true;
      // The common case, once per sample: still on the same level.
      this.onLevel(t, v, i);
      return null;
    }
    return this.addSlow(t, v, i, temp);
  }

  private onLevel(t: number, v: number, i: number): void {
    this.n++;
    this.sumA += i;
    this.lastTimeS = t;
    this.lastVoltageV = v;
    this.lastCurrentA = i;
    const at = this.ringAt++ % RING;
    this.ringT[at] = t;
    this.ringV[at] = v;
    this.ringA[at] = i;
  }

  /** Means of voltage and current over the current level's last second (from its last RING samples). */
  private lastSecond(): { v: number; a: number; n: number } {
    let n = 0;
    let sv = 0;
    let sa = 0;
    const count = Math.min(this.ringAt, RING, this.n);
    for (let k = 1; k <= count; k++) {
      const at = (this.ringAt - k) % RING;
      if ((this.ringT[at] as number) < this.lastTimeS - 1) break;
      n++;
      sv += this.ringV[at] as number;
      sa += this.ringA[at] as number;
    }
    return n > 0 ? { v: sv / n, a: sa / n, n } : { v: this.lastVoltageV, a: this.lastCurrentA, n: 1 };
  }

  private addSlow(t: number, v: number, i: number, temp: number): TwoLevelReading | null {
    let reading: TwoLevelReading | null = null;
    const p = this.pending;
    if (p) {
      if (i < this.pendingLowA || i > this.pendingHighA) reading = this.close();
      else reading = this.readHigh(p, true, t, v, i, temp);
    }
    if (this.n > 0 && i >= this.lowA && i <= this.highA) {
      this.onLevel(t, v, i);
      return reading;
    }
    if (this.n > 0 && !this.finished) {
      const lowS = this.lastTimeS - this.levelStartS;
      const ratio = i / (this.sumA / this.n);
      if (
        lowS >= TWO_LEVEL_MIN_LOW_S - 0.1 &&
        lowS <= TWO_LEVEL_MAX_LOW_S &&
        ratio >= TWO_LEVEL_RATIO_MIN &&
        ratio <= TWO_LEVEL_RATIO_MAX
      ) {
        const edge = (this.lastTimeS + t) / 2;
        const mean = this.lastSecond();
        const fresh: Pending = {
          lowStartT: this.levelStartS,
          lastLowT: this.lastTimeS,
          u1: this.lastVoltageV,
          i1: this.lastCurrentA,
          u1Mean: mean.v,
          i1Mean: mean.a,
          lowN: mean.n,
          high: new PointReading(edge + 1),
          pT: t,
          pV: v,
          pI: i,
          pTemp: temp,
        };
        const tol = levelTolerance(i, this.thresholdA);
        this.pending = fresh;
        this.pendingLowA = i - tol;
        this.pendingHighA = i + tol;
        reading = this.readHigh(fresh, false, t, v, i, temp) ?? reading;
      } else if (lowS >= 1) this.finished = true;
      this.levelStartS = this.lastTimeS;
    }
    const tol = levelTolerance(i, this.thresholdA);
    this.n = 0;
    this.sumA = 0;
    this.ringAt = 0;
    this.lowA = i - tol;
    this.highA = i + tol;
    this.onLevel(t, v, i);
    return reading;
  }

  /** The high level (or the stretch) ended: a pending reading keeps what it has. */
  close(): TwoLevelReading | null {
    const p = this.pending;
    this.pending = null;
    this.finished = true;
    if (!p) return null;
    // A 1 s pulse ends at most half the edge's interval before its stated 1 s point.
    p.high.close(p.high.atS - 1 - p.lastLowT + 1e-9);
    return p.high.valid ? this.finish(p) : null;
  }

  private readHigh(
    p: Pending,
    hasPrev: boolean,
    t: number,
    v: number,
    i: number,
    temp: number,
  ): TwoLevelReading | null {
    p.high.add(hasPrev, p.pT, p.pV, p.pI, p.pTemp, t, v, i, temp);
    p.pT = t;
    p.pV = v;
    p.pI = i;
    p.pTemp = temp;
    if (!p.high.done) return null;
    this.pending = null;
    this.finished = true;
    return p.high.valid ? this.finish(p) : null;
  }

  private finish(p: Pending): TwoLevelReading {
    const edge = p.high.atS - 1;
    return {
      lowStartT: p.lowStartT,
      stepT: edge,
      edgeIntervalS: 2 * (edge - p.lastLowT),
      u1V: p.u1,
      i1A: p.i1,
      u1MeanV: p.u1Mean,
      i1MeanA: p.i1Mean,
      lowWindowSamples: p.lowN,
      high: p.high,
    };
  }
}

/**
 * Current at which a pack resting at `nominalVPerCell` would sag to `floorVPerCell` through its
 * DC resistance: I = S · (Vnominal − Vfloor) / Rpack = (Vnominal − Vfloor) / Rcell.
 */
export function sagLimitedCurrentA(
  resistancePackOhm: number,
  cells: number,
  nominalVPerCell: number,
  floorVPerCell: number,
): number {
  if (!(resistancePackOhm > 0) || !(cells > 0)) return Number.NaN;
  return (cells * (nominalVPerCell - floorVPerCell)) / resistancePackOhm;
}

/** Sag-limited current ÷ rated capacity in Ah: a C rate comparable with the label. */
export function sagLimitedC(
  resistancePackOhm: number,
  cells: number,
  ratedMah: number,
  nominalVPerCell: number,
  floorVPerCell: number,
): number {
  if (!(ratedMah > 0)) return Number.NaN;
  return sagLimitedCurrentA(resistancePackOhm, cells, nominalVPerCell, floorVPerCell) / (ratedMah / 1000);
}

/** Whether measured step currents are close enough to 0.2 It and 1 It for a rated capacity. */
export function matchesTwoLevelCurrents(i1A: number, i2A: number, ratedMah: number): boolean {
  const itA = ratedMah / 1000;
  return i1A >= 0.1 * itA && i1A <= 0.3 * itA && i2A >= 0.7 * itA && i2A <= 1.5 * itA;
}
