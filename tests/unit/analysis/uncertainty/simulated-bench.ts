/**
 * A simulated bench for the Monte Carlo checks (JCGM 101:2008): it draws one test's instrument errors and
 * timing, "logs" a known true discharge or current step through them and computes the figure the way
 * lib/analysis does (trapezoid with the rest end of an edge interval at zero current; R = ΔU/ΔI). Written
 * independently of the GUM formulas it checks: nothing here is linearised.
 */
import type { CurrentAccuracy, TemperatureAccuracy, VoltageAccuracy } from "@/lib/analysis/uncertainty/accuracy";
import { drawRectangular, type Rng } from "@/lib/analysis/uncertainty/monte-carlo";

export type Reader = (trueValue: number) => number;

/** One test's reading function: gain and offset drawn once (systematic), resolution error per reading (random). */
export function drawReader(rng: Rng, percentOfReading: number, offset: number, resolution: number): Reader {
  const g = drawRectangular(rng, percentOfReading / 100);
  const o = drawRectangular(rng, offset);
  return (x) => x * (1 + g) + o + drawRectangular(rng, resolution / 2);
}

export const voltageReader = (rng: Rng, a: VoltageAccuracy) =>
  drawReader(rng, a.percentOfReading, a.offsetV, a.resolutionV);
export const currentReader = (rng: Rng, a: CurrentAccuracy) =>
  drawReader(rng, a.percentOfReading, a.offsetA, a.resolutionA);
export const temperatureReader = (rng: Rng, a: TemperatureAccuracy) =>
  drawReader(rng, a.percentOfReading, a.offsetC, a.resolutionC);

export type TrueDischarge = {
  currentA: number;
  durationS: number;
  /** True pack voltage at time t into the load. */
  voltageAt: (tS: number) => number;
};

/**
 * Log a constant-current discharge sampled every Δt with a random phase, and integrate it like the analysis:
 * samples inside [0, T) are under load; the rest samples on either side read zero current.
 */
export function simulateDischarge(
  rng: Rng,
  d: TrueDischarge,
  dtS: number,
  readV: Reader,
  readI: Reader,
): { chargeAs: number; energyWs: number } {
  const phase = rng() * dtS;
  let t = phase - dtS; // the last rest sample before the load
  let lastI = 0;
  let lastP = 0;
  let q = 0;
  let e = 0;
  for (;;) {
    t += dtS;
    const underLoad = t < d.durationS;
    const i = underLoad ? readI(d.currentA) : 0;
    const p = underLoad ? i * readV(d.voltageAt(t)) : 0;
    q += 0.5 * (lastI + i) * dtS;
    e += 0.5 * (lastP + p) * dtS;
    lastI = i;
    lastP = p;
    if (!underLoad) break;
  }
  return { chargeAs: q, energyWs: e };
}

export type TrueStep = {
  /** Voltage and current on the low level, settled. */
  u1V: number;
  i1A: number;
  i2A: number;
  /** True resistance at exactly 1 s after the step (Ω) and its growth, fraction per second. */
  resistanceOhm: number;
  risePerS: number;
};

/**
 * A two-level (or rest → load) step: the last low sample is read at s₀, the step really happens at s₀ + lag
 * (lag uniform in [0, Δt)), and U₂, I₂ are read at s₀ + 1 s, i.e. 1 − lag seconds after the real step.
 */
export function simulateStep(rng: Rng, s: TrueStep, dtS: number, readV: Reader, readI: Reader): number {
  const lag = rng() * dtS;
  const tau = 1 - lag;
  const rAtTau = s.resistanceOhm * (1 + s.risePerS * (tau - 1));
  const u2True = s.u1V - rAtTau * (s.i2A - s.i1A);
  const u1 = readV(s.u1V);
  const i1 = readI(s.i1A);
  const u2 = readV(u2True);
  const i2 = readI(s.i2A);
  return (u1 - u2) / (i2 - i1);
}
