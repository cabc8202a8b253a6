/**
 * The DC resistance of a discharge, with what the sampling allows one to say about it:
 *  - coarse sampling: the current edge is known only to ±half the sample interval around it, which
 *    moves a reading stated "1 s after the edge" by |dU/dt| × that; above 2.5 % of the step (so that
 *    two logs of one pack at different sampling phases can differ by 5 % at most), or with no sample
 *    within a second of the edge, the resistance is called indicative (code coarse-sampling);
 *  - rippling current: when the current changes from sample to sample by more than 5 % of its mean,
 *    one sample is no reading; the voltage and current are averaged over ±0.5 s around the stated
 *    time where at least 5 samples fall there (sound: for a pack that follows V = E − I·R, the mean
 *    of V is E − R × the mean of I), else the resistance is indicative (code noisy-current).
 */
import type { LoadPhase } from "./phases";
import type { PointReading } from "./readings";
import { matchesTwoLevelCurrents, twoLevelResistanceOhm } from "./resistance";
import type { Stretch } from "./stretch";
import type { Warnings } from "./warnings";

export const COARSE_SHIFT_SHARE = 0.025;
export const NOISY_CURRENT_RIPPLE = 0.05;
export const MIN_WINDOW_SAMPLES = 5;

export type Resistance = {
  ohm: number;
  method: "iec-61960-two-level" | "step";
  temperatureC: number;
  indicative: boolean;
};

export type Read = { u2V: number; i2A: number; windowed: boolean; coarse: boolean; noisy: boolean; shiftShare: number };

/** U2 and I2 from a reading, averaged when the current ripples, and whether the sampling supports it. */
export function readAt(reading: PointReading, u1V: number, edgeIntervalS: number, ripple: number): Read {
  const noisy = ripple > NOISY_CURRENT_RIPPLE;
  const windowed = noisy && reading.windowSamples >= MIN_WINDOW_SAMPLES;
  const u2V = windowed ? reading.windowSumV / reading.windowSamples : reading.voltageV;
  const i2A = windowed ? reading.windowSumA / reading.windowSamples : reading.currentA;
  const slope = reading.slopeVPerS;
  const halfEdge = Number.isFinite(edgeIntervalS) ? edgeIntervalS / 2 : 0;
  const shiftShare = Number.isFinite(slope) ? (Math.abs(slope) * halfEdge) / Math.abs(u1V - u2V) : Number.NaN;
  const coarse =
    edgeIntervalS > 1 ||
    reading.lateByS > 0.25 ||
    (Number.isFinite(shiftShare) ? shiftShare > COARSE_SHIFT_SHARE : halfEdge > 0.25);
  return { u2V, i2A, windowed, coarse, noisy, shiftShare };
}

function pct(x: number): string {
  return `${(x * 100).toFixed(x < 0.1 ? 1 : 0)} %`;
}

function sayQuality(read: Read, ripple: number, edgeIntervalS: number, what: string, w: Warnings): void {
  if (read.coarse) {
    const moved = Number.isFinite(read.shiftShare)
      ? `, which moves the 1 s reading by about ${pct(read.shiftShare)}`
      : "";
    w.code(
      "coarse-sampling",
      `The samples around the ${what} are ${edgeIntervalS.toFixed(2)} s apart, so the moment the current changed is known only to ±${(edgeIntervalS / 2).toFixed(2)} s${moved}: the resistance is indicative. Log at 5 Hz or faster for a 1 s reading.`,
    );
  }
  if (read.noisy) {
    w.code(
      "noisy-current",
      read.windowed
        ? `The current changes by about ${pct(ripple)} from sample to sample (a rippling load); the ${what} reading averages the samples within ±0.5 s of the 1 s point instead of using one sample.`
        : `The current changes by about ${pct(ripple)} from sample to sample (a rippling load), and too few samples fall near the 1 s point to average: the resistance is indicative.`,
    );
  }
}

function fromTwoLevel(s: Stretch, ratedMah: number | undefined, w: Warnings): Resistance | null {
  const r = s.twoLevel;
  if (!r) return null;
  const ripple = s.currentRipple;
  const noisyLow = ripple > NOISY_CURRENT_RIPPLE && r.lowWindowSamples >= MIN_WINDOW_SAMPLES;
  const u1 = noisyLow ? r.u1MeanV : r.u1V;
  const i1 = noisyLow ? r.i1MeanA : r.i1A;
  const read = readAt(r.high, u1, r.edgeIntervalS, ripple);
  if (ratedMah !== undefined && !matchesTwoLevelCurrents(i1, read.i2A, ratedMah)) {
    w.add(
      `A two-level step was found (${i1.toFixed(2)} A then ${read.i2A.toFixed(2)} A) but its currents are not ≈0.2 It and ≈1 It for ${ratedMah} mAh; the rest→load step is used instead.`,
    );
    return null;
  }
  const ohm = twoLevelResistanceOhm(u1, i1, read.u2V, read.i2A);
  if (!(ohm > 0)) {
    w.add("The two-level step gave a resistance of zero or less (noise or a logging fault); it is not reported.");
    return null;
  }
  sayQuality(read, ripple, r.edgeIntervalS, "two-level step", w);
  return {
    ohm,
    method: "iec-61960-two-level",
    temperatureC: r.high.temperatureC,
    indicative: read.coarse || (read.noisy && !read.windowed),
  };
}

function fromStep(main: Stretch, w: Warnings): Resistance | null {
  const step = main.step;
  if (!main.restValid || !step) {
    w.add("The main discharge does not start from rest, so no DC resistance can be read from its first second.");
    return null;
  }
  if (!step.valid) {
    w.code(
      "coarse-sampling",
      "No sample within 2 s of the start of the main discharge: sampling is too coarse for a DC resistance.",
    );
    return null;
  }
  const ripple = main.currentRipple;
  const read = readAt(step, main.restVoltageV, main.edgeIntervalS, ripple);
  const ohm = twoLevelResistanceOhm(main.restVoltageV, main.restCurrentA, read.u2V, read.i2A);
  if (!(ohm > 0)) {
    w.add("The rest→load step gave a resistance of zero or less (noise or a logging fault); it is not reported.");
    return null;
  }
  sayQuality(read, ripple, main.edgeIntervalS, "rest → load step", w);
  return {
    ohm,
    method: "step",
    temperatureC: step.temperatureC,
    indicative: read.coarse || (read.noisy && !read.windowed),
  };
}

/** The two-level reading where the discharge holds one, else the rest → load step of its main stretch. */
export function dcResistance(phase: LoadPhase, ratedMah: number | undefined, w: Warnings): Resistance | null {
  const main = phase.main;
  if (!main) return null;
  const twoLevel = phase.twoLevel ? fromTwoLevel(phase.twoLevel, ratedMah, w) : null;
  return twoLevel ?? fromStep(main, w);
}
