import { describe, expect, it } from "vitest";
import {
  ACTIVATION_ENERGY_INTERFACE_KJ_PER_MOL,
  DEFAULT_ACTIVATION_ENERGY_KJ_PER_MOL,
  GAS_CONSTANT_J_PER_MOL_K,
  arrheniusFactor,
  resistanceAtTemperature,
} from "@/lib/analysis/arrhenius";

// Reference ratios below were computed outside this project with Python's math.exp,
// R = 8.314462618 J/(mol·K) (CODATA 2018) and the published activation energies:
//   17.1 kJ/mol — electrolyte conductivity, Ecker et al., J. Electrochem. Soc. 162 (2015) A1836;
//   50 kJ/mol  — interfacial Li-ion transfer, Yamada et al., J. Phys. Chem. C 113 (2009) 14528.
describe("Arrhenius temperature correction", () => {
  it("uses the CODATA 2018 molar gas constant", () => {
    expect(GAS_CONSTANT_J_PER_MOL_K).toBe(8.314462618);
  });

  it("defaults to Ecker et al. 2015's 17.1 kJ/mol and keeps Yamada et al. 2009's 50 kJ/mol for reference", () => {
    expect(DEFAULT_ACTIVATION_ENERGY_KJ_PER_MOL).toBe(17.1);
    expect(ACTIVATION_ENERGY_INTERFACE_KJ_PER_MOL).toBe(50);
  });

  it.each([
    [0, 1.8801353962888023],
    [10, 1.4411306603812428],
    [35, 0.7994318097345994],
    [45, 0.6481482355147559],
    [-10, 2.502949429883377],
  ])("R(%i °C)/R(25 °C) at 17.1 kJ/mol (Ecker et al. 2015) matches the Python reference", (tempC, ratio) => {
    expect(arrheniusFactor(25, tempC, 17.1)).toBeCloseTo(ratio, 12);
  });

  it.each([
    [0, 6.334649496012885],
    [10, 2.911018104143294],
    [35, 0.5196789920818907],
  ])("R(%i °C)/R(25 °C) at 50 kJ/mol (Yamada et al. 2009) matches the Python reference", (tempC, ratio) => {
    expect(arrheniusFactor(25, tempC, 50)).toBeCloseTo(ratio, 12);
  });

  it("at ≈50 kJ/mol a 10 K rise near room temperature about halves resistance (the 'doubles every 10 °C' rule of thumb, common practice)", () => {
    const ratio = arrheniusFactor(25, 35, 50);
    expect(1 / ratio).toBeGreaterThan(1.8);
    expect(1 / ratio).toBeLessThan(2.1);
  });

  it("corrects a cold reading down and a warm reading up to 25 °C", () => {
    expect(resistanceAtTemperature(10, 0)).toBeCloseTo(10 * 0.5318765882360915, 10);
    expect(resistanceAtTemperature(10, 45)).toBeCloseTo(10 * 1.5428569348889847, 10);
    expect(resistanceAtTemperature(10, 25)).toBe(10);
  });

  it("is its own inverse: there and back gives the start value", () => {
    const there = resistanceAtTemperature(7, 12, 40, 30);
    expect(resistanceAtTemperature(there, 40, 12, 30)).toBeCloseTo(7, 12);
  });

  it("gives NaN below absolute zero instead of a number", () => {
    expect(arrheniusFactor(25, -300)).toBeNaN();
  });
});
