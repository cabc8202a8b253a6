/**
 * The law of propagation of uncertainty of the GUM (JCGM 100:2008, "Evaluation of measurement data — Guide to
 * the expression of uncertainty in measurement"), for uncorrelated inputs (GUM 5.1.2):
 *   u_c²(y) = Σ cᵢ² u²(xᵢ),  cᵢ = ∂f/∂xᵢ,   expanded uncertainty U = k · u_c with k = 2 (GUM 6.2.1, 6.3.3).
 * With k = 2 the interval y ± U holds about 95 % of the values that could reasonably be attributed to the
 * measurand when the result is close to normal; hence the field name `U95`.
 *
 * Choices, stated once here and repeated on the method page:
 * - "± a" limits with nothing more known (an instrument's stated accuracy, an assumed range): a rectangular
 *   distribution, u = a/√3 (GUM 4.3.7). Chosen over a normal or triangular reading of the limits because a
 *   maker's or our own "±" says no more than "somewhere inside", and it gives the larger u of the three.
 * - The resolution δ of a digital read-out: rectangular of half-width δ/2, u = δ/√12 (GUM F.2.2.1).
 * - Correlation (the same instrument's gain error in two readings) is written into the model so that the
 *   shared error appears once (R = ΔU/ΔI carries (1 + g_V)/(1 + g_I); offsets cancel in a difference), so the
 *   contributions listed here are always uncorrelated and add in quadrature.
 * Pure TypeScript, no I/O: safe in the browser.
 */

export const COVERAGE_FACTOR = 2 as const;

/**
 * Where a share of the uncertainty comes from. Systematic: the same for every reading of one test (gain and
 * offset errors). Random: differs from reading to reading (resolution, noise, where a sample falls in time).
 * Assumption: a stated choice that is not a measurement (an activation energy, for instance).
 */
export type UncertaintyKind = "systematic" | "random" | "assumption";

export type ContributionSource =
  | "voltage-gain"
  | "voltage-offset"
  | "voltage-resolution"
  | "current-gain"
  | "current-offset"
  | "current-resolution"
  | "temperature-gain"
  | "temperature-offset"
  | "temperature-resolution"
  | "sampling-edges"
  | "read-timing"
  | "activation-energy";

export type Contribution = {
  source: ContributionSource;
  /** Plain words for pages and tooltips. */
  label: string;
  kind: UncertaintyKind;
  /** Standard uncertainty this source adds to the figure, in the figure's own unit (|cᵢ| · u(xᵢ)). */
  u: number;
};

export type FigureUncertainty = {
  value: number;
  /** Combined standard uncertainty u_c, in the figure's unit. */
  u: number;
  /** Expanded uncertainty U = k · u_c: the "±" shown beside the figure. */
  U95: number;
  k: typeof COVERAGE_FACTOR;
  /** Largest first; sources that add nothing are left out. */
  contributions: Contribution[];
  /** What the uncertainty does not cover, or what cancelled, in words. */
  note?: string;
};

/** Standard uncertainty of a quantity known only to lie within ± halfWidth (GUM 4.3.7: a/√3). */
export function rectangularU(halfWidth: number): number {
  return Math.abs(halfWidth) / Math.sqrt(3);
}

/** Standard uncertainty from the resolution of a digital read-out (GUM F.2.2.1: δ/√12). */
export function resolutionU(resolution: number): number {
  return Math.abs(resolution) / Math.sqrt(12);
}

/** u_c = √Σ uᵢ² and U = 2 u_c; contributions sorted largest first, zero ones dropped. Null on non-finite input. */
export function combine(
  value: number,
  contributions: readonly Contribution[],
  note?: string,
): FigureUncertainty | null {
  if (!Number.isFinite(value) || contributions.some((c) => !Number.isFinite(c.u))) return null;
  const kept = contributions.filter((c) => c.u !== 0).map((c) => ({ ...c, u: Math.abs(c.u) }));
  kept.sort((a, b) => b.u - a.u);
  const u = Math.sqrt(kept.reduce((s, c) => s + c.u * c.u, 0));
  const out: FigureUncertainty = { value, u, U95: COVERAGE_FACTOR * u, k: COVERAGE_FACTOR, contributions: kept };
  if (note !== undefined) out.note = note;
  return out;
}

/**
 * A figure times an exact factor (per cell = pack ÷ S; ratio = figure ÷ a rated or labelled value, exact by
 * definition): every contribution scales with it (GUM 5.1.2 with c = factor).
 */
export function scaleUncertainty(m: FigureUncertainty, factor: number, note?: string): FigureUncertainty | null {
  if (!Number.isFinite(factor)) return null;
  const f = Math.abs(factor);
  const merged = [m.note, note].filter((s): s is string => s !== undefined && s !== "").join(" ");
  return combine(
    m.value * factor,
    m.contributions.map((c) => ({ ...c, u: c.u * f })),
    merged === "" ? undefined : merged,
  );
}

/** Relative expanded uncertainty U/|value| (0.012 = 1.2 %); null when the value is 0. */
export function relativeU95(m: FigureUncertainty): number | null {
  return m.value !== 0 ? m.U95 / Math.abs(m.value) : null;
}

/** Every input is a finite number. */
export function allFinite(...xs: number[]): boolean {
  return xs.every((x) => Number.isFinite(x));
}
