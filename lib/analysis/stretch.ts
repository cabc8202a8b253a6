/**
 * One load stretch: consecutive samples with current above the load threshold in one
 * direction. Everything a figure needs from "the main discharge" is gathered here as the
 * samples go by, in constant memory, because which stretch is the longest is known only at
 * the end. Currents are in the stretch's own frame (always positive).
 */
import { type TwoLevelReading, TwoLevelDetector } from "./resistance";

export type StretchSettings = { holdDelayS: number; stopTemperatureC: number; loadThresholdA: number };

/** How far past the wanted instant the first sample may fall and still be used ("sampled late"). */
const STEP_LATE_S = 1;

export class Stretch {
  readonly onsetT: number;
  readonly restValid: boolean;
  readonly restV: number;
  readonly restI: number;
  lastT: number;
  samples = 0;
  chargeAs = 0;
  energyWs = 0;
  minV = Number.POSITIVE_INFINITY;
  minCellV = Number.POSITIVE_INFINITY;
  peakI = 0;
  holdV = Number.NaN;
  holdLate = false;
  stepV = Number.NaN;
  stepI = Number.NaN;
  stepTemp = Number.NaN;
  stepLate = false;
  startTemp: number;
  peakTemp: number;
  stopTempT = Number.NaN;
  twoLevel: TwoLevelReading | null = null;
  /** Where the running minimum voltage fell: [prevT, prevV, t, v] per entry, so a cut-off crossing can be found later for any threshold. */
  readonly minTrail: number[] = [];
  private trailMin = Number.POSITIVE_INFINITY;
  private readonly trailStep: number;
  private holdDone = false;
  private stepDone = false;
  /** Earliest time at which a hold or step reading is due; skips both checks on most samples. */
  private nextCaptureT: number;
  private pT: number;
  private pV: number;
  private pI: number;
  private pTemp: number;
  private readonly detector: TwoLevelDetector;
  private detecting = true;

  constructor(
    private readonly settings: StretchSettings,
    prev: { t: number; v: number; i: number; temp: number; rest: boolean } | null,
    first: { t: number; v: number },
  ) {
    this.onsetT = prev ? prev.t : first.t;
    this.restValid = prev !== null && prev.rest;
    this.restV = prev ? prev.v : Number.NaN;
    this.restI = prev ? prev.i : Number.NaN;
    this.startTemp = prev ? prev.temp : Number.NaN;
    this.peakTemp = this.startTemp;
    this.pT = prev ? prev.t : first.t;
    this.pV = prev ? prev.v : first.v;
    this.pI = prev ? prev.i : 0;
    this.pTemp = this.startTemp;
    this.lastT = first.t;
    this.trailStep = Math.max(0.0005, 5e-5 * Math.abs(first.v));
    this.detector = new TwoLevelDetector(settings.loadThresholdA, this.onsetT);
    this.nextCaptureT = this.onsetT + Math.min(1, settings.holdDelayS);
    if (this.startTemp === this.startTemp) this.watchTemperature(this.onsetT, this.startTemp);
  }

  get durationS(): number {
    return this.lastT - this.onsetT;
  }

  /** A load sample of this stretch; `i` is positive in the stretch's frame. Runs once per sample. */
  add(t: number, v: number, i: number, temp: number, minCellV: number): void {
    this.samples++;
    this.lastT = t;
    if (i > this.peakI) this.peakI = i;
    if (minCellV < this.minCellV) this.minCellV = minCellV;
    if (v < this.minV) {
      this.minV = v;
      if (v < this.trailMin - this.trailStep) {
        this.minTrail.push(this.pT, this.pV, t, v);
        this.trailMin = v;
      }
    }
    if (t >= this.nextCaptureT) this.capture(t, v, i, temp);
    if (this.startTemp !== this.startTemp && temp === temp) this.startTemp = temp;
    if (this.detecting) {
      const reading = this.detector.add(t, v, i, temp);
      if (reading !== null && this.twoLevel === null) this.twoLevel = reading;
      if (this.detector.finished) this.detecting = false;
    }
    this.pT = t;
    this.pV = v;
    this.pI = i;
    this.pTemp = temp;
  }

  private capture(t: number, v: number, i: number, temp: number): void {
    if (!this.holdDone) this.captureHold(t, v);
    if (!this.stepDone) {
      if (this.restValid) this.captureStep(t, v, i, temp);
      else this.stepDone = true;
    }
    const hold = this.holdDone ? Number.POSITIVE_INFINITY : this.onsetT + this.settings.holdDelayS;
    const step = this.stepDone ? Number.POSITIVE_INFINITY : this.onsetT + 1;
    this.nextCaptureT = Math.min(hold, step);
  }

  /** Temperature is followed from the onset to the end of the log, after the stretch closes too. */
  /** Below this temperature a sample changes nothing here (−∞ before any temperature is known). */
  watchFromC(): number {
    if (this.peakTemp !== this.peakTemp) return Number.NEGATIVE_INFINITY;
    const stop = this.stopTempT !== this.stopTempT ? this.settings.stopTemperatureC : Number.POSITIVE_INFINITY;
    return Math.min(this.peakTemp + Number.EPSILON * Math.abs(this.peakTemp), stop);
  }

  watchTemperature(t: number, temp: number): void {
    if (!(this.peakTemp >= temp)) this.peakTemp = temp; // also when no peak yet (NaN)
    if (this.stopTempT !== this.stopTempT && temp >= this.settings.stopTemperatureC) this.stopTempT = t;
  }

  private captureHold(t: number, v: number): void {
    const target = this.onsetT + this.settings.holdDelayS;
    if (t < target) return;
    this.holdDone = true;
    if (this.samples > 1 && this.pT < target) this.holdV = lerp(this.pT, this.pV, t, v, target);
    else if (t === target || this.samples > 1) this.holdV = v;
    else if (t - target <= STEP_LATE_S) {
      this.holdV = v;
      this.holdLate = true;
    }
  }

  private captureStep(t: number, v: number, i: number, temp: number): void {
    const target = this.onsetT + 1;
    if (t < target) return;
    this.stepDone = true;
    if (this.samples > 1 && this.pT < target) {
      this.stepV = lerp(this.pT, this.pV, t, v, target);
      this.stepI = lerp(this.pT, this.pI, t, i, target);
      this.stepTemp = this.pTemp === this.pTemp ? lerp(this.pT, this.pTemp, t, temp, target) : temp;
    } else if (t - target <= STEP_LATE_S) {
      this.stepV = v;
      this.stepI = i;
      this.stepTemp = temp;
      this.stepLate = t - target > 0.25;
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
      return at - this.onsetT;
    }
    return Number.NaN;
  }
}

function lerp(t0: number, y0: number, t1: number, y1: number, t: number): number {
  if (t1 === t0) return y1;
  return y0 + ((y1 - y0) * (t - t0)) / (t1 - t0);
}
