import { describe, expect, it } from "vitest";
import { RESISTANCE_METHODS } from "@/lib/analysis/group-key";
import {
  ACCURACY_RESISTANCE_METHODS,
  currentChannel,
  instrumentAccuracySchema,
  statedAccuracySchema,
  temperatureChannel,
  voltageChannel,
} from "@/lib/analysis/uncertainty/accuracy";
import {
  ACCURACY_CLASSES,
  ACCURACY_CLASS_KEYS,
  DEFAULT_ACCURACY_CLASS,
  resolveAccuracy,
} from "@/lib/analysis/uncertainty/accuracy-classes";

const full = {
  voltage: { percentOfReading: 0.05, offsetV: 0.003, resolutionV: 0.001 },
  current: { percentOfReading: 0.3, offsetA: 0.01, resolutionA: 0.001 },
  temperature: { percentOfReading: 0, offsetC: 1, resolutionC: 0.1 },
  samplingIntervalS: 0.5,
  resistanceMethod: "iec-61960-two-level" as const,
};

describe("instrument accuracy schema (zod, browser-safe)", () => {
  it("accepts a complete statement", () => {
    expect(instrumentAccuracySchema.parse(full)).toEqual(full);
  });

  it.each([
    [{ ...full, voltage: { ...full.voltage, percentOfReading: -1 } }, "Voltage accuracy cannot be negative."],
    [
      { ...full, current: { ...full.current, percentOfReading: 12 } },
      "Current accuracy must be at most 10 % of reading.",
    ],
    [
      { ...full, current: { ...full.current, offsetA: Number.POSITIVE_INFINITY } },
      "Current offset must be a number (A).",
    ],
    [{ ...full, samplingIntervalS: 0 }, "Sampling interval must be above 0 s."],
    [{ ...full, resistanceMethod: "guess" }, "Choose how resistance is measured."],
  ])("refuses bad input with a clear message (%#)", (input, message) => {
    const r = instrumentAccuracySchema.safeParse(input);
    expect(r.success).toBe(false);
    expect(r.error?.issues.map((i) => i.message)).toContain(message);
  });

  it("offers the same resistance methods as the like-for-like key", () => {
    expect([...ACCURACY_RESISTANCE_METHODS].sort()).toEqual(Object.keys(RESISTANCE_METHODS).sort());
  });

  it("a stated accuracy may leave anything out", () => {
    expect(statedAccuracySchema.parse({})).toEqual({});
    expect(statedAccuracySchema.parse({ current: { percentOfReading: 1 }, voltage: null }).current).toEqual({
      percentOfReading: 1,
    });
  });
});

describe("channels as standard uncertainties", () => {
  it("± limits are rectangular, u = a/√3 (JCGM 100:2008 4.3.7); resolution δ gives δ/√12 (GUM F.2.2.1)", () => {
    const v = voltageChannel(full.voltage);
    expect(v.gainRelU).toBeCloseTo(0.0005 / Math.sqrt(3), 15);
    expect(v.offsetU).toBeCloseTo(0.003 / Math.sqrt(3), 15);
    expect(v.resolutionU).toBeCloseTo(0.001 / Math.sqrt(12), 15);
    expect(currentChannel(full.current).gainRelU).toBeCloseTo(0.003 / Math.sqrt(3), 15);
    expect(temperatureChannel(full.temperature).offsetU).toBeCloseTo(1 / Math.sqrt(3), 15);
  });
});

describe("default classes of instrument (values from memory, common practice)", () => {
  it.each(ACCURACY_CLASS_KEYS.map((k) => [k]))("%s passes the schema and says where its values come from", (key) => {
    const cls = ACCURACY_CLASSES[key];
    expect(instrumentAccuracySchema.parse(cls.accuracy)).toEqual(cls.accuracy);
    expect(cls.source).toMatch(/from memory/);
    expect(cls.source).toMatch(/common practice/);
    expect(cls.key).toBe(key);
  });

  it("the default is the widest class, so an assumed ± is never the smallest on offer", () => {
    const d = ACCURACY_CLASSES[DEFAULT_ACCURACY_CLASS].accuracy;
    for (const key of ACCURACY_CLASS_KEYS) {
      const a = ACCURACY_CLASSES[key].accuracy;
      expect(d.voltage.percentOfReading).toBeGreaterThanOrEqual(a.voltage.percentOfReading);
      expect(d.voltage.offsetV).toBeGreaterThanOrEqual(a.voltage.offsetV);
      expect(d.current.percentOfReading).toBeGreaterThanOrEqual(a.current.percentOfReading);
      expect(d.current.offsetA).toBeGreaterThanOrEqual(a.current.offsetA);
      expect(d.temperature.offsetC).toBeGreaterThanOrEqual(a.temperature.offsetC);
    }
  });
});

describe("resolveAccuracy: stated values win, missing ones are assumed and listed in words", () => {
  it("nothing stated: every value comes from the default class and is listed", () => {
    const r = resolveAccuracy(null);
    expect(r.accuracy).toEqual(ACCURACY_CLASSES[DEFAULT_ACCURACY_CLASS].accuracy);
    expect(r.assumptions).toHaveLength(11);
    expect(r.assumptions.every((a) => a.source === ACCURACY_CLASSES[DEFAULT_ACCURACY_CLASS].source)).toBe(true);
    expect(r.assumptions.find((a) => a.field === "current.offsetA")?.words).toBe(
      "Current offset 0.05 A assumed for a typical hobby charger or analyser read-out.",
    );
    expect(r.summary[1]).toBe(
      "Current ±(2 % of reading + 0.05 A), resolution 0.01 A (assumed: typical hobby charger or analyser read-out)",
    );
  });

  it("everything stated: no assumption", () => {
    const r = resolveAccuracy(full, "bench-meter-logger");
    expect(r.accuracy).toEqual(full);
    expect(r.assumptions).toEqual([]);
    expect(r.summary[0]).toBe("Voltage ±(0.05 % of reading + 0.003 V), resolution 0.001 V");
  });

  it("partly stated: only the gaps are filled, from the class asked for", () => {
    const r = resolveAccuracy({ current: { percentOfReading: 0.4 }, samplingIntervalS: 2 }, "electronic-load-logger");
    expect(r.accuracy.current).toEqual({ percentOfReading: 0.4, offsetA: 0.02, resolutionA: 0.001 });
    expect(r.accuracy.samplingIntervalS).toBe(2);
    expect(r.assumptions.map((a) => a.field)).not.toContain("current.percentOfReading");
    expect(r.assumptions.map((a) => a.field)).toContain("current.offsetA");
    expect(r.summary[1]).toMatch(/partly assumed: programmable electronic load/);
    expect(r.summary[3]).toBe("Sampling interval 2 s");
  });

  it("a stated zero is a statement, not a gap", () => {
    const r = resolveAccuracy({ temperature: { percentOfReading: 0, offsetC: 0.5, resolutionC: 0.1 } });
    expect(r.accuracy.temperature).toEqual({ percentOfReading: 0, offsetC: 0.5, resolutionC: 0.1 });
    expect(r.assumptions.some((a) => a.field.startsWith("temperature."))).toBe(false);
  });
});
