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
  const r = spawnSync(process.execPath, ["--import", "tsx", path.join(repoRoot, "scripts/analyse.ts"), ...args], { cwd: repoRoot, encoding: "utf8", timeout: 30_000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

function write(name: string, text: string): string {
  const file = path.join(dir, name);
  fs.writeFileSync(file, text);
  return file;
}

describe("analyse command line", () => {
  const good = write("good.csv", toCsv(generateLog({ cells: 3, capacityMah: 1500, cRate: 5, sampleIntervalS: 0.5, iecPrelude: true }).rows, { delimiter: ";", decimalComma: true }));

  it("--json prints one object with the agreed fields", () => {
    const r = cli(good, "--rated-mah", "1500", "--labelled-c", "20", "--weight-g", "130", "--json");
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as Record<string, unknown>;
    for (const key of ["samples", "durationS", "cells", "capacityMah", "energyWh", "meanVoltageV", "minVoltageV", "peakCurrentA", "peakTemperatureC", "temperatureRiseC", "holdVoltagePerCellV", "dcResistanceMohm", "dcResistanceMethod", "resistanceAt25CMohm", "sagLimitedC", "capacityRatio", "labelRatio", "specificEnergyWhKg", "warnings"]) {
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
});
