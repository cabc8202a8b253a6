import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { z } from "zod";
import { LogFigure } from "@/components/charts/log-figure";
import { StaticIsland } from "@/components/static-island";
import { recordId } from "@/lib/validations/ids";
import { DischargesTable } from "@/components/analysis/discharges-table";
import { RetentionSummary } from "@/components/analysis/retention-summary";
import { FlagResultForm } from "@/components/flag-result-form-client";
import { MethodCard } from "@/components/method-card";
import { prepareTimeCurve } from "@/lib/curves";
import { METHODS_ANCHORS, methodsHref } from "@/lib/figure-words";
import { fmtDate, labelSpec, packTitle } from "@/lib/format";
import { DATA_LICENCE_LABEL, DATA_LICENCE_URL } from "@/lib/open-data/licence";
import { logDownloadName, recomputeCommand } from "@/lib/open-data/recompute";
import { describeResultGroup } from "@/lib/pack-summary";
import { openCaseReasonWords, reviewReasonLabel, reviewStatusLabels } from "@/lib/labels";
import type { ReviewStatus } from "@/lib/enums";
import { cachedResult } from "@/server/public-data";
import { resolveAccuracy } from "@/lib/analysis/uncertainty";
import { figureU95 } from "@/lib/figure-u95";
import { AccuracyCard } from "@/components/analysis/accuracy-card";
import { FiguresList } from "./_components/figures-list";

// Generated on first request; moderation revalidates `result:<id>`. Non-public results are 404.
export const revalidate = 3600;
export async function generateStaticParams() {
  return [];
}

const params = z.object({ id: recordId });
type Props = { params: Promise<{ id: string }> };

export async function generateMetadata(props: Props): Promise<Metadata> {
  const parsed = params.safeParse(await props.params);
  const r = parsed.success ? await cachedResult(parsed.data.id) : null;
  return r ? { title: `Result #${r.id} — ${packTitle(r.pack)}` } : {};
}

const isStatus = (s: string): s is ReviewStatus => Object.hasOwn(reviewStatusLabels, s);
const statusWord = (s: string) => (isStatus(s) ? reviewStatusLabels[s].toLowerCase() : "another state");

export default async function ResultPage(props: Props) {
  const parsed = params.safeParse(await props.params);
  if (!parsed.success) notFound();
  const r = await cachedResult(parsed.data.id);
  if (!r) notFound();
  const group = describeResultGroup(r);
  const accuracy = resolveAccuracy(r.statedAccuracy);
  const u95 = figureU95(r.figures, accuracy.accuracy, {
    cells: r.pack.cellsInSeries,
    ratedMah: r.ratedCapacityMah,
    labelledC: r.pack.labelledContinuousC,
  });
  const time = prepareTimeCurve(r.curve, r.pack.cellsInSeries, 300);
  const logFile = logDownloadName(r.id, r.logFilename);
  const command = recomputeCommand(logFile, {
    cells: r.pack.cellsInSeries,
    ratedMah: r.ratedCapacityMah,
    labelledC: r.pack.labelledContinuousC,
    weightG: r.pack.weightG,
    cutoffVPerCell: r.cutoffVPerCell,
    stopTemperatureC: r.stopTemperatureC,
    packStartTemperatureC: r.packStartTemperatureC,
    mapping: r.logMapping,
  });
  return (
    <article className="space-y-8">
      <header className="space-y-2">
        <p className="muted text-sm">
          <a href={`/packs/${r.pack.slug}`}>{packTitle(r.pack)}</a> ·{" "}
          <span className="num">{labelSpec({ ...r.pack, ratedCapacityMah: r.ratedCapacityMah })}</span>
        </p>
        <h1>Result #{r.id}</h1>
        {r.openCaseReasons.length ? (
          <p
            className="rounded-md border border-warn/40 bg-warn-soft px-3 py-2 text-sm text-warn"
            role="note"
            data-testid="open-case"
          >
            A reader asked moderators to check this result:{" "}
            {r.openCaseReasons.map((reason) => openCaseReasonWords[reason]).join("; ")} — it still counts until they
            decide.
          </p>
        ) : null}
        <div className="max-w-xl">
          <FlagResultForm resultId={r.id} />
        </div>
        <p className="text-sm">
          Contributor: <strong data-testid="contributor">{r.contributor}</strong> · published {fmtDate(r.publishedAt)}
        </p>
        <p className="text-sm">
          Like-for-like group: <span className="muted">{group.label}</span>
        </p>
      </header>

      <div className="grid gap-6 lg:grid-cols-[1fr_2fr]">
        <section aria-labelledby="method" className="card space-y-2">
          <h2 id="method">Method card</h2>
          <MethodCard m={r} />
          {r.notes ? <p className="muted text-sm">Notes: {r.notes}</p> : null}
        </section>
        <section aria-labelledby="figures" className="card space-y-2">
          <h2 id="figures">Figures</h2>
          <FiguresList f={r.figures} u95={u95} />
          <p className="muted text-xs">
            Computed by Sagline from the uploaded log.{" "}
            <a href={methodsHref(METHODS_ANCHORS.figures)}>How each figure is defined</a>.
          </p>
        </section>
      </div>

      <AccuracyCard resolved={accuracy} benchProfileId={r.benchProfileId} linkBench />

      <section aria-labelledby="discharges-h" className="card space-y-3">
        <h2 id="discharges-h">Discharges</h2>
        <DischargesTable discharges={r.figures.discharges} headline={r.figures.headlineDischarge} />
        <RetentionSummary retention={r.figures.retention} />
      </section>

      <section aria-labelledby="log" className="space-y-4">
        <h2 id="log">Log</h2>
        <StaticIsland id="log-island">
          <LogFigure
            id="log-chart"
            title="Voltage, current and temperature over time"
            points={time.map((p) => ({ s: p.s, v: p.vpc, a: p.a, t: p.tc }))}
            cells={r.pack.cellsInSeries}
            stopTemperatureC={r.stopTemperatureC}
            caption={`Result #${r.id}: the log`}
            notes={
              <p>
                {time.length} points kept of the log by largest-triangle downsampling; rest periods included. Each panel
                has its own scale; they share the time axis.
              </p>
            }
          />
        </StaticIsland>
      </section>

      <section aria-labelledby="raw-log" className="space-y-2" data-testid="raw-log">
        <h2 id="raw-log">Raw log and recomputing the figures</h2>
        <p className="text-sm">
          <a href={`/api/v1/results/${r.id}/log`} download={logFile}>
            Download the log ({logFile})
          </a>{" "}
          as it was uploaded, under{" "}
          <a href={DATA_LICENCE_URL} rel="license">
            {DATA_LICENCE_LABEL}
          </a>
          . With Sagline&apos;s open command-line tool, this command computes the same figures from it:
        </p>
        <pre tabIndex={0} className="overflow-x-auto rounded bg-paper-sunk p-3 text-sm dark:bg-night-sunk">
          <code data-testid="recompute-command">{command}</code>
        </pre>
      </section>
      {r.photoCount > 0 ? (
        <section aria-labelledby="photos" className="space-y-2">
          <h2 id="photos">Label photos</h2>
          <p className="muted text-sm">The pack’s label as the contributor photographed it (location data removed).</p>
          <ul className="grid grid-cols-2 gap-3 sm:grid-cols-4" data-testid="result-photos">
            {Array.from({ length: r.photoCount }, (_, i) => (
              <li key={i}>
                <a href={`/results/${r.id}/photos/${i + 1}`}>
                  {/* Served from storage through /results/<id>/photos/<n>; next/image's optimiser does not apply. */}
                  {/* eslint-disable-next-line @next/next/no-img-element */}
                  <img
                    src={`/results/${r.id}/photos/${i + 1}`}
                    alt={`Label photo ${i + 1} of result #${r.id}`}
                    loading="lazy"
                    className="aspect-square w-full rounded border border-ink/10 object-cover dark:border-night-line"
                  />
                </a>
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      <section aria-labelledby="history" className="space-y-2">
        <h2 id="history">Review history</h2>
        <ol className="space-y-1 text-sm" data-testid="review-history">
          {r.events.map((e) => (
            <li key={e.id} className="flex flex-wrap gap-x-2">
              <span className="num muted">{fmtDate(e.at)}</span>
              <span>
                {e.actor === "system" ? "Sagline" : e.actor}: {e.from ? `${statusWord(e.from)} → ` : ""}
                <strong>{statusWord(e.to)}</strong>
              </span>
              {e.reason ? <span className="muted">({reviewReasonLabel(e.reason)})</span> : null}
              {e.note ? <span className="muted">— {e.note}</span> : null}
            </li>
          ))}
        </ol>
      </section>
    </article>
  );
}
