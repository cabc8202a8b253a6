// CSV writing per RFC 4180 (https://www.rfc-editor.org/rfc/rfc4180): CRLF line breaks; a field holding a
// comma, double quote, CR or LF is enclosed in double quotes, and a double quote inside is doubled.
// Free-text fields are also guarded against spreadsheet formula injection following the OWASP
// "CSV Injection" guidance: a cell starting with = + - @ TAB or CR gets a leading single quote.

import { fieldValue, type Field } from "./field-kit";

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

/**
 * A whole CSV document: the header row (the field names), then one record per row with each field's published
 * (rounded) value, every line ending in CRLF. Nothing else: no comment lines, which RFC 4180 does not have (the
 * licence and credit live in the Data Package descriptor and the README beside the files).
 */
export function toCsv<R>(fields: Field<R>[], rows: Iterable<R>): string {
  const lines = [fields.map((f) => escapeCsvField(f.name)).join(",")];
  for (const row of rows) lines.push(fields.map((f) => csvCell(fieldValue(f, row), f.freeText)).join(","));
  return lines.join("\r\n") + "\r\n";
}
