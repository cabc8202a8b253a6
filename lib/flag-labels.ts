// Short labels for every flag code a result can carry: the plausibility flags computed for moderators
// (lib/analysis/plausibility.ts) and the checks against the method card shown at submission
// (lib/analysis/card-checks.ts), and the bench agreement flag. Used by the review queue's chips and its flag filter.
import { plausibilityCodes, plausibilityLabels } from "@/lib/analysis/plausibility";

export const cardCheckLabels = {
  "cutoff-not-reached": "Cut-off not reached",
  "load-mismatch": "Load differs from card",
  "stop-temperature-passed": "Stop temperature passed",
} as const;

/** Bench agreement (lib/bench-agreement.ts): a new result |z| > 3 from the other benches on its pack and group. */
export const agreementLabels = { "far-from-other-benches": "Far from other benches" } as const;

export const flagCodes = [
  ...plausibilityCodes,
  ...(Object.keys(cardCheckLabels) as (keyof typeof cardCheckLabels)[]),
  ...(Object.keys(agreementLabels) as (keyof typeof agreementLabels)[]),
] as const;
export type FlagCode = (typeof flagCodes)[number];
export const flagLabels: Record<FlagCode, string> = { ...plausibilityLabels, ...cardCheckLabels, ...agreementLabels };

export function flagLabel(code: string): string {
  return (flagLabels as Record<string, string>)[code] ?? code;
}
