import { describe, expect, it } from "vitest";
import { analyseText, columnMappingSchema, parseMappingJson, previewLog } from "@/lib/analysis";
import { generateLog, toCsv } from "../../helpers/ecm";

// Invented logs from the equivalent-circuit generator; the mapping JSON is the shape issue 12 names.
const { rows, truth } = generateLog({ cells: 3, capacityMah: 2200, cRate: 3, sampleIntervalS: 1 });

describe("column mapping schema (the API's mapping parameter, the CLI's --map-json)", () => {
  it("accepts the documented example and gives the core's mapping", () => {
    const r = parseMappingJson('{"time":1,"voltage":9,"current":8,"hasHeader":false}');
    expect(r).toEqual({ ok: true, mapping: { time: 1, voltage: 9, current: 8, hasHeader: false } });
  });

  it("accepts names, per-cell columns, units and the discharge sign", () => {
    const m = {
      time: "Time (s)",
      cellVoltages: ["V1", "V2"],
      current: "I",
      timeUnit: "ms",
      voltageUnit: "mV",
      currentUnit: "mA",
      temperatureUnit: "F",
      dischargeSign: "negative",
    };
    expect(columnMappingSchema.safeParse(m).success).toBe(true);
  });

  it("refuses what the core could not use, with words for people", () => {
    const bad = [
      ["not json", /not valid JSON/],
      ['{"time":-1,"voltage":0,"current":2}', /time: column numbers count from 0/],
      ['{"time":1.5,"voltage":0,"current":2}', /time: /],
      ['{"time":0,"voltage":1,"current":2,"extra":3}', /not usable/],
      [
        '{"time":"t","voltage":1,"current":2,"hasHeader":false}',
        /time: without a header row, time must be a column number/,
      ],
      ['{"time":0,"hasHeader":false}', /must give current, voltage/],
      ['{"timeUnit":"fortnight"}', /timeUnit/],
      [`{"time":"${"x".repeat(3000)}"}`, /longer than/],
    ] as const;
    for (const [text, message] of bad) {
      const r = parseMappingJson(text);
      expect(r.ok, text.slice(0, 40)).toBe(false);
      if (!r.ok) expect(r.message).toMatch(message);
    }
  });
});

describe("previewLog: the first rows split into columns, with the mapping detection found", () => {
  it("detects a headed log and returns a mapping that gives the same figures", async () => {
    const csv = toCsv(rows, {
      delimiter: ";",
      decimalComma: true,
      columns: ["time", "cells", "current", "temperature"],
      voltageUnit: "mV",
    });
    const p = previewLog(csv);
    expect(p.dialect).toMatchObject({ delimiter: ";", decimalComma: true });
    expect(p.headerLine).toBe(1);
    expect(p.rows[0]?.fields[0]).toBe("Time (s)");
    expect(p.rows).toHaveLength(20);
    expect(p.columnCount).toBe(6);
    expect(p.detected).toMatchObject({
      time: 0,
      cellVoltages: [1, 2, 3],
      current: 4,
      temperature: 5,
      hasHeader: true,
      voltageUnit: "mV",
      timeUnit: "s",
    });
    const auto = (await analyseText(csv)).figures;
    const mapped = (await analyseText(csv, { mapping: p.detected ?? {} })).figures;
    expect(mapped.capacityMah).toBe(auto.capacityMah);
    expect(mapped.minCellVoltageV).toBe(auto.minCellVoltageV);
  });

  it("a header-less log: shows the rows and why detection failed; the tester's mapping then works", async () => {
    const csv = toCsv(rows, { header: false, columns: ["voltage", "current", "time"] });
    const p = previewLog(csv);
    expect(p.detected).toBeNull();
    expect(p.problem).toMatch(/pass a column mapping/);
    expect(p.rows[0]?.fields).toHaveLength(3);
    const picked = previewLog(csv, { time: 2, voltage: 0, current: 1, hasHeader: false });
    expect(picked.problem).toBeNull();
    expect(picked.detected).toMatchObject({ time: 2, voltage: 0, current: 1, hasHeader: false });
    const f = (await analyseText(csv, { mapping: picked.detected ?? {} })).figures;
    expect(f.capacityMah).toBeCloseTo(truth.deliveredMah, 0);
  });

  it("a stated discharge sign overrides detection", async () => {
    const csv = toCsv(rows, { dischargeNegative: true });
    const f = (await analyseText(csv, { mapping: { dischargeSign: "negative" } })).figures;
    expect(f.dischargeCurrentSign).toBe("negative");
    expect(f.capacityMah).toBeCloseTo(truth.deliveredMah, 0);
  });
});
