/**
 * Streams a log chunk by chunk. The caller does the I/O and hands over text or bytes; only the
 * unfinished last line is kept between chunks. Rows come out as string arrays (no per-row objects),
 * each with its line number.
 *
 * Two general-purpose CSV tokenizers share the work. Each block of whole lines without quotes goes
 * first to udsv (fast, but it assumes every row has the same number of fields: it pads a short row
 * and skips blank lines silently); the block is kept only when it is checked to have split exactly
 * as papaparse would: one row per line ending, the fields' lengths plus the usual number of
 * delimiters adding up to the block's length (a short row would not), no delimiter left in a last
 * field (a long row would), no byte-order mark. Anything else — quotes, the preamble and header,
 * blank or broken lines, rows of another width — is split by papaparse, as before, so line numbers,
 * blank-line counts and broken-line reports do not change (tests/unit/analysis/reader.test.ts holds
 * the property that both give the same rows across any chunk splits).
 */
import Papa from "papaparse";
import { initParser, type Parser as UdsvParser, type Schema } from "udsv";
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

export type ReadSummary = { bytes: number; lines: number; dialect: Dialect; fastBlocks: number; papaBlocks: number };

export const DEFAULT_MAX_BYTES = 50 * 1024 * 1024;
/** Enough text to see a preamble, the header and a few dozen rows before deciding the dialect. */
const SNIFF_CHARS = 16 * 1024;
/**
 * Text papaparse may carry over while a quoted field stays open. A log's quoted fields are short;
 * without a limit one stray quote would make every later chunk re-read the whole rest of the log.
 */
export const MAX_OPEN_QUOTE_CHARS = 256 * 1024;

function megabytes(bytes: number): string {
  return `${(bytes / (1024 * 1024)).toFixed(bytes < 1024 * 1024 ? 2 : 0)} MB`;
}

/** The usual number of fields in the sniffed rows (the last half: past any preamble and header). */
function usualWidth(rows: string[][]): number {
  const counts = new Map<number, number>();
  for (const r of rows.slice(Math.floor(rows.length / 2))) counts.set(r.length, (counts.get(r.length) ?? 0) + 1);
  let best = 0;
  let bestCount = 0;
  for (const [width, count] of counts) if (count > bestCount) [best, bestCount] = [width, count];
  return best;
}

function udsvFor(dialect: Dialect, width: number): UdsvParser | null {
  if (width < 2) return null;
  const cols = Array.from({ length: width }, (_, k) => ({
    name: String(k),
    type: "s" as const,
    repl: { empty: "", null: undefined, NaN: undefined },
  }));
  // skip: header rows udsv would drop from every call (none: papaparse handles the header).
  const schema: Schema & { skip: number } = {
    col: dialect.delimiter,
    row: dialect.newline,
    encl: '"',
    esc: '"',
    trim: false,
    cols,
    skip: 0,
  };
  return initParser(schema);
}

function countOf(text: string, needle: string): number {
  let n = 0;
  for (let i = text.indexOf(needle); i !== -1; i = text.indexOf(needle, i + needle.length)) n++;
  return n;
}

export async function readRows(
  chunks: ChunkSource,
  handler: RowHandler,
  maxBytes = DEFAULT_MAX_BYTES,
): Promise<ReadSummary> {
  const decoder = new TextDecoder("utf-8"); // drops a UTF-8 BOM itself
  let bytes = 0;
  let pending = "";
  let carry = "";
  let remainder = "";
  let line = 0;
  let parser: Papa.Parser | null = null;
  let fast: UdsvParser | null = null;
  let dialect: Dialect | null = null;
  let width = 0;
  let firstText = true;
  let fastBlocks = 0;
  let papaBlocks = 0;

  const papa = (text: string, final: boolean) => {
    if (!parser) return;
    papaBlocks++;
    const input = remainder.length > 0 ? remainder + text : text;
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
    if (remainder.length > MAX_OPEN_QUOTE_CHARS) {
      throw new LogError(
        "unclosed-quote",
        `A quote (") opened on line ${line + 1} is not closed within ${megabytes(MAX_OPEN_QUOTE_CHARS)}: check the quoting of that line.`,
        line + 1,
      );
    }
  };

  /** Whole lines, ending with a line ending: udsv when it splits them exactly as papaparse would. */
  const block = (text: string) => {
    if (fast && remainder.length === 0 && dialect && text.charCodeAt(0) !== 0xfeff && text.indexOf('"') === -1) {
      const rows = fast.stringArrs<string[]>(text);
      const delimiter = dialect.delimiter;
      let ok = rows.length === countOf(text, dialect.newline);
      // Every row has width fields, width − 1 delimiters and one line ending: their lengths add up to the block's.
      let chars = rows.length * (width - 1 + dialect.newline.length);
      for (let k = 0; ok && k < rows.length; k++) {
        const row = rows[k] ?? [];
        if (row[width - 1]?.includes(delimiter) !== false) ok = false;
        for (let c = 0; c < width; c++) chars += row[c]?.length ?? 0;
      }
      ok &&= chars === text.length;
      if (ok) {
        fastBlocks++;
        if (rows.length > 0) handler.rows(rows, rows.length, line + 1);
        line += rows.length;
        return;
      }
    }
    papa(text, false);
  };

  const feed = (text: string, final: boolean) => {
    if (!dialect) return;
    const input = carry.length > 0 ? carry + text : text;
    if (final) {
      carry = "";
      papa(input, true);
      return;
    }
    const cut = input.lastIndexOf(dialect.newline);
    if (cut === -1) {
      carry = input;
      return;
    }
    const end = cut + dialect.newline.length;
    carry = input.slice(end);
    block(end === input.length ? input : input.slice(0, end));
  };

  const start = (sample: string, complete: boolean) => {
    const sniffed = sniffDialect(sample, complete);
    dialect = sniffed.dialect;
    width = usualWidth(sniffed.rows);
    parser = new Papa.Parser({ delimiter: dialect.delimiter, newline: dialect.newline, quoteChar: '"' });
    fast = udsvFor(dialect, width);
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
      throw new LogError(
        "too-large",
        `The log is larger than the limit of ${megabytes(maxBytes)}: split it or keep only the test itself.`,
      );
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
  return { bytes, lines: line, dialect: dialect as unknown as Dialect, fastBlocks, papaBlocks };
}

/** Splits a string into chunks, so that text already in memory goes through the same path as a stream. */
export function* textChunks(text: string, size = 64 * 1024): Generator<string> {
  for (let i = 0; i < text.length; i += size) yield text.slice(i, i + size);
  if (text.length === 0) yield "";
}
