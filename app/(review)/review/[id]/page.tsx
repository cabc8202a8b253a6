import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { z } from "zod";
import { ReviewHistory } from "@/components/review-history";
import { getReviewDetail, type GroupMedians } from "@/db/queries/review";
import { fmt, labelSpec, packTitle } from "@/lib/format";
import { loadModeLabels, resistanceMethodLabels } from "@/lib/method-labels";
import { requirePageUser } from "@/server/page-auth";
import { reviewStatusLabels } from "@/lib/review-status-labels";
import { flagReasonLabels } from "@/lib/validations/review";
import { FlagChips } from "../_components/flag-chips";
import { CurveSvg } from "./_components/curve-svg";
import { DecisionPanel } from "./_components/decision-panel-client";
import { labelForGroupKey } from "@/lib/analysis";

export const metadata: Metadata = { title: "Review a result" };
export const dynamic = "force-dynamic";

const params = z.object({ id: z.coerce.number().int().positive() });
const when = (d: Date) => d.toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" }) + " UTC";

function Dl({ rows }: { rows: [string, React.ReactNode, "text"?][] }) {
  return (
    <dl className="grid grid-cols-[minmax(0,1fr)_minmax(0,1.3fr)] gap-x-4 gap-y-1.5 text-sm">
      {rows.map(([k, v, kind]) => (
        <div key={k} className="contents">
          <dt className="muted">{k}</dt>
          <dd className={`break-words text-right ${kind === "text" ? "" : "num"}`}>{v}</dd>
        </div>
      ))}
    </dl>
  );
}

export default async function ReviewResultPage(props: { params: Promise<{ id: string }> }) {
  const p = params.safeParse(await props.params);
  if (!p.success) notFound();
  const me = await requirePageUser("review-queue.read", `/review/${p.data.id}`);
  const d = await getReviewDetail(p.data.id);
  if (!d) notFound();
  const r = d.result;
  const f = r.figures;
  const own = r.contributorId === me.id;
  const title = packTitle({ makerName: d.makerName, model: d.pack.model });
  const compare: [string, number | null, keyof Omit<GroupMedians, "n">, number, string][] = [
    ["Delivered capacity", r.capacityMah, "capacityMah", 0, "mAh"],
    ["Label ratio", r.labelRatio, "labelRatio", 2, ""],
    ["Sag-limited C", r.sagLimitedC, "sagLimitedC", 1, "C"],
    ["DC resistance", r.dcResistanceMohm, "dcResistanceMohm", 1, "mΩ"],
  ];
  const history = d.contributorHistory.byStatus;
  return (
    <div className="space-y-6">
      <div className="space-y-1">
        <p className="muted text-sm"><Link href="/review">← Review queue</Link></p>
        <h1>{title}</h1>
        <p className="muted text-sm">
          Result #{r.id} · <span data-testid="result-status">{reviewStatusLabels[r.status]}</span> · submitted {when(r.submittedAt)} by{" "}
          {d.contributor.displayName ?? d.contributor.email} · label {labelSpec(d.pack)}
          {d.pack.status === "proposed" || d.makerStatus === "proposed" ? " · proposed catalogue entry" : ""}
          {d.pack.status === "active" ? <> · <Link href={`/packs/${d.pack.slug}`} data-testid="pack-link">public pack page</Link></> : null}
        </p>
        <p className="text-sm lg:hidden"><a href="#decide-h">Go to the decision ↓</a></p>
      </div>

      <div className="grid gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <div className="min-w-0 space-y-6">
          <section className="card space-y-3" aria-labelledby="flags-h">
            <h2 id="flags-h">Plausibility flags</h2>
            {r.flags.length === 0 ? <p className="muted text-sm">No automatic flag was raised.</p> : (
              <ul className="space-y-2 text-sm" data-testid="flag-list">
                {r.flags.map((fl, i) => (
                  <li key={i} className="space-y-1"><FlagChips flags={[fl]} /><p>{fl.message}</p></li>
                ))}
              </ul>
            )}
          </section>

          <section className="card space-y-3" aria-labelledby="compare-h">
            <h2 id="compare-h">Beside the pack’s group median</h2>
            <p className="muted text-sm">Approved results of this pack in the same like-for-like group (<span title={r.groupKey}>{labelForGroupKey(r.groupKey) ?? r.groupKey}</span>).</p>
            <div className="overflow-x-auto">
              <table className="w-full text-sm">
                <thead><tr className="text-left">
                  <th className="py-1 pr-3 font-medium">Figure</th><th className="py-1 pr-3 text-right font-medium">This result</th>
                  <th className="py-1 pr-3 text-right font-medium">Median now (n={d.groupNow.n})</th>
                  <th className="py-1 text-right font-medium">If approved (n={d.groupAfterApproval.n})</th>
                </tr></thead>
                <tbody className="num">
                  {compare.map(([label, mine, key, digits, unit]) => (
                    <tr key={key} className="border-t border-ink/10 dark:border-night-line">
                      <td className="py-1 pr-3 font-sans">{label}</td>
                      <td className="whitespace-nowrap py-1 pr-3 text-right">{fmt(mine, digits, unit)}</td>
                      <td className="whitespace-nowrap py-1 pr-3 text-right">{fmt(d.groupNow[key], digits, unit)}</td>
                      <td className="whitespace-nowrap py-1 text-right">{fmt(d.groupAfterApproval[key], digits, unit)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          </section>

          <section className="card space-y-3" aria-labelledby="curve-h">
            <h2 id="curve-h">Curves</h2>
            <CurveSvg curve={r.curve} cells={d.pack.cellsInSeries} />
          </section>

          <div className="grid gap-6 md:grid-cols-2">
            <section className="card space-y-3" aria-labelledby="method-h">
              <h2 id="method-h">Method card</h2>
              <Dl rows={[
                ["Ambient", fmt(r.ambientTemperatureC, 1, "°C")],
                ["Pack start", fmt(r.packStartTemperatureC, 1, "°C")],
                ["Load", `${loadModeLabels[r.loadMode]}, ${fmt(r.loadCurrentA, 1, "A")} (${fmt(r.loadRateC, 1, "C")})`, "text"],
                ["Cut-off per cell", fmt(r.cutoffVPerCell, 2, "V")],
                ["Stop temperature", fmt(r.stopTemperatureC, 0, "°C")],
                ["Resistance method", resistanceMethodLabels[r.resistanceMethod], "text"],
                ["Equipment", r.equipment, "text"],
                ["Sample rate", fmt(r.sampleRateHz, 1, "Hz")],
                ["Cycles before test", fmt(r.cyclesBeforeTest)],
                ["Log", `${r.logFilename} · sha256 ${r.logSha256.slice(0, 12)}…`, "text"],
              ]} />
              {r.notes ? <p className="text-sm">{r.notes}</p> : null}
            </section>
            <section className="card space-y-3" aria-labelledby="figures-h">
              <h2 id="figures-h">Figures</h2>
              <Dl rows={[
                ["Delivered capacity", fmt(f.capacityMah, 0, "mAh")],
                ["Capacity ratio", fmt(f.capacityRatio, 2)],
                ["Energy", fmt(f.energyWh, 2, "Wh")],
                ["Mean voltage per cell", fmt(f.meanVoltagePerCellV, 3, "V")],
                ["Minimum voltage per cell", fmt(f.minVoltagePerCellV, 3, "V")],
                ["Hold voltage per cell", fmt(f.holdVoltagePerCellV, 3, "V")],
                ["DC resistance", `${fmt(f.dcResistanceMohm, 1, "mΩ")}${f.dcResistanceMethod ? ` (${f.dcResistanceMethod})` : ""}`],
                ["Resistance at 25 °C (estimate)", fmt(f.resistanceAt25CMohm, 1, "mΩ")],
                ["Temperature start → peak", `${fmt(f.startTemperatureC, 1)} → ${fmt(f.peakTemperatureC, 1, "°C")}`],
                ["Sag-limited C", fmt(f.sagLimitedC, 1, "C")],
                ["Label ratio", fmt(f.labelRatio, 2)],
                ["Cells seen in log", fmt(f.cells)],
              ]} />
            </section>
          </div>
        </div>

        <aside className="min-w-0 space-y-6">
          <section className="card space-y-3" aria-labelledby="decide-h">
            <h2 id="decide-h">Decision</h2>
            {own ? (
              <p className="text-sm">You submitted this result, so another moderator has to review it.</p>
            ) : r.status !== "pending" ? (
              <div className="space-y-2 text-sm" data-testid="decision-done">
                <p>Decided: {reviewStatusLabels[r.status].toLowerCase()}. Only pending results are decided here; the history below says who decided and why.</p>
                <Link href="/review">Back to the queue</Link>
              </div>
            ) : (
              <DecisionPanel resultId={r.id} />
            )}
          </section>
          {d.readerFlags.length ? (
            <section className="card space-y-3" aria-labelledby="reader-flags-h">
              <h2 id="reader-flags-h">Reader flags</h2>
              <ul className="space-y-2 text-sm">
                {d.readerFlags.map((fl) => (
                  <li key={fl.id}>
                    <span className="font-medium">{flagReasonLabels[fl.reason]}</span> · {fl.status}
                    {fl.note ? <span className="muted block">{fl.note}</span> : null}
                    {fl.resolutionNote ? <span className="block">Resolution: {fl.resolutionNote}</span> : null}
                  </li>
                ))}
              </ul>
              {d.readerFlags.some((fl) => fl.status === "open") ? <Link href="/review/flags">Resolve open flags</Link> : null}
            </section>
          ) : null}
          <section className="card space-y-3" aria-labelledby="contributor-h">
            <h2 id="contributor-h">Contributor’s history</h2>
            <p className="text-sm">
              {fmt(history.approved ?? 0)} approved · {fmt(history.rejected ?? 0)} rejected · {fmt(history.changes_requested ?? 0)} sent back ·{" "}
              {fmt(history.pending ?? 0)} pending · {fmt((history.disputed ?? 0) + (history.withdrawn ?? 0))} disputed or withdrawn
            </p>
            {d.contributorHistory.recent.length ? (
              <ul className="space-y-1 text-sm">
                {d.contributorHistory.recent.map((h) => (
                  <li key={h.id} className="flex justify-between gap-2">
                    <span className="truncate">#{h.id} {h.makerName} {h.packModel}</span>
                    <span className="muted shrink-0">{reviewStatusLabels[h.status]}</span>
                  </li>
                ))}
              </ul>
            ) : <p className="muted text-sm">This is their first result.</p>}
          </section>
          <section className="card space-y-3" aria-labelledby="history-h">
            <h2 id="history-h">Review history</h2>
            <ReviewHistory events={d.events} showNames />
          </section>
        </aside>
      </div>
    </div>
  );
}
