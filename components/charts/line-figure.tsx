// A line chart on a page: the drawing (draw/line-plot.tsx, shared with images and embeds), its legend and
// its table — readings at evenly spaced x for lines (the keyboard steps through them), every point for
// points-only charts.
import type { ReactNode } from "react";
import { fmt } from "@/lib/format";
import type { Quantity } from "@/lib/units";
import { ChartFigure, ChartLegend, type ChartTableData, type TableCell } from "./chart-figure";
import { LinePlot, READING_STEPS, lineScales, valueAt, type LineOptions, type LineSeries } from "./draw/line-plot";
import { lineLegendItems } from "./legends";

const HEIGHT = 300;

const yColumn = (o: { yLabel: string; yUnit?: Quantity; cells?: number }) =>
  o.yUnit ? { label: o.yLabel, u: o.yUnit, s: o.cells } : o.yLabel;

/**
 * How many steps the table reads across [d0, d1]: READING_STEPS, or fewer where the x values are written with
 * fewer distinct values than that — a cycle axis from 0 to 1 is read at 0 and 1, not at 16 points all written
 * "0" or "1" with values read between them.
 */
export function readingSteps(d0: number, d1: number, xDigits: number): number {
  const smallest = 10 ** -xDigits;
  return Math.max(1, Math.min(READING_STEPS, Math.floor((d1 - d0) / smallest + 1e-9)));
}

/** Read where the table's x is written: at the value its x column shows, not between two written values. */
const roundTo = (v: number, digits: number) => Math.round(v * 10 ** digits) / 10 ** digits;

function lineTable(
  series: LineSeries[],
  opts: LineOptions & { xLabel: string; yLabel: string; caption: string; yUnit?: Quantity; cells?: number },
): ChartTableData {
  const { x, onlyPoints } = lineScales(series, HEIGHT, opts);
  const fx = (v: number) => fmt(v, opts.xDigits ?? 0);
  const fy = (v: number | null): TableCell => fmt(v, opts.yDigits ?? 2);
  if (onlyPoints)
    return {
      caption: opts.caption,
      columns: ["Series", opts.xLabel, yColumn(opts)],
      rows: series.flatMap((s) =>
        s.points.map((p) => ({ cells: [s.href ? { text: s.label, href: s.href } : s.label, fx(p.x), fy(p.y)] })),
      ),
    };
  const [d0, d1] = x.domain() as [number, number];
  const steps = readingSteps(d0, d1, opts.xDigits ?? 0);
  return {
    caption: `${opts.caption} (read at ${steps + 1} evenly spaced points; — where a series has no data)`,
    columns: [
      opts.xLabel,
      ...series.map((s) => (opts.yUnit ? { label: s.label, u: opts.yUnit, s: opts.cells } : s.label)),
    ],
    rows: Array.from({ length: steps + 1 }, (_, i) => roundTo(d0 + ((d1 - d0) * i) / steps, opts.xDigits ?? 0)).map(
      (xv) => ({
        xPct: Math.round(x(xv) * 100) / 100,
        cells: [fx(xv), ...series.map((s) => fy(valueAt(s.points, xv, s.mode ?? "line")))],
      }),
    ),
  };
}

export function LineFigure({
  id,
  title,
  series,
  xLabel,
  yLabel,
  notes,
  tableCaption,
  yUnit,
  cells,
  ...opts
}: LineOptions & {
  id: string;
  title: string;
  series: LineSeries[];
  xLabel: string;
  yLabel: string;
  notes?: ReactNode;
  tableCaption: string;
  /** The y values' quantity for the reader's units (lib/units.ts). */
  yUnit?: Quantity;
  /** Cells in series when every series is one pack size (per-cell ↔ per-pack conversion). */
  cells?: number;
}) {
  const empty = series.every((s) => s.points.length === 0);
  return (
    <ChartFigure
      id={id}
      title={title}
      legend={<ChartLegend items={lineLegendItems(series)} />}
      table={lineTable(series, { ...opts, xLabel, yLabel, caption: tableCaption, yUnit, cells })}
      notes={notes}
      empty={empty ? "No data to draw." : undefined}
    >
      <LinePlot
        prefix={id}
        series={series}
        xLabel={xLabel}
        yLabel={yLabel}
        height={HEIGHT}
        interactive
        yUnit={yUnit}
        cells={cells}
        {...opts}
      />
    </ChartFigure>
  );
}
