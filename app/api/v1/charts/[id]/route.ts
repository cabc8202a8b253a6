// GET /api/v1/charts/{id} — one saved chart.
import { getSavedChart } from "@/db/queries/open-data/charts";
import { chartIdPath } from "@/lib/api-contract/queries";
import { chartItem } from "@/lib/api-contract/responses";
import { AppError } from "@/lib/errors";
import { savedChartJson } from "@/lib/open-data/chart-links";
import { apiGet, apiJson, apiOptions, parsePath } from "@/server/api";

export const GET = apiGet<{ id: string }>(async (req, params) => {
  const { id } = parsePath(params, chartIdPath, "No such chart.");
  const chart = await getSavedChart(id);
  if (!chart) throw new AppError("not_found", "No such chart.");
  const data = savedChartJson(chart);
  return apiJson(req, chartItem, { data, links: data.links ?? {} });
});
export const OPTIONS = apiOptions;
