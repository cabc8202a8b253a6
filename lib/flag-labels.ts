// Short labels for every flag code a result can carry: the plausibility flags computed for moderators
// (lib/analysis/plausibility.ts) and the checks against the method card shown at submission
// (lib/analysis/card-checks.ts). Used by the review queue's chips and its flag filter.
import { plausibilityCodes, plausibilityLabels } from "@/lib/analysis/plausibility";

export const cardCheckLabels = {
  "cutoff-not-reached": "Cut-off not reached",
  "load-mismatch": "Load differs from card",
  "stop-temperature-passed": "Stop temperature passed",
} as const;

export const flagCodes = [
  ...plausibilityCodes,
  ...(Object.keys(cardCheckLabels) as (keyof typeof cardCheckLabels)[]),
] as const;
export type FlagCode = (typeof flagCodes)[number];
export const flagLabels: Record<FlagCode, string> = { ...plausibilityLabels, ...cardCheckLabels };

export function flagLabel(code: string): string {
  return (flagLabels as Record<string, string>)[code] ?? code;
}
