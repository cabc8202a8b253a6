// CSV writing per RFC 4180 (https://www.rfc-editor.org/rfc/rfc4180): CRLF line breaks; a field holding a
// comma, double quote, CR or LF is enclosed in double quotes, and a double quote inside is doubled.
// Free-text fields are also guarded against spreadsheet formula injection following the OWASP
// "CSV Injection" guidance: a cell starting with = + - @ TAB or CR gets a leading single quote.

export type CsvCell = string | number | boolean | null | undefined;

const FORMULA_START = /^[=+\-@\t\r]/;

/** OWASP CSV-injection guard for free text: prefix a single quote when the cell could start a formula. */
export function guardFormula(text: string): string {
  return FORMULA_START.test(text) ? `'${text}` : text;
}

/** RFC 4180 §2.6–2.7: quote when needed, double inner quotes. */
export function escapeCsvField(value: string): string {
  return /[",\r\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

/** One cell: missing values are empty, numbers are plain (no thousands separators), free text is guarded. */
export function csvCell(value: CsvCell, freeText = false): string {
  if (value === null || value === undefined) return "";
  if (typeof value === "number") return Number.isFinite(value) ? String(value) : "";
  if (typeof value === "boolean") return value ? "true" : "false";
  return escapeCsvField(freeText ? guardFormula(value) : value);
}

export type CsvColumn<R> = { name: string; freeText?: boolean; value: (row: R) => CsvCell };

/** A whole CSV document: optional comment lines (declared as commentChar "#" in the descriptor), the
 * header row, then one record per row, every line ending in CRLF. */
export function toCsv<R>(columns: CsvColumn<R>[], rows: Iterable<R>, noteLines: string[] = []): string {
  const lines: string[] = noteLines.map((l) => `# ${l.replace(/[\r\n]+/g, " ")}`);
  lines.push(columns.map((c) => escapeCsvField(c.name)).join(","));
  for (const row of rows) lines.push(columns.map((c) => csvCell(c.value(row), c.freeText)).join(","));
  return lines.join("\r\n") + "\r\n";
}
