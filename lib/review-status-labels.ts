import type { ReviewStatus } from "@/lib/enums";
import { rejectReasonLabels } from "@/lib/validations/review";

export const reviewStatusLabels: Record<ReviewStatus, string> = {
  pending: "Pending review",
  changes_requested: "Changes requested",
  approved: "Approved",
  rejected: "Rejected",
  withdrawn: "Withdrawn",
};

// Words for the reasons stored on review events (reject reasons, reader flags and their resolutions).

export const reviewReasonLabels: Record<string, string> = {
  ...rejectReasonLabels,
  other: "Other",
  "reader-flag": "Flagged by a reader",
  "flag-kept": "Flag resolved: kept",
  "flag-corrected": "Flag resolved: corrected",
  "flag-withdrawn": "Taken out of publication after a reader's flag",
};
