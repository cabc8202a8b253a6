// GET /api/v1/makers/{slug} — one maker.
import { cachedApiMaker } from "@/server/public-data";
import { AppError } from "@/lib/errors";
import { apiGet, apiJson, apiOptions } from "@/server/api";
import { slugParam } from "@/lib/validations/open-data";

export const GET = apiGet<{ slug: string }>(async (req, params) => {
  const { slug } = slugParam.parse(params);
  const maker = await cachedApiMaker(slug);
  if (!maker) throw new AppError("not_found", "No such maker.");
  return apiJson(req, { data: maker, links: { packs: `/api/v1/packs?maker=${maker.slug}` } });
});
export const OPTIONS = apiOptions;
