// GET /api/v1/groups — like-for-like groups with their numbers of published results and packs, most packs first.
import { groupListQuery } from "@/lib/api-contract/queries";
import { groupList } from "@/lib/api-contract/responses";
import { apiGet, apiJson, apiOptions, pageOf, parseQuery } from "@/server/api";
import { cachedGroups } from "@/server/public-data";

export const GET = apiGet(async (req) => {
  const { page, size, minResults } = parseQuery(req, groupListQuery);
  const all = (await cachedGroups()).filter((g) => g.resultCount >= minResults);
  const env = pageOf(req, { page, size }, all.length);
  const data = all.slice((page - 1) * size, page * size).map((g) => ({
    key: g.key,
    label: g.label,
    resultCount: g.resultCount,
    packCount: g.packCount,
    links: { self: `/api/v1/groups/${g.key}` },
  }));
  return apiJson(
    req,
    groupList,
    { data, meta: { ...env.meta, filters: { minResults } }, links: env.links },
    env.headers,
  );
});
export const OPTIONS = apiOptions;
