import Link from "next/link";
import type { ContributorResult } from "@/db/queries/results-by-contributor";
import { fmt } from "@/lib/format";
import { ownStatusLabels, reviewReasonLabel } from "@/lib/labels";
import { ResultActions } from "./result-actions-client";
import { StatusBadge } from "./status-badge";

const date = (d: Date) =>
  d.toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

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
          <div className="item-head">
            <Link href={`/account/results/${r.id}`} className="font-medium">
              Result #{r.id} · {r.makerName} {r.model}
            </Link>
            <StatusBadge status={r.status} />
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
                    {e.fromStatus ? `${ownStatusLabels[e.fromStatus]} → ` : ""}
                    <span className="font-medium">{ownStatusLabels[e.toStatus]}</span>
                    {e.reason ? <span className="muted"> — {reviewReasonLabel(e.reason)}</span> : null}
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
