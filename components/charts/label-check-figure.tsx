// The label check on a page: the drawing (draw/label-check-plot.tsx, the same one the images and embeds
// draw), its legend, and the table its points are described by.
import { fmtC, fmtLabelledC } from "@/lib/format";
import { LABEL_CHECK_WORDS } from "@/lib/figure-words";
import { ChartFigure, ChartLegend, type ChartTableData } from "./chart-figure";
import {
  LabelCheckPlot,
  SAG_LIMITED_RATING,
  fallsShort,
  type LabelCheckPoint,
  type RatingSeries,
} from "./draw/label-check-plot";
import { labelCheckLegendItems } from "./legends";

function labelCheckTable(points: LabelCheckPoint[], rating: RatingSeries, groupLabel: string): ChartTableData {
  // Sorted by label ratio; each row keeps the index its point has in the drawing (the row's id).
  const sorted = points
    .map((p, i) => ({ p, i }))
    .sort((a, b) => a.p.ratingC / a.p.labelledC - b.p.ratingC / b.p.labelledC);
  return {
    caption: `Label check, ${groupLabel}`,
    columns: ["Pack", "Labelled C", LABEL_CHECK_WORDS[rating].column, "Label ratio", "Results"],
    rows: sorted.map(({ p, i }) => ({
      rowId: String(i),
      cells: [
        { text: p.label, href: `/packs/${p.id}` },
        fmtLabelledC(p.labelledC),
        p.lowC !== undefined && p.highC !== undefined
          ? `${fmtC(p.ratingC)} (95 %: ${fmtC(p.lowC)}–${fmtC(p.highC)})`
          : fmtC(p.ratingC),
        (p.ratingC / p.labelledC).toFixed(2),
        String(p.n),
      ],
    })),
  };
}

export function LabelCheckFigure({
  id,
  title = "Label check",
  points,
  groupLabel,
  rating = SAG_LIMITED_RATING,
  headingLevel = 3,
}: {
  id: string;
  title?: string;
  points: LabelCheckPoint[];
  groupLabel: string;
  rating?: RatingSeries;
  headingLevel?: 2 | 3;
}) {
  const short = points.filter(fallsShort).length;
  const bars = points.some((p) => p.lowC !== undefined);
  return (
    <ChartFigure
      id={id}
      title={title}
      headingLevel={headingLevel}
      legend={<ChartLegend items={labelCheckLegendItems(rating)} />}
      table={labelCheckTable(points, rating, groupLabel)}
      empty={
        points.length === 0
          ? `No published results with a ${LABEL_CHECK_WORDS[rating].short} rating in this group yet.`
          : undefined
      }
      notes={
        <p>
          {groupLabel}. One point per pack:{" "}
          {rating === "measured"
            ? "its sustained C, the highest measured among its approved results in this like-for-like group"
            : "the median sag-limited C estimate of its published results in this like-for-like group"}
          . {short} of {points.length} packs {LABEL_CHECK_WORDS[rating].belowCount}. Select a point to open the pack.
          {bars
            ? " A vertical bar spans the 95 % interval of a pack's median, where it has enough results (6) for one."
            : ""}
        </p>
      }
    >
      <LabelCheckPlot prefix={id} points={points} rating={rating} interactive />
    </ChartFigure>
  );
}
