// GET /api/v1/results/{id}/log — the raw log of a published result, streamed from storage as uploaded, under the
// data's licence, so anyone can recompute its figures with the open CLI. 404 for anything not published.
import { getPublishedLog } from "@/db/queries/results";
import { idPath } from "@/lib/api-contract/queries";
import { logContentType } from "@/lib/api-contract/route-extras";
import { AppError } from "@/lib/errors";
import { logDownloadName } from "@/lib/open-data/recompute";
import { apiGet, apiOptions, parsePath, sendStream } from "@/server/api";
import { getObjectChunks } from "@/server/storage";

export const dynamic = "force-dynamic";
export const runtime = "nodejs";
const MISSING = "No such published result, or its log is not stored.";

export const GET = apiGet<{ id: string }>(async (req, params) => {
  const { id } = parsePath(params, idPath, MISSING);
  const log = await getPublishedLog(id);
  if (!log) throw new AppError("not_found", MISSING);
  const name = logDownloadName(log.resultId, log.filename);
  return sendStream(
    req,
    {
      // The log's own SHA-256 (computed while it was uploaded): equal tags mean equal bytes.
      etag: `"${log.sha256}"`,
      contentType: logContentType(name),
      headers: {
        "Content-Length": String(log.bytes),
        "Content-Disposition": `attachment; filename="${name}"`,
        "Cache-Control": "public, max-age=3600",
        "X-Content-Type-Options": "nosniff",
      },
      open: () => getObjectChunks(log.key),
    },
    MISSING,
  );
});
export const OPTIONS = apiOptions;
