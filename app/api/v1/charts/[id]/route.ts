// GET /api/v1/charts/{id} — one saved chart.
import { getSavedChart } from "@/db/queries/open-data/charts";
import { AppError } from "@/lib/errors";
import { apiGet, apiJson, apiOptions } from "@/server/api";
import { savedChartJson } from "@/lib/open-data/chart-links";
import { chartIdParam } from "@/lib/validations/open-data";

export const GET = apiGet<{ id: string }>(async (req, params) => {
  const { id } = chartIdParam.parse(params);
  const chart = await getSavedChart(id);
  if (!chart) throw new AppError("not_found", "No such chart.");
  return apiJson(req, { data: savedChartJson(chart) });
});
export const OPTIONS = apiOptions;
