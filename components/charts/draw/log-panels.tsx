// A log in Sagline's form: voltage, current and temperature against time as stacked panels that share one
// time axis, each with its own scale and unit — never two y axes on one plot, whose two scales can be
// stretched to suggest any relation between the lines. /analyse, review, result pages and the log images
// draw this one component.
import { scaleLinear } from "@visx/scale";
import { seriesStyle } from "../palette";
import type { Quantity } from "@/lib/units";
import { GUTTER, PlainXAxis, PlainYGrid, UnitTspan, fmtNum, linePath, px, tickDigits } from "./kit";

/** One reading of a log: time (s), voltage (V, per cell or per pack as the drawing's title says), current (A)
 * and pack temperature (°C); a panel is drawn for current and temperature only when the log has them. */
export type LogPoint = { s: number; v: number; a: number | null; t: number | null };

type Panel = { key: "v" | "a" | "t"; title: string; unit?: Quantity; color: string; dash?: string; digits: number };

const PANEL_H = 96;
const GAP = 30;
const BOTTOM = 44;

function logPanels(points: LogPoint[], perCell: boolean): Panel[] {
  const panels: Panel[] = [
    {
      key: "v",
      title: perCell ? "Voltage" : "Pack voltage, V",
      unit: perCell ? "v" : undefined,
      color: seriesStyle(0).color,
      digits: 2,
    },
  ];
  if (points.some((p) => p.a !== null))
    panels.push({ key: "a", title: "Current, A", color: seriesStyle(1).color, dash: seriesStyle(1).dash, digits: 1 });
  if (points.some((p) => p.t !== null))
    panels.push({
      key: "t",
      title: "Pack temperature",
      unit: "temp",
      color: seriesStyle(3).color,
      dash: seriesStyle(3).dash,
      digits: 0,
    });
  return panels;
}

/** Time in minutes once a log is longer than five minutes. */
export const logTime = (points: LogPoint[]) => {
  const last = points[points.length - 1]?.s ?? 0;
  const first = points[0]?.s ?? 0;
  return last - first > 300 ? { div: 60, title: "Time (min)" } : { div: 1, title: "Time (s)" };
};

const logHeight = (panels: number) => panels * (PANEL_H + GAP) + BOTTOM - 8;

export function logX(points: LogPoint[]) {
  const { div } = logTime(points);
  const first = (points[0]?.s ?? 0) / div;
  const last = (points[points.length - 1]?.s ?? 1) / div;
  return scaleLinear<number>({ domain: [first, last > first ? last : first + 1], range: [1, 99] });
}

export function LogPanels({
  points,
  perCell = true,
  stopTemperatureC,
  width = "100%",
  x: left,
  y: top,
  interactive = false,
  cells,
  tickCount = 5,
}: {
  points: LogPoint[];
  /** Whether the voltages are per cell (else the pack's). */
  perCell?: boolean;
  stopTemperatureC?: number | null;
  width?: number | "100%";
  x?: number;
  y?: number;
  interactive?: boolean;
  /** Cells in series, so the reader may switch voltage per cell ↔ per pack (lib/units.ts). */
  cells?: number;
  tickCount?: number;
}) {
  const panels = logPanels(points, perCell);
  const height = logHeight(panels.length);
  const time = logTime(points);
  const x = logX(points);
  const bottom = height - BOTTOM;
  const a11y = interactive
    ? {
        tabIndex: 0,
        "data-readings": "",
        "aria-label": `Log: ${panels.map((p) => p.title).join("; ")}, against time. Use the left and right arrow keys to read values, or show the chart as a table.`,
      }
    : { "aria-label": `Log: ${panels.map((p) => p.title).join("; ")}, against time.` };
  return (
    <svg width={width} height={height} x={left} y={top} className="chart-svg" overflow="visible" role="img" {...a11y}>
      {panels.map((panel, i) => {
        const y0 = i * (PANEL_H + GAP) + 22;
        const valueOf = (p: LogPoint) => p[panel.key];
        const values = points.flatMap((p) => (valueOf(p) === null ? [] : [valueOf(p) as number]));
        const refs = panel.key === "t" && stopTemperatureC != null ? [stopTemperatureC] : [];
        const lo = Math.min(...values, ...refs);
        const hi = Math.max(...values, ...refs);
        const pad = (hi - lo) * 0.08 || 1;
        const y = scaleLinear<number>({ domain: [lo - pad, hi + pad], range: [y0 + PANEL_H, y0 + 8], nice: true });
        const ticks = y.ticks(3);
        const d = linePath(
          points.flatMap((p) => {
            const v = valueOf(p);
            return v === null ? [] : [{ xPct: x(p.s / time.div), y: y(v) }];
          }),
        );
        return (
          <g key={panel.key} data-panel={panel.key}>
            <text x={-GUTTER} y={y0 - 8} fontSize={12} fontWeight={600} fill="currentColor">
              {panel.title}
              {panel.unit ? (
                <>
                  , <UnitTspan q={panel.unit} cells={panel.key === "v" ? cells : undefined} />
                </>
              ) : null}
            </text>
            <PlainYGrid
              ticks={ticks}
              y={y}
              format={(v) => fmtNum(v, Math.min(panel.digits, tickDigits(ticks)))}
              unit={panel.unit}
              cells={panel.key === "v" ? cells : undefined}
            />
            {refs.map((r) => (
              <g key={r}>
                <line x1="0%" x2="100%" y1={px(y(r))} y2={px(y(r))} stroke="currentColor" strokeDasharray="3 3" />
                <text x="100%" y={px(y(r) - 4)} textAnchor="end" fontSize={11} fill="currentColor">
                  stop{" "}
                  <tspan data-u="temp" data-v={r} data-sym="">
                    {fmtNum(r, 0)} °C
                  </tspan>
                </text>
              </g>
            ))}
            <svg
              width="100%"
              height={height}
              viewBox={`0 0 1000 ${height}`}
              preserveAspectRatio="none"
              overflow="visible"
            >
              <path
                d={d}
                fill="none"
                stroke={panel.color}
                strokeWidth={2}
                strokeDasharray={panel.dash}
                strokeLinejoin="round"
                vectorEffect="non-scaling-stroke"
              />
            </svg>
          </g>
        );
      })}
      <PlainXAxis ticks={x.ticks(tickCount)} x={x} y={bottom} format={(v) => fmtNum(v, 0)} title={time.title} />
      {interactive ? (
        <line
          data-chart-cursor=""
          x1="0%"
          x2="0%"
          y1={14}
          y2={bottom}
          stroke="currentColor"
          strokeOpacity={0.6}
          visibility="hidden"
        />
      ) : null}
    </svg>
  );
}
