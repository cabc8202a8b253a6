"use client";
// The label check: labelled continuous C (x) against a rating (y) — the measured sustained C or the
// sag-limited C estimate, as the `rating` prop says — one point per pack, with the parity line y = x. Points
// below the line are packs that fall short of their label. It takes prepared points and draws them.
import { AxisBottom, AxisLeft } from "@visx/axis";
import { GridColumns, GridRows } from "@visx/grid";
import { Group } from "@visx/group";
import { scaleLinear } from "@visx/scale";
import { useState } from "react";
import { ChartFrame } from "./chart-frame";
import { Marker } from "./marker";
import { MEETS_STYLE, SHORT_STYLE } from "./palette";
import { Tooltip } from "./tooltip";
import { useWidth } from "./use-width";
import { LABEL_CHECK_WORDS, type RatingKind } from "@/lib/figure-words";

export type LabelCheckPoint = {
  packSlug: string;
  label: string;
  makerName: string;
  labelledC: number;
  /** The y value: the rating the chart's `rating` prop names (measured sustained C, or the estimate). */
  measuredC: number;
  n: number;
};

const margin = { top: 16, right: 20, bottom: 50, left: 58 };
const f1 = (v: number) => v.toLocaleString("en-GB", { maximumFractionDigits: 1 });

export function LabelCheckChart({
  points,
  groupLabel,
  width: fixedWidth,
  height: fixedHeight,
  title = "Label check",
  rating,
}: {
  points: LabelCheckPoint[];
  groupLabel: string;
  width?: number;
  height?: number;
  title?: string;
  /** Which rating the points carry: it names the axis, the table column and each point's label. */
  rating: RatingKind;
}) {
  const words = LABEL_CHECK_WORDS[rating];
  const { ref, width: measured } = useWidth<HTMLDivElement>(fixedWidth ?? 720);
  const width = fixedWidth ?? measured;
  const height = fixedHeight ?? Math.round(Math.min(460, Math.max(300, width * 0.6)));
  const [active, setActive] = useState<LabelCheckPoint | null>(null);
  const innerW = width - margin.left - margin.right;
  const innerH = height - margin.top - margin.bottom;
  const maxX = Math.max(10, ...points.map((p) => p.labelledC)) * 1.08;
  const maxY = Math.max(10, ...points.map((p) => p.measuredC)) * 1.1;
  const x = scaleLinear<number>({ domain: [0, maxX], range: [0, innerW], nice: true });
  const y = scaleLinear<number>({ domain: [0, maxY], range: [innerH, 0], nice: true });
  const parityEnd = Math.min(x.domain()[1] ?? maxX, y.domain()[1] ?? maxY);
  const short = points.filter((p) => p.measuredC < p.labelledC).length;
  const sorted = [...points].sort((a, b) => a.measuredC / a.labelledC - b.measuredC / b.labelledC);

  const legend = (
    <ul className="flex flex-wrap gap-x-4 gap-y-1" aria-label="Legend">
      <li className="flex items-center gap-1">
        <svg width="14" height="14" aria-hidden="true">
          <Marker shape={MEETS_STYLE.shape} x={7} y={7} size={9} color={MEETS_STYLE.color} />
        </svg>
        {words.meets}
      </li>
      <li className="flex items-center gap-1">
        <svg width="14" height="14" aria-hidden="true">
          <Marker shape={SHORT_STYLE.shape} x={7} y={7} size={9} color={SHORT_STYLE.color} filled={false} />
        </svg>
        {words.below}
      </li>
      <li className="flex items-center gap-1">
        <svg width="22" height="10" aria-hidden="true">
          <line x1="0" y1="5" x2="22" y2="5" stroke="currentColor" strokeDasharray="4 3" />
        </svg>
        parity: rating = label
      </li>
    </ul>
  );

  return (
    <ChartFrame
      title={title}
      legend={legend}
      notes={
        <p>
          {groupLabel}. One point per pack:{" "}
          {rating === "measured"
            ? "its sustained C, the highest measured among its approved results in this like-for-like group"
            : "the median sag-limited C estimate of its published results in this like-for-like group"}
          . {short} of {points.length} packs {words.belowCount}. Select a point to open the pack.
        </p>
      }
      table={{
        caption: `Label check, ${groupLabel}`,
        columns: ["Pack", "Labelled C", words.column, "Label ratio", "Results"],
        rows: sorted.map((p) => [
          { text: `${p.makerName} ${p.label}`, href: `/packs/${p.packSlug}` },
          f1(p.labelledC),
          f1(p.measuredC),
          (p.measuredC / p.labelledC).toFixed(2),
          String(p.n),
        ]),
      }}
    >
      <div ref={ref} className="relative w-full" onKeyDown={(e) => e.key === "Escape" && setActive(null)}>
        {points.length === 0 ? (
          <p className="muted py-12 text-center">No published results with a {words.short} rating in this group yet.</p>
        ) : (
          <svg
            width={width}
            height={height}
            role="group"
            aria-label={`${title}: labelled C against ${words.short} C, ${points.length} packs`}
            className="block max-w-full overflow-visible"
          >
            <Group left={margin.left} top={margin.top}>
              <g className="text-ink/10 dark:text-paper/10">
                <GridRows scale={y} width={innerW} stroke="currentColor" numTicks={6} />
                <GridColumns scale={x} height={innerH} stroke="currentColor" numTicks={width < 500 ? 5 : 8} />
              </g>
              <line
                x1={x(0)}
                y1={y(0)}
                x2={x(parityEnd)}
                y2={y(parityEnd)}
                stroke="currentColor"
                strokeDasharray="5 4"
                className="text-ink-soft dark:text-paper/60"
              />
              <text
                x={x(parityEnd) - 4}
                y={y(parityEnd) + 14}
                textAnchor="end"
                className="fill-ink-soft text-[11px] dark:fill-paper/60"
              >
                y = x
              </text>
              <g className="text-ink-soft dark:text-paper/70">
                <AxisBottom
                  top={innerH}
                  scale={x}
                  numTicks={width < 500 ? 5 : 8}
                  stroke="currentColor"
                  tickStroke="currentColor"
                  tickLabelProps={{ fill: "currentColor", fontSize: 11, textAnchor: "middle" }}
                  label="Labelled continuous rating (C)"
                  labelProps={{ fill: "currentColor", fontSize: 12, textAnchor: "middle" }}
                />
                <AxisLeft
                  scale={y}
                  numTicks={6}
                  stroke="currentColor"
                  tickStroke="currentColor"
                  tickLabelProps={{ fill: "currentColor", fontSize: 11, textAnchor: "end", dx: -2, dy: 3 }}
                  label={words.axis}
                  labelOffset={36}
                  labelProps={{ fill: "currentColor", fontSize: 12, textAnchor: "middle" }}
                />
              </g>
              {points.map((p) => {
                const below = p.measuredC < p.labelledC;
                const s = below ? SHORT_STYLE : MEETS_STYLE;
                const px = x(p.labelledC);
                const py = y(p.measuredC);
                return (
                  <a
                    key={p.packSlug}
                    href={`/packs/${p.packSlug}`}
                    data-testid="label-check-point"
                    aria-label={`${p.makerName} ${p.label}: labelled ${f1(p.labelledC)}C, ${words.short} ${f1(p.measuredC)}C from ${p.n} result${p.n === 1 ? "" : "s"}${below ? `, ${words.pointBelow}` : `, ${words.meets}`}`}
                    onMouseEnter={() => setActive(p)}
                    onMouseLeave={() => setActive(null)}
                    onFocus={() => setActive(p)}
                    onBlur={() => setActive(null)}
                    className="outline-none [&:focus-visible>circle.ring]:opacity-100"
                  >
                    <circle
                      className="ring opacity-0"
                      cx={px}
                      cy={py}
                      r={10}
                      fill="none"
                      stroke="currentColor"
                      strokeWidth={2}
                    />
                    <Marker
                      shape={s.shape}
                      x={px}
                      y={py}
                      size={active?.packSlug === p.packSlug ? 12 : 9}
                      color={s.color}
                      filled={!below}
                    />
                  </a>
                );
              })}
            </Group>
          </svg>
        )}
        {active ? (
          <Tooltip
            left={margin.left + x(active.labelledC)}
            top={margin.top + y(active.measuredC)}
            containerWidth={width}
          >
            <p className="font-medium">
              {active.makerName} {active.label}
            </p>
            <p className="num">
              labelled {f1(active.labelledC)}C · {words.short} {f1(active.measuredC)}C
            </p>
            <p className="num">
              ratio {(active.measuredC / active.labelledC).toFixed(2)} · {active.n} result{active.n === 1 ? "" : "s"}
            </p>
          </Tooltip>
        ) : null}
      </div>
    </ChartFrame>
  );
}
