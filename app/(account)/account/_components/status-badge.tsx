// A result's state as its contributor reads it, as a coloured badge (the words from lib/labels.ts).
import type { ReviewStatus } from "@/lib/enums";
import { ownStatusLabels } from "@/lib/labels";

const statusTone: Record<ReviewStatus, string> = {
  approved: "bg-cell-50 text-cell-700 dark:bg-cell-700/30 dark:text-cell-100",
  pending: "bg-paper-sunk text-ink-soft dark:bg-night-sunk dark:text-paper/80",
  awaiting_answer: "bg-charge-50 text-charge-700 dark:bg-charge-700/30 dark:text-charge-100",
  rejected: "bg-warn-soft text-warn dark:bg-red-950/50 dark:text-red-200",
  withdrawn: "bg-paper-sunk text-ink-faint dark:bg-night-sunk dark:text-paper/60",
};

export function StatusBadge({ status }: { status: ReviewStatus }) {
  return (
    <span className={`rounded px-2 py-0.5 text-xs font-medium ${statusTone[status]}`} data-testid="own-status">
      {ownStatusLabels[status]}
    </span>
  );
}
