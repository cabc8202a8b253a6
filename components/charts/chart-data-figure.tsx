// A chart of the chart builder (a permalink's page) drawn with the page components of its kind — the same
// drawings its images and embed show.
import { CHART_KIND_LABELS } from "@/lib/open-data/chart-state";
import type { ChartData } from "@/lib/open-data/chart-data";
import { LabelCheckFigure } from "./label-check-figure";
import { curveSeries, curvesAxes } from "./legends";
import { LineFigure } from "./line-figure";
import { RankingFigure } from "./ranking-figure";

export function ChartDataFigure({ data, id = "ch" }: { data: ChartData; id?: string }) {
  const title = CHART_KIND_LABELS[data.state.kind];
  if (data.state.kind === "label-check")
    return (
      <LabelCheckFigure
        id={id}
        title={title}
        points={data.labelCheck ?? []}
        groupLabel={data.groupLabel}
        rating={data.rating}
        headingLevel={2}
      />
    );
  if (data.state.kind === "maker-ranking")
    return (
      <RankingFigure
        id={id}
        title={title}
        bars={data.ranking ?? []}
        rating={data.rating}
        notes={<p>{data.groupLabel}.</p>}
      />
    );
  return (
    <LineFigure
      id={id}
      title={title}
      series={curveSeries(data.curves ?? [])}
      {...curvesAxes(800, data.curvesPerPack)}
      yDigits={2}
      tableCaption={`${title}, ${data.groupLabel}`}
      notes={<p>{data.groupLabel}.</p>}
    />
  );
}
