/**
 * Does a log carry measurement noise at all? Every real voltage reading under load wobbles — the load's
 * ripple, the converter's own noise — so a log whose curve is perfectly smooth down to its last written
 * digit was most likely computed, not measured. Pure, on the stored chart curve.
 *
 * The test, on the points under load in the first 85 % of the time under load (the knee at the end is
 * left out: its sharp bend is not noise):
 * 1. The log's resolution q: the fewest decimal places (at most 6) that write every voltage exactly;
 *    q = 10^−places volts. A logger coarser than MAX_JUDGED_RESOLUTION_V hides its noise in its steps,
 *    so coarser logs are not judged.
 * 2. Each point's residual from a least-squares quadratic through it and its FIT_HALF_WIDTH neighbours on
 *    each side (a smooth discharge curve is locally quadratic; the fit follows its bend, not its noise).
 * 3. Rounding to q alone leaves residuals of about 0.2 q (median of |residual|; uniform rounding error
 *    has a standard deviation of q/√12, and the fit takes part of it). A median residual at most
 *    SMOOTH_RATIO × q means nothing but rounding is there: no measurement noise.
 * Thresholds are ours, set with the synthetic generator: noise of half a step or more is recognised as
 * noise (tests/unit/analysis/log-noise.test.ts).
 */
import { loadedPoints } from "./curve-fingerprint";
import type { CurvePoint } from "./types";

export const MAX_JUDGED_RESOLUTION_V = 0.001;
export const SMOOTH_RATIO = 0.3;
export const FIT_HALF_WIDTH = 4;
/** Fewest points judged; shorter curves are not judged. */
export const MIN_NOISE_POINTS = 40;
const MAX_PLACES = 6;

export type NoiseCheck =
  | { judged: false; reason: "too-few-points" | "too-coarse" }
  | { judged: true; resolutionV: number; medianResidualV: number; noiseless: boolean };

/** Decimal places needed to write v exactly (at most MAX_PLACES + 1, meaning "more"). */
export function decimalPlaces(v: number): number {
  for (let d = 0; d <= MAX_PLACES; d++) {
    const scaled = v * 10 ** d;
    // A written decimal read into a double is off by far less than 1e-6 of its last digit.
    if (Math.abs(scaled - Math.round(scaled)) < 1e-6) return d;
  }
  return MAX_PLACES + 1;
}

function det3(m: number[]): number {
  const [a, b, c, d, e, f, g, h, i] = m as [number, number, number, number, number, number, number, number, number];
  return a * (e * i - f * h) - b * (d * i - f * g) + c * (d * h - e * g);
}

/** Residual at `at` of the least-squares quadratic through points at−w … at+w (time centred on `at`). */
export function quadraticResidual(timeS: number[], value: number[], at: number, w: number): number {
  const t0 = timeS[at] as number;
  const s = [0, 0, 0, 0, 0];
  const r = [0, 0, 0];
  for (let k = at - w; k <= at + w; k++) {
    const x = (timeS[k] as number) - t0;
    const y = value[k] as number;
    let p = 1;
    for (let m = 0; m < 5; m++) {
      s[m] = (s[m] as number) + p;
      if (m < 3) r[m] = (r[m] as number) + y * p;
      p *= x;
    }
  }
  const [s0, s1, s2, s3, s4] = s as [number, number, number, number, number];
  const [r0, r1, r2] = r as [number, number, number];
  const d = det3([s0, s1, s2, s1, s2, s3, s2, s3, s4]);
  if (!(Math.abs(d) > 0)) return 0;
  // Cramer's rule for the constant term: the fitted value at t0.
  const fitted = det3([r0, s1, s2, r1, s2, s3, r2, s3, s4]) / d;
  return (value[at] as number) - fitted;
}

export function noiseCheck(curve: CurvePoint[]): NoiseCheck {
  const loaded = loadedPoints(curve);
  if (loaded.length < 2) return { judged: false, reason: "too-few-points" };
  const startS = (loaded[0] as CurvePoint).timeS;
  const endS = startS + 0.85 * ((loaded[loaded.length - 1] as CurvePoint).timeS - startS);
  const points = loaded.filter((p) => p.timeS <= endS);
  if (points.length < MIN_NOISE_POINTS) return { judged: false, reason: "too-few-points" };
  const places = Math.max(...points.map((p) => decimalPlaces(p.voltageV)));
  const resolutionV = 10 ** -places;
  if (resolutionV > MAX_JUDGED_RESOLUTION_V) return { judged: false, reason: "too-coarse" };
  const timeS = points.map((p) => p.timeS);
  const value = points.map((p) => p.voltageV);
  const residuals: number[] = [];
  for (let i = FIT_HALF_WIDTH; i < points.length - FIT_HALF_WIDTH; i++)
    residuals.push(Math.abs(quadraticResidual(timeS, value, i, FIT_HALF_WIDTH)));
  residuals.sort((a, b) => a - b);
  const medianResidualV = residuals[Math.floor(residuals.length / 2)] ?? 0;
  return { judged: true, resolutionV, medianResidualV, noiseless: medianResidualV <= SMOOTH_RATIO * resolutionV };
}
