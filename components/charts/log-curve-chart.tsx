"use client";
// A small preview of a log: pack voltage (left axis, solid), current (right axis, dashed) and, when asked,
// pack temperature (its own scale, dotted, labelled at both ends) against time, with a "show as table" toggle.
// Colours are Okabe–Ito and always paired with a dash pattern. The current axis spans charge (negative) and
// discharge alike, so a charge phase stays inside the chart.
import { useCallback, useId, useMemo, useRef, useState } from "react";
import { AxisBottom, AxisLeft, AxisRight } from "@visx/axis";
import { GridRows } from "@visx/grid";
import { Group } from "@visx/group";
import { scaleLinear } from "@visx/scale";
import { LinePath } from "@visx/shape";
import type { CurvePoint } from "@/lib/analysis/types";
import { fmt } from "@/lib/format";

const MARGIN = { top: 12, right: 52, bottom: 40, left: 52 };
const HEIGHT = 260;

type Props = { points: CurvePoint[]; title?: string; withTemperature?: boolean };

/** The width of an element, kept up to date; a callback ref, so a re-mounted element is observed too. */
function useWidth(initial: number): [(el: HTMLDivElement | null) => void, number] {
  const [width, setWidth] = useState(initial);
  const observer = useRef<ResizeObserver | null>(null);
  const ref = useCallback((el: HTMLDivElement | null) => {
    observer.current?.disconnect();
    observer.current = null;
    if (!el) return;
    setWidth(el.getBoundingClientRect().width);
    observer.current = new ResizeObserver((entries) => {
      const w = entries[0]?.contentRect.width;
      if (w !== undefined && w > 0) setWidth(w);
    });
    observer.current.observe(el);
  }, []);
  return [ref, width];
}

function extent(values: number[]): [number, number] {
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  for (const v of values) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  if (!Number.isFinite(lo)) return [0, 1];
  if (lo === hi) return [lo - 1, hi + 1];
  const pad = (hi - lo) * 0.05;
  return [lo - pad, hi + pad];
}

export function LogCurveChart({ points, title = "Voltage and current over time", withTemperature = false }: Props) {
  const [asTable, setAsTable] = useState(false);
  const [parentRef, width] = useWidth(320);
  const tableId = useId();
  const durationS = points.length > 0 ? (points[points.length - 1]?.timeS ?? 0) - (points[0]?.timeS ?? 0) : 0;
  const inMinutes = durationS > 300;
  const timeLabel = inMinutes ? "Time (min)" : "Time (s)";

  const scales = useMemo(() => {
    const tx = (p: CurvePoint) => (inMinutes ? p.timeS / 60 : p.timeS);
    const innerW = Math.max(10, width - MARGIN.left - MARGIN.right);
    const innerH = HEIGHT - MARGIN.top - MARGIN.bottom;
    const x = scaleLinear<number>({ domain: extent(points.map(tx)), range: [0, innerW] });
    const v = scaleLinear<number>({ domain: extent(points.map((p) => p.voltageV)), range: [innerH, 0], nice: true });
    const [iLo, iHi] = extent(points.map((p) => p.currentA));
    const i = scaleLinear<number>({ domain: [Math.min(iLo, 0), Math.max(iHi, 0.1)], range: [innerH, 0], nice: true });
    const temps = points.flatMap((p) => (p.temperatureC === null ? [] : [p.temperatureC]));
    const t = temps.length > 1 ? scaleLinear<number>({ domain: extent(temps), range: [innerH, 0], nice: true }) : null;
    return { x, v, i, t, tx, innerW, innerH };
  }, [points, width, inMinutes]);

  if (points.length === 0) return <p className="muted text-sm">No curve to show.</p>;
  const tickCount = width < 480 ? 4 : 8;

  return (
    <figure className="space-y-2">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <figcaption className="text-sm font-medium">{title}</figcaption>
        <div className="flex items-center gap-4 text-xs">
          <span className="flex items-center gap-1">
            <svg width="24" height="8" aria-hidden="true">
              <line x1="0" y1="4" x2="24" y2="4" strokeWidth="2" className="stroke-[#0072B2] dark:stroke-[#56B4E9]" />
            </svg>
            Voltage (V)
          </span>
          <span className="flex items-center gap-1">
            <svg width="24" height="8" aria-hidden="true">
              <line
                x1="0"
                y1="4"
                x2="24"
                y2="4"
                strokeWidth="2"
                strokeDasharray="5 3"
                className="stroke-[#D55E00] dark:stroke-[#E69F00]"
              />
            </svg>
            Current (A)
          </span>
          {withTemperature && scales.t ? (
            <span className="flex items-center gap-1">
              <svg width="24" height="8" aria-hidden="true">
                <line
                  x1="0"
                  y1="4"
                  x2="24"
                  y2="4"
                  strokeWidth="2"
                  strokeDasharray="1 3"
                  strokeLinecap="round"
                  className="stroke-[#009E73] dark:stroke-[#6fd3b2]"
                />
              </svg>
              Temperature (°C, {fmt(scales.t.domain()[0], 0)}–{fmt(scales.t.domain()[1], 0)})
            </span>
          ) : null}
          <button
            type="button"
            onClick={() => setAsTable((t) => !t)}
            aria-expanded={asTable}
            aria-controls={tableId}
            className="rounded border border-ink/20 px-2 py-0.5 hover:bg-paper-sunk dark:border-night-line dark:hover:bg-night-sunk"
          >
            {asTable ? "Show as chart" : "Show as table"}
          </button>
        </div>
      </div>
      {asTable ? (
        <div id={tableId} className="max-h-80 overflow-auto rounded border border-ink/10 dark:border-night-line">
          <table className="num w-full text-right text-xs">
            <caption className="sr-only">{title}</caption>
            <thead className="sticky top-0 bg-paper-sunk dark:bg-night-sunk">
              <tr>
                <th scope="col" className="px-2 py-1">
                  Time (s)
                </th>
                <th scope="col" className="px-2 py-1">
                  Voltage (V)
                </th>
                <th scope="col" className="px-2 py-1">
                  Current (A)
                </th>
                <th scope="col" className="px-2 py-1">
                  Temperature (°C)
                </th>
                <th scope="col" className="px-2 py-1">
                  Capacity (mAh)
                </th>
              </tr>
            </thead>
            <tbody>
              {points.map((p) => (
                <tr key={p.timeS} className="border-t border-ink/5 dark:border-night-line">
                  <td className="px-2">{fmt(p.timeS, 1)}</td>
                  <td className="px-2">{fmt(p.voltageV, 3)}</td>
                  <td className="px-2">{fmt(p.currentA, 2)}</td>
                  <td className="px-2">{fmt(p.temperatureC, 1)}</td>
                  <td className="px-2">{fmt(p.capacityMah, 0)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : (
        <div ref={parentRef} className="w-full" id={tableId}>
          <svg
            width={width}
            height={HEIGHT}
            role="img"
            aria-label={`${title}: ${points.length} points over ${fmt(durationS, 0)} s; voltage from ${fmt(points[0]?.voltageV, 2)} V to ${fmt(points[points.length - 1]?.voltageV, 2)} V.`}
            className="overflow-visible text-ink-soft dark:text-paper/70"
          >
            <Group left={MARGIN.left} top={MARGIN.top}>
              <GridRows
                scale={scales.v}
                width={scales.innerW}
                numTicks={5}
                className="stroke-ink/10 dark:stroke-night-line"
                stroke="currentColor"
                strokeOpacity={0.15}
              />
              <LinePath
                data={points}
                x={(p) => scales.x(scales.tx(p))}
                y={(p) => scales.i(p.currentA)}
                strokeWidth={1.5}
                strokeDasharray="5 3"
                className="stroke-[#D55E00] dark:stroke-[#E69F00]"
                fill="none"
              />
              {withTemperature && scales.t ? (
                <LinePath
                  data={points.filter((p) => p.temperatureC !== null)}
                  x={(p) => scales.x(scales.tx(p))}
                  y={(p) => scales.t?.(p.temperatureC ?? 0) ?? 0}
                  strokeWidth={2}
                  strokeDasharray="1 3"
                  strokeLinecap="round"
                  className="stroke-[#009E73] dark:stroke-[#6fd3b2]"
                  fill="none"
                />
              ) : null}
              <LinePath
                data={points}
                x={(p) => scales.x(scales.tx(p))}
                y={(p) => scales.v(p.voltageV)}
                strokeWidth={2}
                className="stroke-[#0072B2] dark:stroke-[#56B4E9]"
                fill="none"
              />
              <AxisLeft
                scale={scales.v}
                numTicks={5}
                label="Voltage (V)"
                stroke="currentColor"
                tickStroke="currentColor"
                tickLabelProps={{ fill: "currentColor", fontSize: 11, textAnchor: "end", dx: -2, dy: 3 }}
                labelProps={{ fill: "currentColor", fontSize: 12, textAnchor: "middle" }}
                labelOffset={32}
              />
              <AxisRight
                scale={scales.i}
                left={scales.innerW}
                numTicks={5}
                label="Current (A)"
                stroke="currentColor"
                tickStroke="currentColor"
                tickLabelProps={{ fill: "currentColor", fontSize: 11, textAnchor: "start", dx: 2, dy: 3 }}
                labelProps={{ fill: "currentColor", fontSize: 12, textAnchor: "middle" }}
                labelOffset={30}
              />
              <AxisBottom
                scale={scales.x}
                top={scales.innerH}
                numTicks={tickCount}
                label={timeLabel}
                stroke="currentColor"
                tickStroke="currentColor"
                tickLabelProps={{ fill: "currentColor", fontSize: 11, textAnchor: "middle" }}
                labelProps={{ fill: "currentColor", fontSize: 12, textAnchor: "middle" }}
              />
            </Group>
          </svg>
        </div>
      )}
    </figure>
  );
}
