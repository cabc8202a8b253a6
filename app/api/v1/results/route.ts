// GET /api/v1/results — approved results with method cards and figures, paginated, filtered by pack, group and pack filters.
import { cachedApiResultsPage } from "@/server/public-data";
import { apiGet, apiJson, apiOptions, pageEnvelope, parseQuery } from "@/server/api";
import { resultListQuery } from "@/lib/validations/open-data";

export const GET = apiGet(async (req) => {
  const { page, size, ...filters } = parseQuery(req, resultListQuery);
  const { rows, total } = await cachedApiResultsPage(filters, { page, size });
  const env = pageEnvelope(req, page, size, total);
  return apiJson(req, { data: rows, meta: { ...env.meta, filters }, links: env.links }, env.headers);
});
export const OPTIONS = apiOptions;
