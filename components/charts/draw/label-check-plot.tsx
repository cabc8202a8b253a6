// The label check: labelled continuous C across, a rating up, one point per pack, with the parity line
// y = x. Packs that reach their label are blue filled circles, packs that fall short vermillion open
// down-triangles (palette.ts): the page, the embed and the PNG/SVG images all draw this one component.
// The rating is a prop (a label and whether it is an estimate or a measurement), so a second rating is a
// second series, not a second chart.
import { scaleLinear } from "@visx/scale";
import { Fragment } from "react";
import type { LabelCheckPoint } from "@/lib/open-data/chart-data";
import { LABEL_CHECK_WORDS, RATING_LABELS, type RatingKind } from "@/lib/figure-words";
import { MEETS_STYLE, SHORT_STYLE } from "../palette";
import { XAxis, YGrid } from "./axes";
import { MarkerDefs, MarkerUse, YTitle, fmtNum, markerId, pct, px, yTickCount } from "./kit";

/** Which rating the points carry up the y axis: the sag-limited C estimate or the sustained C measured. */
export type RatingSeries = RatingKind;

export type { LabelCheckPoint };

export const SAG_LIMITED_RATING: RatingSeries = "estimate";

/** "Sag-limited C (estimate)", "Sustained C (measured)". */
export const ratingTitle = (r: RatingSeries) => RATING_LABELS[r];
/** Below the line: the rating falls short of the labelled C. */
export const fallsShort = (p: LabelCheckPoint) => p.ratingC < p.labelledC;
const MEETS_MARK = { ...MEETS_STYLE, filled: true };
const SHORT_MARK = { ...SHORT_STYLE, filled: false };
const pointStyle = (p: LabelCheckPoint) => (fallsShort(p) ? SHORT_MARK : MEETS_MARK);

const TOP = 26;
const BOTTOM = 44;
const X_PAD = 3;

export function LabelCheckPlot({
  prefix,
  points,
  rating,
  height = 340,
  width = "100%",
  x,
  y,
  interactive = false,
  tickCount = 5,
}: {
  /** Unique in the page: ids of marker shapes and table rows start with it. */
  prefix: string;
  points: LabelCheckPoint[];
  rating: RatingSeries;
  height?: number;
  width?: number | "100%";
  x?: number;
  y?: number;
  /** On a page: each point is a link to its pack, described by its table row `${prefix}-r${index}` (tooltips
   * read it; the table lists the points in their order here). */
  interactive?: boolean;
  tickCount?: number;
}) {
  const bottom = height - BOTTOM;
  const maxX = Math.max(10, ...points.map((p) => p.labelledC)) * 1.08;
  const maxY = Math.max(10, ...points.map((p) => Math.max(p.ratingC, p.highC ?? 0))) * 1.1;
  const xs = scaleLinear<number>({ domain: [0, maxX], range: [X_PAD, 100 - X_PAD], nice: true });
  const ys = scaleLinear<number>({ domain: [0, maxY], range: [bottom, TOP + 8], nice: true });
  const parityEnd = Math.min(xs.domain()[1] ?? maxX, ys.domain()[1] ?? maxY);
  const f0 = (v: number) => fmtNum(v, 0);
  return (
    <svg
      width={width}
      height={height}
      x={x}
      y={y}
      className="chart-svg"
      overflow="visible"
      role={interactive ? "group" : "img"}
      aria-label={`${ratingTitle(rating)} against labelled C, ${points.length} packs`}
    >
      <MarkerDefs prefix={prefix} marks={[MEETS_MARK, SHORT_MARK]} />
      <YTitle y={12}>{LABEL_CHECK_WORDS[rating].axis}</YTitle>
      <YGrid ticks={ys.ticks(yTickCount(bottom - TOP))} y={ys} format={f0} />
      <XAxis ticks={xs.ticks(tickCount)} x={xs} y={bottom} format={f0} title="Labelled continuous C" />
      <line
        x1={pct(xs(0))}
        y1={px(ys(0))}
        x2={pct(xs(parityEnd))}
        y2={px(ys(parityEnd))}
        stroke="currentColor"
        strokeOpacity={0.7}
        strokeDasharray="5 4"
      />
      {/* The 95 % interval of a pack's median (from 6 results on): a thin bar behind its marker, in its colour —
          drawn first, in one group per colour, so each bar carries only its position. */}
      {[MEETS_MARK, SHORT_MARK].map((mark) => (
        <g key={markerId(prefix, mark)} stroke={mark.color} strokeWidth={1.5}>
          {points.map((p) =>
            pointStyle(p) === mark && p.lowC !== undefined && p.highC !== undefined ? (
              <line
                key={p.id}
                x1={pct(xs(p.labelledC))}
                x2={pct(xs(p.labelledC))}
                y1={px(ys(p.lowC))}
                y2={px(ys(p.highC))}
                data-error-bar=""
              />
            ) : null,
          )}
        </g>
      ))}
      {points.map((p, i) => {
        const mark = <MarkerUse prefix={prefix} mark={pointStyle(p)} xPct={xs(p.labelledC)} y={ys(p.ratingC)} />;
        if (!interactive) return <Fragment key={p.id}>{mark}</Fragment>;
        return (
          <a key={p.id} href={`/packs/${p.id}`} aria-label={p.label} aria-describedby={`${prefix}-r${i}`}>
            {mark}
          </a>
        );
      })}
      {interactive ? (
        <circle className="chart-ring" data-chart-ring="" r={10} cx="0%" cy={0} visibility="hidden" />
      ) : null}
    </svg>
  );
}
