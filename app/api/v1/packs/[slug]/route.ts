// GET /api/v1/packs/{slug} — one pack as labelled, with its number of approved results.
import { cachedApiPack } from "@/server/public-data";
import { AppError } from "@/lib/errors";
import { apiGet, apiJson, apiOptions } from "@/server/api";
import { slugParam } from "@/lib/validations/open-data";

export const GET = apiGet<{ slug: string }>(async (req, params) => {
  const { slug } = slugParam.parse(params);
  const pack = await cachedApiPack(slug);
  if (!pack) throw new AppError("not_found", "No such pack.");
  return apiJson(req, { data: pack, links: { results: `/api/v1/results?pack=${pack.slug}` } });
});
export const OPTIONS = apiOptions;
