// The /packs page's body, for both of its routes: /packs without filters (static, revalidated hourly) and, behind
// a rewrite of /packs with any table parameter (next.config.mjs), the per-request render in app/(public)/packs-query.
import "server-only";
import { packListRecord } from "@/lib/open-data/pack-list";
import { readPackParams, writePackParams, type PackParams } from "@/lib/pack-query-params";
import { findPackPage } from "@/server/pack-search";
import { cachedFirstPackPage, cachedGroups, cachedPackFilterOptions, knownGroup } from "@/server/public-data";
import { StaticIsland } from "@/components/static-island";
import { PacksClient } from "./packs-client";
import { ServerPackTable } from "./pack-table-model";
import type { ApiPackPage, FilterOptions } from "./types";

export type SearchParams = Record<string, string | string[] | undefined>;

/** The page's search params as the URL had them (a repeated parameter counts once, its first value). */
export function urlParams(sp: SearchParams): URLSearchParams {
  const out = new URLSearchParams();
  for (const [k, v] of Object.entries(sp)) {
    const first = Array.isArray(v) ? v[0] : v;
    if (first !== undefined) out.set(k, first);
  }
  return out;
}

/** The table's page for `p`: the cached first page when /packs opens as is, else one SQL query. */
function firstPageOf(p: PackParams) {
  return writePackParams(p).toString() === "" ? cachedFirstPackPage() : findPackPage(p);
}

/**
 * /packs for the filters, search, sort and page in `sp`: the first HTML is already that page, rendered with the
 * same pack filter as GET /api/v1/packs; later changes come from that API.
 */
export async function PacksView({ sp }: { sp: URLSearchParams }) {
  const params = readPackParams(sp);
  const group = params.group !== null && (await knownGroup(params.group)) ? params.group : null;
  const [found, offered, groups] = await Promise.all([
    firstPageOf({ ...params, group }),
    cachedPackFilterOptions(),
    cachedGroups(),
  ]);
  // The messages the client shows for the API's 404 (unknown group) and 422 (page past the last).
  const error =
    params.group !== null && group === null
      ? "The packs could not be loaded. Try again, or clear the filters."
      : params.page > found.pageCount
        ? `There is no page ${params.page} of these packs: go back to page 1.`
        : null;
  // The same rows, rounded the same way, as GET /api/v1/packs answers for these filters.
  const initial: ApiPackPage = {
    data: error ? [] : found.rows.map((r) => ({ ...r, ...packListRecord(r) })),
    page: found.page,
    pageCount: error ? 1 : found.pageCount,
    total: error ? 0 : found.total,
  };
  const options: FilterOptions = {
    ...offered,
    groups: groups.map((g) => ({ key: g.key, label: g.label, packCount: g.packCount })),
  };
  return (
    <div className="space-y-4">
      <h1>Packs</h1>
      <p className="muted max-w-3xl text-sm">
        Measured columns appear when you choose a like-for-like group: figures are only compared between results taken
        the same way (<a href="/methods#like-for-like">why</a>). The same data is at <code>/api/v1/packs</code>.
      </p>
      <PacksClient
        options={options}
        initialQuery={writePackParams(params).toString()}
        initialError={error}
        first={
          <StaticIsland id="packs-first">
            <ServerPackTable page={initial} params={params} />
          </StaticIsland>
        }
      />
    </div>
  );
}
