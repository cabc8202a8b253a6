// GET /api/v1/makers — active makers, paginated, with their number of packs.
import { cachedApiMakersPage } from "@/server/public-data";
import { apiGet, apiJson, apiOptions, pageEnvelope, parseQuery } from "@/server/api";
import { pageQuery } from "@/lib/validations/open-data";

export const GET = apiGet(async (req) => {
  const q = parseQuery(req, pageQuery);
  const { rows, total } = await cachedApiMakersPage({ page: q.page, size: q.size });
  const env = pageEnvelope(req, q.page, q.size, total);
  return apiJson(req, { data: rows, meta: env.meta, links: env.links }, env.headers);
});
export const OPTIONS = apiOptions;
