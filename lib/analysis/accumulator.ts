/**
 * Running state of a log as samples stream in: trapezoid sums of charge and energy for each
 * current direction, rest voltage, peaks, the clues that tell which direction is discharge,
 * and the load stretches (segmentation into rest and load). Memory does not grow with the log.
 * Samples arrive in column batches; the loop keeps its state in locals for speed.
 */
import { CurveBuckets, type RawCurvePoint } from "./curve-buckets";
import { Stretch, type StretchSettings } from "./stretch";

/** Reusable column arrays for one batch of samples (time-ordered). */
export class SampleBatch {
  timeS = new Float64Array(0);
  voltageV = new Float64Array(0);
  currentA = new Float64Array(0);
  temperatureC = new Float64Array(0);
  minCellVoltageV = new Float64Array(0);
  /** Running charge after each sample, written by the accumulator for the curve. */
  positiveChargeAs = new Float64Array(0);
  negativeChargeAs = new Float64Array(0);

  reserve(size: number): void {
    if (this.timeS.length >= size) return;
    const n = Math.max(size, 1024);
    this.timeS = new Float64Array(n);
    this.voltageV = new Float64Array(n);
    this.currentA = new Float64Array(n);
    this.temperatureC = new Float64Array(n);
    this.minCellVoltageV = new Float64Array(n);
    this.positiveChargeAs = new Float64Array(n);
    this.negativeChargeAs = new Float64Array(n);
  }
}

/** Totals for one current direction, currents counted positive in that direction (stretch figures folded in as each closes). */
export class DirectionTotals {
  chargeAs = 0;
  energyWs = 0;
  minVoltageV = Number.POSITIVE_INFINITY;
  minCellVoltageV = Number.POSITIVE_INFINITY;
  peakCurrentA = 0;
  loadSamples = 0;
  open: Stretch | null = null;
  /** The longest stretch so far (by time from onset to last load sample). */
  best: Stretch | null = null;
  /** First stretch holding a two-level (IEC 61960-3) step. */
  twoLevel: Stretch | null = null;
  stretches = 0;
}

export class Accumulator {
  samples = 0;
  firstTimeS = Number.NaN;
  lastTimeS = Number.NaN;
  firstVoltageV = Number.NaN;
  maxRestVoltageV = Number.NEGATIVE_INFINITY;
  restSamples = 0;
  temperatureSamples = 0;
  duplicateTimes = 0;
  maxGapS = 0;
  /** Σ ΔV·ΔI over current steps: negative when voltage falls as positive current rises. */
  stepScore = 0;
  stepScoreAbs = 0;
  /** Σ sign(I)·ΔV inside load stretches: negative when voltage falls under positive current. */
  trendScore = 0;
  readonly positive = new DirectionTotals();
  readonly negative = new DirectionTotals();
  readonly curve: CurveBuckets;

  private lastVoltageV = 0;
  private lastCurrentA = 0;
  private lastTemperatureC = Number.NaN;
  private lastSign = 0;
  private lastIntervalS = 0;
  /** Lowest temperature that could change a watched stretch (−∞: check every sample). */
  private watchFromC = Number.NEGATIVE_INFINITY;

  constructor(private readonly settings: StretchSettings, curveBuckets = 512) {
    this.curve = new CurveBuckets(curveBuckets);
  }

  /**
   * Adds batch[0..count). Times are already checked to be non-decreasing. Per-sample calls take
   * (batch, k), never numbers: V8 boxes every double passed to or returned from a call it does not
   * inline, a heap allocation per argument per sample that showed up as most of the GC time.
   */
  pushBatch(batch: SampleBatch, count: number): void {
    const T = batch.timeS;
    const V = batch.voltageV;
    const I = batch.currentA;
    const TEMP = batch.temperatureC;
    const QP = batch.positiveChargeAs;
    const QN = batch.negativeChargeAs;
    const thr = this.settings.loadThresholdA;
    const pos = this.positive;
    const neg = this.negative;
    const curve = this.curve;
    let samples = this.samples;
    let lastT = this.lastTimeS;
    let lastV = this.lastVoltageV;
    let lastI = this.lastCurrentA;
    let lastTemp = this.lastTemperatureC;
    let lastSign = this.lastSign;
    let lastDt = this.lastIntervalS;
    let duplicates = this.duplicateTimes;
    let maxGapS = this.maxGapS;
    let restSamples = this.restSamples;
    let maxRestV = this.maxRestVoltageV;
    let qPos = pos.chargeAs;
    let qNeg = neg.chargeAs;
    let ePos = pos.energyWs;
    let eNeg = neg.energyWs;
    let stepScore = this.stepScore;
    let stepAbs = this.stepScoreAbs;
    let trend = this.trendScore;
    // Kept in locals too: field reads and writes on every sample made V8 box doubles (allocations).
    let temperatureSamples = this.temperatureSamples;
    let watchFromC = this.watchFromC;
    for (let k = 0; k < count; k++) {
      const t = T[k] as number;
      const v = V[k] as number;
      const i = I[k] as number;
      const temp = TEMP[k] as number;
      const sign = i > thr ? 1 : i < -thr ? -1 : 0;
      if (samples > 0 && sign === lastSign) {
        // The common case: still in the same stretch (or still at rest).
        const dt = t - lastT;
        if (dt === 0) duplicates++;
        else if (dt > maxGapS) maxGapS = dt;
        lastDt = dt;
        const di = i - lastI;
        if (di > thr || di < -thr) {
          const s = (v - lastV) * di;
          stepScore += s;
          stepAbs += s < 0 ? -s : s;
        }
        if (sign === 0) {
          restSamples++;
          if (v > maxRestV) maxRestV = v;
        } else {
          const half = 0.5 * dt;
          const dq = sign * (lastI + i) * half;
          const de = sign * (lastI * lastV + i * v) * half;
          const open = (sign === 1 ? pos.open : neg.open) as Stretch;
          if (sign === 1) {
            qPos += dq;
            ePos += de;
          } else {
            qNeg += dq;
            eNeg += de;
          }
          open.chargeAs += dq;
          open.energyWs += de;
          trend += sign * (v - lastV);
          open.addAt(batch, k, sign);
        }
      } else {
        let dq = 0;
        let de = 0;
        if (samples === 0) {
          this.firstTimeS = t;
          this.firstVoltageV = v;
        } else {
          const dt = t - lastT;
          if (dt === 0) duplicates++;
          else if (dt > maxGapS) maxGapS = dt;
          // Trapezoid per direction; the rest end of an interval counts as zero current. At a
          // stretch's edge the ramp counts at most one sampling interval (the one before): a
          // logger that writes rest rows once a minute must not stretch a discharge into its rest.
          const half = 0.5 * (lastDt > 0 && lastDt < dt ? lastDt : dt);
          lastDt = dt;
          const a = lastSign === 1 ? lastI : 0;
          const b = sign === 1 ? i : 0;
          const c = lastSign === -1 ? -lastI : 0;
          const d = sign === -1 ? -i : 0;
          const dqPos = (a + b) * half;
          const dePos = (a * lastV + b * v) * half;
          const dqNeg = (c + d) * half;
          const deNeg = (c * lastV + d * v) * half;
          qPos += dqPos;
          ePos += dePos;
          qNeg += dqNeg;
          eNeg += deNeg;
          const di = i - lastI;
          if (di > thr || di < -thr) {
            const s = (v - lastV) * di;
            stepScore += s;
            stepAbs += s < 0 ? -s : s;
          }
          // The interval that ends a stretch still belongs to it: ramps in and out count.
          if (lastSign === 1 && pos.open !== null) {
            pos.open.chargeAs += dqPos;
            pos.open.energyWs += dePos;
            this.close(pos);
          } else if (lastSign === -1 && neg.open !== null) {
            neg.open.chargeAs += dqNeg;
            neg.open.energyWs += deNeg;
            this.close(neg);
          }
          dq = sign === 1 ? dqPos : dqNeg;
          de = sign === 1 ? dePos : deNeg;
        }
        if (sign === 0) {
          restSamples++;
          if (v > maxRestV) maxRestV = v;
        } else {
          const side = sign === 1 ? pos : neg;
          const prev = samples > 0 ? { t: lastT, v: lastV, i: sign * lastI, temp: lastTemp, rest: lastSign === 0 } : null;
          const open = new Stretch(this.settings, prev, { t, v });
          side.open = open;
          side.stretches++;
          this.watchFromC = Number.NEGATIVE_INFINITY;
          open.chargeAs += dq;
          open.energyWs += de;
          open.addAt(batch, k, sign);
        }
        watchFromC = this.watchFromC; // a stretch opened or closed
      }
      if (temp === temp) {
        temperatureSamples++;
        if (temp >= watchFromC) {
          this.watchTemperature(t, temp);
          watchFromC = this.watchFromC;
        }
      }
      QP[k] = qPos;
      QN[k] = qNeg;
      curve.pushAt(batch, k);
      samples++;
      lastT = t;
      lastV = v;
      lastI = i;
      lastTemp = temp;
      lastSign = sign;
    }
    this.samples = samples;
    this.temperatureSamples = temperatureSamples;
    this.lastTimeS = lastT;
    this.lastVoltageV = lastV;
    this.lastCurrentA = lastI;
    this.lastTemperatureC = lastTemp;
    this.lastSign = lastSign;
    this.lastIntervalS = lastDt;
    this.duplicateTimes = duplicates;
    this.maxGapS = maxGapS;
    this.restSamples = restSamples;
    this.maxRestVoltageV = maxRestV;
    pos.chargeAs = qPos;
    pos.energyWs = ePos;
    neg.chargeAs = qNeg;
    neg.energyWs = eNeg;
    this.stepScore = stepScore;
    this.stepScoreAbs = stepAbs;
    this.trendScore = trend;
  }

  /**
   * Temperature is followed from each candidate stretch's onset to the end of the log. Most
   * samples change nothing (not a new peak, stop temperature not reached): `watchFromC` is the
   * lowest temperature that could, so the per-sample cost is one comparison.
   */
  private watchTemperature(t: number, temp: number): void {
    let from = Number.POSITIVE_INFINITY;
    for (const side of [this.positive, this.negative]) {
      for (const s of side.open === side.best ? [side.open] : [side.open, side.best]) {
        if (s === null) continue;
        s.watchTemperature(t, temp);
        from = Math.min(from, s.watchFromC());
      }
    }
    this.watchFromC = from;
  }

  /** The curve's kept samples, the log's last sample included. */
  curvePoints(): RawCurvePoint[] {
    const last: RawCurvePoint | null = this.samples > 0
      ? { timeS: this.lastTimeS, voltageV: this.lastVoltageV, currentA: this.lastCurrentA, temperatureC: this.lastTemperatureC, positiveChargeAs: this.positive.chargeAs, negativeChargeAs: this.negative.chargeAs }
      : null;
    return this.curve.points(last);
  }

  /** Closes any stretch still open when the log ends. */
  finish(): void {
    if (this.positive.open) this.close(this.positive);
    if (this.negative.open) this.close(this.negative);
  }

  private close(side: DirectionTotals): void {
    const stretch = side.open;
    if (!stretch) return;
    side.open = null;
    this.watchFromC = Number.NEGATIVE_INFINITY;
    side.loadSamples += stretch.samples;
    if (stretch.minVoltageV < side.minVoltageV) side.minVoltageV = stretch.minVoltageV;
    if (stretch.minCellVoltageV < side.minCellVoltageV) side.minCellVoltageV = stretch.minCellVoltageV;
    if (stretch.peakCurrentA > side.peakCurrentA) side.peakCurrentA = stretch.peakCurrentA;
    if (!side.best || stretch.durationS > side.best.durationS) side.best = stretch;
    if (!side.twoLevel && stretch.twoLevel) side.twoLevel = stretch;
  }
}
