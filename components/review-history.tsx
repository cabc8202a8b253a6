// The full review history of a result (every transition: who, when, from, to, reason, note). Public pages
// show the actor's role; moderators also see names; the contributor's own view reads the states in their
// words ("Waiting for your answer"). Feed it getReviewHistory() from db/queries/review.ts.
import type { HistoryEvent } from "@/db/queries/review";
import { ownStatusLabels, reviewReasonLabel, reviewStatusLabels } from "@/lib/labels";

const when = (d: Date) =>
  d.toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" }) + " UTC";
const roleWords = {
  contributor: "Contributor",
  moderator: "Moderator",
  admin: "Admin",
  system: "Reader or system",
} as const;

export function ReviewHistory({
  events,
  showNames = false,
  audience = "moderator",
}: {
  events: HistoryEvent[];
  showNames?: boolean;
  audience?: "moderator" | "own";
}) {
  if (events.length === 0) return <p className="muted text-sm">No review history.</p>;
  const label = audience === "own" ? ownStatusLabels : reviewStatusLabels;
  return (
    <ol className="space-y-3 border-l-2 border-ink/10 pl-4 dark:border-night-line" data-testid="review-history">
      {events.map((e) => (
        <li key={e.id} className="space-y-0.5">
          <p className="text-sm">
            <span className="font-medium">
              {e.fromStatus ? `${label[e.fromStatus]} → ` : ""}
              {label[e.toStatus]}
            </span>
            {e.reason ? <span className="muted"> · {reviewReasonLabel(e.reason)}</span> : null}
          </p>
          <p className="muted text-xs">
            {when(e.createdAt)} ·{" "}
            {showNames && e.actorName
              ? `${e.actorName} (${roleWords[e.actorRole].toLowerCase()})`
              : audience === "own" && e.actorRole === "contributor"
                ? "You"
                : roleWords[e.actorRole]}
          </p>
          {e.note ? <p className="text-sm">{e.note}</p> : null}
        </li>
      ))}
    </ol>
  );
}
