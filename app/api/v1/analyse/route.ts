// POST /api/v1/analyse — figures, curves and warnings for a log sent as the raw body (text/csv) or a multipart field `file`; nothing is stored.
// `?mapping=<JSON>` names the columns of a log detection cannot read (lib/validations/analyse.ts).
import { env } from "@/server/env";
import { limits, clientIp, enforceRateLimit } from "@/server/rate-limit";
import { withPermission } from "@/server/route";
import { analyseChunks, previewOf } from "@/server/uploads/analyse";
import { logFromRequest, textOnly } from "@/server/uploads/body";
import { analyseQuerySchema, searchParamsObject } from "@/lib/validations/analyse";

export const dynamic = "force-dynamic";
export const runtime = "nodejs";

export const POST = withPermission("public", async (req) => {
  await enforceRateLimit(`analyse:${clientIp(req.headers)}`, limits.analysePerIp);
  const { include, ...options } = analyseQuerySchema.parse(searchParamsObject(req.url));
  const maxBytes = env().LOG_MAX_BYTES;
  const log = await logFromRequest(req, maxBytes);
  const analysis = await analyseChunks(textOnly(log.chunks), options, maxBytes, "file", "mapping");
  const { figures, curve } = previewOf(analysis);
  const body = include === "curve" ? { ...figures, curve } : figures;
  return Response.json(body, { headers: { "Cache-Control": "no-store" } });
});
