// A result's evidence — its label photos and raw log — served from storage with a permission check, never
// from a public bucket URL. Photos: moderators always, the contributor their own, everyone else only once the
// result is published. The log: moderators only (and streamed, never buffered whole).
import "server-only";
import { getResultFiles, type ResultFiles } from "@/db/queries/evidence";
import type { ReviewStatus } from "@/lib/enums";
import { AppError } from "@/lib/errors";
import { can } from "@/lib/permissions";
import type { SessionUser } from "@/server/session";
import { getObjectChunks } from "@/server/storage";

const PUBLISHED: readonly ReviewStatus[] = ["approved"];
const PHOTO_TYPES: Record<string, string> = { jpg: "image/jpeg", png: "image/png", webp: "image/webp" };

function toStream(chunks: AsyncIterable<Uint8Array>): ReadableStream<Uint8Array> {
  const it = chunks[Symbol.asyncIterator]();
  return new ReadableStream<Uint8Array>({
    async pull(controller) {
      try {
        const { value, done } = await it.next();
        if (done) controller.close();
        else controller.enqueue(value);
      } catch (err) {
        controller.error(err);
      }
    },
    async cancel() {
      await it.return?.();
    },
  });
}

const gone = () => new AppError("not_found", "There is no such file.");

function maySeePhotos(files: ResultFiles, user: SessionUser | null): boolean {
  if (PUBLISHED.includes(files.status)) return true;
  if (!user) return false;
  return user.id === files.contributorId || can(user.role, "result.evidence");
}

/** Label photo number `index` of a result, or 404 (also when the asker may not see it: nothing is revealed). */
export async function photoResponse(resultId: number, index: number, user: SessionUser | null): Promise<Response> {
  const files = await getResultFiles(resultId);
  const key = files?.photoKeys[index];
  if (!files || !key || !maySeePhotos(files, user)) throw gone();
  const chunks = await getObjectChunks(key);
  if (!chunks) throw gone();
  const published = PUBLISHED.includes(files.status);
  return new Response(toStream(chunks), {
    headers: {
      "Content-Type": PHOTO_TYPES[key.split(".").pop() ?? ""] ?? "application/octet-stream",
      "Content-Disposition": `inline; filename="result-${resultId}-photo-${index + 1}.${key.split(".").pop()}"`,
      "Cache-Control": published ? "public, max-age=300" : "private, no-store",
      "X-Content-Type-Options": "nosniff",
    },
  });
}

/** The raw log as uploaded, as a download for moderators. */
export async function logResponse(resultId: number): Promise<Response> {
  const files = await getResultFiles(resultId);
  if (!files) throw gone();
  const chunks = await getObjectChunks(files.logKey);
  if (!chunks) throw gone();
  const name = files.logFilename.replace(/[^A-Za-z0-9._-]+/g, "_").slice(0, 100) || "log.csv";
  return new Response(toStream(chunks), {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Length": String(files.logBytes),
      "Content-Disposition": `attachment; filename="result-${resultId}-${name}"`,
      "Cache-Control": "private, no-store",
      "X-Content-Type-Options": "nosniff",
    },
  });
}
