import { describe, expect, expectTypeOf, it } from "vitest";
import * as api from "@/lib/analysis";
import type { AnalyseOptions, Analysis, ColumnMapping, CurvePoint, Figures, MethodCardForKey } from "@/lib/analysis";

// The public surface other parts of Sagline (server, seed, CLI) are built against.
describe("public API of lib/analysis", () => {
  it("exports the agreed functions and class", () => {
    for (const name of [
      "analyseLog",
      "analyseText",
      "groupKey",
      "modifiedZScores",
      "summarise",
      "retentionTrend",
      "lttb",
      "LogError",
    ] as const) {
      expect(typeof api[name]).toBe("function");
    }
  });

  it("has the agreed types", () => {
    expectTypeOf<ColumnMapping["timeUnit"]>().toEqualTypeOf<"s" | "ms" | "min" | "h" | undefined>();
    expectTypeOf<AnalyseOptions["mapping"]>().toEqualTypeOf<ColumnMapping | undefined>();
    expectTypeOf<Figures["dcResistanceMethod"]>().toEqualTypeOf<"iec-61960-two-level" | "step" | null>();
    expectTypeOf<Figures["capacityMah"]>().toEqualTypeOf<number | null>();
    expectTypeOf<Figures["warnings"]>().toEqualTypeOf<string[]>();
    expectTypeOf<CurvePoint["temperatureC"]>().toEqualTypeOf<number | null>();
    expectTypeOf<Analysis["parameters"]["activationEnergyKJPerMol"]>().toEqualTypeOf<number>();
    expectTypeOf<MethodCardForKey["cyclesBeforeTest"]>().toEqualTypeOf<number>();
    expectTypeOf(api.analyseText).returns.toEqualTypeOf<Promise<Analysis>>();
    expectTypeOf(api.lttb<{ a: number }>).returns.toEqualTypeOf<{ a: number }[]>();
  });

  it("groupKey returns key, parts and a human label", () => {
    const g = api.groupKey({
      resistanceMethod: "iec-61960-two-level",
      ambientC: 22,
      cutoffVPerCell: 3.0,
      loadCurrentA: 15,
      ratedMah: 5000,
      cyclesBeforeTest: 0,
    });
    expect(g).toEqual({
      key: "iec-61960-two-level_a15-25_co3.0_r2-5_new",
      parts: { resistance: "iec-61960-two-level", ambient: "a15-25", cutoff: "co3.0", rate: "r2-5", age: "new" },
      label: "IEC 61960-3 two-level · 15–25 °C · 3.0 V cut-off · 2–5C · new",
    });
  });

  it("statistics helpers behave as agreed", () => {
    expect(api.modifiedZScores([2, 2, 2])).toEqual([0, 0, 0]);
    expect(api.summarise([3, 1, 2])).toEqual({ median: 2, n: 3, min: 1, max: 3, q1: 1.5, q3: 2.5 });
    expect(api.retentionTrend([], 1000)).toBeNull();
  });
});
