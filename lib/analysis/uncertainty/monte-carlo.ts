/**
 * Propagation of distributions by a Monte Carlo method (JCGM 101:2008, Supplement 1 to the GUM): draw every
 * input from its distribution, evaluate the model, and read the output's standard deviation (its standard
 * uncertainty, JCGM 101 5.9.2) and the probabilistically symmetric 95 % coverage interval (the 2.5 % and 97.5 %
 * quantiles, JCGM 101 7.7). Used by the tests to check the GUM's linearised formulas; seeded, so repeatable.
 * Pure TypeScript, no I/O.
 */

export type Rng = () => number;

/**
 * mulberry32: a small 32-bit seeded generator (Tommy Ettinger's public-domain design, as commonly copied;
 * from memory). Good enough for a few hundred thousand draws in a test; not for cryptography.
 */
export function seededRng(seed: number): Rng {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A draw from the rectangular distribution on [−halfWidth, +halfWidth]. */
export function drawRectangular(rng: Rng, halfWidth: number): number {
  return (2 * rng() - 1) * halfWidth;
}

/** A draw from the normal distribution N(0, sd²), Box–Muller (G. E. P. Box, M. E. Muller, Ann. Math. Stat. 29 (1958) 610). */
export function drawNormal(rng: Rng, sd: number): number {
  let u = rng();
  while (u === 0) u = rng();
  return sd * Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rng());
}

export type MonteCarloSummary = {
  trials: number;
  mean: number;
  /** Standard deviation of the output: its standard uncertainty (JCGM 101 5.9.2). */
  sd: number;
  /** Probabilistically symmetric 95 % coverage interval (JCGM 101 7.7). */
  low95: number;
  high95: number;
  /** Every output, sorted ascending. */
  values: Float64Array;
};

/** Run `model` `trials` times with one seeded generator and summarise the outputs. */
export function monteCarlo(trials: number, model: (rng: Rng) => number, seed = 20080101): MonteCarloSummary {
  if (!(Number.isInteger(trials) && trials >= 2)) throw new RangeError("Monte Carlo needs at least 2 trials.");
  const rng = seededRng(seed);
  const ys = new Float64Array(trials);
  let sum = 0;
  for (let k = 0; k < trials; k++) {
    const y = model(rng);
    ys[k] = y;
    sum += y;
  }
  const mean = sum / trials;
  let ss = 0;
  for (let k = 0; k < trials; k++) {
    const d = (ys[k] as number) - mean;
    ss += d * d;
  }
  ys.sort();
  const at = (p: number) => ys[Math.min(trials - 1, Math.max(0, Math.round(p * trials) - 1))] as number;
  return { trials, mean, sd: Math.sqrt(ss / (trials - 1)), low95: at(0.025), high95: at(0.975), values: ys };
}

/** Share of `values` inside [low, high]. */
export function shareWithin(values: ArrayLike<number>, low: number, high: number): number {
  let inside = 0;
  for (let k = 0; k < values.length; k++) {
    const v = values[k] as number;
    if (v >= low && v <= high) inside++;
  }
  return values.length > 0 ? inside / values.length : Number.NaN;
}
