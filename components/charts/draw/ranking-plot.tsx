// Maker ranking: each maker's median label ratio as a bar, the maker's name above it, with the "label met"
// line at 1.0. Bars that fall short are vermillion, the others blue (palette.ts, as the label check). Axis, rows
// and bars are @visx components that need no hooks (draw/markup.ts walks them like React DOM would).
import { Group } from "@visx/group";
import { scaleLinear } from "@visx/scale";
import { Bar } from "@visx/shape";
import { CHART_RATING_WORDS, type RankingBar } from "@/lib/open-data/chart-data";
import type { ChartRating } from "@/lib/open-data/chart-state";
import { MEETS_STYLE, SHORT_STYLE } from "../palette";
import { XAxis } from "./axes";
import { GUTTER, fmtNum, pct, px } from "./kit";

const TOP = 22;
const BOTTOM = 44;
const ROW = 34;

/** The height the bars want at their natural row height. */
const rankingHeight = (bars: number) => TOP + BOTTOM + Math.max(1, bars) * ROW;

export function RankingPlot({
  bars,
  height = rankingHeight(bars.length),
  width = "100%",
  x: left,
  y: top,
  tickCount = 5,
  compact = false,
  rating,
}: {
  bars: RankingBar[];
  height?: number;
  width?: number | "100%";
  x?: number;
  y?: number;
  tickCount?: number;
  /** Narrow images: the value without the pack count. */
  compact?: boolean;
  /** Which rating the label ratios divide (named on the axis). */
  rating: ChartRating;
}) {
  const bottom = height - BOTTOM;
  const rowH = Math.min(ROW, (bottom - TOP - 6) / Math.max(1, bars.length));
  const max = Math.max(1.1, ...bars.map((b) => b.labelRatio)) * 1.05;
  const x = scaleLinear<number>({ domain: [0, max], range: [0, 78], nice: true });
  const barH = Math.max(3, Math.min(12, rowH - 18));
  return (
    <svg
      width={width}
      height={height}
      x={left}
      y={top}
      className="chart-svg"
      overflow="visible"
      role="img"
      aria-label={`Median label ratio of ${bars.length} makers`}
    >
      <line
        x1={pct(x(1))}
        x2={pct(x(1))}
        y1={TOP - 6}
        y2={bottom}
        stroke="currentColor"
        strokeOpacity={0.7}
        strokeDasharray="7 4"
      />
      <text x={pct(x(1))} dx={4} y={TOP - 8} fontSize={11} fill="currentColor">
        label met (1.0)
      </text>
      {bars.map((b, i) => {
        const y0 = TOP + i * rowH;
        const color = b.labelRatio < 1 ? SHORT_STYLE.color : MEETS_STYLE.color;
        const value = compact ? fmtNum(b.labelRatio, 2) : `${fmtNum(b.labelRatio, 2)} · ${b.packCount} packs`;
        return (
          // One row per maker, moved down into place (@visx/group); the bar is a @visx/shape Bar.
          <Group key={b.label} top={px(y0)}>
            <text x={-GUTTER} y={12} fontSize={12} fill="currentColor">
              {b.label}
            </text>
            <Bar x="0%" y={16} width={pct(x(b.labelRatio))} height={barH} fill={color} />
            <text x={pct(x(b.labelRatio))} dx={6} y={px(16 + barH)} fontSize={11} fill="currentColor" fillOpacity={0.8}>
              {value}
            </text>
          </Group>
        );
      })}
      <XAxis
        ticks={x.ticks(tickCount)}
        x={x}
        y={bottom}
        format={(v) => fmtNum(v, 1)}
        title={CHART_RATING_WORDS[rating].ranking[compact ? 2 : 1]}
      />
    </svg>
  );
}
