// GET /api/v1/packs/{slug} — one pack as labelled, with its number of published results.
import { slugPath } from "@/lib/api-contract/queries";
import { packItem } from "@/lib/api-contract/responses";
import { AppError } from "@/lib/errors";
import { packFields } from "@/lib/open-data/fields";
import { flatRecord } from "@/lib/open-data/records";
import { apiGet, apiJson, apiOptions, parsePath } from "@/server/api";
import { getPackRow } from "@/db/queries/pack-catalogue";

export const GET = apiGet<{ slug: string }>(async (req, params) => {
  const { slug } = parsePath(params, slugPath, "No such pack.");
  const pack = await getPackRow(slug);
  if (!pack) throw new AppError("not_found", "No such pack.");
  return apiJson(req, packItem, {
    data: flatRecord(packFields, pack),
    links: { results: `/api/v1/results?pack=${pack.slug}`, maker: `/api/v1/makers/${pack.makerSlug}` },
  });
});
export const OPTIONS = apiOptions;
