import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { analyseLog } from "@/lib/analysis";

// Real measurements: ORNL 33.1 Ah laminate cell (Wiggins, Allu & Wang, MIT licence,
// DOI 10.5281/zenodo.2580327), read from the shared folder beside the project, never copied in.
// Columns (README there): exclude flag, test time (s), cycle, loop ×3, step, step time (s),
// current (A, discharge negative), voltage (V), power (W), capacity (Ah, running),
// energy (Wh, running), mode (REST/CHRG/DCHG), data flag. No header row.
const repoRoot = path.resolve(__dirname, "../../..");
const dataDir = path.resolve(repoRoot, "../shared/data/open-laminate-cell");
const exists = fs.existsSync(path.join(dataDir, "discharge-1C.csv"));
if (!exists)
  console.log(
    `open-data checks skipped: ${dataDir} is not present (it sits beside the project in CI and on developer machines)`,
  );

type Discharge = { durationS: number; capacityAh: number; energyWh: number };

/** The tester's own totals: the last row of each run of DCHG rows holds that step's capacity and energy. */
function testerTotals(file: string): Discharge[] {
  const out: Discharge[] = [];
  let inRun = false;
  for (const line of fs.readFileSync(file, "utf8").split(/\r?\n/)) {
    const f = line.split(",");
    if (f[13] !== "DCHG") {
      inRun = false;
      continue;
    }
    const row = { durationS: Number(f[7]), capacityAh: Math.abs(Number(f[11])), energyWh: Math.abs(Number(f[12])) };
    if (inRun) out[out.length - 1] = row;
    else out.push(row);
    inRun = true;
  }
  return out;
}

const mapping = { time: 1, current: 8, voltage: 9, hasHeader: false } as const;

describe("real open data: a 33.1 Ah laminate cell at 1C (tester's own totals as the reference)", () => {
  it.skipIf(!exists)(
    "each 1C discharge's capacity and energy agree with the tester's own totals for that discharge within 1 %",
    async () => {
      const file = path.join(dataDir, "discharge-1C.csv");
      const reference = testerTotals(file);
      expect(reference.length).toBeGreaterThanOrEqual(3);
      const { figures: f } = await analyseLog(fs.createReadStream(file), { mapping, ratedMah: 33100 });
      expect(f.discharges).toHaveLength(reference.length);
      f.discharges.forEach((d, k) => {
        const ref = reference[k] as Discharge;
        expect(Math.abs(d.capacityMah / 1000 / ref.capacityAh - 1), `discharge ${k + 1} capacity`).toBeLessThan(0.01);
        expect(Math.abs(d.energyWh / ref.energyWh - 1), `discharge ${k + 1} energy`).toBeLessThan(0.01);
        expect(d.index).toBe(k + 1);
      });
      // Together they are every discharge of the log: the sum is the tester's grand total.
      const sumAh = f.discharges.reduce((s, d) => s + d.capacityMah, 0) / 1000;
      expect(Math.abs(sumAh / reference.reduce((s, d) => s + d.capacityAh, 0) - 1)).toBeLessThan(0.01);
      expect(f.dischargeCurrentSign).toBe("negative");
      expect(f.cells).toBe(1);
    },
  );

  it.skipIf(!exists)(
    "the four-cycle 1C file reports four discharges and the figures of one, never their sum",
    async () => {
      const file = path.join(dataDir, "discharge-1C.csv");
      const reference = testerTotals(file);
      const { figures: f } = await analyseLog(fs.createReadStream(file), {
        mapping,
        ratedMah: 33100,
        cutoffVPerCell: 3.0,
      });
      expect(f.discharges).toHaveLength(4);
      expect(f.discharges.every((d) => d.reachedCutoff)).toBe(true);
      expect(f.headlineDischarge).toBe(1);
      expect(Math.abs((f.capacityMah ?? 0) / 1000 / (reference[0] as Discharge).capacityAh - 1)).toBeLessThan(0.01);
      expect((f.capacityMah ?? 0) / 33100).toBeLessThan(1); // about 0.92, not 3.7
      expect(f.warningCodes).toContain("several-discharges");
      for (const d of f.discharges) expect(d.meanCurrentA).toBeCloseTo(30.6, 1);
      // One physical cell over four cycles: a retention series, and no projection far past four cycles.
      expect(f.retention?.points).toHaveLength(4);
      expect(f.retention?.reference).toBe("rated");
      expect(f.retention?.cyclesTo80 ?? null).toBeNull();
      expect(f.retention?.projectionNote).toMatch(/No projection/);
    },
  );

  it.skipIf(!exists)("the main (longest) discharge agrees with that discharge's own totals within 1 %", async () => {
    const file = path.join(dataDir, "discharge-1C.csv");
    const longest = testerTotals(file).reduce((a, b) => (b.durationS > a.durationS ? b : a));
    const { figures: f } = await analyseLog(fs.createReadStream(file), { mapping });
    expect(Math.abs((f.mainDischargeCapacityMah ?? 0) / 1000 / longest.capacityAh - 1)).toBeLessThan(0.01);
    expect(Math.abs((f.mainDischargeEnergyWh ?? 0) / longest.energyWh - 1)).toBeLessThan(0.01);
    expect(f.mainDischargeCurrentA).toBeCloseTo(30.6, 1);
    expect(f.minVoltageV).toBeCloseTo(3.0, 2);
  });

  it.skipIf(!exists)(
    "label vs delivered: about 30 Ah of the rated 33.1 Ah at 1C, as the data's README says",
    async () => {
      const file = path.join(dataDir, "discharge-1C.csv");
      const { figures: f } = await analyseLog(fs.createReadStream(file), { mapping, ratedMah: 33100 });
      expect((f.mainDischargeCapacityMah ?? 0) / 33100).toBeGreaterThan(0.88);
      expect((f.mainDischargeCapacityMah ?? 0) / 33100).toBeLessThan(0.95);
    },
  );

  it.skipIf(!exists)(
    "the rest → load step resistance agrees within 10 % with the first 30 A pulse of the pulse test (same cell, full charge, 25 °C)",
    async () => {
      // Reference, read straight from the pulse file: rest voltage before the first DCHG pulse and
      // the voltage 1 s into it (the tester logs every 0.5 s there), ΔV ÷ ΔI.
      const lines = fs
        .readFileSync(path.join(dataDir, "HPPC-25C.csv"), "utf8")
        .split(/\r?\n/)
        .map((l) => l.split(","));
      const first = lines.findIndex((f) => f[13] === "DCHG");
      const rest = lines[first - 1] as string[];
      const oneSecond = lines.slice(first).find((f) => Number(f[7]) === 1) as string[];
      const pulseMohm = ((Number(rest[9]) - Number(oneSecond[9])) / (Number(rest[8]) - Number(oneSecond[8]))) * 1000;
      expect(pulseMohm).toBeGreaterThan(1);
      expect(pulseMohm).toBeLessThan(3);
      const { figures: f } = await analyseLog(fs.createReadStream(path.join(dataDir, "discharge-1C.csv")), { mapping });
      expect(f.dcResistanceMethod).toBe("step");
      expect(Math.abs((f.dcResistanceMohm ?? 0) / pulseMohm - 1)).toBeLessThan(0.1);
    },
  );

  it.skipIf(!exists)("reads the pulse-test file's own header row without configuration", async () => {
    const file = path.join(dataDir, "HPPC-25C.csv");
    const reference = testerTotals(file);
    const { figures: f } = await analyseLog(fs.createReadStream(file));
    // The regenerative (charging) pulses split the pulse test into discharges; together they hold every
    // discharge step the tester totalled.
    const capacityAh = reference.reduce((s, d) => s + d.capacityAh, 0);
    const sumAh = f.discharges.reduce((s, d) => s + d.capacityMah, 0) / 1000;
    expect(f.discharges.length).toBeGreaterThan(1);
    expect(Math.abs(sumAh / capacityAh - 1)).toBeLessThan(0.01);
  });
});
