// Cached reads behind the public pages and the public API. Each carries only the tags of what it shows
// (server/cache-tags.ts), so a change's revalidateTag() refreshes exactly the pages that show the changed data.
// Pages call these, never db/queries directly; integration tests call db/queries (unstable_cache needs a Next.js
// server).
import "server-only";
import { unstable_cache } from "next/cache";
import { cache } from "react";
import { getComparison } from "@/db/queries/compare";
import { listPacksInGroup, listPublicGroups, rankMakersInGroup, type RankingRating } from "@/db/queries/groups";
import { listFeaturedCharts } from "@/db/queries/open-data/charts";
import { listGroupCoverage, listGroupSamples } from "@/db/queries/open-data/groups";
import { listGroupCurves, listResultsPage, type Page } from "@/db/queries/open-data/results";
import type { PackWhere, ResultWhere } from "@/db/queries/open-data/where";
import { getPackDetail } from "@/db/queries/pack-detail";
import { activeMakerWithPacksExists, activePackExists } from "@/db/queries/pack-by-slug";
import { listMakerCounts, listPackFilterOptions, queryPackPage } from "@/db/queries/pack-catalogue";
import { DEFAULT_PACK_PARAMS } from "@/lib/pack-query-params";
import { getPacksBySlugs, listActivePacks } from "@/db/queries/packs";
import { suggestComparisons } from "@/lib/compare";
import { getPublicResult, listNewestApprovedResults } from "@/db/queries/results";
import { getSiteSettings } from "@/db/queries/site-settings";
import type { PackFilters, ResultFilters } from "@/lib/api-contract/queries";
import { cacheTags as t, PUBLIC_REVALIDATE_S as revalidate } from "@/server/cache-tags";

export const cachedGroups = unstable_cache(listPublicGroups, ["groups"], { tags: [t.groups], revalidate });

export const cachedPacks = unstable_cache(listActivePacks, ["active-packs"], { tags: [t.catalogue], revalidate });

/** Packs the empty /compare suggests are read among this many per group (the most tested first). */
const COMPARE_EXAMPLE_POOL = 200;

/**
 * Example comparisons for an empty /compare: from the five groups with the most packs, packs of one size class
 * among each group's most tested (lib/compare.ts suggestComparisons). Reads a bounded number of packs.
 */
export const cachedCompareExamples = unstable_cache(
  async () => {
    const groups = (await listPublicGroups()).slice(0, 5);
    const withPacks = await Promise.all(
      groups.map(async (g) => ({
        key: g.key,
        label: g.label,
        packSlugs: (await listPacksInGroup(g.key, COMPARE_EXAMPLE_POOL)).map((p) => p.packSlug),
      })),
    );
    return suggestComparisons(withPacks, await getPacksBySlugs([...new Set(withPacks.flatMap((g) => g.packSlugs))]));
  },
  ["compare-examples"],
  { tags: [t.groups, t.catalogue], revalidate },
);

/** What the packs table's filters offer (makers with active packs, connectors, cell counts): catalogue edits. */
export const cachedPackFilterOptions = unstable_cache(listPackFilterOptions, ["pack-filter-options"], {
  tags: [t.catalogue],
  revalidate,
});

/**
 * The first page of the packs table as /packs opens (no filter, default order): the static page's data, so it
 * carries the tags that refresh it. Every other page of the table is one SQL query per request (uncached).
 */
export const cachedFirstPackPage = unstable_cache(() => queryPackPage(DEFAULT_PACK_PARAMS), ["pack-page-first"], {
  tags: [t.catalogue],
  revalidate,
});

/** Active makers with their pack and published-result counts (the makers list and download). */
export const cachedMakerCounts = unstable_cache(listMakerCounts, ["maker-counts"], {
  tags: [t.catalogue],
  revalidate,
});

export function cachedPacksInGroup(groupKey: string) {
  return unstable_cache(() => listPacksInGroup(groupKey), ["packs-in-group", groupKey], {
    tags: [t.group(groupKey)],
    revalidate,
  })();
}

/** At most `limit` packs of a group with their medians: the most published results first, ties by slug (in SQL). */
export function cachedTopPacksInGroup(groupKey: string, limit: number) {
  return unstable_cache(() => listPacksInGroup(groupKey, limit), ["top-packs-in-group", groupKey, String(limit)], {
    tags: [t.group(groupKey)],
    revalidate,
  })();
}

export function cachedMakerRanking(groupKey: string, rating: RankingRating = "estimate") {
  return unstable_cache(() => rankMakersInGroup(groupKey, rating), ["maker-ranking", groupKey, rating], {
    tags: [t.group(groupKey)],
    revalidate,
  })();
}

export function cachedNewestResults(limit: number) {
  return unstable_cache(() => listNewestApprovedResults(limit), ["newest-results", String(limit)], {
    tags: [t.newest],
    revalidate,
  })();
}

// A pack's and a result's page each ask twice in one request (generateMetadata and the page, rendered at once):
// unstable_cache does not share a read in flight, so a cold page ran every query twice (seen in PostgreSQL's
// statement log at 1,000,000 results). React's per-request cache makes the two asks one read.
export const cachedPackDetail = cache((slug: string) =>
  // The page shows this pack's results only: every change to one of them revalidates pack:<slug>.
  unstable_cache(() => getPackDetail(slug), ["pack-detail", slug], {
    tags: [t.pack(slug)],
    revalidate,
  })(),
);

export const cachedResult = cache((id: number) =>
  // Its pack's label and its bench's accuracy show here too: catalogue edits and bench edits name result:<id>.
  unstable_cache(() => getPublicResult(id), ["result", String(id)], {
    tags: [t.result(id)],
    revalidate,
  })(),
);

export function cachedComparison(slugs: string[], group: string | null) {
  // Only these packs' results are compared, so their pack tags are enough (the group names which of them).
  const tags = slugs.map((s) => t.pack(s));
  return unstable_cache(() => getComparison(slugs, group), ["comparison", slugs.join(","), group ?? "-"], {
    tags,
    revalidate,
  })();
}

/** Per group, maker and pack size, how many published results (the chart builder offers only what has data). */
export const cachedGroupCoverage = unstable_cache(listGroupCoverage, ["group-coverage"], {
  tags: [t.groups],
  revalidate,
});

// ── The public API's reads (app/api/v1) and chart data. Filters are validated by zod before they reach here.
// The cache keeps one entry per key on disk, and anyone can make up queries, so only bounded key spaces are
// cached: catalogue entities that exist (checked first with one indexed row each), the unfiltered or
// group/pack/maker/cells-filtered lists, and the first pages. Free-text and range filters, far pages and
// unknown slugs or groups go straight to the database (an unknown one answers empty without a query).
/** Pages beyond this are read from the database each time. */
const CACHED_PAGES = 20;
const CACHEABLE_FILTERS = new Set(["group", "pack", "maker", "cells"]);

function keyOf(value: Record<string, unknown>): string {
  return JSON.stringify(
    Object.keys(value)
      .filter((k) => value[k] !== undefined)
      .sort()
      .map((k) => [k, value[k]]),
  );
}

/** Whether a like-for-like group has published results (unknown groups answer 404 everywhere). */
export async function knownGroup(key: string): Promise<boolean> {
  return (await cachedGroups()).some((g) => g.key === key);
}

/** Only catalogue slugs that exist (and, for a group, one with published results) make a cache entry. */
async function boundedFilters(
  f: { group?: string; pack?: string; maker?: string } & Record<string, unknown>,
): Promise<boolean> {
  if (Object.keys(f).some((k) => f[k] !== undefined && !CACHEABLE_FILTERS.has(k))) return false;
  if (f.group !== undefined && !(await knownGroup(f.group))) return false;
  // One indexed row each (db/queries/pack-by-slug.ts), not a search of the whole catalogue.
  if (f.pack !== undefined && !(await activePackExists(f.pack))) return false;
  if (f.maker !== undefined && !(await activeMakerWithPacksExists(f.maker))) return false;
  return true;
}

/** A page of published results; `filters` (as asked) make the cache key, `where` (resolved) the query. */
export async function cachedApiResultsPage(filters: ResultFilters, where: ResultWhere, page: Page) {
  if (page.page > CACHED_PAGES || !(await boundedFilters(filters))) return listResultsPage(where, page);
  // Narrowed to a pack, maker or group: that one's tag; otherwise the tag of the unnarrowed results lists.
  const narrowed = [
    ...(filters.group ? [t.group(filters.group)] : []),
    ...(filters.pack ? [t.pack(filters.pack)] : []),
    ...(filters.maker ? [t.maker(filters.maker)] : []),
  ];
  const tags = narrowed.length > 0 ? narrowed : [t.resultLists];
  return unstable_cache(() => listResultsPage(where, page), ["api-results", keyOf(filters), keyOf(page)], {
    tags,
    revalidate,
  })();
}

export async function cachedGroupSamples(groupKey: string, filters: PackFilters, where: PackWhere) {
  if (!(await knownGroup(groupKey))) return [];
  if (!(await boundedFilters(filters))) return listGroupSamples(groupKey, where);
  return unstable_cache(() => listGroupSamples(groupKey, where), ["group-samples", groupKey, keyOf(filters)], {
    tags: [t.group(groupKey)],
    revalidate,
  })();
}

/** At most `limit` curves of a group (db/queries/open-data/results.ts listGroupCurves picks them in SQL). */
export async function cachedGroupCurves(groupKey: string, filters: PackFilters, where: PackWhere, limit: number) {
  if (!(await knownGroup(groupKey))) return { series: [], packTotal: 0 };
  if (!(await boundedFilters(filters))) return listGroupCurves(groupKey, where, limit);
  const key = ["group-curves", groupKey, keyOf(filters), String(limit)];
  return unstable_cache(() => listGroupCurves(groupKey, where, limit), key, {
    tags: [t.group(groupKey)],
    revalidate,
  })();
}

/** Pages of featured charts kept in the data cache; later pages (rare) are read each time. */
const CACHED_CHART_PAGES = 10;

/** One page of the featured charts (/charts, GET /api/v1/charts): featuring a chart revalidates `charts`. */
export function cachedFeaturedCharts(page: number, size: number) {
  if (page > CACHED_CHART_PAGES) return listFeaturedCharts(page, size);
  return unstable_cache(() => listFeaturedCharts(page, size), ["featured-charts", String(page), String(size)], {
    tags: [t.charts],
    revalidate,
  })();
}

/** The site settings, for every page's notice and the submit page: saving them revalidates `settings`. */
export const cachedSiteSettings = unstable_cache(getSiteSettings, ["site-settings"], {
  tags: [t.settings],
  revalidate,
});
