// GET /api/v1/results — published results with method cards and figures, paged, filtered by pack, group and the
// packs table's filters.
import { resultListQuery } from "@/lib/api-contract/queries";
import { resultList } from "@/lib/api-contract/responses";
import { nestedRecord } from "@/lib/open-data/records";
import { resultFields } from "@/lib/open-data/result-fields";
import { apiGet, apiJson, apiOptions, pageOf, parseQuery } from "@/server/api";
import { packWhere, requireKnownGroup } from "@/server/open-data/catalogue";
import { cachedApiResultsPage } from "@/server/public-data";

export const GET = apiGet(async (req) => {
  const { page, size, ...filters } = parseQuery(req, resultListQuery);
  await requireKnownGroup(filters.group);
  const where = { ...(await packWhere(filters)), pack: filters.pack, group: filters.group };
  const { rows, total } = await cachedApiResultsPage(filters, where, { page, size });
  const env = pageOf(req, { page, size }, total);
  return apiJson(
    req,
    resultList,
    { data: rows.map((r) => nestedRecord(resultFields, r)), meta: { ...env.meta, filters }, links: env.links },
    env.headers,
  );
});
export const OPTIONS = apiOptions;
