import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { analyseText } from "@/lib/analysis";
import { type EcmOptions, clock, decimate, generateLog, toCsv } from "../../helpers/ecm";

// Every log here comes from the equivalent-circuit generator (lib/synthetic), whose truth is computed
// from the circuit, not from the analysis: the step resistance truth is the noise-free reading 1 s
// after the load was switched on (first-order RC step response, circuit theory).

/** A 4S 5 Ah pack with a fast RC pair (τ = 2 s): its voltage still moves quickly 1 s after the step. */
const FAST: EcmOptions = {
  seed: 3,
  cells: 4,
  capacityMah: 5000,
  cRate: 4,
  r0PerCellMohm: 3,
  r1PerCellMohm: 1.5,
  tau1S: 2,
  noise: { voltageV: 0.002, currentA: 0.01 },
};

async function figuresOf(ecm: EcmOptions, options: Parameters<typeof analyseText>[1] = {}) {
  const { rows, truth } = generateLog(ecm);
  return { truth, rows, f: (await analyseText(toCsv(rows), { ratedMah: 5000, ...options })).figures };
}

describe("readings timed from the current edge: a sample-phase sweep", () => {
  it("at 1, 2 and 5 Hz, any sampling phase gives the resistance within 5 % of the 1 s truth, or says coarse-sampling (property)", async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.constantFrom(1, 2, 5),
        fc.double({ min: 0, max: 0.999, noNaN: true }),
        fc.constantFrom(2, 20),
        async (hz, phase, tau) => {
          const dt = 1 / hz;
          const { truth, f } = await figuresOf({
            ...FAST,
            tau1S: tau,
            sampleIntervalS: dt,
            initialRestS: 5 + phase * dt,
          });
          const off = Math.abs((f.dcResistanceMohm ?? 0) / truth.stepResistanceMohm - 1);
          if (off > 0.05) expect(f.warningCodes).toContain("coarse-sampling");
          if (f.warningCodes.includes("coarse-sampling")) expect(f.dcResistanceIndicative).toBe(true);
          expect(f.sampleIntervalS).toBeCloseTo(dt, 9);
        },
      ),
      { numRuns: 60, seed: 1212 },
    );
  });

  it("at 5 Hz the fast pack reads the same within 5 % at every phase and without the code; at 1 Hz it says coarse-sampling", async () => {
    const at = async (hz: number, phase: number) =>
      (await figuresOf({ ...FAST, sampleIntervalS: 1 / hz, initialRestS: 5 + phase / hz })).f;
    const five = await Promise.all([0, 0.25, 0.5, 0.75].map((p) => at(5, p)));
    const values = five.map((f) => f.dcResistanceMohm ?? 0);
    expect(Math.max(...values) / Math.min(...values)).toBeLessThan(1.05);
    for (const f of five) expect(f.warningCodes).not.toContain("coarse-sampling");
    for (const p of [0, 0.5]) expect((await at(1, p)).warningCodes).toContain("coarse-sampling");
  });
});

describe("noisy current: ±20 % ripple from a PWM-driven load", () => {
  it("at 10 Hz says noisy-current and averages over ±0.5 s: within 3 % of the ripple-free reading", async () => {
    const base = { ...FAST, tau1S: 20, sampleIntervalS: 0.1 };
    const clean = await figuresOf(base);
    const rippled = await figuresOf({ ...base, rippleFraction: 0.2 });
    expect(rippled.f.warningCodes).toContain("noisy-current");
    expect(rippled.f.warnings.join(" ")).toMatch(/averages the samples within ±0.5 s/);
    expect(Math.abs((rippled.f.dcResistanceMohm ?? 0) / (clean.f.dcResistanceMohm ?? 1) - 1)).toBeLessThan(0.03);
    expect(rippled.f.dcResistanceIndicative).toBe(false);
  });

  it("at 1 Hz too few samples fall in the window: noisy-current, and the resistance is indicative", async () => {
    const { f } = await figuresOf({ ...FAST, tau1S: 20, sampleIntervalS: 1, rippleFraction: 0.2 });
    expect(f.warningCodes).toContain("noisy-current");
    expect(f.dcResistanceIndicative).toBe(true);
  });

  it("sensor noise of 10 mA on 20 A is not ripple", async () => {
    expect((await figuresOf({ ...FAST, sampleIntervalS: 0.2 })).f.warningCodes).not.toContain("noisy-current");
  });
});

describe("the cut-off, judged with the sampling", () => {
  // A 1 Hz logger beside a tester that stops the load by its own 20 Hz meter at 3.3 V per cell.
  const fine = generateLog({
    seed: 8,
    cells: 4,
    capacityMah: 2200,
    cRate: 10,
    r0PerCellMohm: 4,
    r1PerCellMohm: 1,
    sampleIntervalS: 0.05,
    initialRestS: 5,
    finalRestS: 5,
    cutoffVPerCell: 3.3,
  });

  it("a 1 Hz log that ends above the cut-off by more than 10 mV per cell still reached it when the final fall over one interval covers it", async () => {
    let cases = 0;
    for (let offset = 0; offset < 20; offset += 3) {
      const rows = decimate(fine.rows, 20, offset);
      const lastLoad = [...rows].reverse().find((r) => r.currentA > 0.02);
      const f = (await analyseText(toCsv(rows), { cutoffVPerCell: 3.3, ratedMah: 2200 })).figures;
      expect(f.sampleIntervalS).toBeCloseTo(1, 9);
      expect(f.reachedCutoff).toBe(true);
      expect(f.timeToCutoffS).not.toBeNull();
      // Within one interval of the tester's own stop.
      expect(Math.abs((f.timeToCutoffS ?? 0) - fine.truth.mainDurationS)).toBeLessThanOrEqual(1.0001);
      if ((lastLoad?.voltageV ?? 0) / 4 > 3.31) cases++;
    }
    expect(cases).toBeGreaterThan(0); // the old fixed 10 mV tolerance would have missed these
  });

  it("a run aborted at 3.7 V per cell has no time to cut-off and says cutoff-not-reached, with or without a stated cut-off", async () => {
    for (const options of [{ cutoffVPerCell: 3.3 }, {}]) {
      const { f } = await figuresOf(
        { cells: 3, capacityMah: 2200, cRate: 2, sampleIntervalS: 1, cutoffVPerCell: 3.7 },
        options,
      );
      expect(f.reachedCutoff).toBe(false);
      expect(f.timeToCutoffS).toBeNull();
      expect(f.warningCodes).toContain("cutoff-not-reached");
    }
  });

  it("without a stated cut-off, a discharge that ends at or below 3.5 V per cell counts as run to its cut-off (common practice)", async () => {
    const { truth, f } = await figuresOf({ cells: 2, cRate: 2, sampleIntervalS: 0.5 });
    expect(f.cutoffSource).toBe("log-end");
    expect(f.reachedCutoff).toBe(true);
    expect(f.timeToCutoffS).toBeCloseTo(truth.mainDurationS, 6);
  });
});

describe("holes, clocks, cells and skipped lines", () => {
  const base = generateLog({
    seed: 4,
    cells: 4,
    capacityMah: 1300,
    cRate: 4,
    sampleIntervalS: 1,
    initialRestS: 5,
    finalRestS: 5,
  });

  it("a 20 s hole in a 1 Hz log gives the gap code; capacity stays right for a constant current", async () => {
    const holed = base.rows.filter((r) => !(r.timeS > 300 && r.timeS < 320));
    const f = (await analyseText(toCsv(holed))).figures;
    expect(f.warningCodes).toContain("gap");
    expect(f.warnings.join(" ")).toMatch(/20\.0 s from 300\.0 s/);
    expect(Math.abs((f.capacityMah ?? 0) / base.truth.deliveredMah - 1)).toBeLessThan(0.001);
    expect((await analyseText(toCsv(base.rows))).figures.warningCodes).not.toContain("gap");
  });

  it("a logger that writes rest rows every 30 s and load rows every second has no holes", async () => {
    const rows = generateLog({
      cells: 4,
      capacityMah: 1300,
      cRate: 4,
      sampleIntervalS: 1,
      initialRestS: 120,
      finalRestS: 120,
    }).rows;
    const sparse = rows.filter(
      (r, k) =>
        r.currentA > 0.02 ||
        (rows[k + 1]?.currentA ?? 0) > 0.02 ||
        (rows[k - 1]?.currentA ?? 0) > 0.02 ||
        r.timeS % 30 === 0,
    );
    expect((await analyseText(toCsv(sparse))).figures.warningCodes).not.toContain("gap");
  });

  it("clock time that passes midnight runs on into the next day", async () => {
    const startOfDayS = 23 * 3600 + 55 * 60; // 23:55:00
    const csv = `Time,Voltage (V),Current (A)\n${base.rows.map((r) => `${clock(startOfDayS + r.timeS)},${r.voltageV.toFixed(4)},${r.currentA.toFixed(3)}`).join("\n")}\n`;
    const f = (await analyseText(csv)).figures;
    expect(base.truth.durationS).toBeGreaterThan(300); // it does pass midnight
    expect(f.durationS).toBeCloseTo(Math.round(base.truth.durationS), 6);
    expect(Math.abs((f.capacityMah ?? 0) / base.truth.deliveredMah - 1)).toBeLessThan(0.002);
    expect(f.warnings.join(" ")).toMatch(/passed midnight 1 time/);
  });

  it("a weak cell: the per-cell column below the cut-off gives cell-below-cutoff, the lowest cell and the spread", async () => {
    const offsets = [-0.2, 0.2 / 3, 0.2 / 3, 0.2 / 3];
    const { rows, truth } = generateLog({
      seed: 2,
      cells: 4,
      capacityMah: 1300,
      cRate: 4,
      sampleIntervalS: 1,
      cellOffsetsV: offsets,
      cutoffVPerCell: 3.3,
    });
    const f = (
      await analyseText(toCsv(rows, { columns: ["time", "voltage", "current", "temperature", "cells"] }), {
        cutoffVPerCell: 3.3,
      })
    ).figures;
    expect(f.warningCodes).toContain("cell-below-cutoff");
    expect(f.minCellVoltageV).toBeCloseTo(truth.minVoltageV / 4 - 0.2, 3);
    expect(f.cellSpreadV).toBeCloseTo(0.2 + 0.2 / 3, 3);
    const even = generateLog({
      seed: 2,
      cells: 4,
      capacityMah: 1300,
      cRate: 4,
      sampleIntervalS: 1,
      cellSpreadV: 0.003,
      cutoffVPerCell: 3.3,
    });
    const g = (
      await analyseText(toCsv(even.rows, { columns: ["time", "voltage", "current", "cells"] }), { cutoffVPerCell: 3.3 })
    ).figures;
    expect(g.warningCodes).not.toContain("cell-below-cutoff");
  });

  it("many unreadable lines give many-skipped-lines; a few do not", async () => {
    const lines = toCsv(base.rows).split("\n");
    const broken = lines.map((l, k) => (k > 0 && k % 20 === 0 ? "12,oops" : l)).join("\n");
    expect((await analyseText(broken)).figures.warningCodes).toContain("many-skipped-lines");
    const few = lines.map((l, k) => (k === 50 || k === 90 ? "12,oops" : l)).join("\n");
    expect((await analyseText(few)).figures.warningCodes).not.toContain("many-skipped-lines");
  });
});
