// POST /api/v1/uploads/log — streams a log (raw text/csv body) to storage while hashing and analysing it; answers with its storage key and a preview.
import { AppError } from "@/lib/errors";
import { env } from "@/server/env";
import { enforceRateLimit, limits } from "@/server/rate-limit";
import { withPermission } from "@/server/route";
import { incomingLogKey } from "@/server/storage";
import { previewOf } from "@/server/uploads/analyse";
import { logBodyKind, requestChunks } from "@/server/uploads/body";
import { storeAndAnalyse } from "@/server/uploads/log-upload";
import { searchParamsObject } from "@/lib/validations/analyse";
import { hasLogExtension, logUploadQuerySchema } from "@/lib/validations/upload";

export const dynamic = "force-dynamic";
export const runtime = "nodejs";

export const POST = withPermission("upload.create", async (req, _ctx, user) => {
  if (!user) throw new AppError("unauthenticated", "Please sign in first.");
  const { filename, loadCurrentA, loadMode, ...options } = logUploadQuerySchema.parse(searchParamsObject(req.url));
  const maxBytes = env().LOG_MAX_BYTES;
  logBodyKind(req, maxBytes, false, "log");
  if (!hasLogExtension(filename)) {
    throw new AppError("unsupported_media_type", "Only CSV logs can be uploaded.", {
      log: [`${filename} is not a CSV log: export the log from your logger as .csv (or .txt/.tsv).`],
    });
  }
  await enforceRateLimit(`upload:${user.id}`, limits.uploadPerUser);
  const key = incomingLogKey(user.id);
  const { stored, analysis } = await storeAndAnalyse(
    requestChunks(req, maxBytes, "log"),
    key,
    options,
    maxBytes,
    "log",
  );
  const card =
    options.cells && options.cutoffVPerCell
      ? {
          packCells: options.cells,
          cutoffVPerCell: options.cutoffVPerCell,
          loadCurrentA,
          loadMode,
          stopTemperatureC: options.stopTemperatureC,
        }
      : undefined;
  return Response.json(
    { log: { ...stored, filename }, preview: previewOf(analysis, card) },
    { status: 201, headers: { "Cache-Control": "no-store" } },
  );
});
