// GET /api/v1/groups/{key} — one like-for-like group: per-pack medians of published results with n and spread.
import { groupPath, groupQuery } from "@/lib/api-contract/queries";
import { groupItem } from "@/lib/api-contract/responses";
import { aggregateByPack, groupLabel, publishedAggregate } from "@/lib/open-data/aggregate";
import { apiGet, apiJson, apiOptions, parsePath, parseQuery } from "@/server/api";
import { packWhere, requireKnownGroup } from "@/server/open-data/catalogue";
import { cachedGroupSamples } from "@/server/public-data";

export const GET = apiGet<{ key: string }>(async (req, params) => {
  const { key } = parsePath(params, groupPath, "No such like-for-like group.");
  const filters = parseQuery(req, groupQuery);
  await requireKnownGroup(key);
  const samples = await cachedGroupSamples(key, filters, await packWhere(filters));
  const packs = aggregateByPack(samples).map(publishedAggregate);
  return apiJson(req, groupItem, {
    data: { key, label: groupLabel(key, samples[0]), resultCount: samples.length, packCount: packs.length, packs },
    meta: { aggregate: "median of published results per pack, with n, min and max" },
    links: { results: `/api/v1/results?group=${key}`, packs: `/api/v1/packs?group=${key}` },
  });
});
export const OPTIONS = apiOptions;
