// The maker ranking on a page: the drawing the images draw, and its table.
import type { RankingBar } from "@/lib/open-data/chart-data";
import type { ChartRating } from "@/lib/open-data/chart-state";
import { LABEL_RATIO_LABELS } from "@/lib/figure-words";
import { fmt } from "@/lib/format";
import { ChartFigure } from "./chart-figure";
import { RankingPlot } from "./draw/ranking-plot";

export function RankingFigure({
  id,
  title,
  bars,
  notes,
  rating,
}: {
  id: string;
  title: string;
  bars: RankingBar[];
  notes?: React.ReactNode;
  rating: ChartRating;
}) {
  return (
    <ChartFigure
      id={id}
      title={title}
      notes={notes}
      empty={bars.length === 0 ? "No label ratios in this group yet." : undefined}
      table={{
        caption: title,
        columns: ["Maker", `Median ${LABEL_RATIO_LABELS[rating].toLowerCase()}`, "Packs", "Results"],
        rows: bars.map((b) => ({ cells: [b.label, fmt(b.labelRatio, 2), String(b.packCount), String(b.resultCount)] })),
      }}
    >
      <RankingPlot bars={bars} rating={rating} />
    </ChartFigure>
  );
}
