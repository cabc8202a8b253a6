import type { Metadata } from "next";
import Link from "next/link";
import { listOpenReaderFlags } from "@/db/queries/review";
import { requirePageUser } from "@/server/page-auth";
import { reviewStatusLabels } from "@/lib/labels";
import { flagReasonLabels } from "@/lib/labels";
import type { FlagReason } from "@/lib/enums";
import { ResolveFlagForm } from "./_components/resolve-flag-client";
import { ResolvedFlagNotice } from "./_components/resolved-flag-notice-client";

export const metadata: Metadata = { title: "Reader flags" };
export const dynamic = "force-dynamic";

const when = (d: Date) =>
  d.toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" }) + " UTC";

export default async function ReaderFlagsPage() {
  const me = await requirePageUser("flag.resolve", "/review/flags");
  const flags = await listOpenReaderFlags();
  return (
    <div className="space-y-6">
      <div className="space-y-1">
        <h1>Reader flags</h1>
        <p className="muted max-w-3xl">
          {flags.length} open {flags.length === 1 ? "flag" : "flags"}, oldest first. A reader’s flag never changes a
          result by itself: it stays published and counted, and its page says a check is open. Keep it, keep it with a
          note (say what the reader got right), or take it out of publication with a reason shown on its page — a
          withdrawn result is never deleted and its history stays public.
        </p>
      </div>
      {/* Around the list and its empty state alike, so the confirmation survives the last row leaving. */}
      <ResolvedFlagNotice>
        {flags.length === 0 ? (
          <p className="card muted">No open flags.</p>
        ) : (
          <ul className="space-y-4" data-testid="flag-queue">
            {flags.map((fl) => (
              <li key={fl.id} className="card grid gap-4 md:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
                <div className="min-w-0 space-y-1">
                  <p className="font-medium">{flagReasonLabels[fl.reason as FlagReason] ?? fl.reason}</p>
                  <p className="muted text-sm">
                    Flag #{fl.id} on <Link href={`/review/${fl.resultId}`}>result #{fl.resultId}</Link> · {fl.makerName}{" "}
                    {fl.packModel} · {reviewStatusLabels[fl.resultStatus]} · {when(fl.createdAt)}
                  </p>
                  {fl.note ? (
                    <blockquote className="border-l-2 border-charge-400 pl-3 text-sm">{fl.note}</blockquote>
                  ) : null}
                </div>
                {fl.contributorId === me.id ? (
                  <p className="text-sm">This is your own result; another moderator has to resolve the flag.</p>
                ) : (
                  <ResolveFlagForm flagId={fl.id} packTitle={`${fl.makerName} ${fl.packModel}`} />
                )}
              </li>
            ))}
          </ul>
        )}
      </ResolvedFlagNotice>
    </div>
  );
}
