// A log upload in one pass: the request body streams to storage (multipart upload) while the same
// chunks are hashed and fed to the measurement core. Nothing holds the whole file; a bad log or a
// storage failure removes what was sent.
import "server-only";
import { createHash } from "node:crypto";
import { once } from "node:events";
import { PassThrough } from "node:stream";
import type { AnalyseOptions, Analysis } from "@/lib/analysis";
import { deleteObject, getObjectChunks, startStreamUpload } from "@/server/storage";
import { AppError } from "@/lib/errors";
import { analyseChunks } from "./analyse";
import { textOnly } from "./body";

export type StoredLog = { key: string; sha256: string; bytes: number };

/** Passes chunks through while counting and hashing them. */
function hashing(chunks: AsyncIterable<Uint8Array>) {
  const hash = createHash("sha256");
  const state = { bytes: 0, sha256: "" };
  const iterable = (async function* () {
    for await (const chunk of chunks) {
      hash.update(chunk);
      state.bytes += chunk.byteLength;
      yield chunk;
    }
    state.sha256 = hash.digest("hex");
  })();
  return { iterable, state };
}

export async function storeAndAnalyse(
  chunks: AsyncIterable<Uint8Array>,
  key: string,
  options: AnalyseOptions,
  maxBytes: number,
  field = "file",
): Promise<{ stored: StoredLog; analysis: Analysis }> {
  const body = new PassThrough({ highWaterMark: 1024 * 1024 });
  const upload = startStreamUpload(key, body, "text/csv; charset=utf-8");
  upload.done.catch(() => undefined); // awaited below; this only silences the early-failure case
  const hashed = hashing(textOnly(chunks, field));
  const tee = (async function* () {
    for await (const chunk of hashed.iterable) {
      // Backpressure: wait for storage to take the chunk before reading more of the request.
      if (!body.write(chunk)) await Promise.race([once(body, "drain"), upload.done]);
      yield chunk;
    }
    body.end();
  })();
  try {
    const analysis = await analyseChunks(tee, options, maxBytes, field);
    await upload.done;
    return { stored: { key, sha256: hashed.state.sha256, bytes: hashed.state.bytes }, analysis };
  } catch (err) {
    body.destroy();
    await upload.abort();
    await deleteObject(key).catch(() => undefined);
    throw err;
  }
}

/** The stored log read back and analysed again (at submit time: figures from the client are never trusted). */
export async function analyseStored(
  key: string,
  options: AnalyseOptions,
  maxBytes: number,
  field = "log",
): Promise<{ sha256: string; bytes: number; analysis: Analysis }> {
  const chunks = await getObjectChunks(key);
  if (!chunks)
    throw new AppError("validation", "The uploaded log is no longer stored.", {
      [field]: ["The uploaded log is no longer stored: please upload it again."],
    });
  const hashed = hashing(chunks);
  const analysis = await analyseChunks(hashed.iterable, options, maxBytes, field);
  return { sha256: hashed.state.sha256, bytes: hashed.state.bytes, analysis };
}
