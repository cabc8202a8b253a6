import { SummaryValue } from "@/components/summary-value";
import type { PackSummary } from "@/lib/catalogue";
import { markDistinguished, type ComparedPack, type Direction, type Mark } from "@/lib/compare";
import { RATING_LABELS } from "@/lib/figure-words";
import { exclusionText } from "@/lib/like-for-like";
import { LabelPairNote } from "@/components/label-pair-note";
import { Qty } from "@/components/quantity";
import { fmtC, labelSpec, packTitle } from "@/lib/format";
import type { Quantity } from "@/lib/units";
import type { Summary, SummaryFigure } from "@/lib/pack-summary";

// Delivered capacity has no "better": packs of different sizes differ by design (capacity ratio is the fair one).
// Resistances are stored per pack and shown per cell by default (`perCell`: divided by the pack's cells), like
// every figure the reader's units control (lib/units.ts).
type Row = {
  label: string;
  figure: SummaryFigure;
  digits: number;
  unit: string;
  better: Direction | null;
  q?: Quantity;
  perCell?: boolean;
};
const ROWS: Row[] = [
  { label: "Sustained C (measured, median)", figure: "sustainedCMeasured", digits: 1, unit: "C", better: "higher" },
  {
    label: "Label ratio (measured ÷ label)",
    figure: "sustainedLabelRatio",
    digits: 2,
    unit: "",
    better: "higher",
  },
  { label: RATING_LABELS.estimate, figure: "sagLimitedC", digits: 1, unit: "C", better: "higher" },
  { label: "Label ratio (estimate ÷ label)", figure: "labelRatio", digits: 2, unit: "", better: "higher" },
  { label: "Delivered capacity", figure: "capacityMah", digits: 0, unit: "mAh", better: null },
  { label: "Capacity ratio", figure: "capacityRatio", digits: 2, unit: "", better: "higher" },
  { label: "Hold voltage", figure: "holdVoltagePerCellV", digits: 3, unit: "", better: "higher", q: "v" },
  { label: "DC resistance", figure: "dcResistanceMohm", digits: 2, unit: "", better: "lower", q: "r", perCell: true },
  {
    label: "DC resistance at 25 °C (estimate)",
    figure: "resistanceAt25CMohm",
    digits: 2,
    unit: "",
    better: "lower",
    q: "r",
    perCell: true,
  },
  { label: "Temperature rise", figure: "temperatureRiseC", digits: 1, unit: "", better: "lower", q: "dtemp" },
];

function MarkNote({ best, note }: Mark) {
  if (best)
    return (
      <span className="mt-0.5 inline-block rounded bg-cell-100 px-1 text-xs font-medium text-cell-700 dark:bg-cell-700/40 dark:text-cell-100">
        ★ best
      </span>
    );
  if (note) return <span className="mt-0.5 inline-block text-xs text-charge-700 dark:text-charge-400">{note}</span>;
  return null;
}

/** Figures side by side: rows are figures, columns are packs (first column sticks on a phone). */
export function CompareTable({ packs, compared }: { packs: PackSummary[]; compared: ComparedPack[] }) {
  const cell = "border-b border-ink/5 px-3 py-2 align-top dark:border-night-line/60";
  const head = "sticky left-0 z-10 bg-paper-raised text-left font-normal dark:bg-night-raised";
  return (
    <div className="card -mx-4 overflow-x-auto p-0 sm:mx-0" tabIndex={0} role="region" aria-label="Comparison table">
      <table className="w-full min-w-[40rem] border-collapse text-sm" data-testid="compare-table">
        <caption className="sr-only">
          Figures of the compared packs in one like-for-like group. ★ marks a pack whose median is distinguishably
          better than every other pack&apos;s (95 % intervals apart); otherwise the row says the packs are not
          distinguishable.
        </caption>
        <thead>
          <tr>
            <th scope="col" className={`${cell} ${head} w-32 sm:w-48`}>
              <span className="sr-only">Figure</span>
            </th>
            {packs.map((p) => (
              <th key={p.slug} scope="col" className={`${cell} text-left font-medium`}>
                <a href={`/packs/${p.slug}`}>{packTitle(p)}</a>
                <span className="num muted block text-xs font-normal">
                  {labelSpec(p)} <LabelPairNote burst={p.labelledBurstC !== null} /> ·{" "}
                  <Qty q="mass" v={p.weightG} digits={0} />
                </span>
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          <tr>
            <th scope="row" className={`${cell} ${head}`}>
              Results in this group
            </th>
            {compared.map((c) => (
              <td key={c.packId} className={`${cell} num`}>
                {c.n === 0 ? <span className="text-warn">none — figures missing</span> : c.n}
              </td>
            ))}
          </tr>
          {ROWS.map((row) => {
            const summaries = compared.map((c) => c.figures[row.figure] as Summary | null);
            const rowMarks = row.better
              ? markDistinguished(
                  compared.map((c) => c.intervals[row.figure]),
                  row.better,
                )
              : null;
            const marks = rowMarks?.marks ?? [];
            return (
              <tr key={row.figure}>
                <th scope="row" className={`${cell} ${head}`}>
                  {row.label}
                  <span className="muted block text-xs">
                    {row.better ? `${row.better} is better` : "not ranked: sizes differ"}
                  </span>
                  {rowMarks?.note ? (
                    <span className="block text-xs font-normal" data-testid="not-distinguishable">
                      {rowMarks.note}
                    </span>
                  ) : null}
                </th>
                {summaries.map((s, i) => (
                  <td
                    key={compared[i]?.packId ?? i}
                    className={`${cell} ${marks[i]?.best ? "bg-cell-50 dark:bg-cell-700/15" : ""}`}
                  >
                    <SummaryValue
                      s={s}
                      digits={row.digits}
                      unit={row.unit}
                      q={row.q}
                      cells={packs[i]?.cellsInSeries}
                      divide={row.perCell ? (packs[i]?.cellsInSeries ?? 1) : 1}
                    />
                    {marks[i] ? <MarkNote {...marks[i]} /> : null}
                  </td>
                ))}
              </tr>
            );
          })}
          <tr>
            <th scope="row" className={`${cell} ${head}`}>
              Sustained C (the pack&apos;s rating)
              <span className="muted block text-xs">
                highest measured among approved results; ranked by the median above
              </span>
            </th>
            {compared.map((c) => (
              <td key={c.packId} className={`${cell} num`}>
                {c.sustainedC === null ? <span className="muted">—</span> : fmtC(c.sustainedC)}
              </td>
            ))}
          </tr>
          <tr>
            <th scope="row" className={`${cell} ${head}`}>
              Left out
            </th>
            {compared.map((c) => (
              <td key={c.packId} className={`${cell} text-xs`} data-testid="excluded">
                {c.excluded.length === 0 ? (
                  <span className="muted">nothing</span>
                ) : (
                  c.excluded.map((e) => <p key={e.reason}>{exclusionText(e)}</p>)
                )}
              </td>
            ))}
          </tr>
        </tbody>
      </table>
    </div>
  );
}
