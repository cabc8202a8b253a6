// The reader's units against NIST Special Publication 811 (2008), "Guide for the Use of the International
// System of Units (SI)", Appendix B.8 (factors for units listed alphabetically) and §B.9 / §4.2.1.1 for
// temperatures: 1 oz (avoirdupois) = 2.834 952 E+01 g; t/°C = (t/°F − 32)/1.8; 1 °F of difference = 1/1.8 °C.
import { describe, expect, it } from "vitest";
import {
  DEFAULT_UNITS,
  GRAMS_PER_OUNCE,
  celsiusToFahrenheit,
  convert,
  convertColumns,
  digitsFor,
  fahrenheitToCelsius,
  gramsToOunces,
  ouncesToGrams,
  parseUnitsParam,
  symbol,
  writeUnitsParam,
} from "@/lib/units";

const imperial = { temperature: "F", mass: "oz", basis: "pack" } as const;

describe("conversions (NIST SP 811)", () => {
  it("an ounce is 28.349 523 125 g (B.8: 2.834 952 E+01 g, exact by the 1959 definition of the pound)", () => {
    expect(GRAMS_PER_OUNCE).toBe(28.349523125);
    expect(gramsToOunces(28.349523125)).toBe(1);
    // A 4S 1300 mAh pack of 160 g: 5.644 oz.
    expect(gramsToOunces(160)).toBeCloseTo(5.6438, 4);
    expect(ouncesToGrams(gramsToOunces(183.5))).toBeCloseTo(183.5, 10);
  });
  it("t/°F = 1.8 t/°C + 32: freezing 32 °F, boiling 212 °F, −40 the same on both scales", () => {
    expect(celsiusToFahrenheit(0)).toBe(32);
    expect(celsiusToFahrenheit(100)).toBe(212);
    expect(celsiusToFahrenheit(-40)).toBe(-40);
    expect(celsiusToFahrenheit(25)).toBe(77);
    expect(fahrenheitToCelsius(celsiusToFahrenheit(37.4))).toBeCloseTo(37.4, 10);
  });
  it("a temperature rise converts without the offset (a difference of 1 °C is 1.8 °F)", () => {
    expect(convert("dtemp", 10, imperial)).toBe(18);
    expect(convert("temp", 10, imperial)).toBe(50);
  });
  it("per pack is per cell times the cells in series; without the cells it stays per cell", () => {
    expect(convert("v", 3.75, imperial, 4)).toBe(15);
    expect(convert("r", 2.5, imperial, 6)).toBe(15);
    expect(convert("v", 3.75, imperial)).toBe(3.75);
    expect(symbol("v", imperial, 4)).toBe("V");
    expect(symbol("v", imperial)).toBe("V/cell");
    expect(symbol("v", DEFAULT_UNITS, 4)).toBe("V/cell");
  });
  it("the defaults change nothing", () => {
    for (const q of ["temp", "dtemp", "mass", "v", "r"] as const) expect(convert(q, 12.3, DEFAULT_UNITS, 4)).toBe(12.3);
  });
  it("keeps sensible decimals: oz one more than g, pack volts one fewer than per cell", () => {
    expect(digitsFor("mass", 0, imperial)).toBe(1);
    expect(digitsFor("v", 3, imperial, 4)).toBe(2);
    expect(digitsFor("temp", 1, imperial)).toBe(1);
  });
});

describe("the units parameter", () => {
  it("reads any subset in any order over the defaults and writes only what differs", () => {
    expect(parseUnitsParam("oz,F")).toEqual({ temperature: "F", mass: "oz", basis: "cell" });
    expect(parseUnitsParam("pack")).toEqual({ ...DEFAULT_UNITS, basis: "pack" });
    expect(parseUnitsParam("kelvin,<script>")).toEqual(DEFAULT_UNITS);
    expect(parseUnitsParam(null)).toEqual(DEFAULT_UNITS);
    expect(writeUnitsParam(imperial)).toBe("F,oz,pack");
    expect(writeUnitsParam(DEFAULT_UNITS)).toBe("");
    expect(parseUnitsParam(writeUnitsParam(imperial))).toEqual(imperial);
  });
});

describe("CSV columns in the reader's units", () => {
  type Row = {
    ambientTemperatureC: number;
    temperatureRiseC: number | null;
    weightG: number;
    holdVoltagePerCellV: number;
    cells: number;
  };
  const columns = [
    { name: "ambientTemperatureC", value: (r: Row) => r.ambientTemperatureC },
    { name: "temperatureRiseC", value: (r: Row) => r.temperatureRiseC },
    { name: "weightG", value: (r: Row) => r.weightG },
    { name: "holdVoltagePerCellV", value: (r: Row) => r.holdVoltagePerCellV },
    { name: "cellsInSeries", value: (r: Row) => r.cells },
  ];
  const row: Row = {
    ambientTemperatureC: 20,
    temperatureRiseC: 15,
    weightG: 283.49523125,
    holdVoltagePerCellV: 3.8,
    cells: 6,
  };
  it("renames each converted column so its unit stays explicit, and converts its values", () => {
    const out = convertColumns<Row, (typeof columns)[number]>(columns, imperial, (r) => r.cells);
    expect(out.map((c) => c.name)).toEqual([
      "ambientTemperatureF",
      "temperatureRiseF",
      "weightOz",
      "holdVoltagePackV",
      "cellsInSeries",
    ]);
    expect(out.map((c) => c.value(row))).toEqual([68, 27, 10, 22.8, 6]);
    expect(out[1]?.value({ ...row, temperatureRiseC: null })).toBeNull();
  });
  it("leaves the SI columns alone for the defaults", () => {
    expect(convertColumns<Row, (typeof columns)[number]>(columns, DEFAULT_UNITS)).toEqual(columns);
  });
});
