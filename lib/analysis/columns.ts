/**
 * Finds the header row and decides which column is time, voltage, current, temperature and
 * per-cell voltage, with units, from the first rows of a log, or from an explicit mapping.
 */
import { LogError } from "./errors";
import { type HeaderGuess, guessHeader } from "./header-names";
import {
  CURRENT_UNITS,
  type CurrentUnit,
  type Dimension,
  TEMPERATURE_UNITS,
  TIME_UNITS,
  type TemperatureUnit,
  type TimeUnit,
  type UnitInfo,
  VOLTAGE_UNITS,
  type VoltageUnit,
  parseField,
} from "./units";

export type ColumnRef = string | number;
export type ColumnMapping = {
  time?: ColumnRef;
  voltage?: ColumnRef;
  current?: ColumnRef;
  temperature?: ColumnRef;
  /** Per-cell voltage columns, cell 1 first. */
  cellVoltages?: ColumnRef[];
  timeUnit?: TimeUnit;
  voltageUnit?: VoltageUnit;
  currentUnit?: CurrentUnit;
  temperatureUnit?: TemperatureUnit;
  hasHeader?: boolean;
  /** Which sign the log gives discharge current; detected from the data when not given. */
  dischargeSign?: "positive" | "negative";
};

export type SampleRow = { fields: string[]; line: number };

export type ColumnPlan = {
  /** Line number of the header row, 0 when the log has none. Rows up to it are not data. */
  headerLine: number;
  header: string[] | null;
  time: number;
  voltage: number | null;
  current: number;
  temperature: number | null;
  cells: number[];
  timeUnit: UnitInfo;
  voltageUnit: UnitInfo;
  currentUnit: UnitInfo;
  temperatureUnit: UnitInfo;
  /** False when no unit was stated for voltage; the reader may then recognise millivolts by size. */
  voltageUnitStated: boolean;
  /** Fields a data row needs (largest required index + 1; temperature may be missing). */
  width: number;
};

const HEADER_SEARCH_ROWS = 20;

function isNumericRow(fields: string[], decimalComma: boolean): boolean {
  let numeric = 0;
  let filled = 0;
  for (const f of fields) {
    if (f.trim().length === 0) continue;
    filled++;
    if (!Number.isNaN(parseField(f, decimalComma))) numeric++;
  }
  return filled > 0 && numeric * 2 >= filled;
}

function listed(words: string[]): string {
  return words.length <= 1 ? (words[0] ?? "") : `${words.slice(0, -1).join(", ")} and ${words[words.length - 1]}`;
}

function quoteHeader(fields: string[]): string {
  const text = fields.map((f) => `"${f.trim()}"`).join(", ");
  return text.length > 200 ? `${text.slice(0, 197)}...` : text;
}

function numericShare(rows: SampleRow[], index: number, decimalComma: boolean): number {
  if (rows.length === 0) return 1;
  let ok = 0;
  for (const r of rows) if (!Number.isNaN(parseField(r.fields[index], decimalComma))) ok++;
  return ok / rows.length;
}

function resolveRef(ref: ColumnRef, header: string[] | null, what: string): number {
  if (typeof ref === "number") {
    if (!Number.isInteger(ref) || ref < 0)
      throw new LogError("bad-mapping", `The mapping for ${what} must be a column number from 0, got ${ref}.`);
    if (header && ref >= header.length) {
      throw new LogError(
        "bad-mapping",
        `The mapping for ${what} is column ${ref}, but the header ${quoteHeader(header)} has only ${header.length} columns (numbered from 0).`,
      );
    }
    return ref;
  }
  if (!header)
    throw new LogError(
      "bad-mapping",
      `The mapping names ${what} as "${ref}", but the log has no header row: use a column number (from 0).`,
    );
  const wanted = ref.trim().toLowerCase();
  const index = header.findIndex(
    (h) =>
      h
        .replace(/^\uFEFF/, "")
        .trim()
        .toLowerCase() === wanted,
  );
  if (index === -1)
    throw new LogError(
      "bad-mapping",
      `The mapping names ${what} as "${ref}", which is not in the header ${quoteHeader(header)}.`,
    );
  return index;
}

type Chosen = { index: number; unit: UnitInfo | null };

function pick(
  guesses: HeaderGuess[],
  dimension: Dimension,
  data: SampleRow[],
  decimalComma: boolean,
  taken: Set<number>,
): Chosen | null {
  const candidates = guesses
    .filter((g) => g.dimension === dimension && g.cellNumber === null && g.score > 0 && !taken.has(g.index))
    .sort((a, b) => b.score - a.score || a.index - b.index);
  for (const c of candidates) {
    if (numericShare(data, c.index, decimalComma) >= 0.5) return { index: c.index, unit: c.unit };
  }
  return null;
}

function unitFor(guesses: HeaderGuess[] | null, index: number, dimension: Dimension): UnitInfo | null {
  const g = guesses?.[index];
  return g && g.unit && g.unit.dimension === dimension ? g.unit : null;
}

function tryPlan(
  headerRow: SampleRow | null,
  data: SampleRow[],
  decimalComma: boolean,
  mapping: ColumnMapping,
): ColumnPlan | { missing: string[] } {
  const header = headerRow ? headerRow.fields : null;
  const guesses = header ? header.map((h, i) => guessHeader(h, i)) : null;
  const taken = new Set<number>();
  for (const key of ["time", "voltage", "current", "temperature"] as const) {
    const ref = mapping[key];
    if (ref !== undefined) taken.add(resolveRef(ref, header, key));
  }
  const choose = (key: "time" | "voltage" | "current" | "temperature"): Chosen | null => {
    const ref = mapping[key];
    if (ref !== undefined) {
      const index = resolveRef(ref, header, key);
      return { index, unit: unitFor(guesses, index, key) };
    }
    if (!guesses) return null;
    const chosen = pick(guesses, key, data, decimalComma, taken);
    if (chosen) taken.add(chosen.index);
    return chosen;
  };
  const time = choose("time");
  const current = choose("current");
  let cells: number[] = [];
  if (mapping.cellVoltages)
    cells = mapping.cellVoltages.map((ref, i) => resolveRef(ref, header, `cell ${i + 1} voltage`));
  else if (guesses) {
    cells = guesses
      .filter((g) => g.cellNumber !== null && numericShare(data, g.index, decimalComma) >= 0.5)
      .sort((a, b) => (a.cellNumber ?? 0) - (b.cellNumber ?? 0))
      .map((g) => g.index);
  }
  const voltage = choose("voltage");
  const temperature = choose("temperature");
  const missing: string[] = [];
  if (!time) missing.push("time");
  if (!voltage && cells.length === 0) missing.push("voltage");
  if (!current) missing.push("current");
  if (!time || !current || (!voltage && cells.length === 0)) return { missing };

  const timeUnit = mapping.timeUnit ? TIME_UNITS[mapping.timeUnit] : (time.unit ?? TIME_UNITS.s);
  const voltageStated = mapping.voltageUnit ?? (voltage ? voltage.unit : unitFor(guesses, cells[0] ?? -1, "voltage"));
  const voltageUnit =
    typeof voltageStated === "string" ? VOLTAGE_UNITS[voltageStated] : (voltageStated ?? VOLTAGE_UNITS.V);
  const currentUnit = mapping.currentUnit ? CURRENT_UNITS[mapping.currentUnit] : (current.unit ?? CURRENT_UNITS.A);
  const temperatureUnit = mapping.temperatureUnit
    ? TEMPERATURE_UNITS[mapping.temperatureUnit]
    : (temperature?.unit ?? TEMPERATURE_UNITS.C);
  // Temperature is optional per row, so a short row without it is still a sample.
  const used = [time.index, current.index, voltage?.index ?? 0, ...cells];
  return {
    headerLine: headerRow ? headerRow.line : 0,
    header,
    time: time.index,
    voltage: voltage ? voltage.index : null,
    current: current.index,
    temperature: temperature ? temperature.index : null,
    cells,
    timeUnit,
    voltageUnit,
    currentUnit,
    temperatureUnit,
    voltageUnitStated: voltageStated !== null && voltageStated !== undefined,
    width: Math.max(...used) + 1,
  };
}

/** A header-less mapping must name columns the rows have: otherwise every row would be skipped, saying nothing. */
function checkWidth(plan: ColumnPlan, rows: SampleRow[]): ColumnPlan {
  const widest = Math.max(0, ...rows.map((r) => r.fields.length));
  const used: [string, number | null][] = [
    ["time", plan.time],
    ["voltage", plan.voltage],
    ["current", plan.current],
    ["temperature", plan.temperature],
    ...plan.cells.map((c, i): [string, number] => [`cell ${i + 1} voltage`, c]),
  ];
  const beyond = used.filter((u): u is [string, number] => u[1] !== null && u[1] >= widest);
  if (beyond.length > 0) {
    const what = beyond.map(([name, index]) => `${name} in column ${index}`);
    throw new LogError(
      "bad-mapping",
      `The mapping puts ${listed(what)} (counted from 0), but the log's rows have only ${widest} column${widest === 1 ? "" : "s"} (0–${widest - 1}).`,
    );
  }
  return plan;
}

/**
 * `rows` are the first non-blank rows of the log with their line numbers. Throws LogError
 * naming the header it saw when the columns cannot be identified.
 */
export function planColumns(rows: SampleRow[], decimalComma: boolean, mapping: ColumnMapping = {}): ColumnPlan {
  if (rows.length === 0) throw new LogError("empty", "The log is empty: no lines with data were found.");
  if (mapping.hasHeader === false) {
    const plan = tryPlan(null, rows, decimalComma, mapping);
    if ("missing" in plan) {
      throw new LogError(
        "bad-mapping",
        `With hasHeader: false the mapping must give column numbers for time, voltage and current; missing: ${listed(plan.missing)}.`,
      );
    }
    return checkWidth(plan, rows);
  }
  const searched = rows.slice(0, HEADER_SEARCH_ROWS);
  let firstText: SampleRow | null = null;
  let firstMissing: string[] = [];
  for (let k = 0; k < searched.length; k++) {
    const row = searched[k];
    if (!row || isNumericRow(row.fields, decimalComma)) continue;
    const data = rows.slice(k + 1, k + 1 + HEADER_SEARCH_ROWS).filter((r) => isNumericRow(r.fields, decimalComma));
    const plan = tryPlan(row, data, decimalComma, mapping);
    if (!("missing" in plan)) return plan;
    if (!firstText) {
      firstText = row;
      firstMissing = plan.missing;
    }
  }
  if (!firstText) {
    if (mapping.hasHeader === true)
      throw new LogError(
        "columns-not-found",
        `The mapping says the log has a header row, but line ${rows[0]?.line ?? 1} holds only numbers.`,
        rows[0]?.line,
      );
    const plan = tryPlan(null, rows, decimalComma, mapping);
    if (!("missing" in plan)) return checkWidth(plan, rows);
    throw new LogError(
      "columns-not-found",
      `Line ${rows[0]?.line ?? 1} holds numbers, not a header row, so the columns cannot be named: pass a column mapping with column numbers from 0, e.g. { time: 0, voltage: 1, current: 2, hasHeader: false }.`,
      rows[0]?.line,
    );
  }
  const header = firstText.fields;
  const example = `{ time: "${header[0]?.trim() ?? ""}", voltage: "${header[1]?.trim() ?? ""}", current: "${header[2]?.trim() ?? ""}" }`;
  throw new LogError(
    "columns-not-found",
    `Could not identify the ${listed(firstMissing)} column${firstMissing.length > 1 ? "s" : ""} in the header on line ${firstText.line}: ${quoteHeader(header)}. ` +
      `Name columns with their units, e.g. "Time (s)", "Voltage (V)", "Current (A)", "Temperature (°C)", or pass a column mapping such as ${example}.`,
    firstText.line,
  );
}
