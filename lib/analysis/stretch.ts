/**
 * One load stretch: consecutive samples with current above the load threshold in one
 * direction. Everything a figure needs from "the main discharge" is gathered here as the
 * samples go by, in constant memory, because which stretch is the longest is known only at
 * the end. Currents are in the stretch's own frame (always positive).
 */
import type { SampleBatch } from "./accumulator";
import { type TwoLevelReading, TwoLevelDetector } from "./resistance";

export type StretchSettings = { holdDelayS: number; stopTemperatureC: number; loadThresholdA: number };

/** How far past the wanted instant the first sample may fall and still be used ("sampled late"). */
const STEP_LATE_S = 1;

export class Stretch {
  readonly onsetTimeS: number;
  readonly restValid: boolean;
  readonly restVoltageV: number;
  readonly restCurrentA: number;
  lastTimeS: number;
  samples = 0;
  chargeAs = 0;
  energyWs = 0;
  minVoltageV = Number.POSITIVE_INFINITY;
  minCellVoltageV = Number.POSITIVE_INFINITY;
  peakCurrentA = 0;
  holdVoltageV = Number.NaN;
  holdSampledLate = false;
  stepVoltageV = Number.NaN;
  stepCurrentA = Number.NaN;
  stepTemperatureC = Number.NaN;
  stepSampledLate = false;
  startTemperatureC: number;
  peakTemperatureC: number;
  stopTemperatureTimeS = Number.NaN;
  twoLevel: TwoLevelReading | null = null;
  /** Where the running minimum voltage fell: [prevT, prevV, t, v] per entry, so a cut-off crossing can be found later for any threshold. */
  readonly minTrail: number[] = [];
  private trailMinVoltageV = Number.POSITIVE_INFINITY;
  private readonly trailStepV: number;
  private holdDone = false;
  private stepDone = false;
  /** Earliest time at which a hold or step reading is due; skips both checks on most samples. */
  private nextCaptureTimeS: number;
  private prevTimeS: number;
  private prevVoltageV: number;
  private prevCurrentA: number;
  private prevTemperatureC: number;
  private readonly detector: TwoLevelDetector;
  private detecting = true;

  constructor(
    private readonly settings: StretchSettings,
    prev: { t: number; v: number; i: number; temp: number; rest: boolean } | null,
    first: { t: number; v: number },
  ) {
    this.onsetTimeS = prev ? prev.t : first.t;
    this.restValid = prev !== null && prev.rest;
    this.restVoltageV = prev ? prev.v : Number.NaN;
    this.restCurrentA = prev ? prev.i : Number.NaN;
    this.startTemperatureC = prev ? prev.temp : Number.NaN;
    this.peakTemperatureC = this.startTemperatureC;
    this.prevTimeS = prev ? prev.t : first.t;
    this.prevVoltageV = prev ? prev.v : first.v;
    this.prevCurrentA = prev ? prev.i : 0;
    this.prevTemperatureC = this.startTemperatureC;
    this.lastTimeS = first.t;
    this.trailStepV = Math.max(0.0005, 5e-5 * Math.abs(first.v));
    this.detector = new TwoLevelDetector(settings.loadThresholdA, this.onsetTimeS);
    this.nextCaptureTimeS = this.onsetTimeS + Math.min(1, settings.holdDelayS);
    if (this.startTemperatureC === this.startTemperatureC) this.watchTemperature(this.onsetTimeS, this.startTemperatureC);
  }

  get durationS(): number {
    return this.lastTimeS - this.onsetTimeS;
  }

  /** A load sample of this stretch; `i` is positive in the stretch's frame. */
  add(t: number, v: number, i: number, temp: number, minCellVoltageV: number): void {
    const b = scratch;
    b.timeS[0] = t;
    b.voltageV[0] = v;
    b.currentA[0] = i;
    b.temperatureC[0] = temp;
    b.minCellVoltageV[0] = minCellVoltageV;
    this.addAt(b, 0, 1);
  }

  /**
   * Sample k of a batch, its current times `sign` (into the stretch's frame). Runs once per load
   * sample: takes the batch, not numbers, so no double is boxed for the call.
   */
  addAt(batch: SampleBatch, k: number, sign: number): void {
    const t = batch.timeS[k] as number;
    const v = batch.voltageV[k] as number;
    const i = sign * (batch.currentA[k] as number);
    const temp = batch.temperatureC[k] as number;
    const minCellVoltageV = batch.minCellVoltageV[k] as number;
    this.samples++;
    this.lastTimeS = t;
    if (i > this.peakCurrentA) this.peakCurrentA = i;
    if (minCellVoltageV < this.minCellVoltageV) this.minCellVoltageV = minCellVoltageV;
    if (v < this.minVoltageV) {
      this.minVoltageV = v;
      if (v < this.trailMinVoltageV - this.trailStepV) {
        this.minTrail.push(this.prevTimeS, this.prevVoltageV, t, v);
        this.trailMinVoltageV = v;
      }
    }
    if (t >= this.nextCaptureTimeS) this.capture(t, v, i, temp);
    if (this.startTemperatureC !== this.startTemperatureC && temp === temp) this.startTemperatureC = temp;
    if (this.detecting) {
      const reading = this.detector.add(t, v, i, temp);
      if (reading !== null && this.twoLevel === null) this.twoLevel = reading;
      if (this.detector.finished) this.detecting = false;
    }
    this.prevTimeS = t;
    this.prevVoltageV = v;
    this.prevCurrentA = i;
    this.prevTemperatureC = temp;
  }

  private capture(t: number, v: number, i: number, temp: number): void {
    if (!this.holdDone) this.captureHold(t, v);
    if (!this.stepDone) {
      if (this.restValid) this.captureStep(t, v, i, temp);
      else this.stepDone = true;
    }
    const hold = this.holdDone ? Number.POSITIVE_INFINITY : this.onsetTimeS + this.settings.holdDelayS;
    const step = this.stepDone ? Number.POSITIVE_INFINITY : this.onsetTimeS + 1;
    this.nextCaptureTimeS = Math.min(hold, step);
  }

  /** Temperature is followed from the onset to the end of the log, after the stretch closes too. */
  /** Below this temperature a sample changes nothing here (−∞ before any temperature is known). */
  watchFromC(): number {
    if (this.peakTemperatureC !== this.peakTemperatureC) return Number.NEGATIVE_INFINITY;
    const stop = this.stopTemperatureTimeS !== this.stopTemperatureTimeS ? this.settings.stopTemperatureC : Number.POSITIVE_INFINITY;
    return Math.min(this.peakTemperatureC + Number.EPSILON * Math.abs(this.peakTemperatureC), stop);
  }

  watchTemperature(t: number, temp: number): void {
    if (!(this.peakTemperatureC >= temp)) this.peakTemperatureC = temp; // also when no peak yet (NaN)
    if (this.stopTemperatureTimeS !== this.stopTemperatureTimeS && temp >= this.settings.stopTemperatureC) this.stopTemperatureTimeS = t;
  }

  private captureHold(t: number, v: number): void {
    const target = this.onsetTimeS + this.settings.holdDelayS;
    if (t < target) return;
    this.holdDone = true;
    if (this.samples > 1 && this.prevTimeS < target) this.holdVoltageV = lerp(this.prevTimeS, this.prevVoltageV, t, v, target);
    else if (t === target || this.samples > 1) this.holdVoltageV = v;
    else if (t - target <= STEP_LATE_S) {
      this.holdVoltageV = v;
      this.holdSampledLate = true;
    }
  }

  private captureStep(t: number, v: number, i: number, temp: number): void {
    const target = this.onsetTimeS + 1;
    if (t < target) return;
    this.stepDone = true;
    if (this.samples > 1 && this.prevTimeS < target) {
      this.stepVoltageV = lerp(this.prevTimeS, this.prevVoltageV, t, v, target);
      this.stepCurrentA = lerp(this.prevTimeS, this.prevCurrentA, t, i, target);
      this.stepTemperatureC = this.prevTemperatureC === this.prevTemperatureC ? lerp(this.prevTimeS, this.prevTemperatureC, t, temp, target) : temp;
    } else if (t - target <= STEP_LATE_S) {
      this.stepVoltageV = v;
      this.stepCurrentA = i;
      this.stepTemperatureC = temp;
      this.stepSampledLate = t - target > 0.25;
    }
  }

  /** Time from onset to the first moment the voltage reached `thresholdV`, interpolated; NaN if never. */
  timeToVoltageS(thresholdV: number): number {
    const trail = this.minTrail;
    for (let k = 0; k + 3 < trail.length; k += 4) {
      const v = trail[k + 3] as number;
      if (v > thresholdV) continue;
      const pT = trail[k] as number;
      const pV = trail[k + 1] as number;
      const t = trail[k + 2] as number;
      const at = pV > thresholdV && pV !== v ? pT + ((pV - thresholdV) / (pV - v)) * (t - pT) : t;
      return at - this.onsetTimeS;
    }
    return Number.NaN;
  }
}

/** One-sample columns for add(), the entry point outside the batch loop (tests, single samples). */
const scratch = {
  timeS: new Float64Array(1),
  voltageV: new Float64Array(1),
  currentA: new Float64Array(1),
  temperatureC: new Float64Array(1),
  minCellVoltageV: new Float64Array(1),
} as SampleBatch;

function lerp(t0: number, y0: number, t1: number, y1: number, t: number): number {
  if (t1 === t0) return y1;
  return y0 + ((y1 - y0) * (t - t0)) / (t1 - t0);
}
