/**
 * Sniffs how a log is written from its first few kilobytes: line ending, field separator
 * (comma, semicolon or tab) and decimal mark. The splitting itself is papaparse's.
 */
import Papa from "papaparse";

export type Delimiter = "," | ";" | "\t";
export type Newline = "\n" | "\r\n" | "\r";
export type Dialect = { delimiter: Delimiter; newline: Newline; decimalComma: boolean };

/** Tab and semicolon first: when either splits every line evenly, any comma is a decimal mark. */
const DELIMITERS: Delimiter[] = ["\t", ";", ","];
const SAMPLE_LINES = 60;

export function detectNewline(sample: string): Newline {
  const lf = sample.indexOf("\n");
  if (lf > 0 && sample.charCodeAt(lf - 1) === 13) return "\r\n";
  if (lf === -1 && sample.includes("\r")) return "\r";
  return "\n";
}

function countOf(line: string, char: string): number {
  let n = 0;
  for (let i = line.indexOf(char); i !== -1; i = line.indexOf(char, i + 1)) n++;
  return n;
}

function modeOf(values: number[]): { value: number; share: number } {
  const counts = new Map<number, number>();
  for (const v of values) counts.set(v, (counts.get(v) ?? 0) + 1);
  let best = 0;
  let bestCount = 0;
  for (const [value, count] of counts) {
    if (count > bestCount || (count === bestCount && value > best)) {
      best = value;
      bestCount = count;
    }
  }
  return { value: best, share: values.length === 0 ? 0 : bestCount / values.length };
}

export function detectDelimiter(lines: string[]): Delimiter {
  let fallback: Delimiter = ",";
  let fallbackTotal = 0;
  for (const delimiter of DELIMITERS) {
    const counts = lines.map((line) => countOf(line, delimiter));
    const mode = modeOf(counts);
    if (mode.value >= 1 && mode.share >= 0.6) return delimiter;
    const total = counts.reduce((a, b) => a + b, 0);
    if (total > fallbackTotal) {
      fallback = delimiter;
      fallbackTotal = total;
    }
  }
  return fallback;
}

const COMMA_DECIMAL = /^\s*[+-]?\d+,\d+\s*$/;
const POINT_DECIMAL = /^\s*[+-]?\d*\.\d+\s*$/;

export function detectDecimalComma(rows: string[][]): boolean {
  let comma = 0;
  let point = 0;
  for (const row of rows) {
    for (const field of row) {
      if (COMMA_DECIMAL.test(field)) comma++;
      else if (POINT_DECIMAL.test(field)) point++;
    }
  }
  return comma > point;
}

/** `sample` has no BOM; `complete` says whether it is the whole log (else its last line may be cut). */
export function sniffDialect(sample: string, complete: boolean): { dialect: Dialect; rows: string[][] } {
  const newline = detectNewline(sample);
  const allLines = sample.split(newline);
  if (!complete) allLines.pop();
  const lines = allLines.filter((l) => l.trim().length > 0).slice(0, SAMPLE_LINES);
  const delimiter = detectDelimiter(lines);
  const parsed = Papa.parse<string[]>(lines.join("\n"), { delimiter, newline: "\n", quoteChar: '"' });
  const rows = parsed.data;
  return { dialect: { delimiter, newline, decimalComma: detectDecimalComma(rows) }, rows };
}
