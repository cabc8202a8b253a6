/**
 * Command line: figures from a log file.
 *   npm run --silent analyse -- <log.csv> [--cells N] [--rated-mah X] [--labelled-c C] [--weight-g W]
 *       [--cutoff-v V] [--stop-temp-c T] [--pack-start-temp-c T] [--hold-s S] [--no-header] [--json]
 *       [--map time=COL,voltage=COL,current=COL[,temperature=COL][,cells=COL+COL+…][,time-unit=s|ms|min|h]
 *              [,voltage-unit=V|mV][,current-unit=A|mA][,temperature-unit=C|F|K][,discharge=positive|negative]]
 *       [--map-json '{"time":1,"voltage":9,"current":8,"hasHeader":false}']
 * COL is a header name or a column number from 0. Either mapping form is checked by the same schema as
 * the API's `mapping` parameter (lib/analysis/mapping-schema.ts). Bad input: exit code 2 and one line on stderr.
 */
import fs from "node:fs";
import {
  type AnalyseOptions,
  type Analysis,
  LogError,
  analyseLog,
  columnMappingSchema,
  parseMappingJson,
  toPublicFigures,
} from "../lib/analysis";
import { CLI_NUMBER_FLAGS } from "../lib/open-data/recompute";

const USAGE =
  "usage: npm run --silent analyse -- <log.csv> [--cells N] [--rated-mah X] [--labelled-c C] [--weight-g W] [--cutoff-v V] [--stop-temp-c T] [--pack-start-temp-c T] [--hold-s S] [--map time=COL,voltage=COL,current=COL,…] [--map-json JSON] [--no-header] [--json]";

class UsageError extends Error {}

// The flags live beside the command a result's page shows (lib/open-data/recompute.ts), so the two agree.
const NUMBER_FLAGS: Record<string, keyof AnalyseOptions> = CLI_NUMBER_FLAGS;

const MAP_KEYS: Record<string, string> = {
  time: "time",
  voltage: "voltage",
  current: "current",
  temperature: "temperature",
  cells: "cellVoltages",
  "time-unit": "timeUnit",
  "voltage-unit": "voltageUnit",
  "current-unit": "currentUnit",
  "temperature-unit": "temperatureUnit",
  discharge: "dischargeSign",
};

const column = (value: string): string | number => (/^\d+$/.test(value) ? Number(value) : value);

function parseMap(text: string, mapping: Record<string, unknown>): void {
  for (const part of text.split(",")) {
    const [key, ...rest] = part.split("=");
    const value = rest.join("=").trim();
    const target = key ? MAP_KEYS[key.trim()] : undefined;
    if (!target || !value)
      throw new UsageError(
        `--map takes time=COL,voltage=COL,current=COL[,temperature=COL][,cells=COL+COL…][,time-unit=…], got "${text}"`,
      );
    if (target === "cellVoltages") mapping[target] = value.split("+").map((c) => column(c.trim()));
    else if (target.endsWith("Unit") || target === "dischargeSign") mapping[target] = value;
    else mapping[target] = column(value);
  }
}

function parseArgs(argv: string[]): { file: string; options: AnalyseOptions; json: boolean } {
  let file: string | null = null;
  let json = false;
  const options: Record<string, unknown> = {};
  let mapping: Record<string, unknown> = {};
  for (let k = 0; k < argv.length; k++) {
    const arg = argv[k] as string;
    if (arg === "--json") json = true;
    else if (arg === "--no-header") mapping.hasHeader = false;
    else if (arg === "--map") parseMap(argv[++k] ?? "", mapping);
    else if (arg === "--map-json") {
      const parsed = parseMappingJson(argv[++k] ?? "");
      if (!parsed.ok) throw new UsageError(parsed.message);
      mapping = { ...mapping, ...parsed.mapping };
    } else if (arg in NUMBER_FLAGS) {
      const raw = argv[++k];
      const value = Number(raw);
      if (raw === undefined || raw.trim() === "" || !Number.isFinite(value))
        throw new UsageError(`${arg} needs a number, got ${raw === undefined ? "nothing" : `"${raw}"`}`);
      options[NUMBER_FLAGS[arg] as string] = value;
    } else if (arg.startsWith("--")) throw new UsageError(`unknown option ${arg}`);
    else if (file === null) file = arg;
    else throw new UsageError(`unexpected argument "${arg}"`);
  }
  if (file === null) throw new UsageError("no log file given");
  if (Object.keys(mapping).length > 0) {
    const checked = columnMappingSchema.safeParse(mapping);
    if (!checked.success)
      throw new UsageError(
        `the column mapping is not usable: ${checked.error.issues.map((i) => `${i.path.join(".") || "mapping"}: ${i.message}`).join("; ")}`,
      );
    options.mapping = checked.data;
  }
  return { file, options: options as AnalyseOptions, json };
}

function fmt(x: number | null, digits: number, unit = ""): string {
  return x === null ? "—" : `${x.toFixed(digits)}${unit}`;
}

function table(a: Analysis): string {
  const f = a.figures;
  const rows: [string, string][] = [
    ["samples", `${f.samples}${f.skippedLines > 0 ? ` (${f.skippedLines} lines skipped)` : ""}`],
    ["duration", fmt(f.durationS, 1, " s")],
    [
      "cells in series",
      f.cells === null ? "—" : `${f.cells}${f.cellsSource === "rest-voltage" ? " (from rest voltage)" : ""}`,
    ],
    ["delivered capacity", fmt(f.capacityMah, 0, " mAh")],
    ["delivered energy", fmt(f.energyWh, 2, " Wh")],
    ["mean voltage under load", `${fmt(f.meanVoltageV, 3, " V")} (${fmt(f.meanVoltagePerCellV, 3, " V/cell")})`],
    ["minimum voltage", `${fmt(f.minVoltageV, 3, " V")} (${fmt(f.minVoltagePerCellV, 3, " V/cell")})`],
    ["peak current", fmt(f.peakCurrentA, 2, " A")],
    ["main discharge current", fmt(f.mainDischargeCurrentA, 2, " A")],
    ["time to cut-off", fmt(f.timeToCutoffS, 1, " s")],
    [`hold voltage (${a.parameters.holdDelayS} s)`, fmt(f.holdVoltagePerCellV, 3, " V/cell")],
    [
      "temperature start → peak",
      `${fmt(f.startTemperatureC, 1, " °C")} → ${fmt(f.peakTemperatureC, 1, " °C")} (rise ${fmt(f.temperatureRiseC, 1, " °C")})`,
    ],
    [
      "DC resistance",
      `${fmt(f.dcResistanceMohm, 2, " mΩ")} (${fmt(f.dcResistancePerCellMohm, 2, " mΩ/cell")}; ${f.dcResistanceMethod ?? "no method"})`,
    ],
    [
      "resistance at 25 °C (estimate)",
      `${fmt(f.resistanceAt25CMohm, 2, " mΩ")} (measured at ${fmt(f.resistanceTemperatureC, 1, " °C")}; Ea ${a.parameters.activationEnergyKJPerMol} kJ/mol)`,
    ],
    ["sample interval (median, under load)", fmt(f.sampleIntervalS, 3, " s")],
    ["sag-limited C (estimate)", sagText(a)],
    [
      "sustained C (measured)",
      f.sustainedCMeasured !== null
        ? `${fmt(f.sustainedCMeasured, 2, "C")} (mean current drawn ÷ rated Ah)`
        : `— (${f.sustainedCReason ?? "not rated"})`,
    ],
    ["capacity ratio", fmt(f.capacityRatio, 3)],
    ["label ratio (estimate ÷ label)", fmt(f.labelRatio, 3)],
    ["label ratio (measured ÷ label)", fmt(f.sustainedLabelRatio, 3)],
    ["specific energy", fmt(f.specificEnergyWhKg, 1, " Wh/kg")],
    ["specific power", fmt(f.specificPowerWKg, 0, " W/kg")],
  ];
  const width = Math.max(...rows.map(([k]) => k.length));
  const lines = rows.map(([k, v]) => `${k.padEnd(width)}  ${v}`);
  if (f.discharges.length > 1) {
    lines.push(`discharges (the figures above describe discharge ${f.headlineDischarge}):`);
    for (const d of f.discharges) {
      lines.push(
        `  ${String(d.index).padStart(3)}  from ${fmt(d.startS, 0, " s")}  ${fmt(d.capacityMah, 0, " mAh")}  ${fmt(d.energyWh, 2, " Wh")}  ${fmt(d.meanCurrentA, 2, " A")}  min ${fmt(d.minVoltageV, 3, " V")}  ${d.reachedCutoff ? "to cut-off" : "cut-off not reached"}`,
      );
    }
  }
  if (f.retention)
    lines.push(
      `capacity over these cycles: ${f.retention.trend ? `${(f.retention.trend.slopePerCycle * 100).toFixed(2)} % per cycle` : "no trend"}; ${f.retention.projectionNote}`,
    );
  for (const w of f.warnings) lines.push(`warning: ${w}`);
  if (f.warningCodes.length > 0) lines.push(`warning codes: ${f.warningCodes.join(", ")}`);
  return lines.join("\n");
}

function sagText(a: Analysis): string {
  const f = a.figures;
  const s = f.sagLimitedCAssumptions;
  if (f.sagLimitedCEstimate === null || !s) return "—";
  const at = s.resistancePoint === "hold" ? `${s.resistanceAtS} s` : "1 s";
  return `${fmt(f.sagLimitedCEstimate, 1, "C")} (${s.nominalVPerCell} V nominal → ${s.floorVPerCell} V floor through ${fmt(s.resistanceMohm, 2, " mΩ")} read ${at} after the load step${s.temperatureC !== null ? ` at ${fmt(s.temperatureC, 1, " °C")}` : ""}${s.indicative ? "; indicative" : ""})`;
}

/** The public JSON shape (lib/analysis/public-figures.ts), the same as POST /api/v1/analyse answers. */
function json(a: Analysis): string {
  return JSON.stringify(toPublicFigures(a), null, 2);
}

async function main(): Promise<number> {
  let parsed: ReturnType<typeof parseArgs>;
  try {
    parsed = parseArgs(process.argv.slice(2));
  } catch (error) {
    process.stderr.write(`error: ${error instanceof Error ? error.message : String(error)} (${USAGE})\n`);
    return 2;
  }
  const { file, options } = parsed;
  let stat: fs.Stats;
  try {
    stat = fs.statSync(file);
  } catch {
    process.stderr.write(`error: cannot read ${file}: no such file\n`);
    return 2;
  }
  if (!stat.isFile()) {
    process.stderr.write(`error: ${file} is not a file\n`);
    return 2;
  }
  try {
    const analysis = await analyseLog(fs.createReadStream(file), options);
    process.stdout.write(`${parsed.json ? json(analysis) : table(analysis)}\n`);
    return 0;
  } catch (error) {
    if (error instanceof LogError) {
      process.stderr.write(`error: ${file}${error.line !== undefined ? `:${error.line}` : ""}: ${error.message}\n`);
      return 2;
    }
    process.stderr.write(`error: ${file}: ${error instanceof Error ? error.message : String(error)}\n`);
    return 2;
  }
}

main().then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    process.stderr.write(`error: ${error instanceof Error ? error.message : String(error)}\n`);
    process.exitCode = 2;
  },
);
