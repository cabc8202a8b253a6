// The full review history of a result (every transition: who, when, from, to, reason, note). Public pages
// show the actor's role; moderators also see names. Feed it getReviewHistory() from db/queries/review.ts.
import type { HistoryEvent } from "@/db/queries/review";
import { reviewReasonLabels as reasonWords, reviewStatusLabels } from "@/lib/review-status-labels";

const when = (d: Date) =>
  d.toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" }) + " UTC";
const roleWords = {
  contributor: "Contributor",
  moderator: "Moderator",
  admin: "Admin",
  system: "Reader or system",
} as const;

export function ReviewHistory({ events, showNames = false }: { events: HistoryEvent[]; showNames?: boolean }) {
  if (events.length === 0) return <p className="muted text-sm">No review history.</p>;
  return (
    <ol className="space-y-3 border-l-2 border-ink/10 pl-4 dark:border-night-line" data-testid="review-history">
      {events.map((e) => (
        <li key={e.id} className="space-y-0.5">
          <p className="text-sm">
            <span className="font-medium">
              {e.fromStatus ? `${reviewStatusLabels[e.fromStatus]} → ` : ""}
              {reviewStatusLabels[e.toStatus]}
            </span>
            {e.reason ? <span className="muted"> · {reasonWords[e.reason] ?? e.reason}</span> : null}
          </p>
          <p className="muted text-xs">
            {when(e.createdAt)} ·{" "}
            {showNames && e.actorName
              ? `${e.actorName} (${roleWords[e.actorRole].toLowerCase()})`
              : roleWords[e.actorRole]}
          </p>
          {e.note ? <p className="text-sm">{e.note}</p> : null}
        </li>
      ))}
    </ol>
  );
}
