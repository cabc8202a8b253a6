/**
 * Streams a log through papaparse chunk by chunk. The caller does the I/O and hands over text
 * or bytes; only the unparsed tail of the last chunk is kept between chunks. Rows come out as
 * papaparse's string arrays (no per-row objects), each with its line number.
 */
import Papa from "papaparse";
import { type Dialect, sniffDialect } from "./dialect";
import { LogError } from "./errors";

export type ChunkSource = AsyncIterable<string | Uint8Array> | Iterable<string | Uint8Array>;

export type RowHandler = {
  /** Called once, before any row, with the dialect sniffed from the start of the log. */
  begin(dialect: Dialect): void;
  /**
   * The rows of one chunk, in order, blank ones included (as [""]): rows[0..count) where
   * rows[k] is line firstLine + k. Batches keep the per-row cost to the handler's own loop.
   */
  rows(rows: string[][], count: number, firstLine: number): void;
  /** Called once after the last row. */
  end(): void;
};

export type ReadSummary = { bytes: number; lines: number; dialect: Dialect };

export const DEFAULT_MAX_BYTES = 50 * 1024 * 1024;
/** Enough text to see a preamble, the header and a few dozen rows before deciding the dialect. */
const SNIFF_CHARS = 16 * 1024;

function megabytes(bytes: number): string {
  return `${(bytes / (1024 * 1024)).toFixed(bytes < 1024 * 1024 ? 2 : 0)} MB`;
}

export async function readRows(chunks: ChunkSource, handler: RowHandler, maxBytes = DEFAULT_MAX_BYTES): Promise<ReadSummary> {
  const decoder = new TextDecoder("utf-8"); // drops a UTF-8 BOM itself
  let bytes = 0;
  let pending = "";
  let remainder = "";
  let line = 0;
  let parser: Papa.Parser | null = null;
  let dialect: Dialect | null = null;
  let firstText = true;

  const feed = (text: string, final: boolean) => {
    const input = remainder.length > 0 ? remainder + text : text;
    if (!parser) return;
    const result = parser.parse(input, 0, !final) as { data: string[][]; meta: { cursor: number } };
    const rows = result.data;
    let count = rows.length;
    if (final && count > 0) {
      const last = rows[count - 1];
      if (last && last.length === 1 && last[0] === "") count--; // the newline that ends the file
    }
    if (count > 0) handler.rows(rows, count, line + 1);
    line += count;
    remainder = final ? "" : input.slice(result.meta.cursor);
  };

  const start = (sample: string, complete: boolean) => {
    const sniffed = sniffDialect(sample, complete);
    dialect = sniffed.dialect;
    parser = new Papa.Parser({ delimiter: dialect.delimiter, newline: dialect.newline, quoteChar: '"' });
    handler.begin(dialect);
  };

  for await (const chunk of chunks) {
    let text: string;
    if (typeof chunk === "string") {
      bytes += chunk.length;
      text = chunk;
    } else {
      bytes += chunk.byteLength;
      text = decoder.decode(chunk, { stream: true });
    }
    if (bytes > maxBytes) {
      throw new LogError("too-large", `The log is larger than the limit of ${megabytes(maxBytes)}: split it or keep only the test itself.`);
    }
    if (firstText && text.length > 0) {
      if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
      firstText = false;
    }
    if (!parser) {
      pending += text;
      if (pending.length < SNIFF_CHARS) continue;
      start(pending, false);
      feed(pending, false);
      pending = "";
    } else {
      feed(text, false);
    }
  }
  let tail = decoder.decode();
  if (firstText && tail.charCodeAt(0) === 0xfeff) tail = tail.slice(1);
  if (!parser) {
    pending += tail;
    if (pending.trim().length === 0) throw new LogError("empty", "The log is empty.");
    start(pending, true);
    feed(pending, true);
  } else {
    feed(tail, true);
  }
  handler.end();
  return { bytes, lines: line, dialect: dialect as unknown as Dialect };
}

/** Splits a string into chunks, so that text already in memory goes through the same path as a stream. */
export function* textChunks(text: string, size = 64 * 1024): Generator<string> {
  for (let i = 0; i < text.length; i += size) yield text.slice(i, i + size);
  if (text.length === 0) yield "";
}
