import { describe, expect, it } from "vitest";
import { analyseText } from "@/lib/analysis";
import { arrheniusFactor } from "@/lib/analysis/arrhenius";
import { type EcmOptions, generateLog, toCsv } from "../../helpers/ecm";

// Every figure is checked against the equivalent-circuit generator's own truth, which is
// computed from the circuit (closed forms and fine integration), not from the analysis.

async function run(ecm: EcmOptions, options: Parameters<typeof analyseText>[1] = {}) {
  const { rows, truth } = generateLog(ecm);
  const analysis = await analyseText(toCsv(rows, { decimals: { voltage: 5, current: 4, time: 4 } }), options);
  return { rows, truth, f: analysis.figures, analysis };
}

describe("figures of a constant-current discharge with an IEC two-level prelude", async () => {
  const ecm: EcmOptions = {
    cells: 4,
    capacityMah: 5000,
    cRate: 5,
    r0PerCellMohm: 3,
    r1PerCellMohm: 1.5,
    tau1S: 20,
    sampleIntervalS: 0.1,
    iecPrelude: true,
    cutoffVPerCell: 3.3,
  };
  const { rows, truth, f } = await run(ecm, {
    ratedMah: 5000,
    labelledC: 25,
    weightG: 560,
    cutoffVPerCell: 3.3,
    stopTemperatureC: 30,
  });

  it("delivered capacity = ∫I dt: coulomb counting matches I × t for constant current (closed form)", () => {
    expect(f.capacityMah).toBeCloseTo(truth.deliveredMah, 3);
    expect(f.mainDischargeCapacityMah).toBeCloseTo((25 * truth.mainDurationS) / 3.6, 3);
  });

  it("delivered energy = ∫V·I dt matches the circuit's own Simpson integration within 0.05 %", () => {
    expect(Math.abs((f.energyWh ?? 0) / truth.deliveredWh - 1)).toBeLessThan(5e-4);
  });

  it("mean voltage under load = energy ÷ charge", () => {
    expect(f.meanVoltageV).toBeCloseTo(((f.energyWh ?? 0) * 1000) / (f.capacityMah ?? 1), 9);
    expect(f.meanVoltagePerCellV).toBeCloseTo((f.meanVoltageV ?? 0) / 4, 12);
  });

  it("minimum voltage, peak current, duration and cells", () => {
    expect(f.minVoltageV).toBeCloseTo(truth.minVoltageV, 4);
    expect(f.peakCurrentA).toBeCloseTo(25, 3);
    expect(f.mainDischargeCurrentA).toBeCloseTo(25, 6);
    expect(f.durationS).toBeCloseTo(truth.durationS, 6);
    expect(f.cells).toBe(4);
    expect(f.cellsSource).toBe("rest-voltage");
  });

  it("time to cut-off falls within the last sample interval of the circuit's crossing", () => {
    expect(f.timeToCutoffS).toBeLessThanOrEqual(truth.mainDurationS + 1e-9);
    expect(f.timeToCutoffS).toBeGreaterThan(truth.mainDurationS - 0.1 - 1e-9);
  });

  it("hold voltage per cell 10 s after the current edge matches the circuit within 0.5 mV", () => {
    // The generator switches the load exactly on a sample; the analysis places the edge midway between
    // the last rest and the first load sample (0.05 s later here), which the voltage's slope turns into ≈0.15 mV.
    expect(f.holdVoltagePerCellV).toBeCloseTo(truth.holdVoltagePerCellV, 3);
  });

  it("DC resistance by the IEC 61960-3 two-level method matches the circuit's noise-free reading within 0.5 %", () => {
    expect(f.dcResistanceMethod).toBe("iec-61960-two-level");
    expect(Math.abs((f.dcResistanceMohm ?? 0) / (truth.iecResistanceMohm ?? 1) - 1)).toBeLessThan(0.005);
    expect(f.dcResistancePerCellMohm).toBeCloseTo((f.dcResistanceMohm ?? 0) / 4, 12);
  });

  it("temperature: start, peak and rise = peak − start, as the circuit's thermal model gives", () => {
    expect(f.startTemperatureC).toBeCloseTo(truth.startTemperatureC, 2); // the log holds 0.01 °C
    expect(f.peakTemperatureC).toBeCloseTo(truth.peakTemperatureC, 2);
    expect(f.temperatureRiseC).toBeCloseTo((f.peakTemperatureC ?? 0) - (f.startTemperatureC ?? 0), 12);
  });

  it("time to stop temperature is the first sample at or above it, from the main discharge's start", () => {
    // As logged: temperatures are written with two decimals.
    const first = rows.find((r) => r.timeS > truth.mainStartS && Number(r.temperatureC.toFixed(2)) >= 30);
    expect(f.timeToStopTemperatureS).toBeCloseTo((first?.timeS ?? 0) - truth.mainStartS, 6);
  });

  it("sag-limited C estimate = S·(3.7 − 3.3 V) / R(10 s) ÷ rated Ah, R read at the hold point (HPPC-style 10 s resistance; 3.7/3.3 V common practice)", () => {
    const a = f.sagLimitedCAssumptions;
    expect(a).toMatchObject({ nominalVPerCell: 3.7, floorVPerCell: 3.3, resistancePoint: "hold", resistanceAtS: 10 });
    const r = (a?.resistanceMohm ?? 0) / 1000;
    expect(f.sagLimitedCEstimate).toBeCloseTo((4 * 0.4) / r / 5, 9);
    expect(f.sagLimitedC).toBe(f.sagLimitedCEstimate);
    expect(f.labelRatio).toBeCloseTo((f.sagLimitedCEstimate ?? 0) / 25, 12);
    // R(10 s) by Ohm's law from the circuit: rest voltage before the main load minus the voltage 10 s in, ÷ 25 A.
    const restV = rows.find((row) => row.timeS === truth.mainStartS)?.voltageV ?? 0;
    expect(r).toBeCloseTo((restV - 4 * truth.holdVoltagePerCellV) / 25, 4);
    // It includes the first 10 s of polarisation, so it is above the 1 s two-level reading.
    expect(r * 1000).toBeGreaterThan(f.dcResistanceMohm ?? Number.POSITIVE_INFINITY);
  });

  it("capacity ratio, specific energy and specific power (SI definitions)", () => {
    expect(f.capacityRatio).toBeCloseTo((f.capacityMah ?? 0) / 5000, 12);
    expect(f.specificEnergyWhKg).toBeCloseTo((f.energyWh ?? 0) / 0.56, 9);
    const meanPowerW = ((f.mainDischargeEnergyWh ?? 0) * 3600) / (f.mainDischargeDurationS ?? 1);
    expect(f.specificPowerWKg).toBeCloseTo(meanPowerW / 0.56, 6);
  });

  it("has no warnings for a clean log", () => {
    expect(f.warnings).toEqual([]);
  });
});

describe("DC resistance from the rest → load step, and its 25 °C estimate", () => {
  it("matches the circuit's noise-free step reading within 0.5 % and says which method", async () => {
    const { truth, f } = await run({ cells: 3, capacityMah: 2200, cRate: 10, sampleIntervalS: 0.1, r0PerCellMohm: 5 });
    expect(f.dcResistanceMethod).toBe("step");
    expect(Math.abs((f.dcResistanceMohm ?? 0) / truth.stepResistanceMohm - 1)).toBeLessThan(0.005);
  });

  it("a cold pack (5 °C) corrected by Arrhenius with the same 17.1 kJ/mol recovers the 25 °C reading within 2 %", async () => {
    const warm = await run({ cells: 4, cRate: 2, sampleIntervalS: 0.1, ambientC: 25 });
    const cold = await run({ cells: 4, cRate: 2, sampleIntervalS: 0.1, ambientC: 5 });
    expect(cold.f.dcResistanceMohm).toBeGreaterThan((warm.f.dcResistanceMohm ?? 0) * 1.3);
    expect(cold.f.resistanceTemperatureC).toBeCloseTo(5, 1);
    expect(cold.f.resistanceAt25CMohm).toBeCloseTo(
      (cold.f.dcResistanceMohm ?? 0) * arrheniusFactor(cold.f.resistanceTemperatureC ?? 0, 25),
      9,
    );
    expect(Math.abs((cold.f.resistanceAt25CMohm ?? 0) / (warm.f.dcResistanceMohm ?? 1) - 1)).toBeLessThan(0.02);
  });

  it("uses the method card's pack temperature when the log has none, and says so", async () => {
    const { rows } = generateLog({ cells: 2, cRate: 1, sampleIntervalS: 0.5 });
    const csv = toCsv(rows, { columns: ["time", "voltage", "current"] });
    const f = (await analyseText(csv, { packStartTemperatureC: 15 })).figures;
    expect(f.resistanceTemperatureC).toBe(15);
    expect(f.resistanceAt25CMohm).toBeCloseTo((f.dcResistanceMohm ?? 0) * arrheniusFactor(15, 25), 9);
    expect(f.warnings.join(" ")).toMatch(/method card/);
  });
});

describe("noisy and irregular logs", () => {
  it("finds the two-level step of a small pack through 20 mA of current noise (the low step is only 0.44 A)", async () => {
    for (const seed of [1, 2, 3]) {
      const { truth, f } = await run(
        {
          seed,
          cells: 3,
          capacityMah: 2200,
          cRate: 3,
          sampleIntervalS: 1,
          iecPrelude: true,
          noise: { voltageV: 0.0005, currentA: 0.02 },
        },
        { ratedMah: 2200 },
      );
      expect(f.dcResistanceMethod).toBe("iec-61960-two-level");
      expect(Math.abs((f.dcResistanceMohm ?? 0) / (truth.iecResistanceMohm ?? 1) - 1)).toBeLessThan(0.25);
    }
  });

  it("noise of 2 mV and 20 mA on an irregularly sampled log keeps capacity within 0.5 % and resistance within 5 %", async () => {
    const { truth, f } = await run({
      cells: 6,
      capacityMah: 4000,
      cRate: 3,
      sampleIntervalS: 0.2,
      jitter: 0.4,
      noise: { voltageV: 0.002, currentA: 0.02, temperatureC: 0.05 },
      seed: 11,
    });
    expect(Math.abs((f.capacityMah ?? 0) / truth.deliveredMah - 1)).toBeLessThan(0.005);
    expect(Math.abs((f.energyWh ?? 0) / truth.deliveredWh - 1)).toBeLessThan(0.005);
    expect(Math.abs((f.dcResistanceMohm ?? 0) / truth.stepResistanceMohm - 1)).toBeLessThan(0.05);
  });
});

describe("time to cut-off", () => {
  it("without a stated cut-off it is the length of the main discharge", async () => {
    const { truth, f } = await run({ cells: 2, cRate: 2, sampleIntervalS: 0.5 });
    expect(f.timeToCutoffS).toBeCloseTo(truth.mainDurationS, 6);
  });

  it("a discharge that stops a few mV above the stated cut-off counts as reaching it, with a note", async () => {
    const { f } = await run(
      { cells: 2, cRate: 2, sampleIntervalS: 0.5, cutoffVPerCell: 3.305 },
      { cutoffVPerCell: 3.3 },
    );
    expect(f.timeToCutoffS).not.toBeNull();
    expect(f.reachedCutoff).toBe(true);
    expect(f.warnings.join(" ")).toMatch(/within what one sample interval can show/);
  });

  it("a discharge stopped well above the cut-off has no time to cut-off, and says so", async () => {
    const { f } = await run({ cells: 2, cRate: 2, sampleIntervalS: 0.5, cutoffVPerCell: 3.5 }, { cutoffVPerCell: 3.3 });
    expect(f.timeToCutoffS).toBeNull();
    expect(f.warnings.join(" ")).toMatch(/never reached the cut-off of 3.3 V/);
  });
});
