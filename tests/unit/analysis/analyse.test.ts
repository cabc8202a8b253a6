import { describe, expect, it } from "vitest";
import { LogError, analyseLog, analyseText } from "@/lib/analysis";
import { type CsvDialect, type EcmOptions, generateLog, toCsv } from "../../helpers/ecm";

const ECM: EcmOptions = {
  seed: 5,
  cells: 4,
  capacityMah: 3000,
  cRate: 4,
  sampleIntervalS: 0.2,
  iecPrelude: true,
  cellSpreadV: 0.005,
};
const { rows, truth } = generateLog(ECM);

async function figures(dialect: CsvDialect, options: Parameters<typeof analyseText>[1] = {}) {
  return (await analyseText(toCsv(rows, dialect), { ratedMah: 3000, ...options })).figures;
}

async function expectLogError(promise: Promise<unknown>, code: string, line?: number): Promise<LogError> {
  try {
    await promise;
  } catch (error) {
    expect(error).toBeInstanceOf(LogError);
    const e = error as LogError;
    expect(e.code).toBe(code);
    if (line !== undefined) expect(e.line).toBe(line);
    return e;
  }
  throw new Error(`expected LogError ${code}`);
}

describe("reading logs as testers have them, without configuration", async () => {
  const base = await figures({});

  it("the plain dialect reproduces the circuit's truth", () => {
    expect(base.capacityMah).toBeCloseTo(truth.deliveredMah, 0);
    expect(base.dcResistanceMethod).toBe("iec-61960-two-level");
    expect(base.cells).toBe(4);
  });

  const dialects: [string, CsvDialect][] = [
    ["semicolon", { delimiter: ";" }],
    ["tab", { delimiter: "\t" }],
    ["semicolon + decimal comma", { delimiter: ";", decimalComma: true }],
    ["tab + decimal comma", { delimiter: "\t", decimalComma: true }],
    ["comma + decimal comma in quotes", { delimiter: ",", decimalComma: true }],
    ["UTF-8 BOM", { bom: true }],
    ["CRLF", { crlf: true }],
    ["BOM + CRLF + semicolon + comma", { bom: true, crlf: true, delimiter: ";", decimalComma: true }],
    ["time in ms", { timeUnit: "ms" }],
    ["time in min", { timeUnit: "min" }],
    ["voltage in mV", { voltageUnit: "mV" }],
    ["current in mA", { currentUnit: "mA" }],
    ["discharge logged negative", { dischargeNegative: true }],
    ["other column order", { columns: ["current", "temperature", "voltage", "time"] }],
    ["extra columns", { columns: ["extra", "time", "voltage", "extra", "current", "temperature"] }],
    ["per-cell columns with pack voltage", { columns: ["time", "cells", "voltage", "current", "temperature"] }],
    ["per-cell columns only", { columns: ["time", "current", "cells"] }],
    ["[unit] headers", { headerStyle: "brackets", timeUnit: "ms", voltageUnit: "mV", currentUnit: "mA" }],
    ["name_unit headers", { headerStyle: "snake", timeUnit: "min" }],
    ["quantity/unit headers", { headerStyle: "slash", delimiter: "\t" }],
  ];

  it.each(dialects)("%s gives the same figures", async (_name, dialect) => {
    const f = await figures(dialect);
    expect(Math.abs((f.capacityMah ?? 0) / (base.capacityMah ?? 1) - 1)).toBeLessThan(2e-4);
    expect(Math.abs((f.energyWh ?? 0) / (base.energyWh ?? 1) - 1)).toBeLessThan(2e-4);
    expect(f.minVoltageV).toBeCloseTo(base.minVoltageV ?? 0, 2);
    expect(f.holdVoltagePerCellV).toBeCloseTo(base.holdVoltagePerCellV ?? 0, 3);
    expect(f.dcResistanceMethod).toBe("iec-61960-two-level");
    expect(Math.abs((f.dcResistanceMohm ?? 0) / (base.dcResistanceMohm ?? 1) - 1)).toBeLessThan(0.02);
    expect(f.cells).toBe(4);
    expect(f.samples).toBe(base.samples);
  });

  it("reports the per-cell columns: cell count and the lowest cell", async () => {
    const f = await figures({ columns: ["time", "cells", "current"] });
    expect(f.cellsSource).toBe("cell-columns");
    expect(f.minCellVoltageV).toBeLessThan((f.minVoltagePerCellV ?? 0) + 1e-9);
  });

  it("says when discharge current was logged negative", async () => {
    expect((await figures({ dischargeNegative: true })).warnings).toContain(
      "Discharge current is logged as negative; figures use it as positive.",
    );
    expect((await figures({ dischargeNegative: true })).dischargeCurrentSign).toBe("negative");
  });

  it("reads unlabelled millivolts by their size, with a warning", async () => {
    const csv = toCsv(rows, { voltageUnit: "mV" }).replace("Voltage (mV)", "Voltage");
    const f = (await analyseText(csv)).figures;
    expect(f.minVoltageV).toBeCloseTo(base.minVoltageV ?? 0, 3);
    expect(f.warnings.join(" ")).toMatch(/millivolts/);
  });
});

describe("messy logs: skipped and counted, not fatal", () => {
  const lines = toCsv(rows).split("\n");

  it("skips blank and broken lines, counts them and names the first lines", async () => {
    const messy = [...lines];
    messy.splice(50, 0, "");
    messy.splice(100, 0, "12.3,garbage,1");
    messy.splice(150, 0, "1,2");
    const f = (await analyseText(messy.join("\n"), { ratedMah: 3000 })).figures;
    expect(f.skippedLines).toBe(3);
    expect(f.samples).toBe(rows.length);
    expect(f.warnings.join(" ")).toMatch(/2 unreadable lines skipped \(lines 101, 151\)/);
    expect(f.warnings.join(" ")).toMatch(/1 blank line skipped/);
    expect(f.capacityMah).toBeCloseTo(truth.deliveredMah, 0);
  });

  it("skips lines above the header (a logger's preamble) and counts them", async () => {
    const f = (await analyseText(`Exported by bench logger\nPack: test\n${lines.join("\n")}`)).figures;
    expect(f.skippedLines).toBe(2);
    expect(f.warnings).toContain("2 lines before the header row skipped.");
    expect(f.capacityMah).toBeCloseTo(truth.deliveredMah, 0);
  });

  it("reads clock-style time (hh:mm:ss)", async () => {
    const whole = generateLog({ cells: 2, cRate: 1, sampleIntervalS: 1 }).rows;
    const clock = (s: number) =>
      `${String(Math.floor(s / 3600)).padStart(2, "0")}:${String(Math.floor(s / 60) % 60).padStart(2, "0")}:${String(Math.round(s % 60)).padStart(2, "0")}`;
    const csv = `Time,Voltage (V),Current (A)\n${whole.map((r) => `${clock(r.timeS)},${r.voltageV.toFixed(4)},${r.currentA.toFixed(3)}`).join("\n")}\n`;
    const f = (await analyseText(csv)).figures;
    expect(f.durationS).toBeCloseTo(whole[whole.length - 1]?.timeS ?? 0, 6);
  });

  it("accepts duplicate timestamps (they add nothing) and says so", async () => {
    const dup = [...lines];
    dup.splice(300, 0, dup[300] as string, dup[300] as string);
    const f = (await analyseText(dup.join("\n"))).figures;
    expect(f.capacityMah).toBeCloseTo(truth.deliveredMah, 0);
    expect(f.warnings.join(" ")).toMatch(/2 samples repeat the timestamp/);
  });

  it("skips a single sample whose time jumps back", async () => {
    const glitch = [...lines];
    glitch[400] = `1.000,${(glitch[400] as string).split(",").slice(1).join(",")}`;
    const f = (await analyseText(glitch.join("\n"))).figures;
    expect(f.skippedLines).toBe(1);
    expect(f.warnings.join(" ")).toMatch(/time earlier than the sample before skipped \(first on line 401\)/);
  });
});

describe("clear errors (LogError, with the line where it applies)", () => {
  it("refuses time going backwards over a stretch (a restarted clock)", async () => {
    const text = `${toCsv(rows.slice(0, 200))}${toCsv(rows.slice(0, 50), { header: false })}`;
    const e = await expectLogError(analyseText(text), "time-backwards", 202);
    expect(e.message).toMatch(/Time goes backwards from line 202/);
  });

  it("refuses fewer than 10 samples", async () => {
    await expectLogError(analyseText(toCsv(rows.slice(0, 9))), "too-few-samples");
  });

  it("refuses a log over the size limit (default 50 MB, configurable)", async () => {
    const e = await expectLogError(analyseText(toCsv(rows), { maxBytes: 10_000 }), "too-large");
    expect(e.message).toMatch(/limit/);
  });

  it("names the header and how to map it when columns are unknown; an explicit mapping then works", async () => {
    const csv = toCsv(rows).replace("Time (s),Voltage (V),Current (A),Temperature (°C)", "clock,pack,load,probe");
    const e = await expectLogError(analyseText(csv), "columns-not-found", 1);
    expect(e.message).toContain('"clock", "pack", "load", "probe"');
    const f = (
      await analyseText(csv, { mapping: { time: "clock", voltage: "pack", current: "load", temperature: "probe" } })
    ).figures;
    expect(f.capacityMah).toBeCloseTo(truth.deliveredMah, 0);
  });

  it("reads a header-less log through a mapping by column number", async () => {
    const csv = toCsv(rows, { header: false, columns: ["voltage", "time", "current"] });
    const f = (await analyseText(csv, { mapping: { time: 1, voltage: 0, current: 2, hasHeader: false } })).figures;
    expect(f.capacityMah).toBeCloseTo(truth.deliveredMah, 0);
  });

  it("refuses a log with no discharge in it", async () => {
    const charge = rows.map((r) => ({
      ...r,
      currentA: r.currentA > 0 ? -r.currentA : 0,
      voltageV: r.currentA > 0 ? 16.9 + r.timeS / 1e4 : 16.8,
    }));
    await expectLogError(analyseText(toCsv(charge)), "no-discharge");
  });

  it("refuses bad options", async () => {
    await expectLogError(analyseText(toCsv(rows), { ratedMah: -5 }), "bad-option");
    await expectLogError(analyseText(toCsv(rows), { cells: 2.5 }), "bad-option");
    await expectLogError(analyseText(toCsv(rows), { nominalVPerCell: 3, floorVPerCell: 3.3 }), "bad-option");
  });
});

describe("the chart curve", async () => {
  const a = await analyseText(toCsv(rows), { curvePoints: 300 });

  it("has at most curvePoints points (default 400), first and last sample kept, in time order", async () => {
    expect(a.curve.length).toBeLessThanOrEqual(300);
    expect(a.curve.length).toBeGreaterThan(250);
    expect(a.curve[0]?.timeS).toBe(0);
    expect(a.curve[a.curve.length - 1]?.timeS).toBeCloseTo(truth.durationS, 6);
    for (let k = 1; k < a.curve.length; k++) expect(a.curve[k]?.timeS).toBeGreaterThan(a.curve[k - 1]?.timeS ?? 0);
    expect((await analyseText(toCsv(rows))).curve.length).toBeLessThanOrEqual(400);
  });

  it("carries running delivered capacity and discharge-positive current", async () => {
    const neg = await analyseText(toCsv(rows, { dischargeNegative: true }));
    expect(Math.max(...neg.curve.map((p) => p.currentA))).toBeGreaterThan(10);
    const last = a.curve[a.curve.length - 1];
    expect(last?.capacityMah).toBeCloseTo(a.figures.capacityMah ?? 0, 6);
    for (let k = 1; k < a.curve.length; k++)
      expect(a.curve[k]?.capacityMah).toBeGreaterThanOrEqual(a.curve[k - 1]?.capacityMah ?? 0);
  });

  it("reports the parameters used", () => {
    expect(a.parameters).toMatchObject({
      holdDelayS: 10,
      activationEnergyKJPerMol: 17.1,
      nominalVPerCell: 3.7,
      floorVPerCell: 3.3,
    });
  });

  it("takes a stream of byte chunks as well as text", async () => {
    const bytes = new TextEncoder().encode(toCsv(rows));
    const chunks = Array.from({ length: Math.ceil(bytes.length / 999) }, (_, k) =>
      bytes.subarray(k * 999, (k + 1) * 999),
    );
    const b = await analyseLog(chunks, { curvePoints: 300 });
    expect(b.figures).toEqual(a.figures);
  });
});
