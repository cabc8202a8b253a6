/**
 * Performance scores of ISO 13528:2015 (clause 9; clause numbers from memory: 9.4 z, 9.7 Eₙ):
 *   z  = (x − x*) / σ_pt                    x* the consensus, σ_pt the standard deviation for proficiency
 *                                            assessment (here the robust s* of Algorithm A unless the caller gives one)
 *   Eₙ = (x − X) / √(U_x² + U_X²)            U the expanded uncertainties (k = 2) of the result and of the
 *                                            assigned value X.
 * The usual reading (ISO 13528:2015 9.4, and ISO/IEC 17043): |z| ≤ 2 satisfactory, 2 < |z| < 3 questionable,
 * |z| ≥ 3 unsatisfactory; |Eₙ| ≤ 1 satisfactory, |Eₙ| > 1 unsatisfactory. Sagline's plausibility flag for
 * moderators is raised when |z| > 3 (issue 16), i.e. inside ISO's "unsatisfactory" band.
 *
 * With two benches Algorithm A's σ_pt = s* makes z ≈ ±0.62 whatever the values (x* is their mean and s*
 * scales with their difference): z says nothing then. So z is computed from 3 benches on unless σ_pt is given;
 * with two, only Eₙ (when both results state an uncertainty) compares them.
 */
import { algorithmA, type AlgorithmAOptions, type RobustConsensus } from "./algorithm-a";

export const Z_QUESTIONABLE = 2;
export const Z_UNSATISFACTORY = 3;
export const Z_FLAG_THRESHOLD = 3;
export const EN_LIMIT = 1;
export const MIN_BENCHES_FOR_Z = 3;

export type ScoreClass = "satisfactory" | "questionable" | "unsatisfactory";

/** z = (x − x*) / σ_pt; null when σ_pt is not a positive number. */
export function zScore(x: number, assigned: number, sigmaPt: number): number | null {
  if (!Number.isFinite(x) || !Number.isFinite(assigned) || !(sigmaPt > 0) || !Number.isFinite(sigmaPt)) return null;
  return (x - assigned) / sigmaPt;
}

/** Eₙ = (x − X) / √(U_x² + U_X²); null when both U are 0 or any input is not finite. */
export function enNumber(x: number, U95x: number, assigned: number, U95Assigned: number): number | null {
  if (![x, U95x, assigned, U95Assigned].every((v) => Number.isFinite(v)) || U95x < 0 || U95Assigned < 0) return null;
  const d = Math.sqrt(U95x * U95x + U95Assigned * U95Assigned);
  return d > 0 ? (x - assigned) / d : null;
}

export function classifyZ(z: number): ScoreClass {
  const a = Math.abs(z);
  return a <= Z_QUESTIONABLE ? "satisfactory" : a < Z_UNSATISFACTORY ? "questionable" : "unsatisfactory";
}

export function classifyEn(en: number): Exclude<ScoreClass, "questionable"> {
  return Math.abs(en) <= EN_LIMIT ? "satisfactory" : "unsatisfactory";
}

export const AGREEMENT_FLAG_CODE = "far-from-other-benches" as const;

export type AgreementFlag = { code: typeof AGREEMENT_FLAG_CODE; label: string; z: number };

/** The moderators' plausibility flag for a new result: |z| > 3 against the other benches' consensus. */
export function agreementFlag(z: number | null, figureLabel: string): AgreementFlag | null {
  if (z === null || !(Math.abs(z) > Z_FLAG_THRESHOLD)) return null;
  const side = z > 0 ? "above" : "below";
  return {
    code: AGREEMENT_FLAG_CODE,
    z,
    label: `${figureLabel} is ${Math.abs(z).toFixed(1)} standard deviations ${side} what other benches measured on this pack (|z| > 3).`,
  };
}

export type Participant = {
  benchId: string;
  /** The bench's value for this pack, figure and like-for-like group (the median of its results there). */
  value: number;
  /** Its expanded uncertainty (k = 2), when the bench states its accuracy. */
  U95?: number | null;
};

export type ParticipantScore = Participant & {
  z: number | null;
  en: number | null;
  zClass: ScoreClass | null;
  enClass: Exclude<ScoreClass, "questionable"> | null;
};

export type ComparisonScores = {
  consensus: RobustConsensus | null;
  /** The σ_pt used for z, or null when z is not computed. */
  sigmaPt: number | null;
  /** Why z is missing, in words, when it is. */
  zMissing: string | null;
  scores: ParticipantScore[];
};

/**
 * Score every bench that measured one pack's figure in one like-for-like group against their robust consensus.
 * Eₙ, from three benches on, uses the consensus as the assigned value with U_X = 2·u(x*) (ISO 13528:2015 7.7.3);
 * each bench's own value is part of that consensus, which makes Eₙ a little kind to it when there are few benches.
 * With two benches that consensus would be their mean, with a U_X that grows with their difference (Eₙ could never
 * pass 0.36), so each is scored against the other instead: Eₙ = (x − x_other)/√(U_x² + U_other²).
 */
export function scoreParticipants(
  participants: readonly Participant[],
  options: AlgorithmAOptions & { sigmaPt?: number } = {},
): ComparisonScores {
  const usable = participants.filter((p) => Number.isFinite(p.value));
  const consensus = algorithmA(
    usable.map((p) => p.value),
    options,
  );
  let sigmaPt: number | null = null;
  let zMissing: string | null = null;
  if (consensus === null) zMissing = "Fewer than two benches measured this pack in this group.";
  else if (options.sigmaPt !== undefined) sigmaPt = options.sigmaPt > 0 ? options.sigmaPt : null;
  else if (consensus.p < MIN_BENCHES_FOR_Z) zMissing = "Two benches: z needs at least three; compare their ± instead.";
  else if (consensus.degenerate || !(consensus.s > 0))
    zMissing = "The benches agree exactly on most values, so there is no spread to score against.";
  else sigmaPt = consensus.s;
  if (consensus !== null && sigmaPt === null && zMissing === null) zMissing = "No positive σ_pt was given.";
  const scores = usable.map((p, k): ParticipantScore => {
    const z = consensus && sigmaPt !== null ? zScore(p.value, consensus.x, sigmaPt) : null;
    const other = usable.length === 2 ? usable[1 - k] : undefined;
    let en: number | null = null;
    if (consensus && p.U95 !== null && p.U95 !== undefined) {
      if (other === undefined) en = enNumber(p.value, p.U95, consensus.x, 2 * consensus.uX);
      else if (other.U95 !== null && other.U95 !== undefined) en = enNumber(p.value, p.U95, other.value, other.U95);
    }
    return { ...p, z, en, zClass: z === null ? null : classifyZ(z), enClass: en === null ? null : classifyEn(en) };
  });
  return { consensus, sigmaPt, zMissing, scores };
}
