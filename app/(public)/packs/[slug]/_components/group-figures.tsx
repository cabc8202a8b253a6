import { SummaryValue } from "@/components/summary-value";
import { LABEL_RATIO_LABELS, METHODS_ANCHORS, methodsHref, RATING_LABELS } from "@/lib/figure-words";
import { fmt, fmtC, fmtLabelledC, RESISTANCE_25C_SOURCE } from "@/lib/format";
import type { GroupFigures } from "@/lib/pack-summary";
import { shownOf } from "@/lib/bounded-lists";

/**
 * Label vs measured, one row per like-for-like group: medians with n and spread. Groups are never pooled. With
 * `limit`, the groups with the most results (figuresByGroup's order) up to that many, and a note linking to `fullHref`
 * where the rest are: a much-tested pack's page keeps its size.
 */
export function GroupFiguresTable({
  groups: all,
  labelledC,
  ratedMah,
  cells,
  limit,
  fullHref,
}: {
  groups: GroupFigures[];
  labelledC: number;
  ratedMah: number;
  cells: number;
  limit?: number;
  fullHref?: string;
}) {
  const groups = limit === undefined ? all : all.slice(0, limit);
  const cut = shownOf(groups.length, all.length, "like-for-like group");
  if (groups.length === 0)
    return (
      <p className="muted">
        No published results yet. <a href="/submit">Submit one</a>.
      </p>
    );
  return (
    <div className="space-y-2">
      <p className="muted text-xs">
        Label: {fmtLabelledC(labelledC)} continuous, {fmt(ratedMah)} mAh. Each row is one like-for-like group; values
        are medians of its published results (n, and min–max underneath; from 6 results on, the median&apos;s 95 %
        interval instead, by order statistics: <a href="/methods#uncertainty-intervals">how</a>).
      </p>
      {cut ? (
        <p className="text-sm" data-testid="group-figures-cut">
          {cut}, those with the most results. {fullHref ? <a href={fullHref}>All {all.length} groups →</a> : null}
        </p>
      ) : null}
      <div
        className="-mx-4 overflow-x-auto px-4"
        tabIndex={0}
        role="region"
        aria-label="Figures by like-for-like group"
      >
        <table className="figs min-w-[60rem]" data-testid="group-figures">
          <caption className="sr-only">Label against measured figures by like-for-like group</caption>
          <thead>
            <tr>
              <th scope="col">Like-for-like group</th>
              <th scope="col">
                Sag-limited C <small className="font-normal">estimate</small>
              </th>
              <th scope="col">
                Label ratio <small className="font-normal">estimate ÷ label</small>
              </th>
              <th scope="col">
                Sustained C <small className="font-normal">measured, highest</small>
              </th>
              <th scope="col">
                Label ratio <small className="font-normal">measured ÷ label</small>
              </th>
              <th scope="col">Delivered</th>
              <th scope="col">Capacity ratio</th>
              <th scope="col">Hold voltage</th>
              <th scope="col">DC resistance</th>
              <th scope="col">
                At 25 °C <small className="font-normal">estimate</small>
              </th>
              <th scope="col">Temp. rise</th>
            </tr>
          </thead>
          <tbody>
            {groups.map((g) => (
              <tr key={g.group.key}>
                <th scope="row">
                  {g.group.label}
                  <small>
                    {g.n} result{g.n === 1 ? "" : "s"}
                    {g.openCases ? `, ${g.openCases} being checked by moderators` : ""}
                  </small>
                </th>
                <td>
                  <SummaryValue s={g.figures.sagLimitedC} interval={g.intervals.sagLimitedC} digits={1} unit="C" />
                </td>
                <td>
                  <SummaryValue s={g.figures.labelRatio} interval={g.intervals.labelRatio} digits={2} />
                </td>
                <td className="num">{g.sustainedC === null ? <span className="muted">—</span> : fmtC(g.sustainedC)}</td>
                <td>
                  <SummaryValue
                    s={g.figures.sustainedLabelRatio}
                    interval={g.intervals.sustainedLabelRatio}
                    digits={2}
                  />
                </td>
                <td>
                  <SummaryValue s={g.figures.capacityMah} interval={g.intervals.capacityMah} digits={0} unit="mAh" />
                </td>
                <td>
                  <SummaryValue s={g.figures.capacityRatio} interval={g.intervals.capacityRatio} digits={2} />
                </td>
                <td>
                  <SummaryValue
                    s={g.figures.holdVoltagePerCellV}
                    interval={g.intervals.holdVoltagePerCellV}
                    digits={3}
                    q="v"
                    cells={cells}
                  />
                </td>
                <td>
                  <SummaryValue
                    s={g.figures.dcResistanceMohm}
                    interval={g.intervals.dcResistanceMohm}
                    digits={2}
                    q="r"
                    cells={cells}
                    divide={cells}
                  />
                </td>
                <td>
                  <SummaryValue
                    s={g.figures.resistanceAt25CMohm}
                    interval={g.intervals.resistanceAt25CMohm}
                    digits={2}
                    q="r"
                    cells={cells}
                    divide={cells}
                  />
                </td>
                <td>
                  <SummaryValue
                    s={g.figures.temperatureRiseC}
                    interval={g.intervals.temperatureRiseC}
                    digits={1}
                    q="dtemp"
                  />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="muted space-y-1 text-xs">
        <p>
          <strong>{RATING_LABELS.estimate}</strong> is an estimate from a resistance, not a tested rate: the current at
          which the pack would sag from 3.7 V nominal to a 3.3 V floor per cell through the resistance read 10 s after
          the load edge, at each test&apos;s pack temperature (each result lists its own assumptions).{" "}
          <a href={methodsHref(METHODS_ANCHORS.sagLimitedC)}>Definition</a>. {LABEL_RATIO_LABELS.estimate}.
        </p>
        <p>
          <strong>{RATING_LABELS.measured}</strong> is measured: the current a run actually drew to its cut-off while
          holding the floor and staying under the stop temperature; a group shows the highest among its approved
          results. <a href={methodsHref(METHODS_ANCHORS.sustainedC)}>The rule</a>. {LABEL_RATIO_LABELS.measured}.
        </p>
        <p>
          DC resistance is measured on the pack and shown per cell (the pack&apos;s ÷ {cells} cells) unless you choose
          per pack under Units; &quot;at 25 °C&quot; is an estimate by {RESISTANCE_25C_SOURCE} — always read it beside
          the raw value. Definitions: <a href={methodsHref(METHODS_ANCHORS.figures)}>methods</a>.
        </p>
      </div>
    </div>
  );
}
