/**
 * Discharges (and, seen from the other direction, charges) as phases of a log. A discharge is a run
 * of discharge stretches that no charge interrupts: a pause without charging stays within it (the
 * two-level resistance pulses and the main load of one test are one discharge), a charge phase ends
 * it. Which current direction is discharge is known only at the end, so both directions are kept.
 */
import type { Stretch } from "./stretch";

/** An opposite-direction stretch must last this long to count as a charge phase (a glitch does not split a discharge). */
export const CHARGE_PHASE_MIN_S = 2;

export class LoadPhase {
  readonly onsetTimeS: number;
  /** Time of its last load sample. */
  endTimeS: number;
  chargeAs = 0;
  energyWs = 0;
  /** Time under load (the pauses between its stretches not counted). */
  loadTimeS = 0;
  minVoltageV = Number.POSITIVE_INFINITY;
  minCellVoltageV = Number.POSITIVE_INFINITY;
  maxCellSpreadV = 0;
  peakCurrentA = 0;
  /** Σ I, Σ I², samples over its stretches (for the steadiness of the current). */
  sumA = 0;
  sumSqA = 0;
  samples = 0;
  /** From its onset until a charge phase ends it (packs often peak just after the load stops). */
  peakTemperatureC = Number.NaN;
  stopTemperatureTimeS = Number.NaN;
  /** Its longest stretch (the main load) and its first stretch holding a two-level step. */
  main: Stretch | null = null;
  twoLevel: Stretch | null = null;
  stretches = 0;
  open = true;
  /** False while a stretch of the other direction runs (its temperature is not this phase's). */
  watching = true;

  constructor(first: Stretch) {
    this.onsetTimeS = first.onsetTimeS;
    this.endTimeS = first.lastTimeS;
  }

  /** A stretch of this phase closed. */
  fold(s: Stretch): void {
    this.stretches++;
    this.endTimeS = s.lastTimeS;
    this.chargeAs += s.chargeAs;
    this.energyWs += s.energyWs;
    this.loadTimeS += s.durationS;
    this.sumA += s.sumA;
    this.sumSqA += s.sumSqA;
    this.samples += s.samples;
    if (s.minVoltageV < this.minVoltageV) this.minVoltageV = s.minVoltageV;
    if (s.minCellVoltageV < this.minCellVoltageV) this.minCellVoltageV = s.minCellVoltageV;
    if (s.maxCellSpreadV > this.maxCellSpreadV) this.maxCellSpreadV = s.maxCellSpreadV;
    if (s.peakCurrentA > this.peakCurrentA) this.peakCurrentA = s.peakCurrentA;
    if (!this.main || s.durationS > this.main.durationS) this.main = s;
    if (!this.twoLevel && s.twoLevel) this.twoLevel = s;
  }

  /** Below this temperature a sample changes nothing here (−∞ before any temperature is known). */
  watchFromC(stopTemperatureC: number): number {
    if (this.peakTemperatureC !== this.peakTemperatureC) return Number.NEGATIVE_INFINITY;
    const stop = this.stopTemperatureTimeS !== this.stopTemperatureTimeS ? stopTemperatureC : Number.POSITIVE_INFINITY;
    return Math.min(this.peakTemperatureC + Number.EPSILON * Math.abs(this.peakTemperatureC), stop);
  }

  watchTemperature(t: number, temp: number, stopTemperatureC: number): void {
    if (!(this.peakTemperatureC >= temp)) this.peakTemperatureC = temp; // also when no peak yet (NaN)
    if (this.stopTemperatureTimeS !== this.stopTemperatureTimeS && temp >= stopTemperatureC)
      this.stopTemperatureTimeS = t;
  }

  /** Relative spread of the current over its samples (standard deviation ÷ mean). */
  get currentSpread(): number {
    if (this.samples < 2) return 0;
    const mean = this.sumA / this.samples;
    const variance = Math.max(0, this.sumSqA / this.samples - mean * mean);
    return Math.sqrt(variance) / mean;
  }
}

/** Totals for one current direction, currents counted positive in that direction. */
export class DirectionTotals {
  chargeAs = 0;
  energyWs = 0;
  minVoltageV = Number.POSITIVE_INFINITY;
  peakCurrentA = 0;
  loadSamples = 0;
  open: Stretch | null = null;
  /** The longest stretch of the whole log (by time from onset to last load sample). */
  best: Stretch | null = null;
  stretches = 0;
  /** Its phases in log order; the last one is open until a charge phase (the other direction) ends it. */
  readonly phases: LoadPhase[] = [];

  get openPhase(): LoadPhase | null {
    const last = this.phases[this.phases.length - 1];
    return last && last.open ? last : null;
  }

  /** A stretch of this direction starts. */
  opened(s: Stretch): void {
    if (!this.openPhase) this.phases.push(new LoadPhase(s));
  }

  /** A stretch of this direction ends. */
  closed(s: Stretch): void {
    this.loadSamples += s.samples;
    if (s.minVoltageV < this.minVoltageV) this.minVoltageV = s.minVoltageV;
    if (s.peakCurrentA > this.peakCurrentA) this.peakCurrentA = s.peakCurrentA;
    if (!this.best || s.durationS > this.best.durationS) this.best = s;
    this.openPhase?.fold(s);
  }
}
