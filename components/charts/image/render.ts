// The standalone SVG of a chart (downloads, the PNG's source): the image component written out as markup.
import { createElement } from "react";
import type { ChartData } from "@/lib/open-data/chart-data";
import { DEFAULT_CHART_SIZE, type ChartSize } from "@/lib/open-data/chart-size";
import { toMarkup } from "../draw/markup";
import { ChartImage } from "./chart-image";

export function chartSvgMarkup(data: ChartData, size: ChartSize = DEFAULT_CHART_SIZE, titleId = "chart-title"): string {
  return toMarkup(createElement(ChartImage, { data, size, titleId }));
}
