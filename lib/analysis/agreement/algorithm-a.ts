/**
 * Robust consensus of several benches' values for one pack and figure: Algorithm A of ISO 13528:2015
 * ("Statistical methods for use in proficiency testing by interlaboratory comparison"), Annex C.3.
 *
 *   start:   x* = median(xᵢ),  s* = 1.483 · median|xᵢ − median(xᵢ)|
 *   repeat:  δ = 1.5 · s*;  xᵢ' = x* − δ if xᵢ < x* − δ,  x* + δ if xᵢ > x* + δ,  else xᵢ   (winsorise)
 *            x* = mean(xᵢ'),  s* = 1.134 · √(Σ(xᵢ' − x*)² / (p − 1))
 *   until x* and s* stop changing.
 * 1.483 makes the MAD estimate the standard deviation of normal data; 1.134 undoes the shrinking of the standard
 * deviation that winsorising at ±1.5 s* causes for normal data (ISO 13528:2015 C.3).
 *
 * When more than half the values are equal the MAD is 0 and the iteration cannot start; ISO 13528 leaves that case
 * to the organiser. Our choice: report x* = the median, s* = 0 and `degenerate: true`, and let callers score
 * nothing against a zero spread.
 * The standard uncertainty of the consensus is u(x*) = 1.25 · s* / √p (ISO 13528:2015 7.7.3).
 */

export const ALGORITHM_A_MAD_FACTOR = 1.483;
export const ALGORITHM_A_WINSOR_FACTOR = 1.5;
export const ALGORITHM_A_SD_FACTOR = 1.134;
export const CONSENSUS_U_FACTOR = 1.25;

export type RobustConsensus = {
  /** Robust mean x*. */
  x: number;
  /** Robust standard deviation s*. */
  s: number;
  /** Number of values used. */
  p: number;
  /** Standard uncertainty of x*: 1.25 · s* ÷ √p. */
  uX: number;
  iterations: number;
  converged: boolean;
  /** Values pulled in to x* ± 1.5 s* at the last iteration. */
  winsorised: number;
  /** MAD was 0 (more than half the values equal): x* is the median and s* is 0. */
  degenerate: boolean;
};

export type AlgorithmAOptions = {
  /** Stop when x* and s* both change by less than this fraction of s* (default 1e-10). */
  tolerance?: number;
  maxIterations?: number;
};

function medianOfSorted(s: readonly number[]): number {
  const mid = (s.length - 1) / 2;
  return ((s[Math.floor(mid)] as number) + (s[Math.ceil(mid)] as number)) / 2;
}

function medianOf(values: readonly number[]): number {
  return medianOfSorted([...values].sort((a, b) => a - b));
}

/** One step: winsorise around (x, s), return the new x*, s* and how many values were pulled in. */
export function algorithmAStep(
  values: readonly number[],
  x: number,
  s: number,
): { x: number; s: number; winsorised: number } {
  const delta = ALGORITHM_A_WINSOR_FACTOR * s;
  let winsorised = 0;
  const w = values.map((v) => {
    if (v < x - delta) {
      winsorised++;
      return x - delta;
    }
    if (v > x + delta) {
      winsorised++;
      return x + delta;
    }
    return v;
  });
  const p = w.length;
  const mean = w.reduce((a, b) => a + b, 0) / p;
  const ss = w.reduce((a, b) => a + (b - mean) * (b - mean), 0);
  return { x: mean, s: ALGORITHM_A_SD_FACTOR * Math.sqrt(ss / (p - 1)), winsorised };
}

/** Algorithm A on the finite values; null when fewer than 2 remain. */
export function algorithmA(values: readonly number[], options: AlgorithmAOptions = {}): RobustConsensus | null {
  const tolerance = options.tolerance ?? 1e-10;
  const maxIterations = options.maxIterations ?? 1000;
  const xs = values.filter((v) => Number.isFinite(v));
  const p = xs.length;
  if (p < 2) return null;
  let x = medianOf(xs);
  let s = ALGORITHM_A_MAD_FACTOR * medianOf(xs.map((v) => Math.abs(v - x)));
  if (!(s > 0)) return { x, s: 0, p, uX: 0, iterations: 0, converged: true, winsorised: 0, degenerate: true };
  let iterations = 0;
  let winsorised = 0;
  let converged = false;
  while (iterations < maxIterations) {
    const next = algorithmAStep(xs, x, s);
    iterations++;
    const change = Math.max(Math.abs(next.x - x), Math.abs(next.s - s));
    x = next.x;
    s = next.s;
    winsorised = next.winsorised;
    if (change <= tolerance * s) {
      converged = true;
      break;
    }
  }
  return { x, s, p, uX: (CONSENSUS_U_FACTOR * s) / Math.sqrt(p), iterations, converged, winsorised, degenerate: false };
}
