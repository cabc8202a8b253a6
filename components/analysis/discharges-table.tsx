// Every discharge of a log, in log order, with the one the headline figures describe marked. Shared by
// /analyse, /submit, the review page and the result page (a plain component: no state, no effects).
import type { Discharge } from "@/lib/analysis";
import { METHODS_ANCHORS, methodsHref } from "@/lib/figure-words";
import { fmt } from "@/lib/format";

const th = "px-2 py-1 text-right font-medium whitespace-nowrap";
const td = "px-2 py-1 text-right whitespace-nowrap";

function duration(s: number): string {
  if (!Number.isFinite(s)) return "—";
  const m = Math.floor(s / 60);
  return m > 0 ? `${m} min ${fmt(s - m * 60, 0)} s` : `${fmt(s, 0)} s`;
}

/** Which discharge the headline figures describe, and why that one, in words. */
export function headlineWords(discharges: Discharge[], headline: number | null): string {
  if (headline === null || discharges.length === 0) return "The log holds no discharge.";
  const d = discharges.find((x) => x.index === headline);
  if (discharges.length === 1) return "The log holds one discharge; the figures describe it.";
  const why = d?.reachedCutoff ? "the first that reached the cut-off" : "the longest: none reached the cut-off";
  return `The log holds ${discharges.length} discharges. The headline figures describe discharge ${headline} (${why}), never their sum.`;
}

export function DischargesTable({
  discharges,
  headline,
  caption = "Discharges in this log",
}: {
  /** Absent on results analysed before discharges were listed. */
  discharges: Discharge[] | undefined;
  headline: number | null | undefined;
  caption?: string;
}) {
  if (!discharges) return <p className="muted text-sm">This result was analysed before discharges were listed.</p>;
  const head = headline ?? null;
  return (
    <div className="space-y-2" data-testid="discharges">
      <p className="text-sm" data-testid="headline-discharge">
        {headlineWords(discharges, head)}{" "}
        <a href={methodsHref(METHODS_ANCHORS.discharges)} className="text-inherit underline decoration-dotted">
          How discharges are split
        </a>
      </p>
      {discharges.length > 0 ? (
        <div className="-mx-1 overflow-x-auto px-1" tabIndex={0} role="region" aria-label={caption}>
          <table className="w-full min-w-[44rem] border-collapse text-sm">
            <caption className="sr-only">
              {caption}: one row per discharge, in log order; the marked row is the one the headline figures describe.
            </caption>
            <thead>
              <tr className="border-b border-ink/15 align-bottom dark:border-night-line">
                <th scope="col" className={`${th} text-left`}>
                  Discharge
                </th>
                <th scope="col" className={th}>
                  Starts at
                </th>
                <th scope="col" className={th}>
                  Duration
                </th>
                <th scope="col" className={th}>
                  Capacity
                </th>
                <th scope="col" className={th}>
                  Energy
                </th>
                <th scope="col" className={th}>
                  Mean current
                </th>
                <th scope="col" className={th}>
                  Mean / min voltage
                </th>
                <th scope="col" className={th}>
                  Cut-off
                </th>
                <th scope="col" className={th}>
                  Peak temp.
                </th>
              </tr>
            </thead>
            <tbody className="num">
              {discharges.map((d) => {
                const isHead = d.index === head;
                return (
                  <tr
                    key={d.index}
                    data-testid="discharge-row"
                    data-headline={isHead ? "true" : undefined}
                    className={`border-b border-ink/5 dark:border-night-line/60 ${isHead ? "bg-cell-50 dark:bg-cell-700/15" : ""}`}
                  >
                    <th scope="row" className="px-2 py-1 text-left font-sans font-normal whitespace-nowrap">
                      {d.index}
                      {isHead ? (
                        <span className="ml-2 rounded bg-cell-100 px-1 text-xs font-medium text-cell-700 dark:bg-cell-700/40 dark:text-cell-100">
                          headline
                        </span>
                      ) : null}
                    </th>
                    <td className={td}>{duration(d.startS)}</td>
                    <td className={td}>{duration(d.durationS)}</td>
                    <td className={td}>{fmt(d.capacityMah, 0, "mAh")}</td>
                    <td className={td}>{fmt(d.energyWh, 2, "Wh")}</td>
                    <td className={td}>{fmt(d.meanCurrentA, 2, "A")}</td>
                    <td className={td}>
                      {fmt(d.meanVoltageV, 2)} / {fmt(d.minVoltageV, 2, "V")}
                    </td>
                    <td className={`${td} font-sans`}>{d.reachedCutoff ? "reached" : "not reached"}</td>
                    <td className={td}>{fmt(d.peakTemperatureC, 1, "°C")}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      ) : null}
    </div>
  );
}
