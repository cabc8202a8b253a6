// Several series over a shared x axis (discharge curves, values over cycles). Colour, dash and marker shape
// together tell series apart (palette.ts). Pages, embeds and images draw this one component; on a page the
// plot is focusable and ← → read the chart's table rows (chart-behaviour-client.tsx).
import { scaleLinear } from "@visx/scale";
import { seriesStyle } from "../palette";
import type { Quantity } from "@/lib/units";
import { XAxis, YGrid } from "./axes";
import { MarkerDefs, MarkerUse, UnitTspan, YTitle, linePath, fmtNum, px, tickDigits, yTickCount } from "./kit";

export type XY = { x: number; y: number };
export type LineSeries = {
  id: string;
  label: string;
  href?: string;
  points: XY[];
  mode?: "line" | "points";
  styleIndex?: number;
};
export type LineOptions = {
  xDigits?: number;
  yDigits?: number;
  refLines?: { y: number; label: string }[];
  yDomain?: [number, number];
  tickCount?: number;
};

const TOP = 26;
const BOTTOM = 44;
/** Readings across the chart for its table and the keyboard: this many intervals. */
export const READING_STEPS = 15;
/** About this many markers along each line (with its colour and dash, the marker tells series apart). */
const MARKERS_PER_LINE = 6;

/** The scales of a line chart: x in percent of the plot width, y in pixels. Shared with its table. */
export function lineScales(series: LineSeries[], height: number, opts: LineOptions = {}) {
  const all = series.flatMap((s) => s.points);
  const xs = all.map((p) => p.x);
  const ys = [...all.map((p) => p.y), ...(opts.refLines ?? []).map((r) => r.y)];
  const xMin = Math.min(...xs, Number.POSITIVE_INFINITY);
  const xMax = Math.max(...xs, Number.NEGATIVE_INFINITY);
  const yMin = Math.min(...ys, Number.POSITIVE_INFINITY);
  const yMax = Math.max(...ys, Number.NEGATIVE_INFINITY);
  const pad = (yMax - yMin) * 0.08 || 1;
  const onlyPoints = series.length > 0 && series.every((s) => s.mode === "points");
  // Points-only charts get room on x so markers at the ends are not cut.
  const xPad = onlyPoints ? 4 : 1;
  const x = scaleLinear<number>({
    domain: [Math.min(0, xMin), xMax > xMin ? xMax : xMin + 1],
    range: [xPad, 100 - xPad],
    nice: true,
  });
  const y = scaleLinear<number>({
    domain: opts.yDomain ?? [yMin - pad, yMax + pad],
    range: [height - BOTTOM, TOP + 8],
    nice: true,
  });
  return { x, y, onlyPoints, bottom: height - BOTTOM };
}

/** The value of a series at x: interpolated on lines, the nearest point for points; null outside a line. */
export function valueAt(points: XY[], x: number, mode: "line" | "points" = "line"): number | null {
  const first = points[0];
  const last = points[points.length - 1];
  if (!first || !last) return null;
  if (mode === "points") {
    let best = first;
    for (const p of points) if (Math.abs(p.x - x) < Math.abs(best.x - x)) best = p;
    return best.y;
  }
  if (x < first.x || x > last.x) return null;
  for (let k = 1; k < points.length; k++) {
    const a = points[k - 1] as XY;
    const b = points[k] as XY;
    if (x <= b.x) return b.x === a.x ? b.y : a.y + ((x - a.x) / (b.x - a.x)) * (b.y - a.y);
  }
  return last.y;
}

export function LinePlot({
  prefix,
  series,
  xLabel,
  yLabel,
  height = 300,
  width = "100%",
  x: left,
  y: top,
  interactive = false,
  yUnit,
  cells,
  ...opts
}: LineOptions & {
  prefix: string;
  series: LineSeries[];
  xLabel: string;
  yLabel: string;
  height?: number;
  width?: number | "100%";
  x?: number;
  y?: number;
  /** On a page: focusable, with a cursor the keyboard moves through the table's readings. */
  interactive?: boolean;
  /** The y values' quantity for the reader's units (lib/units.ts); its symbol is added to the y title. */
  yUnit?: Quantity;
  /** Cells in series when every series is one pack size (per-cell ↔ per-pack conversion). */
  cells?: number;
}) {
  const { x, y, bottom } = lineScales(series, height, opts);
  const xDigits = opts.xDigits ?? 0;
  const yDigits = opts.yDigits ?? 2;
  const styles = series.map((s, i) => seriesStyle(s.styleIndex ?? i));
  // Whole-number axes (cycles, mAh) get whole-number ticks only: no "0.5 cycles".
  const xTicks = x.ticks(opts.tickCount ?? 5).filter((v) => xDigits > 0 || Number.isInteger(v));
  const yTicks = y.ticks(yTickCount(bottom - TOP));
  const yTickDigits = Math.min(yDigits, tickDigits(yTicks));
  const a11y = interactive
    ? {
        tabIndex: 0,
        "data-readings": "",
        role: "img",
        "aria-label": `${yLabel} against ${xLabel}, ${series.length} series. Use the left and right arrow keys to read values, or show the chart as a table.`,
      }
    : { role: "img", "aria-label": `${yLabel} against ${xLabel}, ${series.length} series.` };
  return (
    <svg width={width} height={height} x={left} y={top} className="chart-svg" overflow="visible" {...a11y}>
      <MarkerDefs prefix={prefix} marks={styles} />
      <YTitle y={12}>
        {yLabel}
        {yUnit ? (
          <>
            , <UnitTspan q={yUnit} cells={cells} />
          </>
        ) : null}
      </YTitle>
      <YGrid ticks={yTicks} y={y} format={(v) => fmtNum(v, yTickDigits)} unit={yUnit} cells={cells} />
      {(opts.refLines ?? []).map((r) => (
        <g key={r.label}>
          <line x1="0%" x2="100%" y1={px(y(r.y))} y2={px(y(r.y))} stroke="currentColor" strokeDasharray="3 3" />
          <text x="100%" y={px(y(r.y) - 4)} textAnchor="end" fontSize={11} fill="currentColor">
            {r.label}
          </text>
        </g>
      ))}
      <XAxis ticks={xTicks} x={x} y={bottom} format={(v) => fmtNum(v, xDigits)} title={xLabel} />
      <svg
        width="100%"
        height={height}
        viewBox={`0 0 1000 ${height}`}
        preserveAspectRatio="none"
        overflow="visible"
        fill="none"
        strokeWidth={2}
        strokeLinejoin="round"
      >
        {series.map((s, i) =>
          s.mode === "points" || s.points.length === 0 ? null : (
            <path
              key={s.id}
              d={linePath(s.points.map((p) => ({ xPct: x(p.x), y: y(p.y) })))}
              stroke={styles[i]?.color}
              strokeDasharray={styles[i]?.dash}
              vectorEffect="non-scaling-stroke"
            />
          ),
        )}
      </svg>
      {series.map((s, i) => {
        const st = styles[i];
        if (!st) return null;
        const every = s.mode === "points" ? 1 : Math.max(1, Math.ceil(s.points.length / MARKERS_PER_LINE));
        return (
          <g key={s.id}>
            {s.points.map((p, k) =>
              k % every === 0 ? <MarkerUse key={k} prefix={prefix} mark={st} xPct={x(p.x)} y={y(p.y)} /> : null,
            )}
          </g>
        );
      })}
      {interactive ? (
        <line
          data-chart-cursor=""
          x1="0%"
          x2="0%"
          y1={TOP}
          y2={bottom}
          stroke="currentColor"
          strokeOpacity={0.6}
          visibility="hidden"
        />
      ) : null}
    </svg>
  );
}
