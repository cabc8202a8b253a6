// GET /api/v1/packs — the pack catalogue with the packs table's filters, fuzzy search, sorting and pages.
import { packListQuery } from "@/lib/api-contract/queries";
import { packList } from "@/lib/api-contract/responses";
import { packFields } from "@/lib/open-data/fields";
import { packListRecord } from "@/lib/open-data/pack-list";
import { flatRecord } from "@/lib/open-data/records";
import { toPackParams } from "@/lib/pack-query-params";
import { apiGet, apiJson, apiOptions, pageOf, parseQuery } from "@/server/api";
import { requireKnownGroup } from "@/server/open-data/catalogue";
import { findPackPage } from "@/server/pack-search";

export const GET = apiGet(async (req) => {
  const query = parseQuery(req, packListQuery);
  const { sort, dir, page: _page, size: _size, ...filters } = query;
  const params = toPackParams(query);
  await requireKnownGroup(filters.group);
  const result = await findPackPage(params);
  const page = pageOf(req, params, result.total);
  return apiJson(
    req,
    packList,
    {
      data: result.rows.map((r) => ({ ...flatRecord(packFields, r), ...packListRecord(r) })),
      meta: { ...page.meta, filters, sort, dir },
      links: page.links,
    },
    { ...page.headers, "Cache-Control": "public, max-age=60, s-maxage=300, stale-while-revalidate=600" },
  );
});
export const OPTIONS = apiOptions;
