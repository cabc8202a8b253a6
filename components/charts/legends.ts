// Legends and series of the chart kinds, one definition for the page (HTML legend) and the image (SVG legend).
import type { CurveLine } from "@/lib/open-data/chart-data";
import { LABEL_CHECK_WORDS, type RatingKind } from "@/lib/figure-words";
import type { LegendItem } from "./chart-figure";
import type { LineSeries } from "./draw/line-plot";
import { MEETS_STYLE, SHORT_STYLE, seriesStyle } from "./palette";

export function labelCheckLegendItems(rating: RatingKind): LegendItem[] {
  const words = LABEL_CHECK_WORDS[rating];
  return [
    { label: words.meets, color: MEETS_STYLE.color, shape: MEETS_STYLE.shape, filled: true },
    { label: words.below, color: SHORT_STYLE.color, shape: SHORT_STYLE.shape, filled: false },
    { label: "parity: rating = label", color: "currentColor", line: true, dash: "5 4" },
  ];
}

export function lineLegendItems(series: LineSeries[]): LegendItem[] {
  return series.map((s, i) => {
    const st = seriesStyle(s.styleIndex ?? i);
    return { label: s.label, href: s.href, color: st.color, shape: st.shape, dash: st.dash, line: s.mode !== "points" };
  });
}

/** The "curves" chart kind: one line per pack, voltage per cell against the share of rated capacity. */
export function curveSeries(curves: CurveLine[]): LineSeries[] {
  return curves.map((c, i) => ({
    id: `c${i}`,
    label: c.label,
    points: c.points.map((p) => ({ x: p.capacityPercent, y: p.voltagePerCellV })),
    styleIndex: i,
  }));
}

export function curvesAxes(width: number, perPack?: { cells: number }) {
  const y = perPack ? `Pack voltage (${perPack.cells}S)` : "Voltage per cell";
  return width < 420
    ? { xLabel: "Capacity (% of rated)", yLabel: `${y}, V` }
    : { xLabel: "Capacity delivered (% of rated mAh)", yLabel: `${y} under load, V` };
}
