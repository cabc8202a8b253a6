// The confirmation a moderator reads after resolving a reader flag: which flag, on which result, how it was
// resolved and where that leaves the result. Pure, so the words are tested without a browser.
import type { ReviewStatus } from "@/lib/enums";
import type { FlagResolution } from "@/lib/validations/review";

/** What a resolution did: the moderator's page names the flag, the result and the result's status after it. */
export type ResolvedFlag = {
  flagId: number;
  resolution: FlagResolution;
  resultId: number;
  status: ReviewStatus;
  /** Other open flags on the same result closed with this one (only a withdrawal closes them). */
  alsoClosed: number;
  /** Open flags left on the result after this one. */
  stillOpen: number;
};

const how: Record<ResolvedFlag["resolution"], string> = {
  kept: "result kept",
  corrected: "result kept, with a moderator’s note",
  withdrawn: "result taken out of publication",
};

export function flagResolutionMessage(r: ResolvedFlag, packTitle?: string): string {
  const on = `result #${r.resultId}${packTitle ? ` (${packTitle})` : ""}`;
  const head = `Flag #${r.flagId} on ${on} resolved: ${how[r.resolution]}.`;
  const others =
    r.alsoClosed === 1
      ? " 1 other open flag on it was closed with this one."
      : r.alsoClosed > 1
        ? ` ${r.alsoClosed} other open flags on it were closed with this one.`
        : "";
  if (r.status === "withdrawn") return `${head} It is withdrawn; it and its history stay in the audit log.${others}`;
  if (r.status !== "approved") return head;
  if (r.stillOpen === 0) return `${head} It stays published and counted, and no longer shows an open check.`;
  const left = r.stillOpen === 1 ? "1 other flag on it is" : `${r.stillOpen} other flags on it are`;
  return `${head} It stays published and counted; ${left} still open.`;
}
