import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { z } from "zod";
import { LogFigure } from "@/components/charts/log-figure";
import { ReviewHistory } from "@/components/review-history";
import { getReviewDetail } from "@/db/queries/review";
import { prepareTimeCurve } from "@/lib/curves";
import { labelSpec, packTitle } from "@/lib/format";
import { catalogueStatusLabels, reviewStatusLabels } from "@/lib/labels";
import { recordId } from "@/lib/validations/ids";
import { requirePageUser } from "@/server/page-auth";
import { FlagChips } from "../_components/flag-chips";
import { BenchAgreementSection } from "./_components/bench-agreement-section";
import { DecisionPanel } from "./_components/decision-panel-client";
import { Evidence } from "./_components/evidence";
import { ContributorHistory, GroupComparison, MethodAndFigures, ReaderFlags } from "./_components/result-sections";

export const metadata: Metadata = { title: "Review a result" };
export const dynamic = "force-dynamic";

const params = z.object({ id: recordId });
const when = (d: Date) =>
  d.toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" }) + " UTC";

export default async function ReviewResultPage(props: { params: Promise<{ id: string }> }) {
  const p = params.safeParse(await props.params);
  if (!p.success) notFound();
  const me = await requirePageUser("review-queue.read", `/review/${p.data.id}`);
  const d = await getReviewDetail(p.data.id);
  if (!d) notFound();
  const r = d.result;
  const own = r.contributorId === me.id;
  const title = packTitle({ makerName: d.makerName, model: d.pack.model });
  return (
    <div className="space-y-6">
      <div className="space-y-1">
        <p className="muted text-sm">
          <Link href="/review">← Review queue</Link>
        </p>
        <h1>{title}</h1>
        <p className="muted text-sm">
          Result #{r.id} · <span data-testid="result-status">{reviewStatusLabels[r.status]}</span> · submitted{" "}
          {when(r.submittedAt)} by {d.contributor.displayName ?? d.contributor.email} · label {labelSpec(d.pack)}
          {d.pack.status === "proposed" || d.makerStatus === "proposed" ? (
            <span data-testid="proposed-entry"> · {catalogueStatusLabels.proposed.toLowerCase()}</span>
          ) : null}
          {d.pack.status === "active" ? (
            <>
              {" "}
              ·{" "}
              <Link href={`/packs/${d.pack.slug}`} data-testid="pack-link">
                public pack page
              </Link>
            </>
          ) : null}
        </p>
        <p className="text-sm lg:hidden">
          <a href="#decide-h">Go to the decision ↓</a>
        </p>
      </div>

      <div className="grid gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <div className="min-w-0 space-y-6">
          <section className="card space-y-3" aria-labelledby="flags-h">
            <h2 id="flags-h">Plausibility flags</h2>
            {r.flags.length === 0 ? (
              <p className="muted text-sm">No automatic flag was raised.</p>
            ) : (
              <ul className="space-y-2 text-sm" data-testid="flag-list">
                {r.flags.map((fl, i) => (
                  <li key={i} className="space-y-1">
                    <FlagChips flags={[fl]} />
                    <p>{fl.message}</p>
                    {fl.resultIds?.length ? (
                      <p>
                        Compare with:{" "}
                        {fl.resultIds.map((id, k) => (
                          <span key={id}>
                            {k > 0 ? ", " : ""}
                            <Link href={`/review/${id}`}>result #{id}</Link>
                          </span>
                        ))}
                      </p>
                    ) : null}
                  </li>
                ))}
              </ul>
            )}
          </section>

          <BenchAgreementSection resultId={r.id} />

          <GroupComparison d={d} />

          <Evidence
            resultId={r.id}
            photoCount={r.photoKeys.length}
            log={{ filename: r.logFilename, bytes: r.logBytes, sha256: r.logSha256 }}
          />

          <section className="card space-y-3" aria-labelledby="curve-h">
            <h2 id="curve-h">Curves</h2>
            <LogFigure
              id="review-log"
              title="Voltage, current and temperature over time"
              points={prepareTimeCurve(r.curve, d.pack.cellsInSeries, 300).map((q) => ({
                s: q.s,
                v: q.vpc,
                a: q.a,
                t: q.tc,
              }))}
              cells={d.pack.cellsInSeries}
              stopTemperatureC={r.stopTemperatureC}
              caption={`Result #${r.id}: the log`}
            />
          </section>

          <MethodAndFigures d={d} />
        </div>

        <aside className="min-w-0 space-y-6">
          <section className="card space-y-3" aria-labelledby="decide-h">
            <h2 id="decide-h">Decision</h2>
            {own ? (
              <p className="text-sm">You submitted this result, so another moderator has to review it.</p>
            ) : r.status !== "pending" ? (
              <div className="space-y-2 text-sm" data-testid="decision-done">
                <p>
                  Now: {reviewStatusLabels[r.status].toLowerCase()}. Only results waiting for review are decided here;
                  the history below says who decided and why.
                </p>
                {r.status === "approved" && d.pack.status === "active" ? (
                  <p>
                    <Link href={`/packs/${d.pack.slug}`} data-testid="live-pack-link">
                      Open the pack’s public page
                    </Link>
                  </p>
                ) : null}
                <Link href="/review">Back to the queue</Link>
              </div>
            ) : (
              <DecisionPanel resultId={r.id} proposal={d.proposal} />
            )}
          </section>
          <ReaderFlags flags={d.readerFlags} />
          <ContributorHistory history={d.contributorHistory} />
          <section className="card space-y-3" aria-labelledby="history-h">
            <h2 id="history-h">Review history</h2>
            <ReviewHistory events={d.events} showNames />
          </section>
        </aside>
      </div>
    </div>
  );
}
