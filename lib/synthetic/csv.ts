/** Synthetic logs written as CSV in the dialects testers' loggers use (header styles, units, separators). */
import { EcmSimulator, type EcmOptions, type EcmRow, type EcmTruth } from "./circuit";

export type CsvColumn = "time" | "voltage" | "current" | "temperature" | "cells" | "extra";
export type CsvDialect = {
  delimiter?: "," | ";" | "\t";
  decimalComma?: boolean;
  timeUnit?: "s" | "ms" | "min";
  voltageUnit?: "V" | "mV";
  currentUnit?: "A" | "mA";
  /** Log discharge current as negative numbers. */
  dischargeNegative?: boolean;
  bom?: boolean;
  crlf?: boolean;
  /** Write a header row (default true). */
  header?: boolean;
  headerStyle?: "parens" | "brackets" | "snake" | "slash";
  /** Column order; "cells" expands to one column per cell, "extra" to power, capacity and mode. */
  columns?: CsvColumn[];
  /** Decimal places, overriding the defaults for each unit. */
  decimals?: { time?: number; voltage?: number; current?: number; temperature?: number };
};

const TIME_SCALE = { s: 1, ms: 1000, min: 1 / 60 };
const TIME_DECIMALS = { s: 3, ms: 0, min: 5 };
type Style = NonNullable<CsvDialect["headerStyle"]>;
const HEADERS: Record<Style, { time: string; voltage: string; current: string; temperature: string; cell: string }> = {
  parens: {
    time: "Time (#)",
    voltage: "Voltage (#)",
    current: "Current (#)",
    temperature: "Temperature (°C)",
    cell: "Cell @ (#)",
  },
  brackets: { time: "time [#]", voltage: "U [#]", current: "I [#]", temperature: "Temp [°C]", cell: "V@ [#]" },
  snake: { time: "time_#", voltage: "voltage_#", current: "current_#", temperature: "temp_c", cell: "cell@_#" },
  slash: { time: "t/#", voltage: "U/#", current: "I/#", temperature: "T/°C", cell: "Cell@/#" },
};

function columnsOf(d: CsvDialect): CsvColumn[] {
  return d.columns ?? ["time", "voltage", "current", "temperature"];
}

export function csvHeader(d: CsvDialect, cells: number): string {
  const style = HEADERS[d.headerStyle ?? "parens"];
  const unit = (name: string, u: string) =>
    d.headerStyle === "snake" ? name.replace("#", u.toLowerCase()) : name.replace("#", u);
  const names: string[] = [];
  for (const c of columnsOf(d)) {
    if (c === "time") names.push(unit(style.time, d.timeUnit ?? "s"));
    else if (c === "voltage") names.push(unit(style.voltage, d.voltageUnit ?? "V"));
    else if (c === "current") names.push(unit(style.current, d.currentUnit ?? "A"));
    else if (c === "temperature") names.push(style.temperature);
    else if (c === "cells")
      for (let k = 1; k <= cells; k++) names.push(unit(style.cell.replace("@", String(k)), d.voltageUnit ?? "V"));
    else names.push("Power (W)", "Capacity (mAh)", "Mode");
  }
  return names.join(d.delimiter ?? ",") + (d.crlf ? "\r\n" : "\n");
}

/** One data line; `capacityMah` is the running total written in the extra columns. */
export function csvLine(row: EcmRow, d: CsvDialect, capacityMah = 0): string {
  const sep = d.delimiter ?? ",";
  const mv = d.voltageUnit === "mV";
  const fmt = (x: number, decimals: number) => {
    const text = x.toFixed(decimals);
    if (!d.decimalComma) return text;
    const comma = text.replace(".", ",");
    return sep === "," && decimals > 0 ? `"${comma}"` : comma;
  };
  const timeUnit = d.timeUnit ?? "s";
  const current = (d.dischargeNegative ? -row.currentA : row.currentA) * (d.currentUnit === "mA" ? 1000 : 1);
  const out: string[] = [];
  const places = d.decimals ?? {};
  for (const c of columnsOf(d)) {
    if (c === "time") out.push(fmt(row.timeS * TIME_SCALE[timeUnit], places.time ?? TIME_DECIMALS[timeUnit]));
    else if (c === "voltage") out.push(fmt(row.voltageV * (mv ? 1000 : 1), places.voltage ?? (mv ? 1 : 4)));
    else if (c === "current") out.push(fmt(current, places.current ?? (d.currentUnit === "mA" ? 0 : 3)));
    else if (c === "temperature") out.push(fmt(row.temperatureC, places.temperature ?? 2));
    else if (c === "cells") for (const v of row.cellVoltagesV) out.push(fmt(v * (mv ? 1000 : 1), mv ? 1 : 4));
    else out.push(fmt(row.voltageV * row.currentA, 1), fmt(capacityMah, 1), row.currentA > 0.02 ? "DCHG" : "REST");
  }
  return out.join(sep) + (d.crlf ? "\r\n" : "\n");
}

export function toCsv(rows: EcmRow[], d: CsvDialect = {}): string {
  const cells = rows[0]?.cellVoltagesV.length ?? 0;
  const parts: string[] = [d.bom ? "\uFEFF" : ""];
  if (d.header !== false) parts.push(csvHeader(d, cells));
  let capacityMah = 0;
  for (let k = 0; k < rows.length; k++) {
    const row = rows[k] as EcmRow;
    const prev = rows[k - 1];
    if (prev) capacityMah += (((prev.currentA + row.currentA) / 2) * (row.timeS - prev.timeS)) / 3.6;
    parts.push(csvLine(row, d, capacityMah));
  }
  return parts.join("");
}

/** The log as text chunks, generated on the fly: nothing but one chunk is ever in memory. */
export function* csvChunks(options: EcmOptions, d: CsvDialect = {}, rowsPerChunk = 2048): Generator<string, EcmTruth> {
  const sim = new EcmSimulator(options);
  let chunk = (d.bom ? "\uFEFF" : "") + (d.header !== false ? csvHeader(d, options.cells ?? 4) : "");
  let n = 0;
  while (sim.next()) {
    chunk += csvLine(sim.row, d);
    if (++n % rowsPerChunk === 0) {
      yield chunk;
      chunk = "";
    }
  }
  if (chunk.length > 0) yield chunk;
  return sim.truth;
}
