/**
 * The first rows of a log split into columns, and the mapping detection would use — for a picker
 * that lets a tester name each column before the analysis (pure; browser-safe).
 */
import Papa from "papaparse";
import { type ColumnMapping, type ColumnPlan, planColumns } from "./columns";
import { type Dialect, sniffDialect } from "./dialect";
import { isLogError } from "./errors";
import {
  CURRENT_UNITS,
  type CurrentUnit,
  TEMPERATURE_UNITS,
  TIME_UNITS,
  type TemperatureUnit,
  type TimeUnit,
  type UnitInfo,
  VOLTAGE_UNITS,
  type VoltageUnit,
} from "./units";

/** Text read for a preview: enough for a preamble, the header and the first rows. */
export const PREVIEW_CHARS = 16 * 1024;
export const PREVIEW_ROWS = 20;

export type LogTablePreview = {
  dialect: Dialect;
  /** The first non-blank rows, split into fields, with their line numbers. */
  rows: { line: number; fields: string[] }[];
  /** Most fields in any previewed row. */
  columnCount: number;
  /** Line of the header row detection found (null: none, or detection failed). */
  headerLine: number | null;
  /** The mapping detection found, by column number, ready to edit and pass back to the analysis; null when it failed. */
  detected: ColumnMapping | null;
  /** Why detection failed, in words (null when it worked). */
  problem: string | null;
};

function unitSymbol<T extends string>(unit: UnitInfo, table: Record<T, UnitInfo>): T | undefined {
  return (Object.keys(table) as T[]).find((k) => table[k] === unit);
}

function toMapping(plan: ColumnPlan): ColumnMapping {
  const m: ColumnMapping = { time: plan.time, current: plan.current, hasHeader: plan.header !== null };
  if (plan.voltage !== null) m.voltage = plan.voltage;
  if (plan.temperature !== null) m.temperature = plan.temperature;
  if (plan.cells.length > 0) m.cellVoltages = [...plan.cells];
  m.timeUnit = unitSymbol<TimeUnit>(plan.timeUnit, TIME_UNITS);
  if (plan.voltageUnitStated) m.voltageUnit = unitSymbol<VoltageUnit>(plan.voltageUnit, VOLTAGE_UNITS);
  m.currentUnit = unitSymbol<CurrentUnit>(plan.currentUnit, CURRENT_UNITS);
  if (plan.temperature !== null)
    m.temperatureUnit = unitSymbol<TemperatureUnit>(plan.temperatureUnit, TEMPERATURE_UNITS);
  return m;
}

/** The start of a log (a string of any length; only the first 16 kB are read), previewed with an optional mapping to try. */
export function previewLog(text: string, mapping?: ColumnMapping): LogTablePreview {
  const start = text.charCodeAt(0) === 0xfeff ? text.slice(1, PREVIEW_CHARS + 1) : text.slice(0, PREVIEW_CHARS);
  const complete = text.length <= PREVIEW_CHARS;
  const { dialect } = sniffDialect(start, complete);
  const lines = start.split(dialect.newline);
  if (!complete) lines.pop(); // the last line may be cut
  const rows: { line: number; fields: string[] }[] = [];
  for (let k = 0; k < lines.length && rows.length < 60; k++) {
    const line = lines[k] as string;
    if (line.trim().length === 0) continue;
    const fields = Papa.parse<string[]>(line, { delimiter: dialect.delimiter, quoteChar: '"' }).data[0] ?? [line];
    rows.push({ line: k + 1, fields });
  }
  let detected: ColumnMapping | null = null;
  let headerLine: number | null = null;
  let problem: string | null = null;
  try {
    const plan = planColumns(rows, dialect.decimalComma, mapping);
    detected = toMapping(plan);
    headerLine = plan.header ? plan.headerLine : null;
  } catch (error) {
    if (!isLogError(error)) throw error;
    problem = error.message;
  }
  const shown = rows.slice(0, PREVIEW_ROWS);
  return {
    dialect,
    rows: shown,
    columnCount: Math.max(0, ...shown.map((r) => r.fields.length)),
    headerLine,
    detected,
    problem,
  };
}
