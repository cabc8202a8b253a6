// GET /api/v1/makers — active makers, paged, with their numbers of packs and published results.
import { pageQuery } from "@/lib/api-contract/queries";
import { makerList } from "@/lib/api-contract/responses";
import { makerFields } from "@/lib/open-data/fields";
import { flatRecord } from "@/lib/open-data/records";
import { apiGet, apiJson, apiOptions, pageOf, parseQuery } from "@/server/api";
import { makerRows } from "@/server/open-data/catalogue";

export const GET = apiGet(async (req) => {
  const q = parseQuery(req, pageQuery);
  const all = await makerRows();
  const page = pageOf(req, q, all.length);
  const data = all.slice((q.page - 1) * q.size, q.page * q.size).map((m) => flatRecord(makerFields, m));
  return apiJson(req, makerList, { data, meta: page.meta, links: page.links }, page.headers);
});
export const OPTIONS = apiOptions;
