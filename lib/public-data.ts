// Cached reads behind the public pages and the public API. Each carries the tags of lib/cache-tags.ts, so
// moderation's revalidateTag() refreshes exactly the pages that show the changed data. Pages call these,
// never db/queries directly; integration tests call db/queries (unstable_cache needs a Next.js server).
import "server-only";
import { unstable_cache } from "next/cache";
import { getComparison } from "@/db/queries/compare";
import { listPacksInGroup, listPublicGroups, rankMakersInGroup } from "@/db/queries/groups";
import { listGroupOptions, listGroupSamples, listGroups } from "@/db/queries/open-data/groups";
import { getApiPackBySlug, getMakerBySlug, listAllMakers, listMakersPage, type Page } from "@/db/queries/open-data/packs";
import { getApprovedResult, listGroupCurves, listResultsPage } from "@/db/queries/open-data/results";
import { getPackDetail } from "@/db/queries/pack-detail";
import { listActivePacks, listPackRows } from "@/db/queries/packs";
import { getPublicResult, listNewestApprovedResults } from "@/db/queries/results";
import type { PackFilters, ResultFilters } from "@/lib/validations/open-data";
import { cacheTags as t, PUBLIC_REVALIDATE_S as revalidate } from "@/lib/cache-tags";

export const cachedGroups = unstable_cache(listPublicGroups, ["groups"], { tags: [t.results, t.packs], revalidate });

export const cachedPacks = unstable_cache(listActivePacks, ["active-packs"], { tags: [t.packs], revalidate });

export function cachedPackRows(groupKey: string | null) {
  const tags = groupKey ? [t.packs, t.results, t.group(groupKey)] : [t.packs, t.results];
  return unstable_cache(() => listPackRows(groupKey), ["pack-rows", groupKey ?? "-"], { tags, revalidate })();
}

export function cachedPacksInGroup(groupKey: string) {
  return unstable_cache(() => listPacksInGroup(groupKey), ["packs-in-group", groupKey], { tags: [t.group(groupKey), t.results, t.packs], revalidate })();
}

export function cachedMakerRanking(groupKey: string) {
  return unstable_cache(() => rankMakersInGroup(groupKey), ["maker-ranking", groupKey], { tags: [t.group(groupKey), t.results, t.packs], revalidate })();
}

export function cachedNewestResults(limit: number) {
  return unstable_cache(() => listNewestApprovedResults(limit), ["newest-results", String(limit)], { tags: [t.results], revalidate })();
}

export function cachedPackDetail(slug: string) {
  return unstable_cache(() => getPackDetail(slug), ["pack-detail", slug], { tags: [t.pack(slug), t.packs], revalidate })();
}

export function cachedResult(id: number) {
  return unstable_cache(() => getPublicResult(id), ["result", String(id)], { tags: [t.result(id), t.results], revalidate })();
}

export function cachedComparison(slugs: string[], group: string | null) {
  const tags = [t.results, t.packs, ...slugs.map((s) => t.pack(s)), ...(group ? [t.group(group)] : [])];
  return unstable_cache(() => getComparison(slugs, group), ["comparison", slugs.join(","), group ?? "-"], { tags, revalidate })();
}

/** Active makers with their active pack counts (/data's download form): catalogue edits and merges revalidate `packs`. */
export const cachedMakers = unstable_cache(listAllMakers, ["open-data-makers"], { tags: [t.packs], revalidate });

/** Like-for-like groups with their approved-result counts (/data's download form): every decision revalidates `results`. */
export function cachedGroupOptions(minResults: number) {
  return unstable_cache(() => listGroupOptions(minResults), ["group-options", String(minResults)], { tags: [t.results, t.packs], revalidate })();
}

// ── The public API's reads (app/api/v1). Filters are validated by zod before they reach here; the cache key
// is their JSON with sorted keys, so equal queries share one entry whatever the order of the search params.
function keyOf(value: Record<string, unknown>): string {
  return JSON.stringify(Object.keys(value).sort().map((k) => [k, value[k]]));
}

export function cachedApiMakersPage(page: Page) {
  return unstable_cache(() => listMakersPage(page), ["api-makers", keyOf(page)], { tags: [t.packs], revalidate })();
}

export function cachedApiMaker(slug: string) {
  return unstable_cache(() => getMakerBySlug(slug), ["api-maker", slug], { tags: [t.packs, t.maker(slug)], revalidate })();
}

export function cachedApiPack(slug: string) {
  return unstable_cache(() => getApiPackBySlug(slug), ["api-pack", slug], { tags: [t.packs, t.results, t.pack(slug)], revalidate })();
}

export function cachedApiResultsPage(filters: ResultFilters, page: Page) {
  const tags = [t.results, t.packs, ...(filters.group ? [t.group(filters.group)] : []), ...(filters.pack ? [t.pack(filters.pack)] : [])];
  return unstable_cache(() => listResultsPage(filters, page), ["api-results", keyOf(filters), keyOf(page)], { tags, revalidate })();
}

export function cachedApiResult(id: number) {
  return unstable_cache(() => getApprovedResult(id), ["api-result", String(id)], { tags: [t.results, t.result(id)], revalidate })();
}

export function cachedApiGroups(minResults: number) {
  return unstable_cache(() => listGroups(minResults), ["api-groups", String(minResults)], { tags: [t.results, t.packs], revalidate })();
}

export function cachedGroupSamples(groupKey: string, filters: PackFilters) {
  return unstable_cache(() => listGroupSamples(groupKey, filters), ["group-samples", groupKey, keyOf(filters)], { tags: [t.results, t.packs, t.group(groupKey)], revalidate })();
}

export function cachedGroupCurves(groupKey: string, filters: ResultFilters) {
  return unstable_cache(() => listGroupCurves(groupKey, filters), ["group-curves", groupKey, keyOf(filters)], { tags: [t.results, t.packs, t.group(groupKey)], revalidate })();
}
