"use client";
// Several series over a shared x axis (discharge curves, values over cycles). Colour, dash and marker
// shape together tell series apart. Keyboard: focus the plot, then ← → move a cursor that reads every
// series at that x; Esc hides the reading.
import { AxisBottom, AxisLeft } from "@visx/axis";
import { localPoint } from "@visx/event";
import { GridRows } from "@visx/grid";
import { Group } from "@visx/group";
import { scaleLinear } from "@visx/scale";
import { LinePath } from "@visx/shape";
import { useState } from "react";
import { ChartFrame, type ChartTable } from "./chart-frame";
import { Marker } from "./marker";
import { seriesStyle } from "./palette";
import { Tooltip } from "./tooltip";
import { useWidth } from "./use-width";

export type LineSeries = {
  id: string;
  label: string;
  href?: string;
  points: { x: number; y: number }[];
  mode?: "line" | "points";
  styleIndex?: number;
};

const margin = { top: 14, right: 18, bottom: 50, left: 60 };
const STEPS = 60;

function valueAt(points: { x: number; y: number }[], x: number, mode: "line" | "points"): number | null {
  if (points.length === 0) return null;
  const first = points[0] as { x: number; y: number };
  const last = points[points.length - 1] as { x: number; y: number };
  if (mode === "points") {
    let best = first;
    for (const p of points) if (Math.abs(p.x - x) < Math.abs(best.x - x)) best = p;
    return best.y;
  }
  if (x < first.x || x > last.x) return null;
  for (let k = 1; k < points.length; k++) {
    const a = points[k - 1] as { x: number; y: number };
    const b = points[k] as { x: number; y: number };
    if (x <= b.x) return b.x === a.x ? b.y : a.y + ((x - a.x) / (b.x - a.x)) * (b.y - a.y);
  }
  return last.y;
}

export function LineChart({
  title,
  series,
  xLabel,
  yLabel,
  xDigits = 0,
  yDigits = 2,
  refLines = [],
  notes,
  tableCaption,
  height: fixedHeight,
  yDomain,
}: {
  title: string;
  series: LineSeries[];
  xLabel: string;
  yLabel: string;
  xDigits?: number;
  yDigits?: number;
  refLines?: { y: number; label: string }[];
  notes?: React.ReactNode;
  tableCaption: string;
  height?: number;
  yDomain?: [number, number];
}) {
  const { ref, width } = useWidth<HTMLDivElement>(720);
  const height = fixedHeight ?? Math.round(Math.min(380, Math.max(260, width * 0.5)));
  const [cursor, setCursor] = useState<number | null>(null);
  const innerW = width - margin.left - margin.right;
  const innerH = height - margin.top - margin.bottom;
  const all = series.flatMap((s) => s.points);
  const xs = all.map((p) => p.x);
  const ys = [...all.map((p) => p.y), ...refLines.map((r) => r.y)];
  const xMin = Math.min(...xs, Number.POSITIVE_INFINITY);
  const xMax = Math.max(...xs, Number.NEGATIVE_INFINITY);
  const yMin = Math.min(...ys, Number.POSITIVE_INFINITY);
  const yMax = Math.max(...ys, Number.NEGATIVE_INFINITY);
  const pad = (yMax - yMin) * 0.08 || 1;
  // Points-only charts get a margin on x so markers at the ends are not cut by the axes.
  const xPad = series.every((s) => s.mode === "points") ? (xMax - Math.min(0, xMin)) * 0.06 || 1 : 0;
  const x = scaleLinear<number>({
    domain: [Math.min(0, xMin) - xPad, (xMax > xMin ? xMax : xMin + 1) + xPad],
    range: [0, innerW],
    nice: true,
  });
  const y = scaleLinear<number>({ domain: yDomain ?? [yMin - pad, yMax + pad], range: [innerH, 0], nice: true });
  const [d0, d1] = x.domain() as [number, number];
  const stepX = (i: number) => d0 + ((d1 - d0) * i) / STEPS;
  const fx = (v: number) =>
    v.toLocaleString("en-GB", { maximumFractionDigits: xDigits, minimumFractionDigits: xDigits });
  const fy = (v: number | null) =>
    v === null ? "—" : v.toLocaleString("en-GB", { maximumFractionDigits: yDigits, minimumFractionDigits: yDigits });
  const onlyPoints = series.every((s) => s.mode === "points");
  // Whole-number axes (cycles, mAh) get whole-number ticks only: no "0.5 cycles".
  const xTicks = x.ticks(width < 500 ? 4 : 8).filter((v) => xDigits > 0 || Number.isInteger(v));

  const table: ChartTable = onlyPoints
    ? {
        caption: tableCaption,
        columns: ["Series", xLabel, yLabel],
        rows: series.flatMap((s) =>
          s.points.map((p) => [s.href ? { text: s.label, href: s.href } : s.label, fx(p.x), fy(p.y)]),
        ),
      }
    : {
        caption: `${tableCaption} (read at ${STEPS / 4 + 1} evenly spaced points; — where a series has no data)`,
        columns: [xLabel, ...series.map((s) => s.label)],
        rows: Array.from({ length: STEPS / 4 + 1 }, (_, i) => stepX(i * 4)).map((xv) => [
          fx(xv),
          ...series.map((s) => fy(valueAt(s.points, xv, s.mode ?? "line"))),
        ]),
      };

  const legend = (
    <ul className="flex flex-wrap gap-x-4 gap-y-1" aria-label="Legend">
      {series.map((s, i) => {
        const st = seriesStyle(s.styleIndex ?? i);
        return (
          <li key={s.id} className="flex items-center gap-1.5">
            <svg width="30" height="12" aria-hidden="true">
              {s.mode === "points" ? null : (
                <line x1="0" y1="6" x2="30" y2="6" stroke={st.color} strokeWidth={2} strokeDasharray={st.dash} />
              )}
              <Marker shape={st.shape} x={15} y={6} size={8} color={st.color} />
            </svg>
            {s.href ? <a href={s.href}>{s.label}</a> : <span>{s.label}</span>}
          </li>
        );
      })}
    </ul>
  );

  const cx = cursor === null ? null : stepX(cursor);
  const onKey = (e: React.KeyboardEvent) => {
    if (e.key === "Escape") return setCursor(null);
    if (e.key === "ArrowRight" || e.key === "ArrowLeft" || e.key === "Home" || e.key === "End") {
      e.preventDefault();
      setCursor((c) =>
        e.key === "Home"
          ? 0
          : e.key === "End"
            ? STEPS
            : Math.max(0, Math.min(STEPS, (c ?? -1) + (e.key === "ArrowRight" ? 1 : -1))),
      );
    }
  };

  return (
    <ChartFrame title={title} legend={legend} notes={notes} table={table}>
      <div ref={ref} className="relative w-full">
        {all.length === 0 ? (
          <p className="muted py-10 text-center">No data to draw.</p>
        ) : (
          <svg
            width={width}
            height={height}
            className="block max-w-full"
            role="img"
            tabIndex={0}
            onKeyDown={onKey}
            onBlur={() => setCursor(null)}
            aria-label={`${title}. ${xLabel} against ${yLabel}, ${series.length} series. Use the left and right arrow keys to read values; or show as table.`}
          >
            <Group left={margin.left} top={margin.top}>
              <g className="text-ink/10 dark:text-paper/10">
                <GridRows scale={y} width={innerW} stroke="currentColor" numTicks={5} />
              </g>
              {refLines.map((r) => (
                <g key={r.label} className="text-ink-soft dark:text-paper/60">
                  <line x1={0} x2={innerW} y1={y(r.y)} y2={y(r.y)} stroke="currentColor" strokeDasharray="3 3" />
                  <text x={innerW - 2} y={y(r.y) - 4} textAnchor="end" fontSize={11} fill="currentColor">
                    {r.label}
                  </text>
                </g>
              ))}
              {series.map((s, i) => {
                const st = seriesStyle(s.styleIndex ?? i);
                const every = Math.max(1, Math.ceil(s.points.length / 8));
                return (
                  <g key={s.id}>
                    {s.mode === "points" ? null : (
                      <LinePath
                        data={s.points}
                        x={(p) => x(p.x)}
                        y={(p) => y(p.y)}
                        stroke={st.color}
                        strokeWidth={2}
                        strokeDasharray={st.dash}
                      />
                    )}
                    {s.points.map((p, k) =>
                      s.mode === "points" || k % every === 0 ? (
                        <Marker
                          key={k}
                          shape={st.shape}
                          x={x(p.x)}
                          y={y(p.y)}
                          size={s.mode === "points" ? 9 : 7}
                          color={st.color}
                        />
                      ) : null,
                    )}
                  </g>
                );
              })}
              {cx !== null ? (
                <line
                  x1={x(cx)}
                  x2={x(cx)}
                  y1={0}
                  y2={innerH}
                  stroke="currentColor"
                  className="text-ink-soft dark:text-paper/60"
                />
              ) : null}
              <g className="text-ink-soft dark:text-paper/70">
                <AxisBottom
                  top={innerH}
                  scale={x}
                  tickValues={xTicks}
                  tickFormat={(v) => fx(Number(v))}
                  stroke="currentColor"
                  tickStroke="currentColor"
                  tickLabelProps={{ fill: "currentColor", fontSize: 11, textAnchor: "middle" }}
                  label={xLabel}
                  labelProps={{ fill: "currentColor", fontSize: 12, textAnchor: "middle" }}
                />
                <AxisLeft
                  scale={y}
                  numTicks={5}
                  stroke="currentColor"
                  tickStroke="currentColor"
                  tickLabelProps={{ fill: "currentColor", fontSize: 11, textAnchor: "end", dx: -2, dy: 3 }}
                  label={yLabel}
                  labelOffset={40}
                  labelProps={{ fill: "currentColor", fontSize: 12, textAnchor: "middle" }}
                />
              </g>
              <rect
                width={innerW}
                height={innerH}
                fill="transparent"
                onMouseMove={(e) => {
                  const p = localPoint(e);
                  if (p) setCursor(Math.round(((x.invert(p.x - margin.left) - d0) / (d1 - d0)) * STEPS));
                }}
                onMouseLeave={() => setCursor(null)}
              />
            </Group>
          </svg>
        )}
        {cx !== null ? (
          <Tooltip left={margin.left + x(cx)} top={margin.top + 10} containerWidth={width}>
            <p className="num font-medium">
              {xLabel}: {fx(cx)}
            </p>
            {series.map((s, i) => (
              <p key={s.id} className="num flex items-center gap-1">
                <svg width="10" height="10" aria-hidden="true">
                  <Marker
                    shape={seriesStyle(s.styleIndex ?? i).shape}
                    x={5}
                    y={5}
                    size={7}
                    color={seriesStyle(s.styleIndex ?? i).color}
                  />
                </svg>
                <span>
                  {s.label}: {fy(valueAt(s.points, cx, s.mode ?? "line"))}
                </span>
              </p>
            ))}
          </Tooltip>
        ) : null}
      </div>
    </ChartFrame>
  );
}
