// A bench profile's accuracy columns → the uncertainty core's statement → resolveAccuracy: stated values are
// kept, blank ones are assumed from the stated default class and listed as assumptions (the result page shows
// them). The defaults themselves are Sagline's assumption from memory (accuracy-classes.ts says so).
import { describe, expect, it } from "vitest";
import { ACCURACY_CLASSES, DEFAULT_ACCURACY_CLASS, resolveAccuracy } from "@/lib/analysis/uncertainty";
import { NO_BENCH_ACCURACY, statedAccuracyOf } from "@/lib/bench-accuracy";

describe("statedAccuracyOf", () => {
  it("keeps what the bench states and leaves the rest to be assumed, naming each assumption", () => {
    const resolved = resolveAccuracy(
      statedAccuracyOf(
        { ...NO_BENCH_ACCURACY, currentAccuracyPct: 0.2, currentOffsetA: 0.005, samplingIntervalS: 0.5 },
        "dc-step",
      ),
    );
    expect(resolved.accuracy.current.percentOfReading).toBe(0.2);
    expect(resolved.accuracy.current.offsetA).toBe(0.005);
    expect(resolved.accuracy.samplingIntervalS).toBe(0.5);
    expect(resolved.accuracy.resistanceMethod).toBe("dc-step");
    const defaults = ACCURACY_CLASSES[DEFAULT_ACCURACY_CLASS].accuracy;
    expect(resolved.accuracy.voltage).toEqual(defaults.voltage);
    expect(resolved.accuracy.current.resolutionA).toBe(defaults.current.resolutionA);
    expect(resolved.assumptions.map((a) => a.field).sort()).toEqual(
      [
        "current.resolutionA",
        "temperature.offsetC",
        "temperature.percentOfReading",
        "temperature.resolutionC",
        "voltage.offsetV",
        "voltage.percentOfReading",
        "voltage.resolutionV",
      ].sort(),
    );
    expect(resolved.assumptions.every((a) => /from memory/.test(a.source))).toBe(true);
    expect(resolved.summary[1]).toMatch(/^Current ±\(0\.2 % of reading \+ 0\.005 A\).*partly assumed/);
  });

  it("without a bench profile assumes every value but the method card's resistance method", () => {
    const resolved = resolveAccuracy(statedAccuracyOf(null, "iec-61960-two-level"));
    expect(resolved.assumptions).toHaveLength(10);
    expect(resolved.accuracy.resistanceMethod).toBe("iec-61960-two-level");
    expect(resolved.summary[0]).toMatch(/\(assumed: /);
  });
});
