// A server-drawn chart inline in a page (the permalink and the embed): the 800-pixel drawing, and below
// 560 px of viewport (NARROW_VIEWPORT_PX; the class names must stay literal for Tailwind) the 400-pixel
// narrow layout, whose text stays legible on a phone instead of shrinking with the picture.
import type { ChartData } from "@/lib/open-data/chart-data";
import { NARROW_WIDTH } from "@/lib/open-data/chart-links";
import { DEFAULT_CHART_SIZE, defaultHeight } from "@/lib/open-data/chart-size";
import { renderChartSvg } from "@/lib/open-data/chart-svg";

const fit = "[&>svg]:block [&>svg]:h-auto [&>svg]:w-full";

export function ServerChartSvg({ data }: { data: ChartData }) {
  return (
    <>
      <div
        className={`max-[559px]:hidden ${fit}`}
        dangerouslySetInnerHTML={{ __html: renderChartSvg(data, DEFAULT_CHART_SIZE, "chart-title") }}
      />
      <div
        className={`min-[560px]:hidden ${fit}`}
        dangerouslySetInnerHTML={{
          __html: renderChartSvg(
            data,
            { width: NARROW_WIDTH, height: defaultHeight(NARROW_WIDTH) },
            "chart-title-narrow",
          ),
        }}
      />
    </>
  );
}
