/**
 * Running state of a log as samples stream in: trapezoid sums of charge and energy for each
 * current direction, rest voltage, peaks, the clues that tell which direction is discharge,
 * and the load stretches (segmentation into rest and load). Memory does not grow with the log.
 * Samples arrive in column batches; the loop keeps its state in locals for speed.
 */
import { CurveBuckets, type RawCurvePoint } from "./curve-buckets";
import { GAP_FACTOR, GAP_MIN_S, GapWatch, IntervalSample } from "./intervals";
import { CHARGE_PHASE_MIN_S, DirectionTotals } from "./phases";
import { Stretch, type StretchSettings } from "./stretch";
import type { SampleBatch } from "./sample-batch";

export { DirectionTotals } from "./phases";
export { SampleBatch } from "./sample-batch";

export type AccumulatorSettings = StretchSettings & { stopTemperatureC: number };

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
  readonly intervals = new IntervalSample();
  readonly gaps = new GapWatch(GAP_MIN_S);
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
  private intervalCountdown = 1;
  /** The last interval (not yet judged as a hole), where it started, whether a load sample ends it, and the one before. */
  private midDt = 0;
  private midStartS = 0;
  private midLoad = false;
  private beforeDt = 0;
  /** Lowest temperature that could change a watched stretch (−∞: check every sample). */
  private watchFromC = Number.NEGATIVE_INFINITY;

  constructor(
    private readonly settings: AccumulatorSettings,
    curveBuckets = 512,
  ) {
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
    const intervals = this.intervals;
    let intervalCountdown = this.intervalCountdown;
    let gapFloorS = this.gaps.floorS;
    let beforeDt = this.beforeDt;
    let midDt = this.midDt;
    let midStartS = this.midStartS;
    let midLoad = this.midLoad;
    for (let k = 0; k < count; k++) {
      const t = T[k] as number;
      const v = V[k] as number;
      const i = I[k] as number;
      const temp = TEMP[k] as number;
      const sign = i > thr ? 1 : i < -thr ? -1 : 0;
      if (samples > 0) {
        const dt = t - lastT;
        if (dt === 0) duplicates++;
        else {
          if (dt > maxGapS) maxGapS = dt;
          // The median interval is the one under load (loggers often write rest rows less often).
          if (sign !== 0 && sign === lastSign && --intervalCountdown === 0) {
            intervals.keep(dt);
            intervalCountdown = intervals.stride;
          }
          // The interval before this one is judged now that both its neighbours are known.
          if (midDt > gapFloorS && midLoad && midDt > GAP_FACTOR * dt && midDt > GAP_FACTOR * beforeDt) {
            this.gaps.offer(midStartS, midDt);
            gapFloorS = this.gaps.floorS;
          }
          beforeDt = midDt;
          midDt = dt;
          midStartS = lastT;
          midLoad = sign !== 0 || lastSign !== 0;
        }
      }
      if (samples > 0 && sign === lastSign) {
        // The common case: still in the same stretch (or still at rest).
        const dt = t - lastT;
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
          const prev =
            samples > 0 ? { t: lastT, v: lastV, i: sign * lastI, temp: lastTemp, rest: lastSign === 0 } : null;
          const open = new Stretch(this.settings, prev, { t, v });
          side.open = open;
          side.stretches++;
          side.opened(open);
          // Temperature while charging is not the discharge's own (resumed if this turns out a glitch).
          const otherPhase = (sign === 1 ? neg : pos).openPhase;
          if (otherPhase) otherPhase.watching = false;
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
    this.intervalCountdown = intervalCountdown;
    this.beforeDt = beforeDt;
    this.midDt = midDt;
    this.midStartS = midStartS;
    this.midLoad = midLoad;
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
   * Temperature is followed by each open phase (both directions: which one is discharge is known only
   * at the end). Most samples change nothing (not a new peak, stop temperature not reached):
   * `watchFromC` is the lowest temperature that could, so the per-sample cost is one comparison.
   */
  private watchTemperature(t: number, temp: number): void {
    const stopC = this.settings.stopTemperatureC;
    let from = Number.POSITIVE_INFINITY;
    for (const side of [this.positive, this.negative]) {
      const phase = side.openPhase;
      if (phase === null || !phase.watching) continue;
      phase.watchTemperature(t, temp, stopC);
      from = Math.min(from, phase.watchFromC(stopC));
    }
    this.watchFromC = from;
  }

  /** The curve's kept samples, the log's last sample included. */
  curvePoints(): RawCurvePoint[] {
    const last: RawCurvePoint | null =
      this.samples > 0
        ? {
            timeS: this.lastTimeS,
            voltageV: this.lastVoltageV,
            currentA: this.lastCurrentA,
            temperatureC: this.lastTemperatureC,
            positiveChargeAs: this.positive.chargeAs,
            negativeChargeAs: this.negative.chargeAs,
          }
        : null;
    return this.curve.points(last);
  }

  /** Closes any stretch still open when the log ends. */
  finish(): void {
    // The log's last interval has nothing after it: judged against the one before only.
    if (this.midDt > this.gaps.floorS && this.midLoad && this.midDt > GAP_FACTOR * this.beforeDt)
      this.gaps.offer(this.midStartS, this.midDt);
    this.midDt = 0;
    if (this.positive.open) this.close(this.positive);
    if (this.negative.open) this.close(this.negative);
  }

  private close(side: DirectionTotals): void {
    const stretch = side.open;
    if (!stretch) return;
    side.open = null;
    stretch.close();
    this.watchFromC = Number.NEGATIVE_INFINITY;
    side.closed(stretch);
    // A charge long enough to be a charge phase ends the other direction's open phase.
    if (stretch.durationS >= CHARGE_PHASE_MIN_S) {
      const other = side === this.positive ? this.negative : this.positive;
      const phase = other.openPhase;
      if (phase) phase.open = false;
    } else {
      const phase = (side === this.positive ? this.negative : this.positive).openPhase;
      if (phase) phase.watching = true;
    }
  }
}
