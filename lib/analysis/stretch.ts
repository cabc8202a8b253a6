/**
 * One load stretch: consecutive samples with current above the load threshold in one
 * direction. Everything a figure needs from a stretch is gathered here as the samples go by, in
 * constant memory, because which stretch matters is known only at the end. Currents are in the
 * stretch's own frame (always positive). Readings at stated times (1 s for the step resistance, the
 * hold delay for the hold voltage) are measured from the current edge (readings.ts).
 */
import type { SampleBatch } from "./sample-batch";
import { PointReading } from "./readings";
import { type TwoLevelReading, TwoLevelDetector } from "./resistance";

export type StretchSettings = { holdDelayS: number; loadThresholdA: number };

/** Entries of the minimum-voltage trail: previous time and voltage, time, voltage, charge so far. */
const TRAIL_FIELDS = 5;

export class Stretch {
  /** The last sample before the load (the earliest the load can have started); durations count from here. */
  readonly onsetTimeS: number;
  /** Best estimate of when the current changed: midway between the last sample before and the first under load. */
  readonly edgeTimeS: number;
  /** The sample interval around the edge (NaN when the log starts under load). */
  readonly edgeIntervalS: number;
  readonly restValid: boolean;
  readonly restVoltageV: number;
  readonly restCurrentA: number;
  startTemperatureC: number;
  lastTimeS: number;
  lastVoltageV: number;
  /** The sample before the last one, for the slope at the end of the stretch. */
  endPrevTimeS = Number.NaN;
  endPrevVoltageV = Number.NaN;
  samples = 0;
  chargeAs = 0;
  energyWs = 0;
  minVoltageV = Number.POSITIVE_INFINITY;
  minCellVoltageV = Number.POSITIVE_INFINITY;
  /** Largest difference between the highest and lowest cell of one sample (0 without cell columns). */
  maxCellSpreadV = 0;
  peakCurrentA = 0;
  /** Σ I, Σ I² and Σ (ΔI)² over the stretch's samples: mean, spread and sample-to-sample ripple of the current. */
  sumA = 0;
  sumSqA = 0;
  sumSqDiffA = 0;
  diffSamples = 0;
  readonly hold: PointReading;
  /** 1 s after the edge, for the rest → load step resistance; null when the stretch does not start from rest. */
  readonly step: PointReading | null;
  twoLevel: TwoLevelReading | null = null;
  /** Where the running minimum voltage fell, so a cut-off or floor crossing can be found later for any threshold. */
  readonly minTrail: number[] = [];
  private trailMinVoltageV = Number.POSITIVE_INFINITY;
  private readonly trailStepV: number;
  /** Earliest time at which a pending reading needs a sample; skips the readings on most samples. */
  private nextCaptureTimeS: number;
  private prevTimeS: number;
  private prevVoltageV: number;
  private prevCurrentA: number;
  private prevTemperatureC: number;
  private readonly detector: TwoLevelDetector;
  private detecting = true;

  constructor(
    settings: StretchSettings,
    prev: { t: number; v: number; i: number; temp: number; rest: boolean } | null,
    first: { t: number; v: number },
  ) {
    this.onsetTimeS = prev ? prev.t : first.t;
    this.edgeTimeS = prev ? (prev.t + first.t) / 2 : first.t;
    this.edgeIntervalS = prev ? first.t - prev.t : Number.NaN;
    this.restValid = prev !== null && prev.rest;
    this.restVoltageV = prev ? prev.v : Number.NaN;
    this.restCurrentA = prev ? prev.i : Number.NaN;
    this.startTemperatureC = prev ? prev.temp : Number.NaN;
    this.prevTimeS = Number.NaN;
    this.prevVoltageV = Number.NaN;
    this.prevCurrentA = Number.NaN;
    this.prevTemperatureC = Number.NaN;
    this.lastTimeS = first.t;
    this.lastVoltageV = first.v;
    this.trailStepV = Math.max(0.0005, 5e-5 * Math.abs(first.v));
    this.detector = new TwoLevelDetector(settings.loadThresholdA, this.edgeTimeS);
    this.hold = new PointReading(this.edgeTimeS + settings.holdDelayS);
    this.step = this.restValid ? new PointReading(this.edgeTimeS + 1) : null;
    this.nextCaptureTimeS = Math.min(this.hold.fromS, this.step ? this.step.fromS : Number.POSITIVE_INFINITY);
  }

  get durationS(): number {
    return this.lastTimeS - this.onsetTimeS;
  }

  /** A load sample of this stretch; `i` is positive in the stretch's frame (tests and single samples). */
  add(t: number, v: number, i: number, temp: number, minCellVoltageV: number, cellSpreadV = 0): void {
    const b = scratch;
    b.timeS[0] = t;
    b.voltageV[0] = v;
    b.currentA[0] = i;
    b.temperatureC[0] = temp;
    b.minCellVoltageV[0] = minCellVoltageV;
    b.cellSpreadV[0] = cellSpreadV;
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
    const spread = batch.cellSpreadV[k] as number;
    const hasPrev = this.samples > 0;
    this.samples++;
    if (hasPrev) {
      // A change of more than half the current is a step between levels, not ripple.
      const p = this.prevCurrentA;
      const d = i - p;
      const limit = 0.5 * (i > p ? i : p);
      if (d < limit && d > -limit) {
        this.sumSqDiffA += d * d;
        this.diffSamples++;
      }
    }
    this.sumA += i;
    this.sumSqA += i * i;
    this.endPrevTimeS = this.lastTimeS;
    this.endPrevVoltageV = this.lastVoltageV;
    this.lastTimeS = t;
    this.lastVoltageV = v;
    if (i > this.peakCurrentA) this.peakCurrentA = i;
    if (minCellVoltageV < this.minCellVoltageV) this.minCellVoltageV = minCellVoltageV;
    if (spread > this.maxCellSpreadV) this.maxCellSpreadV = spread;
    if (v < this.minVoltageV) {
      this.minVoltageV = v;
      if (v < this.trailMinVoltageV - this.trailStepV) {
        this.minTrail.push(hasPrev ? this.prevTimeS : t, hasPrev ? this.prevVoltageV : v, t, v, this.chargeAs);
        this.trailMinVoltageV = v;
      }
    }
    if (t >= this.nextCaptureTimeS) this.capture(hasPrev, t, v, i, temp);
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

  private capture(hasPrev: boolean, t: number, v: number, i: number, temp: number): void {
    const { prevTimeS: pt, prevVoltageV: pv, prevCurrentA: pi, prevTemperatureC: ptemp } = this;
    let next = Number.POSITIVE_INFINITY;
    for (const r of [this.step, this.hold]) {
      if (r === null || r.done) continue;
      r.add(hasPrev, pt, pv, pi, ptemp, t, v, i, temp);
      if (!r.done) next = Math.min(next, r.fromS);
    }
    this.nextCaptureTimeS = next;
  }

  /** The stretch ended: readings still waiting keep what they have. */
  close(): void {
    this.step?.close();
    this.hold.close();
    if (this.detecting) {
      const reading = this.detector.close();
      if (reading !== null && this.twoLevel === null) this.twoLevel = reading;
      this.detecting = false;
    }
  }

  /** Mean current over the stretch's samples. */
  get meanCurrentA(): number {
    return this.samples > 0 ? this.sumA / this.samples : Number.NaN;
  }

  /**
   * Sample-to-sample ripple of the current ÷ its mean: √(Σ(ΔI)² ÷ 2(n − 1)) ÷ mean I (the mean
   * square successive difference, J. von Neumann et al., Ann. Math. Statist. 12 (1941) 153). A slow
   * drift (constant-power loads) hardly moves it; ripple from sample to sample does. Steps between
   * levels (a change of more than half the current) are left out.
   */
  get currentRipple(): number {
    if (this.diffSamples < 2) return 0;
    return Math.sqrt(this.sumSqDiffA / (2 * this.diffSamples)) / this.meanCurrentA;
  }

  /** Volts per second at the end of the stretch (positive when falling), from its last two samples. */
  get endFallVPerS(): number {
    const dt = this.lastTimeS - this.endPrevTimeS;
    return dt > 0 ? (this.endPrevVoltageV - this.lastVoltageV) / dt : 0;
  }

  /** Time from onset to the first moment the voltage reached `thresholdV`, interpolated; NaN if never. */
  timeToVoltageS(thresholdV: number): number {
    const at = this.crossing(thresholdV);
    return at === null ? Number.NaN : at.timeS - this.onsetTimeS;
  }

  /** Charge delivered (A·s) when the voltage first reached `thresholdV` (to within one sample); NaN if never. */
  chargeAtVoltageAs(thresholdV: number): number {
    const at = this.crossing(thresholdV);
    return at === null ? Number.NaN : at.chargeAs;
  }

  private crossing(thresholdV: number): { timeS: number; chargeAs: number } | null {
    const trail = this.minTrail;
    for (let k = 0; k + TRAIL_FIELDS - 1 < trail.length; k += TRAIL_FIELDS) {
      const v = trail[k + 3] as number;
      if (v > thresholdV) continue;
      const pT = trail[k] as number;
      const pV = trail[k + 1] as number;
      const t = trail[k + 2] as number;
      const timeS = pV > thresholdV && pV !== v ? pT + ((pV - thresholdV) / (pV - v)) * (t - pT) : t;
      return { timeS, chargeAs: trail[k + 4] as number };
    }
    return null;
  }
}

/** One-sample columns for add(), the entry point outside the batch loop (tests, single samples). */
const scratch = {
  timeS: new Float64Array(1),
  voltageV: new Float64Array(1),
  currentA: new Float64Array(1),
  temperatureC: new Float64Array(1),
  minCellVoltageV: new Float64Array(1),
  cellSpreadV: new Float64Array(1),
} as SampleBatch;
