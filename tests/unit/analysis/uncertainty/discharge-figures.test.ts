import { describe, expect, it } from "vitest";
import { currentChannel, voltageChannel, type InstrumentAccuracy } from "@/lib/analysis/uncertainty/accuracy";
import { ACCURACY_CLASSES } from "@/lib/analysis/uncertainty/accuracy-classes";
import {
  capacityRatioUncertainty,
  capacityUncertainty,
  energyUncertainty,
  holdVoltageUncertainty,
  labelRatioUncertainty,
  meanVoltageUncertainty,
  perCellUncertainty,
  sustainedCUncertainty,
  type DischargeSummary,
} from "@/lib/analysis/uncertainty/discharge-figures";
import { monteCarlo } from "@/lib/analysis/uncertainty/monte-carlo";
import { currentReader, simulateDischarge, voltageReader, type TrueDischarge } from "./simulated-bench";

// Closed forms: the GUM's law of propagation (JCGM 100:2008 5.1.2) written out by hand for each model, with
// rectangular ± limits u = a/√3 (4.3.7) and resolution δ/√12 (F.2.2.1). Monte Carlo: JCGM 101:2008 on the same
// models, simulated without linearising (./simulated-bench.ts); the two standard uncertainties must agree within
// 5 % (issue 16), and the k = 2 interval must hold at least 95 % of the simulated outcomes.
const R3 = Math.sqrt(3);
const R12 = Math.sqrt(12);
const R6 = Math.sqrt(6);

const hobby = ACCURACY_CLASSES["hobby-charger-readout"].accuracy;
const bench = ACCURACY_CLASSES["bench-meter-logger"].accuracy;
const load = ACCURACY_CLASSES["electronic-load-logger"].accuracy;

/** 4S pack, true voltage falling from 16.6 V: V(x) = 16.6 − 1.6x − 0.5x⁴, x = t/T; mean 16.6 − 0.8 − 0.1 = 15.7 V. */
function discharge(currentA: number, durationS: number): TrueDischarge {
  return { currentA, durationS, voltageAt: (t) => 16.6 - 1.6 * (t / durationS) - 0.5 * (t / durationS) ** 4 };
}
const MEAN_V = 15.7;

type Case = { name: string; acc: InstrumentAccuracy; currentA: number; durationS: number; dtS: number };
const cases: Case[] = [
  { name: "hobby read-out, 5C for 696 s, 2 s samples", acc: hobby, currentA: 25, durationS: 696, dtS: 2 },
  { name: "bench meter, 10C for 348 s, coarse 5 s samples", acc: bench, currentA: 50, durationS: 348, dtS: 5 },
  { name: "electronic load, 2C for 29 min, 4 s samples", acc: load, currentA: 10, durationS: 1740, dtS: 4 },
];

function summary(c: Case): DischargeSummary {
  return {
    meanCurrentA: c.currentA,
    durationS: c.durationS,
    samples: Math.round(c.durationS / c.dtS),
    samplingIntervalS: c.dtS,
  };
}

function within5Percent(gum: number, mc: number): void {
  expect(Math.abs(gum - mc) / mc).toBeLessThan(0.05);
}

function coverage(values: Float64Array, centre: number, U: number): number {
  let n = 0;
  for (const v of values) if (Math.abs(v - centre) <= U) n++;
  return n / values.length;
}

describe("delivered capacity Q = ∫ I dt", () => {
  it("closed form, hobby read-out at 10 A for 1740 s (hand-written GUM sum)", () => {
    const c: Case = { name: "2C", acc: hobby, currentA: 10, durationS: 1740, dtS: 1 };
    const q = (10 * 1740) / 3.6;
    const r = capacityUncertainty(q, summary(c), currentChannel(hobby.current));
    const expected = Math.sqrt(
      ((q * 0.02) / R3) ** 2 + // gain ±2 % of reading
        ((1740 * 0.05) / R3 / 3.6) ** 2 + // offset ±0.05 A for 1740 s
        ((1740 * 0.01) / R12 / Math.sqrt(1740) / 3.6) ** 2 + // 0.01 A resolution averaged over 1740 samples
        ((10 * 1) / R6 / 3.6) ** 2, // both edges, ±I·Δt/2 each
    );
    expect(r?.u).toBeCloseTo(expected, 9);
    expect(r?.U95).toBeCloseTo(2 * expected, 9);
    expect(r?.k).toBe(2);
    expect(r?.contributions[0]?.source).toBe("current-gain");
    expect(r?.U95).toBeCloseTo(115.1, 0); // 4833 ± 115 mAh: about ±2.4 %
  });

  it.each(cases.map((c) => [c.name, c]))("agrees with a Monte Carlo simulation (JCGM 101:2008): %s", (_name, c) => {
    const s = summary(c);
    const trueQ = (c.currentA * c.durationS) / 3.6;
    const gum = capacityUncertainty(trueQ, s, currentChannel(c.acc.current));
    // Output: the error Q_read − Q_true of one simulated test (the true duration is not tied to the sampling grid).
    const mc = monteCarlo(
      6000,
      (rng) => {
        const d = discharge(c.currentA, c.durationS + rng() * c.dtS);
        const out = simulateDischarge(
          rng,
          d,
          c.dtS,
          voltageReader(rng, c.acc.voltage),
          currentReader(rng, c.acc.current),
        );
        return (out.chargeAs - d.currentA * d.durationS) / 3.6;
      },
      101,
    );
    expect(gum).not.toBeNull();
    within5Percent(gum?.u ?? 0, mc.sd);
    expect(Math.abs(mc.mean)).toBeLessThan(4 * (mc.sd / Math.sqrt(mc.trials))); // the model has no bias
    expect(coverage(mc.values, 0, gum?.U95 ?? 0)).toBeGreaterThanOrEqual(0.95);
  });

  it("coarse sampling makes the edges dominate (bench meter, 5 s samples)", () => {
    const c = cases[1] as Case;
    const r = capacityUncertainty((50 * 348) / 3.6, summary(c), currentChannel(bench.current));
    expect(r?.contributions[0]?.source).toBe("sampling-edges");
    expect(r?.contributions[0]?.kind).toBe("random");
  });

  it("refuses inputs it cannot use", () => {
    const ch = currentChannel(hobby.current);
    expect(capacityUncertainty(Number.NaN, summary(cases[0] as Case), ch)).toBeNull();
    expect(capacityUncertainty(100, { ...summary(cases[0] as Case), samplingIntervalS: 0 }, ch)).toBeNull();
  });
});

describe("delivered energy E = ∫ V·I dt", () => {
  it("closed form, hobby read-out (hand-written GUM sum)", () => {
    const c: Case = { name: "2C", acc: hobby, currentA: 10, durationS: 1740, dtS: 1 };
    const qAh = (10 * 1740) / 3600;
    const e = qAh * MEAN_V;
    const r = energyUncertainty(e, MEAN_V, summary(c), voltageChannel(hobby.voltage), currentChannel(hobby.current));
    const expected = Math.sqrt(
      ((e * 0.005) / R3) ** 2 +
        ((qAh * 0.02) / R3) ** 2 + // voltage gain, voltage offset
        ((e * 0.02) / R3) ** 2 +
        ((MEAN_V * 1740 * 0.05) / R3 / 3600) ** 2 + // current gain, current offset
        ((10 * 1740 * 0.01) / R12 / Math.sqrt(1740) / 3600) ** 2 +
        ((MEAN_V * 1740 * 0.01) / R12 / Math.sqrt(1740) / 3600) ** 2 +
        ((MEAN_V * 10 * 1) / R6 / 3600) ** 2,
    );
    expect(r?.u).toBeCloseTo(expected, 12);
  });

  it.each(cases.map((c) => [c.name, c]))("agrees with a Monte Carlo simulation (JCGM 101:2008): %s", (_name, c) => {
    const trueE = (c.currentA * c.durationS * MEAN_V) / 3600;
    const gum = energyUncertainty(
      trueE,
      MEAN_V,
      summary(c),
      voltageChannel(c.acc.voltage),
      currentChannel(c.acc.current),
    );
    const mc = monteCarlo(
      6000,
      (rng) => {
        const d = discharge(c.currentA, c.durationS + rng() * c.dtS);
        const out = simulateDischarge(
          rng,
          d,
          c.dtS,
          voltageReader(rng, c.acc.voltage),
          currentReader(rng, c.acc.current),
        );
        return (out.energyWs - d.currentA * d.durationS * MEAN_V) / 3600;
      },
      202,
    );
    within5Percent(gum?.u ?? 0, mc.sd);
    expect(coverage(mc.values, 0, gum?.U95 ?? 0)).toBeGreaterThanOrEqual(0.95);
  });
});

describe("mean voltage under load V̄ = E / Q", () => {
  it("the current's gain error and offset cancel: only voltage terms remain (closed form)", () => {
    const r = meanVoltageUncertainty(MEAN_V, 1740, voltageChannel(hobby.voltage));
    expect(r?.contributions.map((x) => x.source).sort()).toEqual([
      "voltage-gain",
      "voltage-offset",
      "voltage-resolution",
    ]);
    expect(r?.u).toBeCloseTo(
      Math.sqrt(((MEAN_V * 0.005) / R3) ** 2 + (0.02 / R3) ** 2 + (0.01 / R12 / Math.sqrt(1740)) ** 2),
      12,
    );
    expect(r?.note).toMatch(/cancels/);
    expect(r?.note).toMatch(/not included/);
  });

  it("closed form of the edge term: (Δt/√12)·√((V_start − V̄)² + (V_end − V̄)²) / T", () => {
    const edges = { samplingIntervalS: 5, durationS: 348, startVoltageV: 16.6, endVoltageV: 14.5 };
    const r = meanVoltageUncertainty(MEAN_V, 70, voltageChannel(bench.voltage), edges);
    const edge = r?.contributions.find((x) => x.source === "sampling-edges");
    expect(edge?.u).toBeCloseTo(((5 / R12) * Math.sqrt(0.9 ** 2 + 1.2 ** 2)) / 348, 12);
    expect(r?.contributions[0]?.source).toBe("sampling-edges"); // dominates a short, coarsely sampled bench-meter test
  });

  it.each(cases.map((c) => [c.name, c]))(
    "agrees with a Monte Carlo simulation that does draw current errors: %s",
    (_name, c) => {
      const edges = { samplingIntervalS: c.dtS, durationS: c.durationS, startVoltageV: 16.6, endVoltageV: 14.5 };
      const gum = meanVoltageUncertainty(MEAN_V, Math.round(c.durationS / c.dtS), voltageChannel(c.acc.voltage), edges);
      const mc = monteCarlo(
        6000,
        (rng) => {
          const d = discharge(c.currentA, c.durationS + rng() * c.dtS);
          const out = simulateDischarge(
            rng,
            d,
            c.dtS,
            voltageReader(rng, c.acc.voltage),
            currentReader(rng, c.acc.current),
          );
          return out.energyWs / out.chargeAs - MEAN_V;
        },
        303,
      );
      within5Percent(gum?.u ?? 0, mc.sd);
    },
  );
});

describe("hold voltage: one reading a set time after the load starts", () => {
  const slopeVPerS = -0.004; // still falling 4 mV/s at 10 s (an invented 4S pack)
  it("closed form with the start known to one sampling interval", () => {
    const r = holdVoltageUncertainty(15.9, voltageChannel(hobby.voltage), { samplingIntervalS: 2, slopeVPerS });
    expect(r?.u).toBeCloseTo(
      Math.sqrt(((15.9 * 0.005) / R3) ** 2 + (0.02 / R3) ** 2 + (0.01 / R12) ** 2 + ((0.004 * 2) / R12) ** 2),
      12,
    );
    expect(holdVoltageUncertainty(15.9, voltageChannel(hobby.voltage))?.note).toMatch(/not included/);
  });

  it.each([
    ["hobby read-out, 2 s samples", hobby, 2],
    ["bench meter, 0.5 s samples", bench, 0.5],
    ["electronic load, 5 s samples", load, 5],
  ] as const)("agrees with a Monte Carlo simulation (JCGM 101:2008): %s", (_name, acc, dtS) => {
    const gum = holdVoltageUncertainty(15.9, voltageChannel(acc.voltage), { samplingIntervalS: dtS, slopeVPerS });
    const mc = monteCarlo(
      40000,
      (rng) => {
        const read = voltageReader(rng, acc.voltage);
        const lag = rng() * dtS; // the first load sample lags the real start by 0…Δt
        return read(15.9 + slopeVPerS * lag);
      },
      404,
    );
    within5Percent(gum?.u ?? 0, mc.sd);
  });
});

describe("sustained C = mean current ÷ rated Ah; ratios; per cell", () => {
  it("closed form: rated capacity exact, current terms ÷ Ah", () => {
    const r = sustainedCUncertainty(50, 348, 5000, currentChannel(hobby.current));
    expect(r?.value).toBe(10);
    expect(r?.u).toBeCloseTo(
      Math.sqrt(((50 * 0.02) / R3 / 5) ** 2 + (0.05 / R3 / 5) ** 2 + (0.01 / R12 / Math.sqrt(348) / 5) ** 2),
      12,
    );
  });

  it("agrees with a Monte Carlo simulation of the mean of 348 current readings", () => {
    const gum = sustainedCUncertainty(50, 348, 5000, currentChannel(load.current));
    const mc = monteCarlo(
      20000,
      (rng) => {
        const read = currentReader(rng, load.current);
        let sum = 0;
        for (let k = 0; k < 348; k++) sum += read(50);
        return sum / 348 / 5;
      },
      505,
    );
    within5Percent(gum?.u ?? 0, mc.sd);
  });

  it("capacity ratio, label ratio and per-cell values scale every contribution by the exact divisor (GUM 5.1.2, c = 1/divisor)", () => {
    const cap = capacityUncertainty(
      4833.3,
      { meanCurrentA: 10, durationS: 1740, samples: 1740, samplingIntervalS: 1 },
      currentChannel(hobby.current),
    );
    if (!cap) throw new Error("capacity uncertainty missing");
    const ratio = capacityRatioUncertainty(cap, 5000);
    expect(ratio?.value).toBeCloseTo(0.96666, 5);
    expect(ratio?.u).toBeCloseTo(cap.u / 5000, 15);
    expect(ratio?.contributions.map((c) => c.source)).toEqual(cap.contributions.map((c) => c.source));
    const c = sustainedCUncertainty(50, 348, 5000, currentChannel(hobby.current));
    if (!c) throw new Error("C uncertainty missing");
    expect(labelRatioUncertainty(c, 25)?.U95).toBeCloseTo(c.U95 / 25, 15);
    const v = meanVoltageUncertainty(MEAN_V, 1740, voltageChannel(hobby.voltage));
    if (!v) throw new Error("voltage uncertainty missing");
    expect(perCellUncertainty(v, 4)?.value).toBeCloseTo(3.925, 12);
    expect(perCellUncertainty(v, 4)?.u).toBeCloseTo(v.u / 4, 15);
    expect(perCellUncertainty(v, 0)).toBeNull();
    expect(capacityRatioUncertainty(cap, 0)).toBeNull();
  });
});
