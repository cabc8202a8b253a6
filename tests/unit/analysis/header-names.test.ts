import { describe, expect, it } from "vitest";
import { guessHeader } from "@/lib/analysis/header-names";

function g(raw: string) {
  const h = guessHeader(raw, 0);
  return { dimension: h.dimension, unit: h.unit?.symbol ?? null, cell: h.cellNumber, score: h.score };
}

describe("header cells with units in the forms testers write them", () => {
  it.each([
    ["Time (s)", "time", "s"],
    ["time [ms]", "time", "ms"],
    ["Elapsed time (min)", "time", "min"],
    ["time_ms", "time", "ms"],
    ["t/s", "time", "s"],
    ["Time in s", "time", "s"],
    ["TimeMs", "time", "ms"],
    ["Voltage (V)", "voltage", "V"],
    ["Voltage (mV)", "voltage", "mV"],
    ["voltage_mv", "voltage", "mV"],
    ["U [mV]", "voltage", "mV"],
    ["U/V", "voltage", "V"],
    ["Pack voltage", "voltage", null],
    ["mV", "voltage", "mV"],
    ["Current (A)", "current", "A"],
    ["Current(mA)", "current", "mA"],
    ["I/mA", "current", "mA"],
    ["current_a", "current", "A"],
    ["Temperature (°C)", "temperature", "°C"],
    ["Temp °C", "temperature", "°C"],
    ["temp_c", "temperature", "°C"],
    ["T/°C", "temperature", "°C"],
    ["T (°C)", "temperature", "°C"],
    ["Temp(degC)", "temperature", "°C"],
    ["Pack temp (°F)", "temperature", "°F"],
    ["Temp (℃)", "temperature", "°C"],
  ])("%j → %s in %s", (raw, dimension, unit) => {
    const h = g(raw);
    expect(h.dimension).toBe(dimension);
    expect(h.unit).toBe(unit);
  });

  it.each(["Cell 1 (V)", "cell1", "Cell_1 [mV]", "V1", "vcell1", "Cell1/V"])("%j is the voltage of cell 1", (raw) => {
    expect(g(raw)).toMatchObject({ dimension: "voltage", cell: 1 });
  });

  it.each([
    "Capacity (mAh)",
    "Energy (Wh)",
    "Power (W)",
    "Mode",
    "Cycle",
    "Ambient temp (°C)",
    "Input voltage (V)",
    "Charger temp",
    "Resistance (mOhm)",
    "",
  ])("%j is not a pack measurement and is ignored", (raw) => {
    expect(g(raw).dimension).toBeNull();
  });

  it("reads a cell's temperature probe as temperature, not as a cell voltage", () => {
    expect(g("Cell 1 temp")).toMatchObject({ dimension: "temperature", cell: null });
  });

  it("prefers a plain time column over a step time", () => {
    expect(g("Time(s)").score).toBeGreaterThan(g("StepTime(s)").score);
  });

  it("reads a BOM and quotes off the first header", () => {
    expect(g('\uFEFF"Time (s)"')).toMatchObject({ dimension: "time", unit: "s" });
  });
});
