// GET /api/v1/results/{id} — one approved result with its method card and figures.
import { getApprovedResult } from "@/db/queries/open-data/results";
import { AppError } from "@/lib/errors";
import { apiGet, apiJson, apiOptions } from "@/server/api";
import { idParam } from "@/lib/validations/open-data";

export const GET = apiGet<{ id: string }>(async (req, params) => {
  const { id } = idParam.parse(params);
  const result = await getApprovedResult(id);
  if (!result) throw new AppError("not_found", "No such published result.");
  return apiJson(req, {
    data: result,
    links: { pack: `/api/v1/packs/${result.packSlug}`, group: `/api/v1/groups/${result.groupKey}` },
  });
});
export const OPTIONS = apiOptions;
