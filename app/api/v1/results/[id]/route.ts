// GET /api/v1/results/{id} — one published result with its method card and figures.
import { getPublishedResult } from "@/db/queries/open-data/results";
import { idPath } from "@/lib/api-contract/queries";
import { resultItem } from "@/lib/api-contract/responses";
import { AppError } from "@/lib/errors";
import { nestedRecord } from "@/lib/open-data/records";
import { resultFields } from "@/lib/open-data/result-fields";
import { apiGet, apiJson, apiOptions, parsePath } from "@/server/api";

export const GET = apiGet<{ id: string }>(async (req, params) => {
  const { id } = parsePath(params, idPath, "No such published result.");
  const result = await getPublishedResult(id);
  if (!result) throw new AppError("not_found", "No such published result.");
  return apiJson(req, resultItem, {
    data: nestedRecord(resultFields, result),
    links: {
      pack: `/api/v1/packs/${result.packSlug}`,
      group: `/api/v1/groups/${result.groupKey}`,
      log: `/api/v1/results/${result.id}/log`,
      page: `/results/${result.id}`,
    },
  });
});
export const OPTIONS = apiOptions;
