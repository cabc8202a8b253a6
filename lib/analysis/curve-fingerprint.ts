/**
 * A normalised fingerprint of a log's discharge curve, to find a log that is another result's samples
 * scaled or shifted (voltage × k or + c, time × k or + c, current scaled) rather than a new measurement.
 * Pure: computed from the stored chart curve (the analysis keeps the same samples of a transformed copy).
 *
 * The fingerprint: the points under load (current ≥ half the peak), their time mapped onto 0…1 and their
 * voltage z-scored (minus the mean, over the standard deviation), resampled at SHAPE_POINTS even steps by
 * linear interpolation. Scaling or shifting voltage or time leaves it unchanged. With it the share of the
 * log spent under load (a duration ratio, unchanged by scaling time) and a one-number key for the search.
 *
 * Two fingerprints are "the same curve" when their shapes differ by rounding only (RMS under
 * SAME_SHAPE_RMS), or when they are close (RMS under NEAR_SHAPE_RMS) and their fine detail — the second
 * differences, which a real measurement fills with its own noise — moves together (correlation at least
 * NOISE_CORRELATION). Two genuine tests of one pack differ by their noise, temperature and state of charge:
 * millivolts, far above rounding, and their noise is independent. Thresholds are ours, set with the
 * synthetic generator (tests/unit/analysis/curve-fingerprint.test.ts shows the margins).
 */
import type { CurvePoint } from "./types";

export const FINGERPRINT_VERSION = 1;
export const SHAPE_POINTS = 128;
/** Fewest curve points under load before a fingerprint means anything. */
export const MIN_LOADED_POINTS = 32;
/** Shapes closer than this (RMS of z-scored voltage) differ by rounding only. */
export const SAME_SHAPE_RMS = 0.0002;
/** Shapes closer than this are compared by their fine detail too. */
export const NEAR_SHAPE_RMS = 0.002;
export const NOISE_CORRELATION = 0.95;
/** Shares of the log under load further apart than this (relative) are different tests. */
export const LOADED_SHARE_TOLERANCE = 0.02;
/** Candidates are searched within this distance of the key (the key of a copy equals the original's). */
export const CURVE_KEY_TOLERANCE = 0.01;

export type CurveFingerprint = {
  version: typeof FINGERPRINT_VERSION;
  /** Z-scored voltage at SHAPE_POINTS even steps of the time under load. */
  shape: number[];
  /** Time under load over the whole log's duration. */
  loadedShare: number;
};

const round = (x: number, digits: number) => Math.round(x * 10 ** digits) / 10 ** digits;

/** The points under load: current at least half the peak (either sign), in time order. */
export function loadedPoints(curve: CurvePoint[]): CurvePoint[] {
  let peak = 0;
  for (const p of curve) peak = Math.max(peak, Math.abs(p.currentA));
  if (!(peak > 0)) return [];
  return curve.filter((p) => Math.abs(p.currentA) >= peak * 0.5 && Number.isFinite(p.voltageV));
}

/** The fingerprint of a stored curve, or null when it has too little under load or no voltage change. */
export function curveFingerprint(curve: CurvePoint[]): CurveFingerprint | null {
  const loaded = loadedPoints(curve);
  if (loaded.length < MIN_LOADED_POINTS) return null;
  const first = loaded[0] as CurvePoint;
  const last = loaded[loaded.length - 1] as CurvePoint;
  const spanS = last.timeS - first.timeS;
  const totalS = (curve[curve.length - 1] as CurvePoint).timeS - (curve[0] as CurvePoint).timeS;
  if (!(spanS > 0) || !(totalS > 0)) return null;
  let sum = 0;
  for (const p of loaded) sum += p.voltageV;
  const mean = sum / loaded.length;
  let squares = 0;
  for (const p of loaded) squares += (p.voltageV - mean) ** 2;
  const sd = Math.sqrt(squares / loaded.length);
  if (!(sd > 0)) return null;
  const shape: number[] = [];
  let j = 0;
  for (let k = 0; k < SHAPE_POINTS; k++) {
    const t = first.timeS + (spanS * k) / (SHAPE_POINTS - 1);
    while (j < loaded.length - 2 && (loaded[j + 1] as CurvePoint).timeS < t) j++;
    const a = loaded[j] as CurvePoint;
    const b = loaded[j + 1] as CurvePoint;
    const f = b.timeS > a.timeS ? Math.min(1, Math.max(0, (t - a.timeS) / (b.timeS - a.timeS))) : 0;
    shape.push(round((a.voltageV + (b.voltageV - a.voltageV) * f - mean) / sd, 6));
  }
  return { version: FINGERPRINT_VERSION, shape, loadedShare: round(spanS / totalS, 6) };
}

/** The one number the database searches by: the mean z-score over the first half of the time under load. */
export function curveKey(f: CurveFingerprint): number {
  const half = f.shape.slice(0, Math.floor(f.shape.length / 2));
  return round(half.reduce((a, b) => a + b, 0) / half.length, 6);
}

function secondDifferences(shape: number[]): number[] {
  // The last 15 % holds the knee, whose curvature is shared by every test of a pack: left out.
  const end = Math.floor(shape.length * 0.85);
  const out: number[] = [];
  for (let i = 1; i < end; i++)
    out.push((shape[i] as number) - ((shape[i - 1] as number) + (shape[i + 1] as number)) / 2);
  return out;
}

function correlation(a: number[], b: number[]): number {
  const n = Math.min(a.length, b.length);
  if (n < 3) return 0;
  let ma = 0;
  let mb = 0;
  for (let i = 0; i < n; i++) {
    ma += a[i] as number;
    mb += b[i] as number;
  }
  ma /= n;
  mb /= n;
  let ab = 0;
  let aa = 0;
  let bb = 0;
  for (let i = 0; i < n; i++) {
    const x = (a[i] as number) - ma;
    const y = (b[i] as number) - mb;
    ab += x * y;
    aa += x * x;
    bb += y * y;
  }
  return aa > 0 && bb > 0 ? ab / Math.sqrt(aa * bb) : 0;
}

export type CurveComparison = { shapeRms: number; noiseCorrelation: number; loadedShareRatio: number; same: boolean };

export function compareFingerprints(a: CurveFingerprint, b: CurveFingerprint): CurveComparison {
  const n = Math.min(a.shape.length, b.shape.length);
  let squares = 0;
  for (let i = 0; i < n; i++) squares += ((a.shape[i] as number) - (b.shape[i] as number)) ** 2;
  const shapeRms = n > 0 ? Math.sqrt(squares / n) : Number.POSITIVE_INFINITY;
  const noiseCorrelation = correlation(secondDifferences(a.shape), secondDifferences(b.shape));
  const loadedShareRatio = b.loadedShare > 0 ? a.loadedShare / b.loadedShare : Number.POSITIVE_INFINITY;
  const same =
    a.version === b.version &&
    a.shape.length === b.shape.length &&
    Math.abs(loadedShareRatio - 1) <= LOADED_SHARE_TOLERANCE &&
    (shapeRms <= SAME_SHAPE_RMS || (shapeRms <= NEAR_SHAPE_RMS && noiseCorrelation >= NOISE_CORRELATION));
  return { shapeRms, noiseCorrelation, loadedShareRatio, same };
}
