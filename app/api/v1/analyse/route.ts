// POST /api/v1/analyse — figures, curves and warnings for a log sent as the raw body (text/csv) or a multipart field `file`; nothing is stored.
// `?mapping=<JSON>` names the columns of a log detection cannot read (lib/validations/analyse.ts).
// Strangers are limited per client address and share ANALYSE_MAX_CONCURRENT analyses at a time (503 + Retry-After
// past it); signed-in accounts are limited per account.
import type { SessionUser } from "@/server/session";
import { withAnalysisSlot } from "@/server/analysis-slots";
import { clientAddress } from "@/server/client-address";
import { env } from "@/server/env";
import { limits, enforceRateLimit } from "@/server/rate-limit";
import { withPermission } from "@/server/route";
import { analyseChunks, previewOf } from "@/server/uploads/analyse";
import { logFromRequest, textOnly } from "@/server/uploads/body";
import { analyseQuerySchema, searchParamsObject } from "@/lib/validations/analyse";

export const dynamic = "force-dynamic";
export const runtime = "nodejs";

async function analyse(req: Request): Promise<Response> {
  const { include, ...options } = analyseQuerySchema.parse(searchParamsObject(req.url));
  const maxBytes = env().LOG_MAX_BYTES;
  const log = await logFromRequest(req, maxBytes);
  const analysis = await analyseChunks(textOnly(log.chunks), options, maxBytes, "file", "mapping");
  const { figures, curve } = previewOf(analysis);
  const body = include === "curve" ? { ...figures, curve } : figures;
  return Response.json(body, { headers: { "Cache-Control": "no-store" } });
}

export const POST = withPermission("public", async (req, _ctx, user: SessionUser | null) => {
  if (user) {
    await enforceRateLimit(`analyse:user:${user.id}`, limits.analysePerUser);
    return analyse(req);
  }
  await enforceRateLimit(`analyse:${clientAddress(req.headers)}`, limits.analysePerIp);
  return withAnalysisSlot(() => analyse(req));
});
