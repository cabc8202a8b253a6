import { describe, expect, it } from "vitest";
import { arrheniusFactor } from "@/lib/analysis/arrhenius";
import { EcmSimulator, csvChunks, generateLog, ocvPerCellV, seededRandom, toCsv } from "../../helpers/ecm";

describe("equivalent-circuit log generator (the synthetic truth other tests rely on)", () => {
  it("is deterministic for a seed and differs between seeds", () => {
    const a = toCsv(generateLog({ seed: 3, noise: { voltageV: 0.002 } }).rows);
    const b = toCsv(generateLog({ seed: 3, noise: { voltageV: 0.002 } }).rows);
    const c = toCsv(generateLog({ seed: 4, noise: { voltageV: 0.002 } }).rows);
    expect(a).toBe(b);
    expect(a).not.toBe(c);
  });

  it("mulberry32 gives uniform numbers in [0, 1)", () => {
    const r = seededRandom(1);
    let sum = 0;
    for (let k = 0; k < 10_000; k++) {
      const x = r();
      expect(x).toBeGreaterThanOrEqual(0);
      expect(x).toBeLessThan(1);
      sum += x;
    }
    expect(sum / 10_000).toBeCloseTo(0.5, 1);
  });

  it("OCV rises with state of charge from 3.0 V to 4.2 V per cell (typical LiPo shape, from memory)", () => {
    expect(ocvPerCellV(0)).toBe(3.0);
    expect(ocvPerCellV(1)).toBe(4.2);
    for (let s = 0; s < 1; s += 0.01) expect(ocvPerCellV(s + 0.01)).toBeGreaterThan(ocvPerCellV(s));
  });

  it("truth: delivered charge is current × time for a constant-current discharge (closed form)", () => {
    const { truth } = generateLog({ cells: 3, capacityMah: 2200, cRate: 2, sampleIntervalS: 0.5 });
    expect(truth.reachedCutoff).toBe(true);
    expect(truth.mainDeliveredMah).toBeCloseTo((4.4 * truth.mainDurationS) / 3.6, 6);
    expect(truth.deliveredMah).toBeCloseTo(truth.mainDeliveredMah, 9);
    // A 2C discharge to 3.3 V/cell delivers most, not all, of the capacity.
    expect(truth.mainDeliveredMah / 2200).toBeGreaterThan(0.85);
    expect(truth.mainDeliveredMah / 2200).toBeLessThan(1);
  });

  it("truth: the step resistance is the first-order RC step response R0 + R1(1 − e^(−1/τ)) plus the OCV fall in 1 s (circuit theory)", () => {
    const { truth } = generateLog({
      cells: 4,
      r0PerCellMohm: 3,
      r1PerCellMohm: 2,
      tau1S: 10,
      cRate: 1,
      capacityMah: 5000,
    });
    const rc = 4 * (3 + 2 * (1 - Math.exp(-1 / 10)));
    const ocvFallMohm = ((4 * (ocvPerCellV(1) - ocvPerCellV(1 - 5 / 3.6 / 5000))) / 5) * 1000;
    expect(truth.stepResistanceMohm).toBeCloseTo(rc + ocvFallMohm, 2);
  });

  it("scales resistance with temperature by the Arrhenius factor it shares with the analysis", () => {
    const cold = generateLog({ ambientC: 0, r1PerCellMohm: 0, cRate: 1 }).truth;
    const warm = generateLog({ ambientC: 25, r1PerCellMohm: 0, cRate: 1 }).truth;
    expect(cold.stepResistanceMohm / warm.stepResistanceMohm).toBeCloseTo(arrheniusFactor(25, 0), 1);
  });

  it("warms the pack under load and records the peak", () => {
    const { truth } = generateLog({ cRate: 20, capacityMah: 2000, r0PerCellMohm: 4 });
    expect(truth.peakTemperatureC).toBeGreaterThan(truth.startTemperatureC + 5);
  });

  it("streams the same text it writes whole", () => {
    const options = { seed: 9, cells: 2, iecPrelude: true, sampleIntervalS: 0.2, noise: { currentA: 0.01 } };
    const dialect = { delimiter: ";" as const, decimalComma: true, bom: true };
    expect([...csvChunks(options, dialect, 100)].join("")).toBe(toCsv(generateLog(options).rows, dialect));
  });

  it("stops at maxSamples", () => {
    const sim = new EcmSimulator({ maxSamples: 123 });
    let n = 0;
    while (sim.next()) n++;
    expect(n).toBe(123);
  });

  it("writes the dialects testers' loggers use", () => {
    const { rows } = generateLog({ cells: 2, sampleIntervalS: 1, initialRestS: 2 });
    const csv = toCsv(rows.slice(0, 3), {
      delimiter: "\t",
      timeUnit: "ms",
      voltageUnit: "mV",
      currentUnit: "mA",
      headerStyle: "brackets",
      crlf: true,
      columns: ["current", "time", "cells", "voltage", "extra"],
    });
    const [header, first] = csv.split("\r\n");
    expect(header).toBe("I [mA]\ttime [ms]\tV1 [mV]\tV2 [mV]\tU [mV]\tPower (W)\tCapacity (mAh)\tMode");
    expect(first?.split("\t")).toEqual(["0", "0", "4200.0", "4200.0", "8400.0", "0.0", "0.0", "REST"]);
  });
});
