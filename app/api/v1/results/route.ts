// GET /api/v1/results — published results with method cards and figures, filtered by pack, group and the packs
// table's filters; numbered pages up to a cap, or pages by key (after=<id>) with an estimated total.
import { resultListQuery } from "@/lib/api-contract/queries";
import { resultList } from "@/lib/api-contract/responses";
import { nestedRecord } from "@/lib/open-data/records";
import { resultFields } from "@/lib/open-data/result-fields";
import { apiGet, apiJson, apiOptions, parseQuery } from "@/server/api";
import { packWhere, requireKnownGroup } from "@/server/open-data/catalogue";
import { resultsPage } from "@/server/result-pages";

export const GET = apiGet(async (req) => {
  const { page, size, after, ...filters } = parseQuery(req, resultListQuery);
  await requireKnownGroup(filters.group);
  const where = { ...(await packWhere(filters)), pack: filters.pack, group: filters.group };
  const out = await resultsPage(req, { page, size, after }, filters, where);
  return apiJson(
    req,
    resultList,
    { data: out.rows.map((r) => nestedRecord(resultFields, r)), meta: { ...out.meta, filters }, links: out.links },
    out.headers,
  );
});
export const OPTIONS = apiOptions;
