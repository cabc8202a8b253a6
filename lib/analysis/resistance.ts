/**
 * DC resistance from a current step, and the rate a pack could hold before sagging to a floor.
 *
 * Two-level method (IEC 61960-3, DC internal resistance): discharge at ≈0.2 It until the
 * voltage settles (the standard holds it 10 s), then at ≈1 It for 1 s. With U1, I1 read at the
 * end of the low step and U2, I2 read 1 s into the high step, R = (U1 − U2) / (I2 − I1).
 * It is the rated capacity divided by one hour (5000 mAh → It = 5 A).
 * Step method (our fallback, labelled as such): the same formula across the rest → load step
 * of the main discharge, U1/I1 the last rest sample, U2/I2 1 s after it.
 */

/** R = (U1 − U2) / (I2 − I1), in ohms. NaN when the step carries no current change. */
export function twoLevelResistanceOhm(u1V: number, i1A: number, u2V: number, i2A: number): number {
  const di = i2A - i1A;
  if (!(Math.abs(di) > 0)) return Number.NaN;
  return (u1V - u2V) / di;
}

export type TwoLevelReading = {
  lowStartT: number;
  stepT: number;
  u1V: number;
  i1A: number;
  u2V: number;
  i2A: number;
  temperatureC: number;
  /** True when no sample fell close to 1 s into the high step and the nearest one was used. */
  late: boolean;
};

export const TWO_LEVEL_MIN_LOW_S = 5;
/** A first level longer than this is a discharge, not the low step of a two-level test (IEC holds it 10 s). */
export const TWO_LEVEL_MAX_LOW_S = 60;
export const TWO_LEVEL_RATIO_MIN = 3;
export const TWO_LEVEL_RATIO_MAX = 8;

function levelTolerance(currentA: number, thresholdA: number): number {
  return Math.max(0.25 * Math.abs(currentA), 2 * thresholdA);
}

type Pending = { lowStartT: number; stepT: number; u1: number; i1: number; pT: number; pV: number; pI: number; pTemp: number; hasPrev: boolean };

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
  private pending: Pending | null = null;
  private pendingLowA = 0;
  private pendingHighA = 0;
  /** Nothing more to look for in this stretch. */
  finished = false;

  constructor(private readonly thresholdA: number, onsetTimeS: number) {
    this.levelStartS = onsetTimeS;
  }

  add(t: number, v: number, i: number, temp: number): TwoLevelReading | null {
    if (this.pending === null && i >= this.lowA && i <= this.highA) {
      if (t - this.levelStartS > TWO_LEVEL_MAX_LOW_S) this.finished = true;
      // The common case, once per sample: still on the same level.
      this.n++;
      this.sumA += i;
      this.lastTimeS = t;
      this.lastVoltageV = v;
      this.lastCurrentA = i;
      return null;
    }
    return this.addSlow(t, v, i, temp);
  }

  private addSlow(t: number, v: number, i: number, temp: number): TwoLevelReading | null {
    let reading: TwoLevelReading | null = null;
    const p = this.pending;
    if (p) {
      if (i < this.pendingLowA || i > this.pendingHighA) {
        this.pending = null;
        this.finished = true;
      } else reading = this.readHigh(p, t, v, i, temp);
    }
    if (this.n > 0 && i >= this.lowA && i <= this.highA) {
      this.n++;
      this.sumA += i;
      this.lastTimeS = t;
      this.lastVoltageV = v;
      this.lastCurrentA = i;
      return reading;
    }
    if (this.n > 0) {
      const lowS = this.lastTimeS - this.levelStartS;
      const ratio = i / (this.sumA / this.n);
      if (lowS >= TWO_LEVEL_MIN_LOW_S - 0.1 && lowS <= TWO_LEVEL_MAX_LOW_S && ratio >= TWO_LEVEL_RATIO_MIN && ratio <= TWO_LEVEL_RATIO_MAX) {
        const fresh: Pending = { lowStartT: this.levelStartS, stepT: this.lastTimeS, u1: this.lastVoltageV, i1: this.lastCurrentA, pT: t, pV: v, pI: i, pTemp: temp, hasPrev: false };
        const tol = levelTolerance(i, this.thresholdA);
        this.pending = fresh;
        this.pendingLowA = i - tol;
        this.pendingHighA = i + tol;
        reading = this.readHigh(fresh, t, v, i, temp) ?? reading;
      } else if (lowS >= 1) this.finished = true;
      this.levelStartS = this.lastTimeS;
    }
    const tol = levelTolerance(i, this.thresholdA);
    this.n = 1;
    this.sumA = i;
    this.lowA = i - tol;
    this.highA = i + tol;
    this.lastTimeS = t;
    this.lastVoltageV = v;
    this.lastCurrentA = i;
    return reading;
  }

  private readHigh(p: Pending, t: number, v: number, i: number, temp: number): TwoLevelReading | null {
    const target = p.stepT + 1;
    if (t < target) {
      p.pT = t;
      p.pV = v;
      p.pI = i;
      p.pTemp = temp;
      p.hasPrev = true;
      return null;
    }
    this.pending = null;
    this.finished = true;
    const base = { lowStartT: p.lowStartT, stepT: p.stepT, u1V: p.u1, i1A: p.i1 };
    if (p.hasPrev && p.pT < target) {
      const f = (target - p.pT) / (t - p.pT);
      const tempAt = p.pTemp === p.pTemp && temp === temp ? p.pTemp + f * (temp - p.pTemp) : temp;
      return { ...base, u2V: p.pV + f * (v - p.pV), i2A: p.pI + f * (i - p.pI), temperatureC: tempAt, late: false };
    }
    if (t - target <= 0.5) return { ...base, u2V: v, i2A: i, temperatureC: temp, late: t - target > 0.25 };
    return null;
  }
}

/**
 * Current at which a pack resting at `nominalVPerCell` would sag to `floorVPerCell` through its
 * DC resistance: I = S · (Vnominal − Vfloor) / Rpack = (Vnominal − Vfloor) / Rcell.
 */
export function sagLimitedCurrentA(resistancePackOhm: number, cells: number, nominalVPerCell: number, floorVPerCell: number): number {
  if (!(resistancePackOhm > 0) || !(cells > 0)) return Number.NaN;
  return (cells * (nominalVPerCell - floorVPerCell)) / resistancePackOhm;
}

/** Sag-limited current ÷ rated capacity in Ah: a C rate comparable with the label. */
export function sagLimitedC(resistancePackOhm: number, cells: number, ratedMah: number, nominalVPerCell: number, floorVPerCell: number): number {
  if (!(ratedMah > 0)) return Number.NaN;
  return sagLimitedCurrentA(resistancePackOhm, cells, nominalVPerCell, floorVPerCell) / (ratedMah / 1000);
}

/** Whether measured step currents are close enough to 0.2 It and 1 It for a rated capacity. */
export function matchesTwoLevelCurrents(i1A: number, i2A: number, ratedMah: number): boolean {
  const itA = ratedMah / 1000;
  return i1A >= 0.1 * itA && i1A <= 0.3 * itA && i2A >= 0.7 * itA && i2A <= 1.5 * itA;
}
