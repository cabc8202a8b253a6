// Reading an uploaded log from a request without holding it whole: the raw body (text/csv) or one
// multipart field, as a stream of byte chunks with the size limit enforced as they arrive.
import "server-only";
import { Readable } from "node:stream";
import type { ReadableStream as NodeReadableStream } from "node:stream/web";
import busboy from "busboy";
import { AppError } from "@/lib/errors";

/** Content types a raw log may come with (browsers send application/vnd.ms-excel for .csv on Windows). */
const RAW_LOG_TYPES = new Set([
  "text/csv",
  "text/plain",
  "text/tab-separated-values",
  "application/csv",
  "application/vnd.ms-excel",
  "application/octet-stream",
]);

export type LogBodyKind = "raw" | "multipart";

function megabytes(bytes: number): string {
  return `${Math.round(bytes / (1024 * 1024))} MB`;
}

export function tooLarge(maxBytes: number, field = "file"): AppError {
  const message = `The log is larger than the limit of ${megabytes(maxBytes)}: split it or keep only the test itself.`;
  return new AppError("payload_too_large", message, { [field]: [message] });
}

/** 415 unless the body is a CSV-like raw body or multipart form data; 413 when Content-Length already says too much. */
export function logBodyKind(req: Request, maxBytes: number, allowMultipart = true, field = "file"): LogBodyKind {
  const type = (req.headers.get("content-type") ?? "").split(";")[0]?.trim().toLowerCase() ?? "";
  const length = Number(req.headers.get("content-length") ?? "");
  if (Number.isFinite(length) && length > maxBytes + (allowMultipart ? 64 * 1024 : 0)) throw tooLarge(maxBytes, field);
  if (RAW_LOG_TYPES.has(type)) return "raw";
  if (allowMultipart && type === "multipart/form-data") return "multipart";
  const accepted = allowMultipart
    ? "text/csv as the raw body, or multipart/form-data with a field named file"
    : "text/csv";
  throw new AppError("unsupported_media_type", `Send the log as ${accepted} (got ${type || "no content type"}).`, {
    [field]: ["This is not a CSV log. Export the log from your logger as CSV (comma, semicolon or tab separated)."],
  });
}

/** The raw request body as chunks; throws 413 as soon as it passes maxBytes. */
export async function* requestChunks(req: Request, maxBytes: number, field = "file"): AsyncGenerator<Uint8Array> {
  if (!req.body) return;
  const reader = req.body.getReader();
  let bytes = 0;
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) return;
      bytes += value.byteLength;
      if (bytes > maxBytes) throw tooLarge(maxBytes, field);
      yield value;
    }
  } finally {
    reader.releaseLock();
  }
}

/** A small body (a photo) read whole, refused with 413 as soon as it passes maxBytes. */
export async function readLimited(req: Request, maxBytes: number, field: string, message: string): Promise<Uint8Array> {
  const length = Number(req.headers.get("content-length") ?? "");
  if (Number.isFinite(length) && length > maxBytes)
    throw new AppError("payload_too_large", message, { [field]: [message] });
  const parts: Uint8Array[] = [];
  let total = 0;
  try {
    for await (const chunk of requestChunks(req, maxBytes)) {
      parts.push(chunk);
      total += chunk.byteLength;
    }
  } catch (err) {
    if (err instanceof AppError && err.code === "payload_too_large")
      throw new AppError("payload_too_large", message, { [field]: [message] });
    throw err;
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.byteLength;
  }
  return out;
}

/** The multipart field `file` as chunks (other fields are ignored); 422 when there is none, 413 past maxBytes. */
function multipartFile(
  req: Request,
  maxBytes: number,
  field = "file",
): Promise<{ chunks: AsyncIterable<Uint8Array>; filename: string }> {
  if (!req.body)
    return Promise.reject(
      new AppError("validation", `No log: send a multipart field named ${field}.`, { [field]: ["Choose a log file."] }),
    );
  const parser = busboy({
    headers: { "content-type": req.headers.get("content-type") ?? "" },
    limits: { files: 1, fileSize: maxBytes + 1, fields: 20, fieldSize: 4096, parts: 24 },
  });
  return new Promise((resolve, reject) => {
    let found = false;
    parser.on("file", (name, stream, info) => {
      if (name !== field || found) {
        stream.resume();
        return;
      }
      found = true;
      resolve({
        filename: info.filename ?? "log.csv",
        chunks: (async function* () {
          for await (const chunk of stream) if (chunk instanceof Uint8Array) yield chunk; // Buffers, never strings (no encoding set)
          if (stream.truncated) throw tooLarge(maxBytes);
        })(),
      });
    });
    parser.on("error", (err: unknown) => {
      if (!found)
        reject(
          new AppError(
            "bad_request",
            `The multipart body could not be read: ${err instanceof Error ? err.message : "malformed"}.`,
          ),
        );
    });
    parser.on("close", () => {
      if (!found)
        reject(
          new AppError("validation", `No log: send a multipart field named ${field}.`, {
            [field]: ["Choose a log file."],
          }),
        );
    });
    Readable.fromWeb(req.body as unknown as NodeReadableStream<Uint8Array>)
      .on("error", (err) => parser.destroy(err))
      .pipe(parser);
  });
}

/** The request's log as chunks and its file name, whichever way it was sent. */
export async function logFromRequest(
  req: Request,
  maxBytes: number,
  fallbackName = "log.csv",
): Promise<{ chunks: AsyncIterable<Uint8Array>; filename: string }> {
  const kind = logBodyKind(req, maxBytes);
  if (kind === "multipart") return multipartFile(req, maxBytes);
  return { chunks: requestChunks(req, maxBytes), filename: fallbackName };
}

const BINARY_SIGNATURES: { bytes: number[]; what: string }[] = [
  { bytes: [0x50, 0x4b, 0x03, 0x04], what: "a spreadsheet or zip archive (export the sheet as CSV)" },
  { bytes: [0x25, 0x50, 0x44, 0x46], what: "a PDF" },
  { bytes: [0xd0, 0xcf, 0x11, 0xe0], what: "an old Excel workbook (export the sheet as CSV)" },
  { bytes: [0xff, 0xd8, 0xff], what: "a JPEG picture" },
  { bytes: [0x89, 0x50, 0x4e, 0x47], what: "a PNG picture" },
  { bytes: [0xff, 0xfe], what: "text saved as UTF-16 (save it as UTF-8 CSV)" },
  { bytes: [0xfe, 0xff], what: "text saved as UTF-16 (save it as UTF-8 CSV)" },
];

/** Passes chunks through, refusing files that are plainly not text (checked on the first bytes). */
export async function* textOnly(chunks: AsyncIterable<Uint8Array>, field = "file"): AsyncGenerator<Uint8Array> {
  let checked = false;
  for await (const chunk of chunks) {
    if (!checked && chunk.byteLength > 0) {
      checked = true;
      const known = BINARY_SIGNATURES.find((s) => s.bytes.every((b, k) => chunk[k] === b));
      const head = chunk.subarray(0, 8192);
      if (known || head.includes(0)) {
        const message = `This file is not a CSV text log${known ? ` — it looks like ${known.what}` : " (it contains binary data)"}.`;
        throw new AppError("validation", message, { [field]: [message] });
      }
    }
    yield chunk;
  }
}
