// What a moderator asked when they sent a result back to its contributor: shown on the contributor's view of
// the result and beside the answer form, in the same words as the e-mail.
import { reviewReasonLabel } from "@/lib/labels";

const when = (d: Date) =>
  d.toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" }) + " UTC";

export function ModeratorRequest({
  request,
  heading = "The moderator’s request",
}: {
  request: { note: string | null; reason: string | null; createdAt: Date };
  heading?: string;
}) {
  return (
    <section
      className="space-y-2 rounded-lg border border-charge-500/40 bg-charge-50 p-4 dark:border-charge-500/40 dark:bg-charge-700/20"
      aria-labelledby="moderator-request-h"
      data-testid="moderator-request"
    >
      <h2 id="moderator-request-h" className="text-base">
        {heading}
      </h2>
      <blockquote className="whitespace-pre-line border-l-2 border-charge-500 pl-3">
        {request.note?.trim() || "The moderator gave no note; answer with what you changed."}
      </blockquote>
      <p className="muted text-xs">
        Sent {when(request.createdAt)}
        {request.reason ? ` · ${reviewReasonLabel(request.reason)}` : ""}
      </p>
    </section>
  );
}
