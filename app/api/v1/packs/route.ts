// GET /api/v1/packs — active packs, paginated, filtered like the packs table (maker, cells, connector, capacity, q).
import { listPacksPage } from "@/db/queries/open-data/packs";
import { apiGet, apiJson, apiOptions, pageEnvelope, parseQuery } from "@/lib/open-data/api";
import { packListQuery } from "@/lib/validations/open-data";

export const GET = apiGet(async (req) => {
  const { page, perPage, ...filters } = parseQuery(req, packListQuery);
  const { rows, total } = await listPacksPage(filters, { page, perPage });
  const env = pageEnvelope(req, page, perPage, total);
  return apiJson(req, { data: rows, meta: { ...env.meta, filters }, links: env.links }, env.headers);
});
export const OPTIONS = apiOptions;
