// GET /api/v1/packs — the pack catalogue with filters, fuzzy search, sorting and pages (public, CORS, ETag).
import { withPermission } from "@/server/route";
import { apiOptions, cachedJson, withCors } from "@/server/api";
import { AppError, fieldErrorsOf } from "@/lib/errors";
import { queryPacks } from "@/lib/pack-query";
import { cachedPackRows } from "@/server/public-data";
import { clientAddress } from "@/server/client-address";
import { enforceRateLimit, limits } from "@/server/rate-limit";
import { parsePackQuery, toPackParams } from "@/lib/validations/pack-query";
import { DATA_LICENCE } from "@/components/layout/site-footer";

const handler = withPermission("public", async (req) => {
  await enforceRateLimit(`api:${clientAddress(req.headers)}`, limits.apiPerIp);
  const parsed = parsePackQuery(new URL(req.url).searchParams);
  if (!parsed.success)
    throw new AppError("validation", "Some search parameters are not valid.", fieldErrorsOf(parsed.error));
  const params = toPackParams(parsed.data);
  const page = queryPacks(await cachedPackRows(params.group), params);
  return cachedJson(
    req,
    {
      data: page.rows.map(({ id: _id, ...row }) => row),
      page: page.page,
      pageSize: page.size,
      pageCount: page.pageCount,
      total: page.total,
      group: params.group,
      licence: { name: DATA_LICENCE.name, url: DATA_LICENCE.url, credit: "Sagline contributors" },
    },
    { "X-Total-Count": String(page.total) },
  );
});

export async function GET(req: Request, ctx: unknown): Promise<Response> {
  return withCors(handler(req, ctx));
}

export function OPTIONS(): Response {
  return apiOptions();
}
