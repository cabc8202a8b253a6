// The sections of a result's review page: the result beside its group, the method card and figures, reader
// flags and the contributor's record.
import Link from "next/link";
import type { getReviewDetail, GroupMedians } from "@/db/queries/review";
import { DischargesTable } from "@/components/analysis/discharges-table";
import { RatingFigures } from "@/components/analysis/rating-figures";
import { RetentionSummary } from "@/components/analysis/retention-summary";
import { labelForGroupKey } from "@/lib/analysis";
import { describeMapping } from "@/lib/column-mapping-form";
import { RATING_LABELS } from "@/lib/figure-words";
import { fmt } from "@/lib/format";
import { computedResistanceMethodLabel, flagOutcomeLabels, loadModeLabels, resistanceMethodLabels } from "@/lib/labels";
import { reviewStatusLabels } from "@/lib/labels";
import { flagReasonLabels } from "@/lib/labels";

type Detail = NonNullable<Awaited<ReturnType<typeof getReviewDetail>>>;

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

export function GroupComparison({ d }: { d: Detail }) {
  const r = d.result;
  const compare: [string, number | null, keyof Omit<GroupMedians, "n">, number, string][] = [
    ["Delivered capacity", r.capacityMah, "capacityMah", 0, "mAh"],
    ["Label ratio (estimate ÷ label)", r.labelRatio, "labelRatio", 2, ""],
    [RATING_LABELS.estimate, r.sagLimitedC, "sagLimitedC", 1, "C"],
    [RATING_LABELS.measured, r.sustainedCMeasured, "sustainedCMeasured", 1, "C"],
    ["DC resistance", r.dcResistanceMohm, "dcResistanceMohm", 1, "mΩ"],
  ];
  return (
    <section className="card space-y-3" aria-labelledby="compare-h">
      <h2 id="compare-h">Beside the pack’s group median</h2>
      <p className="muted text-sm">
        Approved results of this pack in the same like-for-like group (
        <span title={r.groupKey}>{labelForGroupKey(r.groupKey) ?? r.groupKey}</span>).
      </p>
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <thead>
            <tr className="text-left">
              <th className="py-1 pr-3 font-medium">Figure</th>
              <th className="py-1 pr-3 text-right font-medium">This result</th>
              <th className="py-1 pr-3 text-right font-medium">Median now (n={d.groupNow.n})</th>
              <th className="py-1 text-right font-medium">If approved (n={d.groupAfterApproval.n})</th>
            </tr>
          </thead>
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
  );
}

export function MethodAndFigures({ d }: { d: Detail }) {
  const r = d.result;
  const f = r.figures;
  return (
    <div className="grid gap-6 md:grid-cols-2">
      <section className="card space-y-3" aria-labelledby="method-h">
        <h2 id="method-h">Method card</h2>
        <Dl
          rows={[
            ["Ambient", fmt(r.ambientTemperatureC, 1, "°C")],
            ["Pack start", fmt(r.packStartTemperatureC, 1, "°C")],
            [
              "Load",
              `${loadModeLabels[r.loadMode]}, ${fmt(r.loadCurrentA, 1, "A")} (${fmt(r.loadRateC, 1, "C")})`,
              "text",
            ],
            ["Cut-off per cell", fmt(r.cutoffVPerCell, 2, "V")],
            ["Stop temperature", fmt(r.stopTemperatureC, 0, "°C")],
            ["Resistance method", resistanceMethodLabels[r.resistanceMethod], "text"],
            ["Equipment", r.equipment, "text"],
            ["Sample rate", fmt(r.sampleRateHz, 1, "Hz")],
            ["Cycles before test", fmt(r.cyclesBeforeTest)],
            ["Log", `${r.logFilename} · sha256 ${r.logSha256.slice(0, 12)}…`, "text"],
            ["Log columns", r.logMapping ? `mapped: ${describeMapping(r.logMapping)}` : "detected", "text"],
          ]}
        />
        {r.notes ? <p className="text-sm">{r.notes}</p> : null}
      </section>
      <section className="card space-y-3" aria-labelledby="figures-h">
        <h2 id="figures-h">Figures</h2>
        <Dl
          rows={[
            ["Delivered capacity", fmt(f.capacityMah, 0, "mAh")],
            ["Capacity ratio", fmt(f.capacityRatio, 2)],
            ["Energy", fmt(f.energyWh, 2, "Wh")],
            ["Mean voltage per cell", fmt(f.meanVoltagePerCellV, 3, "V")],
            ["Minimum voltage per cell", fmt(f.minVoltagePerCellV, 3, "V")],
            ["Hold voltage per cell", fmt(f.holdVoltagePerCellV, 3, "V")],
            [
              "DC resistance",
              `${fmt(f.dcResistanceMohm, 1, "mΩ")}${f.dcResistanceMethod ? ` (${computedResistanceMethodLabel(f.dcResistanceMethod)})` : ""}`,
            ],
            ["Resistance at 25 °C (estimate)", fmt(f.resistanceAt25CMohm, 1, "mΩ")],
            ["Temperature start → peak", `${fmt(f.startTemperatureC, 1)} → ${fmt(f.peakTemperatureC, 1, "°C")}`],
            ["Cells seen in log", fmt(f.cells)],
            ["Median sample interval", fmt(f.sampleIntervalS ?? null, 2, "s")],
          ]}
        />
        <RatingFigures f={f} />
        {f.warnings.length > 0 ? (
          <ul className="list-disc space-y-1 pl-5 text-sm" data-testid="review-warnings" aria-label="Warnings">
            {f.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        ) : null}
      </section>
      <section className="card space-y-3 md:col-span-2" aria-labelledby="discharges-h">
        <h2 id="discharges-h">Discharges</h2>
        <DischargesTable discharges={f.discharges} headline={f.headlineDischarge} />
        <RetentionSummary retention={f.retention} />
      </section>
    </div>
  );
}

export function ReaderFlags({ flags }: { flags: Detail["readerFlags"] }) {
  if (!flags.length) return null;
  return (
    <section className="card space-y-3" aria-labelledby="reader-flags-h">
      <h2 id="reader-flags-h">Reader flags</h2>
      <ul className="space-y-2 text-sm">
        {flags.map((fl) => (
          <li key={fl.id}>
            <span className="font-medium">{flagReasonLabels[fl.reason]}</span> · {flagOutcomeLabels[fl.status]}
            {fl.note ? <span className="muted block">{fl.note}</span> : null}
            {fl.resolutionNote ? <span className="block">Resolution: {fl.resolutionNote}</span> : null}
          </li>
        ))}
      </ul>
      {flags.some((fl) => fl.status === "open") ? <Link href="/review/flags">Resolve open flags</Link> : null}
    </section>
  );
}

export function ContributorHistory({ history }: { history: Detail["contributorHistory"] }) {
  const byStatus = history.byStatus;
  return (
    <section className="card space-y-3" aria-labelledby="contributor-h">
      <h2 id="contributor-h">Contributor’s history</h2>
      <p className="text-sm" data-testid="contributor-counts">
        Other results: {fmt(byStatus.approved ?? 0)} {reviewStatusLabels.approved.toLowerCase()} ·{" "}
        {fmt(byStatus.rejected ?? 0)} {reviewStatusLabels.rejected.toLowerCase()} · {fmt(byStatus.pending ?? 0)}{" "}
        {reviewStatusLabels.pending.toLowerCase()} · {fmt(byStatus.awaiting_answer ?? 0)}{" "}
        {reviewStatusLabels.awaiting_answer.toLowerCase()} · {fmt(byStatus.withdrawn ?? 0)}{" "}
        {reviewStatusLabels.withdrawn.toLowerCase()}
      </p>
      <p className="text-sm">
        Sent back for an answer {fmt(history.timesSentBack)} times in all (this result included).
      </p>
      {history.recent.length ? (
        <ul className="space-y-1 text-sm">
          {history.recent.map((h) => (
            <li key={h.id} className="flex justify-between gap-2">
              <span className="truncate">
                #{h.id} {h.makerName} {h.packModel}
              </span>
              <span className="muted shrink-0">{reviewStatusLabels[h.status]}</span>
            </li>
          ))}
        </ul>
      ) : (
        <p className="muted text-sm">This is their first result.</p>
      )}
    </section>
  );
}
