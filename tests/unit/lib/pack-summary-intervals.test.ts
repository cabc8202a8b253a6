// A pack page's group rows carry each median's 95 % interval by order statistics (lib/pack-summary.ts →
// medianInterval). Checked against the binomial order-statistic formula: for n values the interval
// [x₍r₎, x₍n+1−r₎] covers the median with probability 1 − 2·P(B ≤ r − 1), B ~ Binomial(n, ½); n = 6, r = 1 gives
// 1 − 2/64 = 0.96875 ≥ 0.95, while n = 5 can reach only 1 − 2/32 = 0.9375 (too few: no interval is claimed).
import { describe, expect, it } from "vitest";
import { figuresByGroup, type PublicResultRow } from "@/lib/pack-summary";

function row(id: number, capacityMah: number): PublicResultRow {
  return {
    id,
    packId: 1,
    openCase: false,
    groupKey: "dc-step_a15-25_co3.3_r5-10_new",
    ratedCapacityMah: 1300,
    ambientTemperatureC: 22,
    packStartTemperatureC: 22,
    loadMode: "constant-current",
    loadCurrentA: 10.4,
    loadRateC: 8,
    cutoffVPerCell: 3.3,
    stopTemperatureC: 60,
    resistanceMethod: "dc-step",
    equipment: "Invented load",
    sampleRateHz: 1,
    cyclesBeforeTest: 0,
    testedOn: null,
    publishedAt: null,
    capacityMah,
    energyWh: null,
    dcResistanceMohm: null,
    resistanceAt25CMohm: null,
    holdVoltagePerCellV: null,
    temperatureRiseC: null,
    sagLimitedC: null,
    labelRatio: null,
    sustainedCMeasured: null,
    sustainedLabelRatio: null,
    capacityRatio: null,
    retention: null,
    reachedCutoff: true,
    passedStopTemperature: false,
  };
}

describe("figuresByGroup intervals", () => {
  it("six results: the interval is the smallest to the largest value, coverage 1 − 2/2⁶", () => {
    const values = [1250, 1262, 1241, 1270, 1255, 1248];
    const [g] = figuresByGroup(values.map((v, i) => row(i + 1, v)));
    const m = g?.intervals.capacityMah;
    expect(m?.meets).toBe(true);
    expect(m?.lower).toBe(1241);
    expect(m?.upper).toBe(1270);
    expect(m?.confidence).toBeCloseTo(1 - 2 / 64, 12);
    expect(g?.intervals.energyWh).toBeNull();
  });

  it("five results cannot reach 95 % (at most 1 − 2/2⁵ = 93.75 %): no interval is claimed", () => {
    const [g] = figuresByGroup([1250, 1262, 1241, 1270, 1255].map((v, i) => row(i + 1, v)));
    expect(g?.intervals.capacityMah?.meets ?? false).toBe(false);
  });
});
