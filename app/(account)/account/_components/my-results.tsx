import Link from "next/link";
import type { ContributorResult } from "@/db/queries/results-by-contributor";
import { fmt } from "@/lib/format";
import { reviewStatusLabels } from "@/lib/review-status-labels";
import { ResultActions } from "./result-actions-client";

const date = (d: Date) =>
  d.toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

const statusTone: Record<string, string> = {
  approved: "bg-cell-50 text-cell-700 dark:bg-cell-700/30 dark:text-cell-100",
  pending: "bg-paper-sunk text-ink-soft dark:bg-night-sunk dark:text-paper/80",
  changes_requested: "bg-charge-50 text-charge-700 dark:bg-charge-700/30 dark:text-charge-100",
  rejected: "bg-warn-soft text-warn dark:bg-red-950/50 dark:text-red-200",
  withdrawn: "bg-paper-sunk text-ink-faint dark:bg-night-sunk dark:text-paper/60",
};

export function MyResults({ results }: { results: ContributorResult[] }) {
  if (results.length === 0) {
    return (
      <p className="muted">
        No results yet. When you submit a test it appears here with its review status and every decision on it.
      </p>
    );
  }
  return (
    <ul className="space-y-2" data-testid="my-results">
      {results.map((r) => (
        <li key={r.id} className="card space-y-2" data-testid={`my-result-${r.id}`}>
          <div className="flex flex-wrap items-baseline justify-between gap-2">
            <Link href={`/results/${r.id}`} className="font-medium">
              {r.makerName} {r.model}
            </Link>
            <span className={`rounded px-2 py-0.5 text-xs font-medium ${statusTone[r.status] ?? ""}`}>
              {reviewStatusLabels[r.status]}
            </span>
          </div>
          <p className="muted num text-sm">
            {fmt(r.loadCurrentA, 1, "A")} · ambient {fmt(r.ambientTemperatureC, 0, "°C")} · submitted{" "}
            {date(r.submittedAt)}
            {r.publishedAt ? ` · published ${date(r.publishedAt)}` : ""}
          </p>
          <ResultActions resultId={r.id} status={r.status} />
          {r.events.length > 0 ? (
            <details className="text-sm">
              <summary className="cursor-pointer">Review history ({r.events.length})</summary>
              <ol className="mt-2 space-y-1 border-l border-ink/10 pl-3 dark:border-night-line">
                {r.events.map((e, i) => (
                  <li key={i}>
                    <span className="num muted">{date(e.createdAt)}</span>{" "}
                    {e.fromStatus ? `${reviewStatusLabels[e.fromStatus]} → ` : ""}
                    <span className="font-medium">{reviewStatusLabels[e.toStatus]}</span>
                    {e.reason ? <span className="muted"> — {e.reason}</span> : null}
                  </li>
                ))}
              </ol>
            </details>
          ) : null}
        </li>
      ))}
    </ul>
  );
}
