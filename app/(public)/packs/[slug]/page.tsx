import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { packDetailFor, type PackPageProps } from "./_components/pack-detail-for";
import { LineFigure } from "@/components/charts/line-figure";
import { StaticIsland } from "@/components/static-island";
import { PackEmailsSlot } from "./_components/pack-emails-slot-client";
import { LabelPairNote } from "@/components/label-pair-note";
import { Qty } from "@/components/quantity";
import { METHODS_ANCHORS, methodsHref, RATING_LABELS } from "@/lib/figure-words";
import { fmtC, labelSpec, packTitle } from "@/lib/format";
import { PACK_PAGE_MAX_GROUPS } from "@/lib/bounded-lists";
import { CyclesSection } from "./_components/cycles-section";
import { GroupFiguresTable } from "./_components/group-figures";
import { ResultsList } from "./_components/results-list";

// Generated on first request, then served statically; moderation revalidates the `pack:<slug>` tag.
export const revalidate = 3600;
export async function generateStaticParams() {
  return [];
}

export async function generateMetadata(props: PackPageProps): Promise<Metadata> {
  const detail = await packDetailFor(props);
  return detail
    ? {
        title: packTitle(detail.pack),
        description: `${labelSpec(detail.pack)}: measured figures from independent tests, method attached.`,
      }
    : {};
}

export default async function PackPage(props: PackPageProps) {
  const detail = await packDetailFor(props);
  if (!detail) notFound();
  const { pack, groups, sustained, ageing, curves, results } = detail;
  const title = packTitle(pack);
  return (
    <article className="space-y-10">
      <header className="flex flex-wrap items-start justify-between gap-3">
        <div className="space-y-1">
          <h1>{title}</h1>
          <p className="num muted">
            {labelSpec(pack)} <LabelPairNote burst={pack.labelledBurstC !== null} /> ·{" "}
            <Qty q="mass" v={pack.weightG} digits={0} /> · {pack.connector}
          </p>
        </div>
        <div className="flex gap-2">
          <PackEmailsSlot packId={pack.id} packSlug={pack.slug} packTitle={title} />
          <a href={`/compare?packs=${pack.slug}`} className="btn-line">
            Compare…
          </a>
        </div>
      </header>

      <section aria-labelledby="measured" className="space-y-3">
        <h2 id="measured">Label vs measured</h2>
        <p className="text-sm">
          <strong>{RATING_LABELS.measured}:</strong>{" "}
          {sustained ? (
            <>
              <span className="num" data-testid="sustained-c">
                {fmtC(sustained.rateC)}
              </span>{" "}
              <span className="muted">
                — the highest current a qualifying run actually drew, among approved results (
                <a href={`/results/${sustained.resultId}`}>result #{sustained.resultId}</a>; {sustained.groupLabel}).{" "}
                <a href={methodsHref(METHODS_ANCHORS.sustainedC)}>The rule</a>.
              </span>
            </>
          ) : (
            <span className="muted">— no approved run has qualified for a measured rating yet</span>
          )}
        </p>
        <StaticIsland id="pack-figures">
          <GroupFiguresTable
            groups={groups}
            labelledC={pack.labelledContinuousC}
            ratedMah={pack.ratedCapacityMah}
            cells={pack.cellsInSeries}
            limit={PACK_PAGE_MAX_GROUPS}
            fullHref={`/packs/${pack.slug}/groups`}
          />
        </StaticIsland>
      </section>

      <section aria-labelledby="curves" className="space-y-3">
        <h2 id="curves">Discharge curves</h2>
        {curves.length === 0 ? (
          <p className="muted">No curves yet.</p>
        ) : (
          <StaticIsland id="pack-curves-island">
            <LineFigure
              id="pack-curves"
              title="Voltage per cell against capacity delivered"
              xLabel="Capacity delivered (mAh)"
              yLabel="Voltage per cell, V"
              xDigits={0}
              yDigits={3}
              yUnit="v"
              cells={pack.cellsInSeries}
              tableCaption={`Discharge curves of ${title}`}
              notes={
                <p>
                  The newest {curves.length} published results, downsampled on the server for drawing. Curves from
                  different like-for-like groups are not comparable with each other: each is labelled with its method.
                </p>
              }
              series={curves.map((c) => ({
                id: String(c.resultId),
                label: c.label,
                href: `/results/${c.resultId}`,
                points: c.points.map((p) => ({ x: p.mah, y: p.vpc })),
              }))}
            />
          </StaticIsland>
        )}
      </section>

      <section aria-labelledby="cycles" className="space-y-3">
        <h2 id="cycles">Over cycles</h2>
        <StaticIsland id="pack-cycles">
          <CyclesSection ageing={ageing} cells={pack.cellsInSeries} />
        </StaticIsland>
      </section>

      <section aria-labelledby="results" className="space-y-3">
        <h2 id="results">Results ({results.length})</h2>
        <StaticIsland id="pack-results-island">
          <ResultsList results={results} cells={pack.cellsInSeries} packSlug={pack.slug} />
        </StaticIsland>
      </section>
    </article>
  );
}
