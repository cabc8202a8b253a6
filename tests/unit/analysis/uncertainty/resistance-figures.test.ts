import { describe, expect, it } from "vitest";
import { GAS_CONSTANT_J_PER_MOL_K, arrheniusFactor } from "@/lib/analysis/arrhenius";
import {
  currentChannel,
  temperatureChannel,
  voltageChannel,
  type InstrumentAccuracy,
} from "@/lib/analysis/uncertainty/accuracy";
import { ACCURACY_CLASSES } from "@/lib/analysis/uncertainty/accuracy-classes";
import { monteCarlo, drawRectangular } from "@/lib/analysis/uncertainty/monte-carlo";
import {
  DEFAULT_ACTIVATION_ENERGY_HALF_WIDTH_KJ_PER_MOL,
  DEFAULT_RESISTANCE_RISE_PER_S,
  dcResistanceUncertainty,
  resistanceAt25CUncertainty,
  sagLimitedCUncertainty,
} from "@/lib/analysis/uncertainty/resistance-figures";
import { currentReader, simulateStep, temperatureReader, voltageReader, type TrueStep } from "./simulated-bench";

// Closed forms: JCGM 100:2008 5.1.2 written out by hand; rectangular ± limits (4.3.7), resolution δ/√12 (F.2.2.1).
// Monte Carlo: JCGM 101:2008 on the same models simulated without linearising (./simulated-bench.ts); the
// standard uncertainties must agree within 5 % (issue 16).
const R3 = Math.sqrt(3);
const R12 = Math.sqrt(12);

const hobby = ACCURACY_CLASSES["hobby-charger-readout"].accuracy;
const bench = ACCURACY_CLASSES["bench-meter-logger"].accuracy;
const load = ACCURACY_CLASSES["electronic-load-logger"].accuracy;

// An invented 4S 5000 mAh pack: IEC 61960-3 two-level step 0.2 It → 1 It (1 A → 5 A), pack R = 19.3 mΩ at 1 s.
const twoLevel: TrueStep = {
  u1V: 16.38,
  i1A: 1,
  i2A: 5,
  resistanceOhm: 0.0193,
  risePerS: DEFAULT_RESISTANCE_RISE_PER_S,
};
// The rest → load step of a 10C discharge: 0 A → 50 A.
const restStep: TrueStep = {
  u1V: 16.8,
  i1A: 0,
  i2A: 50,
  resistanceOhm: 0.0193,
  risePerS: DEFAULT_RESISTANCE_RISE_PER_S,
};

type Case = { name: string; acc: InstrumentAccuracy; step: TrueStep; dtS: number };
const cases: Case[] = [
  { name: "hobby read-out, two-level 1 → 5 A, 1 s samples (resolution dominates)", acc: hobby, step: twoLevel, dtS: 1 },
  { name: "bench meter, two-level 1 → 5 A, 0.5 s samples", acc: bench, step: twoLevel, dtS: 0.5 },
  { name: "electronic load, rest → 50 A, 1 s samples (timing dominates)", acc: load, step: restStep, dtS: 1 },
  { name: "electronic load, rest → 50 A, 0.1 s samples (gains dominate)", acc: load, step: restStep, dtS: 0.1 },
];

function within5Percent(gum: number, mc: number): void {
  expect(Math.abs(gum - mc) / mc).toBeLessThan(0.05);
}

function gumR(c: Case) {
  return dcResistanceUncertainty(
    { resistanceMohm: c.step.resistanceOhm * 1000, currentStepA: c.step.i2A - c.step.i1A, samplingIntervalS: c.dtS },
    voltageChannel(c.acc.voltage),
    currentChannel(c.acc.current),
  );
}

describe("DC resistance R = (U₁ − U₂)/(I₂ − I₁), same instruments a second apart", () => {
  it("closed form, hobby read-out (hand-written GUM sum; no offset term: offsets cancel in a difference)", () => {
    const r = gumR(cases[0] as Case);
    const expected = Math.sqrt(
      ((19.3 * 0.005) / R3) ** 2 + // voltage gain ±0.5 %
        ((19.3 * 0.02) / R3) ** 2 + // current gain ±2 %
        2 * (((0.01 / R12) * 1000) / 4) ** 2 + // two 10 mV-resolution voltage readings over a 4 A step, in mΩ
        2 * ((19.3 * (0.01 / R12)) / 4) ** 2 + // two 10 mA-resolution current readings
        ((19.3 * 0.05 * 1) / R12) ** 2, // step instant known to 1 s, R rising 5 %/s
    );
    expect(r?.u).toBeCloseTo(expected, 12);
    expect(r?.contributions.some((c) => c.source.endsWith("offset"))).toBe(false);
    expect(r?.contributions[0]?.source).toBe("voltage-resolution");
    expect(r?.U95).toBeCloseTo(2.17, 2); // 19.3 ± 2.2 mΩ from a hobby read-out on a 4 A step
  });

  it.each(cases.map((c) => [c.name, c]))("agrees with a Monte Carlo simulation (JCGM 101:2008): %s", (_name, c) => {
    const gum = gumR(c);
    const mc = monteCarlo(
      40000,
      (rng) =>
        simulateStep(rng, c.step, c.dtS, voltageReader(rng, c.acc.voltage), currentReader(rng, c.acc.current)) * 1000,
      606,
    );
    within5Percent(gum?.u ?? 0, mc.sd);
  });

  it("offsets really cancel: a simulation with large offsets spreads no wider (Monte Carlo, JCGM 101:2008)", () => {
    const c = cases[1] as Case;
    const big = { ...c.acc, voltage: { ...c.acc.voltage, offsetV: 0.5 }, current: { ...c.acc.current, offsetA: 2 } };
    const mc = monteCarlo(
      40000,
      (rng) =>
        simulateStep(rng, c.step, c.dtS, voltageReader(rng, big.voltage), currentReader(rng, big.current)) * 1000,
      606,
    );
    within5Percent(gumR(c)?.u ?? 0, mc.sd);
  });

  it("refuses a step without current change", () => {
    expect(
      dcResistanceUncertainty(
        { resistanceMohm: 19.3, currentStepA: 0, samplingIntervalS: 1 },
        voltageChannel(hobby.voltage),
        currentChannel(hobby.current),
      ),
    ).toBeNull();
  });
});

describe("resistance at 25 °C by the Arrhenius law, with the activation energy's range as a stated assumption", () => {
  const ea = 17.1;
  const r = gumR(cases[1] as Case);
  if (!r) throw new Error("resistance uncertainty missing");

  it("closed form at 10 °C (sensitivities ∂R₂₅/∂T = R₂₅·Eₐ/(R_g T²), ∂R₂₅/∂Eₐ = R₂₅(1/T₂₅ − 1/T)/R_g)", () => {
    const out = resistanceAt25CUncertainty({
      resistance: r,
      temperatureC: 10,
      temperature: temperatureChannel(hobby.temperature),
      activationEnergyKJPerMol: ea,
    });
    const f = arrheniusFactor(10, 25, ea); // lib/analysis/arrhenius.ts, itself checked against Python's math.exp
    const r25 = 19.3 * f;
    const tK = 283.15;
    const dT = (r25 * ea * 1000) / (GAS_CONSTANT_J_PER_MOL_K * tK * tK);
    const dEa = (r25 * (1 / 298.15 - 1 / tK)) / GAS_CONSTANT_J_PER_MOL_K;
    const expected = Math.sqrt(
      (f * r.u) ** 2 + ((dT * 2) / R3) ** 2 + ((dT * 1) / R12) ** 2 + ((dEa * 5000) / R3) ** 2,
    );
    expect(out?.value).toBeCloseTo(r25, 12);
    expect(out?.u).toBeCloseTo(expected, 12);
    expect(out?.contributions[0]?.source).toBe("activation-energy"); // far from 25 °C the assumption dominates
    expect(out?.contributions[0]?.kind).toBe("assumption");
    expect(DEFAULT_ACTIVATION_ENERGY_HALF_WIDTH_KJ_PER_MOL).toBe(5);
  });

  it("at 25 °C the activation energy adds nothing", () => {
    const out = resistanceAt25CUncertainty({
      resistance: r,
      temperatureC: 25,
      temperature: temperatureChannel(hobby.temperature),
      activationEnergyKJPerMol: ea,
    });
    expect(out?.contributions.some((c) => c.source === "activation-energy")).toBe(false);
    expect(out?.value).toBeCloseTo(19.3, 12);
  });

  it("a gain error on the temperature channel counts on the °C reading", () => {
    const tc = temperatureChannel({ percentOfReading: 2, offsetC: 0, resolutionC: 0 });
    const out = resistanceAt25CUncertainty({
      resistance: r,
      temperatureC: 40,
      temperature: tc,
      activationEnergyKJPerMol: ea,
      activationEnergyHalfWidthKJPerMol: 0,
    });
    const r25 = 19.3 * arrheniusFactor(40, 25, ea);
    const dT = (r25 * ea * 1000) / (GAS_CONSTANT_J_PER_MOL_K * 313.15 ** 2);
    expect(out?.contributions.find((c) => c.source === "temperature-gain")?.u).toBeCloseTo((dT * 40 * 0.02) / R3, 12);
  });

  it.each([
    ["hobby read-out at 10 °C", hobby, 10],
    ["bench meter at 10 °C", bench, 10],
    ["electronic load at 38 °C", load, 38],
  ] as const)("agrees with a Monte Carlo simulation of the whole chain (JCGM 101:2008): %s", (_name, acc, tC) => {
    const c: Case = { name: "", acc, step: twoLevel, dtS: 1 };
    const rIn = gumR(c);
    if (!rIn) throw new Error("resistance uncertainty missing");
    const gum = resistanceAt25CUncertainty({
      resistance: rIn,
      temperatureC: tC,
      temperature: temperatureChannel(acc.temperature),
      activationEnergyKJPerMol: ea,
    });
    const mc = monteCarlo(
      40000,
      (rng) => {
        const rRead =
          simulateStep(rng, twoLevel, 1, voltageReader(rng, acc.voltage), currentReader(rng, acc.current)) * 1000;
        const tRead = temperatureReader(rng, acc.temperature)(tC);
        const eaDraw = ea + drawRectangular(rng, 5);
        return rRead * arrheniusFactor(tRead, 25, eaDraw);
      },
      707,
    );
    within5Percent(gum?.u ?? 0, mc.sd);
  });
});

describe("sag-limited C (an estimate) = S·(V_nominal − V_floor)/R ÷ rated Ah", () => {
  const r = gumR(cases[0] as Case);
  if (!r) throw new Error("resistance uncertainty missing");
  const input = { resistance: r, cells: 4, ratedMah: 5000, nominalVPerCell: 3.7, floorVPerCell: 3.3 };

  it("closed form: relative uncertainty of a quotient equals R's (GUM 5.1.6)", () => {
    const out = sagLimitedCUncertainty(input);
    expect(out?.value).toBeCloseTo((4 * 0.4) / 0.0193 / 5, 10);
    expect((out?.u ?? 0) / (out?.value ?? 1)).toBeCloseTo(r.u / r.value, 12);
    expect(out?.note).toMatch(/definition/);
  });

  it("agrees with a Monte Carlo simulation (JCGM 101:2008), as relative uncertainties", () => {
    // Compared relative to the value: C = k/R is evaluated at the R a bench actually reads, which sits about
    // ρ·Δt/2 = 2.5 % below R(1 s) (the step happens after the last low sample). The GUM is linearised at that
    // reading, so u/C is the like-for-like quantity (JCGM 101:2008 clause 8 validates the GUM at the same estimate; from memory).
    const out = sagLimitedCUncertainty(input);
    const mc = monteCarlo(
      40000,
      (rng) => {
        const rRead = simulateStep(
          rng,
          twoLevel,
          1,
          voltageReader(rng, hobby.voltage),
          currentReader(rng, hobby.current),
        );
        return (4 * 0.4) / rRead / 5;
      },
      808,
    );
    within5Percent((out?.u ?? 0) / (out?.value ?? 1), mc.sd / mc.mean);
  });

  it("refuses a resistance of zero", () => {
    expect(sagLimitedCUncertainty({ ...input, resistance: { ...r, value: 0 } })).toBeNull();
  });
});
