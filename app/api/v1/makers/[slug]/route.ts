// GET /api/v1/makers/{slug} — one maker, with its numbers of packs and published results.
import { slugPath } from "@/lib/api-contract/queries";
import { makerItem } from "@/lib/api-contract/responses";
import { AppError } from "@/lib/errors";
import { makerFields } from "@/lib/open-data/fields";
import { flatRecord } from "@/lib/open-data/records";
import { apiGet, apiJson, apiOptions, parsePath } from "@/server/api";
import { makerRows } from "@/server/open-data/catalogue";

export const GET = apiGet<{ slug: string }>(async (req, params) => {
  const { slug } = parsePath(params, slugPath, "No such maker.");
  const maker = (await makerRows()).find((m) => m.slug === slug);
  if (!maker) throw new AppError("not_found", "No such maker.");
  return apiJson(req, makerItem, {
    data: flatRecord(makerFields, maker),
    links: { packs: `/api/v1/packs?maker=${maker.slug}`, results: `/api/v1/results?maker=${maker.slug}` },
  });
});
export const OPTIONS = apiOptions;
