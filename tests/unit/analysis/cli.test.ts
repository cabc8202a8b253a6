import { spawnSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { generateLog, toCsv } from "../../helpers/ecm";

const repoRoot = path.resolve(__dirname, "../../..");
const dir = fs.mkdtempSync(path.join(os.tmpdir(), "sagline-cli-"));
afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

function cli(...args: string[]) {
  const r = spawnSync(process.execPath, ["--import", "tsx", path.join(repoRoot, "scripts/analyse.ts"), ...args], {
    cwd: repoRoot,
    encoding: "utf8",
    timeout: 30_000,
  });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

function write(name: string, text: string): string {
  const file = path.join(dir, name);
  fs.writeFileSync(file, text);
  return file;
}

describe("analyse command line", () => {
  const good = write(
    "good.csv",
    toCsv(generateLog({ cells: 3, capacityMah: 1500, cRate: 5, sampleIntervalS: 0.5, iecPrelude: true }).rows, {
      delimiter: ";",
      decimalComma: true,
    }),
  );

  it("--json prints one object with the agreed fields", () => {
    const r = cli(good, "--rated-mah", "1500", "--labelled-c", "20", "--weight-g", "130", "--json");
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as Record<string, unknown>;
    for (const key of [
      "samples",
      "durationS",
      "cells",
      "capacityMah",
      "energyWh",
      "meanVoltageV",
      "minVoltageV",
      "peakCurrentA",
      "peakTemperatureC",
      "temperatureRiseC",
      "holdVoltagePerCellV",
      "dcResistanceMohm",
      "dcResistanceMethod",
      "resistanceAt25CMohm",
      "sagLimitedC",
      "capacityRatio",
      "labelRatio",
      "specificEnergyWhKg",
      "warnings",
    ]) {
      expect(out, key).toHaveProperty(key);
    }
    expect(out.dcResistanceMethod).toBe("iec-61960-two-level");
    expect(out.cells).toBe(3);
  });

  it("prints a readable table without --json", () => {
    const r = cli(good);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/delivered capacity\s+\d+ mAh/);
  });

  it("bad input: exit code 2 and one line on stderr naming the problem and the line, no stack trace", () => {
    const bad = write("bad.csv", "when,what,how\n1,2,3\n");
    const r = cli(bad);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe("");
    const lines = r.stderr.trim().split("\n");
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/bad\.csv:1: Could not identify/);
    expect(r.stderr).not.toMatch(/\n\s+at /);
  });

  it("missing file and bad options exit with 2 and one line", () => {
    for (const args of [[path.join(dir, "nope.csv")], [good, "--cells", "x"], [good, "--frobnicate"], []]) {
      const r = cli(...args);
      expect(r.code).toBe(2);
      expect(r.stderr.trim().split("\n")).toHaveLength(1);
    }
  });

  it("reads a header-less log with --no-header and --map (column numbers, units), and with --map-json", () => {
    const gen = generateLog({ cells: 2, capacityMah: 1000, cRate: 2, sampleIntervalS: 1, cycles: 2 });
    const bare = write(
      "bare.csv",
      toCsv(gen.rows, { header: false, columns: ["current", "time", "voltage"], currentUnit: "mA" }),
    );
    expect(cli(bare).code).toBe(2); // numbers only: the columns cannot be named without a mapping
    const viaMap = cli(bare, "--no-header", "--map", "time=1,voltage=2,current=0,current-unit=mA", "--json");
    expect(viaMap.stderr).toBe("");
    const a = JSON.parse(viaMap.stdout) as { capacityMah: number; discharges: { capacityMah: number }[] };
    expect(a.discharges).toHaveLength(2);
    expect(Math.abs(a.capacityMah / (gen.truth.discharges[0]?.deliveredMah ?? 1) - 1)).toBeLessThan(0.005);
    const viaJson = cli(
      bare,
      "--map-json",
      '{"time":1,"voltage":2,"current":0,"currentUnit":"mA","hasHeader":false}',
      "--json",
    );
    expect(JSON.parse(viaJson.stdout)).toEqual(a);
  });

  it("refuses a mapping the schema refuses, in one line", () => {
    const r = cli(good, "--map-json", '{"time":"Time (s)","voltage":1,"current":2,"hasHeader":false}');
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split("\n")).toHaveLength(1);
    expect(r.stderr).toMatch(/time: without a header row, time must be a column number/);
    expect(cli(good, "--map", "time=0,voltage-unit=kV").code).toBe(2);
  });

  // Real measurements: the ORNL 33.1 Ah laminate cell files have no header row (README beside them).
  const laminate = path.resolve(repoRoot, "../shared/data/open-laminate-cell/discharge-1C.csv");
  const hasLaminate = fs.existsSync(laminate);
  if (!hasLaminate) console.log(`open-data CLI check skipped: ${laminate} is not present`);
  it.skipIf(!hasLaminate)(
    "reads the header-less open laminate-cell file with a mapping: four discharges, figures of the first",
    () => {
      const r = cli(laminate, "--no-header", "--map", "time=1,voltage=9,current=8", "--cutoff-v", "3.0", "--json");
      expect(r.code).toBe(0);
      const f = JSON.parse(r.stdout) as {
        discharges: unknown[];
        headlineDischarge: number;
        capacityMah: number;
        warningCodes: string[];
      };
      expect(f.discharges).toHaveLength(4);
      expect(f.headlineDischarge).toBe(1);
      expect(f.capacityMah).toBeGreaterThan(29_000);
      expect(f.capacityMah).toBeLessThan(31_000);
      expect(f.warningCodes).toContain("several-discharges");
      const table = cli(laminate, "--no-header", "--map", "time=1,voltage=9,current=8");
      expect(table.stdout).toMatch(/discharges \(the figures above describe discharge 1\)/);
    },
  );
});
