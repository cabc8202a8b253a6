import { describe, expect, it } from "vitest";
import {
  TwoLevelDetector,
  matchesTwoLevelCurrents,
  sagLimitedC,
  sagLimitedCurrentA,
  twoLevelResistanceOhm,
} from "@/lib/analysis/resistance";

describe("DC resistance, IEC 61960-3 two-level formula R = (U1 − U2)/(I2 − I1)", () => {
  it("worked example: 5 Ah cell, 0.2 It = 1 A at 3.9500 V, 1 It = 5 A at 3.9300 V → 5 mΩ (IEC 61960-3 formula, hand-computed)", () => {
    expect(twoLevelResistanceOhm(3.95, 1, 3.93, 5) * 1000).toBeCloseTo(5, 10);
  });

  it("worked example: 4S 2200 mAh pack, 0.44 A at 16.400 V then 2.2 A at 16.330 V → 39.77 mΩ (hand-computed: 0.070 V / 1.76 A)", () => {
    expect(twoLevelResistanceOhm(16.4, 0.44, 16.33, 2.2) * 1000).toBeCloseTo(39.772727, 5);
  });

  it("is Ohm's law across a rest → load step (I1 = 0)", () => {
    expect(twoLevelResistanceOhm(16.8, 0, 16.5, 30)).toBeCloseTo(0.01, 12);
  });

  it("gives NaN, not Infinity, when the current does not change", () => {
    expect(twoLevelResistanceOhm(4, 1, 3.9, 1)).toBeNaN();
  });

  it("accepts currents within 0.1–0.3 It and 0.7–1.5 It of the rating (our tolerance around IEC's 0.2 It and 1 It)", () => {
    expect(matchesTwoLevelCurrents(1, 5, 5000)).toBe(true);
    expect(matchesTwoLevelCurrents(2.5, 10, 5000)).toBe(false);
  });
});

describe("two-level step detector", () => {
  function feed(samples: [number, number, number][]) {
    const d = new TwoLevelDetector(0.02, 0);
    let found = null;
    for (const [t, v, i] of samples) found = d.add(t, v, i, 25) ?? found;
    // The load stretch ends after the last sample: a reading still waiting keeps what it has.
    return d.close() ?? found;
  }

  it("reads U1/I1 at the end of a ≥5 s low step and U2/I2 1 s into the high step", () => {
    const samples: [number, number, number][] = [];
    for (let k = 1; k <= 100; k++) samples.push([k * 0.1, 3.95, 1]);
    for (let k = 101; k <= 115; k++) samples.push([k * 0.1, 3.93 - (k - 100) * 0.0001, 5]);
    const r = feed(samples);
    expect(r).not.toBeNull();
    expect(r?.u1V).toBe(3.95);
    expect(r?.i1A).toBe(1);
    // The edge lies between the last low (10.0 s) and first high (10.1 s) sample: taken at 10.05 s, so
    // U2 is interpolated 1 s later, at 11.05 s.
    expect(r?.stepT).toBeCloseTo(10.05, 9);
    expect(r?.edgeIntervalS).toBeCloseTo(0.1, 9);
    expect(r?.high.voltageV).toBeCloseTo(3.93 - 10.5 * 0.0001, 9);
    expect(r?.high.currentA).toBe(5);
  });

  it("ignores a low step shorter than 5 s", () => {
    const samples: [number, number, number][] = [];
    for (let k = 1; k <= 30; k++) samples.push([k * 0.1, 3.95, 1]);
    for (let k = 31; k <= 50; k++) samples.push([k * 0.1, 3.93, 5]);
    expect(feed(samples)).toBeNull();
  });

  it("ignores a ratio far from 5 (e.g. 0.2 It → 3 It)", () => {
    const samples: [number, number, number][] = [];
    for (let k = 1; k <= 100; k++) samples.push([k * 0.1, 3.95, 1]);
    for (let k = 101; k <= 120; k++) samples.push([k * 0.1, 3.8, 15]);
    expect(feed(samples)).toBeNull();
  });

  it("ignores a high step that ends before 1 s", () => {
    const samples: [number, number, number][] = [];
    for (let k = 1; k <= 100; k++) samples.push([k * 0.1, 3.95, 1]);
    for (let k = 101; k <= 105; k++) samples.push([k * 0.1, 3.93, 5]);
    for (let k = 106; k <= 120; k++) samples.push([k * 0.1, 3.94, 1]);
    expect(feed(samples)).toBeNull();
  });
});

describe("sag-limited C", () => {
  it("worked example by Ohm's law: 4S, 12 mΩ pack, 3.7 V nominal, 3.3 V floor → 133.3 A; ÷ 5 Ah → 26.67C (defaults are common practice)", () => {
    expect(sagLimitedCurrentA(0.012, 4, 3.7, 3.3)).toBeCloseTo(133.3333, 3);
    expect(sagLimitedC(0.012, 4, 5000, 3.7, 3.3)).toBeCloseTo(26.6667, 3);
  });

  it("does not depend on the cell count for the same resistance per cell", () => {
    expect(sagLimitedCurrentA(0.003, 1, 3.7, 3.3)).toBeCloseTo(sagLimitedCurrentA(0.018, 6, 3.7, 3.3), 10);
  });

  it("gives NaN for a zero or negative resistance or rating", () => {
    expect(sagLimitedC(0, 4, 5000, 3.7, 3.3)).toBeNaN();
    expect(sagLimitedC(0.01, 4, 0, 3.7, 3.3)).toBeNaN();
  });
});
