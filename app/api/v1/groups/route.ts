// GET /api/v1/groups — like-for-like groups with their numbers of approved results and packs.
import { cachedApiGroups } from "@/server/public-data";
import { apiGet, apiJson, apiOptions, pageEnvelope, parseQuery } from "@/server/api";
import { groupListQuery } from "@/lib/validations/open-data";

export const GET = apiGet(async (req) => {
  const { page, size, minResults } = parseQuery(req, groupListQuery);
  const all = await cachedApiGroups(minResults);
  const rows = all
    .slice((page - 1) * size, page * size)
    .map((g) => ({ ...g, links: { self: `/api/v1/groups/${g.key}` } }));
  const env = pageEnvelope(req, page, size, all.length);
  return apiJson(req, { data: rows, meta: env.meta, links: env.links }, env.headers);
});
export const OPTIONS = apiOptions;
