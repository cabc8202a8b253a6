// GET /api/v1/groups/{key} — one like-for-like group: per-pack medians of approved results with n and spread.
import { cachedGroupSamples } from "@/server/public-data";
import { AppError } from "@/lib/errors";
import { aggregateByPack, groupLabel } from "@/lib/open-data/aggregate";
import { apiGet, apiJson, apiOptions, parseQuery } from "@/server/api";
import { groupKeyRouteParam, packFilters } from "@/lib/validations/open-data";

export const GET = apiGet<{ key: string }>(async (req, params) => {
  const { key } = groupKeyRouteParam.parse(params);
  const filters = parseQuery(req, packFilters);
  const samples = await cachedGroupSamples(key, filters);
  if (samples.length === 0 && Object.keys(filters).length === 0)
    throw new AppError("not_found", "No approved results in this group.");
  const packs = aggregateByPack(samples);
  return apiJson(req, {
    data: { key, label: groupLabel(key, samples[0]), resultCount: samples.length, packCount: packs.length, packs },
    meta: { filters, aggregate: "median of approved results per pack, with n, min and max" },
  });
});
export const OPTIONS = apiOptions;
