import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { z } from "zod";
import { MethodCard } from "@/components/method-card";
import { ModeratorRequest } from "@/components/moderator-request";
import { ReviewHistory } from "@/components/review-history";
import { Alert, buttonClass } from "@/components/ui/form";
import { getOwnResult } from "@/db/queries/results-by-contributor";
import { getReviewHistory } from "@/db/queries/review";
import { getLatestRequest } from "@/db/queries/submissions";
import { fmt, labelSpec } from "@/lib/format";
import { reviewReasonLabel } from "@/lib/labels";
import { requirePageUser } from "@/server/page-auth";
import { ResultActions } from "../../_components/result-actions-client";
import { StatusBadge } from "../../_components/status-badge";

export const metadata: Metadata = { title: "Your result" };
export const dynamic = "force-dynamic";

const params = z.object({ id: z.coerce.number().int().positive().max(2_147_483_647) });
const search = z.object({ sent: z.enum(["answer", "submission"]).optional().catch(undefined) });
const when = (d: Date) =>
  d.toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" }) + " UTC";

/** What each state means for the contributor, in one sentence. */
const meaning = {
  pending: "A moderator will check it against its log, photos and method card. You can withdraw it while it waits.",
  awaiting_answer: "A moderator sent it back to you: answer their request below, and it goes back to them.",
  approved: "It is published with its method card, and counts in its pack’s figures.",
  rejected: "A moderator did not accept it; the reason is below. It stays here and in the audit log.",
  withdrawn: "You withdrew it; it will not be reviewed or published. It stays in the audit log.",
} as const;

export default async function OwnResultPage(props: {
  params: Promise<{ id: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const p = params.safeParse(await props.params);
  if (!p.success) notFound();
  const id = p.data.id;
  const user = await requirePageUser("account.update", `/account/results/${id}`);
  const r = await getOwnResult(id);
  // Someone else's result is "not found" here: this page never says whose a result is.
  if (!r || r.contributorId !== user.id) notFound();
  const { sent } = search.parse(await props.searchParams);
  const [events, request] = await Promise.all([getReviewHistory(id), getLatestRequest(id)]);
  const decision = [...events].reverse().find((e) => e.toStatus === r.status && e.actorRole !== "contributor");
  const title = `${r.makerName} ${r.model}`;
  return (
    <div className="space-y-6">
      <header className="space-y-2">
        <p className="muted text-sm">
          <Link href="/account">← Your account</Link>
        </p>
        <h1>
          Result #{r.id} · {title}
        </h1>
        <p className="muted num text-sm">
          {labelSpec(r)} · submitted {when(r.submittedAt)}
          {r.publishedAt ? ` · published ${when(r.publishedAt)}` : ""}
          {r.packStatus === "proposed" ? " · a new pack you proposed: it goes live when the result is approved" : ""}
        </p>
        <p className="flex flex-wrap items-center gap-2">
          <StatusBadge status={r.status} />
          <span className="text-sm">{meaning[r.status]}</span>
        </p>
      </header>

      {sent === "answer" ? (
        <Alert tone="success">
          <span data-testid="answer-sent">
            Your answer on result #{r.id} was sent. It is back with the moderators; we e-mailed you a receipt.
          </span>
        </Alert>
      ) : null}
      {sent === "submission" ? (
        <Alert tone="success">Result #{r.id} was received. We e-mailed you a receipt with this page’s address.</Alert>
      ) : null}

      {r.status === "awaiting_answer" && request ? (
        <div className="space-y-3">
          <ModeratorRequest request={request} />
          <Link href={`/submit/${r.id}`} className={buttonClass("primary")}>
            Answer the moderator
          </Link>
        </div>
      ) : null}
      {r.status === "rejected" && decision ? (
        <section className="card space-y-1" aria-labelledby="why-h">
          <h2 id="why-h" className="text-base">
            Why it was not accepted
          </h2>
          <p>{decision.reason ? reviewReasonLabel(decision.reason) : "No reason was given."}</p>
          {decision.note ? <p className="whitespace-pre-line">{decision.note}</p> : null}
        </section>
      ) : null}
      {r.status === "approved" ? (
        <p>
          <Link href={`/results/${r.id}`}>Open its public page</Link> ·{" "}
          <Link href={`/packs/${r.packSlug}`}>the pack’s page</Link>
        </p>
      ) : null}
      <ResultActions resultId={r.id} status={r.status} answerLink={false} />

      <div className="grid gap-6 lg:grid-cols-2">
        <section className="card space-y-2" aria-labelledby="method-h">
          <h2 id="method-h">Method card</h2>
          <MethodCard m={r} />
        </section>
        <section className="card space-y-2" aria-labelledby="figures-h">
          <h2 id="figures-h">Figures and files</h2>
          <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
            <dt className="muted">Delivered capacity</dt>
            <dd className="num">{fmt(r.capacityMah, 0, "mAh")}</dd>
            <dt className="muted">DC resistance</dt>
            <dd className="num">{fmt(r.dcResistanceMohm, 1, "mΩ")}</dd>
            <dt className="muted">Sag-limited C (estimate)</dt>
            <dd className="num">{fmt(r.sagLimitedC, 1, "C")}</dd>
            <dt className="muted">Label ratio</dt>
            <dd className="num">{fmt(r.labelRatio, 2)}</dd>
            <dt className="muted">Log</dt>
            <dd className="break-all">{r.logFilename}</dd>
            <dt className="muted">Label photos</dt>
            <dd>{r.photoCount === 0 ? "none" : `${r.photoCount}`}</dd>
          </dl>
          {r.photoCount > 0 ? (
            <ul className="grid grid-cols-4 gap-2">
              {Array.from({ length: r.photoCount }, (_, i) => (
                <li key={i}>
                  {/* Served through a permission check (yours before publication): not for next/image. */}
                  {/* eslint-disable-next-line @next/next/no-img-element */}
                  <img
                    src={`/results/${r.id}/photos/${i + 1}`}
                    alt={`Your label photo ${i + 1}`}
                    loading="lazy"
                    className="aspect-square w-full rounded border border-ink/10 object-cover dark:border-night-line"
                  />
                </li>
              ))}
            </ul>
          ) : null}
        </section>
      </div>

      <section className="space-y-2" aria-labelledby="history-h">
        <h2 id="history-h">History</h2>
        <p className="muted text-sm">Every step, who took it and what was said.</p>
        <ReviewHistory events={events} audience="own" />
      </section>
    </div>
  );
}
