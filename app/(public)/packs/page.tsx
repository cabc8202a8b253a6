import type { Metadata } from "next";
import { packListRecord } from "@/lib/open-data/pack-list";
import { queryPacks } from "@/lib/pack-query";
import { DEFAULT_PACK_PARAMS } from "@/lib/pack-query-params";
import { cachedGroups, cachedPackRows } from "@/server/public-data";
import { StaticIsland } from "@/components/static-island";
import { PacksClient } from "./_components/packs-client";
import { PackTable } from "./_components/pack-table";
import type { ApiPackPage, FilterOptions } from "./_components/types";

export const metadata: Metadata = {
  title: "Packs",
  description:
    "Every pack in the catalogue: filter by cells, capacity, labelled C, weight, connector, maker and like-for-like group.",
};
// Static: the first page (no filters) is rendered here; filtered pages come from /api/v1/packs.
export const revalidate = 3600;

export default async function PacksPage() {
  const [rows, groups] = await Promise.all([cachedPackRows(null), cachedGroups()]);
  const first = queryPacks(rows, DEFAULT_PACK_PARAMS);
  // The same rows, rounded the same way, as GET /api/v1/packs answers for the default view.
  const initial: ApiPackPage = {
    data: first.rows.map((r) => ({ ...r, ...packListRecord(r) })),
    page: first.page,
    pageCount: first.pageCount,
    total: first.total,
  };
  const makers = new Map(rows.map((r) => [r.makerSlug, r.makerName]));
  const options: FilterOptions = {
    makers: [...makers.entries()].map(([slug, name]) => ({ slug, name })).sort((a, b) => a.name.localeCompare(b.name)),
    connectors: [...new Set(rows.map((r) => r.connector))].sort(),
    cells: [...new Set(rows.map((r) => r.cellsInSeries))].sort((a, b) => a - b),
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
        first={
          <StaticIsland id="packs-first">
            <PackTable page={initial} params={DEFAULT_PACK_PARAMS} />
          </StaticIsland>
        }
      />
    </div>
  );
}
