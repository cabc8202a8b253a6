// The one label table: every word a page or an e-mail shows for a stored code — review states (as the
// contributor and as moderators read them), reasons on review events, reject reasons, reader-flag reasons
// and outcomes, method-card codes, the computed resistance method, catalogue states and roles. Pages and
// e-mails never print a raw code; they look it up here. Pure, so client components use it too.
import type { Tendency } from "@/lib/analysis/agreement/bench-summary";
import type { FlagReason, LoadMode, RejectReason, ResistanceMethod, ReviewStatus, UserRole } from "@/lib/enums";

type StatusWords = {
  /** What moderators and the public read. */
  label: string;
  /** What the contributor reads about their own result. */
  own: string;
};

const reviewStatusWords: Record<ReviewStatus, StatusWords> = {
  pending: { label: "Waiting for review", own: "Waiting for review" },
  awaiting_answer: { label: "Waiting for the contributor’s answer", own: "Waiting for your answer" },
  approved: { label: "Approved", own: "Approved and published" },
  rejected: { label: "Not accepted", own: "Not accepted" },
  withdrawn: { label: "Withdrawn", own: "Withdrawn" },
};

/** A state's words for moderators and the public. */
export const reviewStatusLabels: Record<ReviewStatus, string> = Object.fromEntries(
  Object.entries(reviewStatusWords).map(([k, v]) => [k, v.label]),
) as Record<ReviewStatus, string>;

/** A state's words for the contributor who submitted the result. */
export const ownStatusLabels: Record<ReviewStatus, string> = Object.fromEntries(
  Object.entries(reviewStatusWords).map(([k, v]) => [k, v.own]),
) as Record<ReviewStatus, string>;

/** A moderator's decisions on a pending result, as buttons and confirmations name them. */
export const decisionWords = {
  approve: { button: "Approve and publish", done: "Approved and published." },
  reject: { button: "Do not accept", done: "Not accepted." },
  ask: { button: "Send back for an answer", done: "Sent back: waiting for the contributor’s answer." },
} as const;

export const rejectReasonLabels: Record<RejectReason, string> = {
  "wrong-data": "Wrong data",
  "incomplete-method": "Incomplete method",
  duplicate: "Duplicate",
  "not-a-measurement": "Not a measurement",
  other: "Other (explain in the note)",
};

export const flagReasonLabels: Record<FlagReason, string> = {
  "wrong-figures": "The figures look wrong",
  "wrong-pack": "Wrong pack",
  duplicate: "Duplicate of another result",
  "not-a-measurement": "Not a real measurement",
  unsafe: "Unsafe method",
  other: "Other",
};

/**
 * How a moderator closes a reader flag. The code "corrected" predates this table: moderators cannot edit a
 * result, so it means the result stays published with a moderator's note saying what the reader got right.
 */
export const flagOutcomeLabels = {
  open: "Open",
  kept: "Kept",
  corrected: "Kept, with a moderator’s note",
  withdrawn: "Taken out of publication",
} as const;

/** The reason of an open case as the public result page says it (our words; the reader's note is not shown). */
export const openCaseReasonWords: Record<FlagReason, string> = {
  "wrong-figures": "the figures may be wrong",
  "wrong-pack": "it may be filed under the wrong pack",
  duplicate: "it may repeat another result",
  "not-a-measurement": "it may not come from a real measurement",
  unsafe: "the test method may be unsafe",
  other: "a reason the reader explained to the moderators",
};

/** Words for the reason stored on a review event (reject reasons, reader flags and their outcomes). */
const reviewReasonLabels: Record<string, string> = {
  ...rejectReasonLabels,
  other: "Other",
  "reader-flag": "Flagged by a reader",
  "flag-kept": `Flag resolved: ${flagOutcomeLabels.kept.toLowerCase()}`,
  "flag-corrected": `Flag resolved: ${flagOutcomeLabels.corrected.toLowerCase()}`,
  "flag-withdrawn": `Flag resolved: ${flagOutcomeLabels.withdrawn.toLowerCase()}`,
};

export function reviewReasonLabel(reason: string): string {
  return reviewReasonLabels[reason] ?? "Other";
}

export const resistanceMethodLabels: Record<ResistanceMethod, string> = {
  "iec-61960-two-level": "IEC 61960-3 two-level DC (≈0.2 It for 10 s, then ≈1 It for 1 s)",
  "dc-step": "DC step (rest → load, read at 1 s)",
  "ac-1khz": "AC meter at 1 kHz",
  "charger-readout": "Charger read-out",
};

/** How Sagline itself read the DC resistance from the log (figures.dcResistanceMethod). */
const computedResistanceMethodLabels: Record<"iec-61960-two-level" | "step", string> = {
  "iec-61960-two-level": "IEC 61960-3 two-level",
  step: "rest → load step at 1 s",
};

export function computedResistanceMethodLabel(code: string | null): string | null {
  if (code === null) return null;
  return (computedResistanceMethodLabels as Record<string, string>)[code] ?? "another method";
}

export const loadModeLabels: Record<LoadMode, string> = {
  "constant-current": "Constant current",
  "constant-power": "Constant power",
  "constant-resistance": "Constant resistance",
};

export const catalogueStatusLabels = {
  active: "In the catalogue",
  proposed: "Proposed with a result, not yet in the catalogue",
  merged: "Merged into another entry",
} as const;

export const roleLabels: Record<UserRole, string> = {
  contributor: "Contributor",
  moderator: "Moderator",
  admin: "Admin",
};

/** How a bench's figure runs against other benches (lib/analysis/agreement/bench-summary.ts). */
export const tendencyLabels: Record<Tendency, string> = {
  "runs-high": "reads high",
  "runs-low": "reads low",
  scatters: "scatters both ways",
};
