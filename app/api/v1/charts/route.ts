// GET /api/v1/charts — saved (curated) charts with their full state and links.
import { listSavedCharts } from "@/db/queries/open-data/charts";
import { apiGet, apiJson, apiOptions } from "@/lib/open-data/api";
import { savedChartJson } from "@/lib/open-data/chart-links";

export const GET = apiGet(async (req) => {
  const charts = await listSavedCharts();
  return apiJson(req, { data: charts.map(savedChartJson) });
});
export const OPTIONS = apiOptions;
