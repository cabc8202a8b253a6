/**
 * Command line: figures from a log file.
 *   npm run --silent analyse -- <log.csv> [--cells N] [--rated-mah X] [--labelled-c C] [--weight-g W]
 *       [--cutoff-v V] [--stop-temp-c T] [--pack-start-temp-c T] [--hold-s S] [--map time=COL,voltage=COL,current=COL[,temperature=COL]]
 *       [--no-header] [--json]
 * COL is a header name or a column number from 0. Bad input: exit code 2 and one line on stderr.
 */
import fs from "node:fs";
import { type AnalyseOptions, type Analysis, type ColumnMapping, LogError, analyseLog, toPublicFigures } from "../lib/analysis";
import { CLI_NUMBER_FLAGS } from "../lib/open-data/recompute";

const USAGE =
  "usage: npm run --silent analyse -- <log.csv> [--cells N] [--rated-mah X] [--labelled-c C] [--weight-g W] [--cutoff-v V] [--stop-temp-c T] [--pack-start-temp-c T] [--hold-s S] [--map time=COL,voltage=COL,current=COL] [--no-header] [--json]";

class UsageError extends Error {}

// The flags live beside the command a result's page shows (lib/open-data/recompute.ts), so the two agree.
const NUMBER_FLAGS: Record<string, keyof AnalyseOptions> = CLI_NUMBER_FLAGS;

function parseMap(text: string, mapping: ColumnMapping): void {
  for (const part of text.split(",")) {
    const [key, ...rest] = part.split("=");
    const value = rest.join("=").trim();
    if (!key || !value || !["time", "voltage", "current", "temperature"].includes(key.trim())) {
      throw new UsageError(`--map takes time=COL,voltage=COL,current=COL[,temperature=COL], got "${text}"`);
    }
    (mapping as Record<string, string | number>)[key.trim()] = /^\d+$/.test(value) ? Number(value) : value;
  }
}

function parseArgs(argv: string[]): { file: string; options: AnalyseOptions; json: boolean } {
  let file: string | null = null;
  let json = false;
  const options: Record<string, unknown> = {};
  const mapping: ColumnMapping = {};
  for (let k = 0; k < argv.length; k++) {
    const arg = argv[k] as string;
    if (arg === "--json") json = true;
    else if (arg === "--no-header") mapping.hasHeader = false;
    else if (arg === "--map") parseMap(argv[++k] ?? "", mapping);
    else if (arg in NUMBER_FLAGS) {
      const raw = argv[++k];
      const value = Number(raw);
      if (raw === undefined || raw.trim() === "" || !Number.isFinite(value)) throw new UsageError(`${arg} needs a number, got ${raw === undefined ? "nothing" : `"${raw}"`}`);
      options[NUMBER_FLAGS[arg] as string] = value;
    } else if (arg.startsWith("--")) throw new UsageError(`unknown option ${arg}`);
    else if (file === null) file = arg;
    else throw new UsageError(`unexpected argument "${arg}"`);
  }
  if (file === null) throw new UsageError("no log file given");
  if (Object.keys(mapping).length > 0) options.mapping = mapping;
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
    ["cells in series", f.cells === null ? "—" : `${f.cells}${f.cellsSource === "rest-voltage" ? " (from rest voltage)" : ""}`],
    ["delivered capacity", fmt(f.capacityMah, 0, " mAh")],
    ["delivered energy", fmt(f.energyWh, 2, " Wh")],
    ["mean voltage under load", `${fmt(f.meanVoltageV, 3, " V")} (${fmt(f.meanVoltagePerCellV, 3, " V/cell")})`],
    ["minimum voltage", `${fmt(f.minVoltageV, 3, " V")} (${fmt(f.minVoltagePerCellV, 3, " V/cell")})`],
    ["peak current", fmt(f.peakCurrentA, 2, " A")],
    ["main discharge current", fmt(f.mainDischargeCurrentA, 2, " A")],
    ["time to cut-off", fmt(f.timeToCutoffS, 1, " s")],
    [`hold voltage (${a.parameters.holdDelayS} s)`, fmt(f.holdVoltagePerCellV, 3, " V/cell")],
    ["temperature start → peak", `${fmt(f.startTemperatureC, 1, " °C")} → ${fmt(f.peakTemperatureC, 1, " °C")} (rise ${fmt(f.temperatureRiseC, 1, " °C")})`],
    ["DC resistance", `${fmt(f.dcResistanceMohm, 2, " mΩ")} (${fmt(f.dcResistancePerCellMohm, 2, " mΩ/cell")}; ${f.dcResistanceMethod ?? "no method"})`],
    ["resistance at 25 °C (estimate)", `${fmt(f.resistanceAt25CMohm, 2, " mΩ")} (measured at ${fmt(f.resistanceTemperatureC, 1, " °C")}; Ea ${a.parameters.activationEnergyKJPerMol} kJ/mol)`],
    ["sag-limited C", `${fmt(f.sagLimitedC, 1, "C")} (${a.parameters.nominalVPerCell} V nominal → ${a.parameters.floorVPerCell} V floor)`],
    ["capacity ratio", fmt(f.capacityRatio, 3)],
    ["label ratio", fmt(f.labelRatio, 3)],
    ["specific energy", fmt(f.specificEnergyWhKg, 1, " Wh/kg")],
    ["specific power", fmt(f.specificPowerWKg, 0, " W/kg")],
  ];
  const width = Math.max(...rows.map(([k]) => k.length));
  const lines = rows.map(([k, v]) => `${k.padEnd(width)}  ${v}`);
  for (const w of f.warnings) lines.push(`warning: ${w}`);
  return lines.join("\n");
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
