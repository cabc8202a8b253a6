import type { ReviewStatus } from "@/db/schema/enums";

export const reviewStatusLabels: Record<ReviewStatus, string> = {
  pending: "Pending review",
  changes_requested: "Changes requested",
  approved: "Approved",
  rejected: "Rejected",
  withdrawn: "Withdrawn",
  disputed: "Disputed",
};
