import { describe, expect, it } from "vitest";
import { Stretch } from "@/lib/analysis/stretch";

const settings = { holdDelayS: 10, stopTemperatureC: 40, loadThresholdA: 0.02 };

function stretch(prev: { t: number; v: number; i?: number; temp?: number } | null, samples: [number, number, number, number?][]) {
  const first = samples[0] as [number, number, number];
  const s = new Stretch(settings, prev ? { t: prev.t, v: prev.v, i: prev.i ?? 0, temp: prev.temp ?? Number.NaN, rest: true } : null, { t: first[0], v: first[1] });
  for (const [t, v, i, temp] of samples) {
    s.add(t, v, i, temp ?? Number.NaN, Number.POSITIVE_INFINITY);
    if (temp !== undefined) s.watchTemperature(t, temp);
  }
  return s;
}

describe("one load stretch", () => {
  const samples: [number, number, number, number][] = [];
  for (let k = 1; k <= 300; k++) samples.push([100 + k * 0.4, 16.5 - 0.002 * k, 10, 25 + k * 0.1]);
  const s = stretch({ t: 100, v: 16.8, temp: 25 }, samples);

  it("starts at the last rest sample and lasts to the last load sample", () => {
    expect(s.onsetTimeS).toBe(100);
    expect(s.durationS).toBeCloseTo(120, 9);
  });

  it("reads the hold voltage 10 s in by linear interpolation between samples", () => {
    // 10 s after onset is sample k = 25 exactly: 16.5 − 0.05.
    expect(s.holdVoltageV).toBeCloseTo(16.45, 12);
  });

  it("reads voltage and current 1 s after the step for the step resistance", () => {
    // 1 s lies between k = 2 (0.8 s) and k = 3 (1.2 s).
    expect(s.stepVoltageV).toBeCloseTo(16.5 - 0.002 * 2.5, 12);
    expect(s.stepCurrentA).toBe(10);
    expect(s.stepSampledLate).toBe(false);
  });

  it("finds when the voltage first reached any threshold, interpolated", () => {
    // 16.0 V is reached at k = 250 (t = 200): 100 s after onset.
    expect(s.timeToVoltageS(16.0)).toBeCloseTo(100, 6);
    expect(s.timeToVoltageS(10)).toBeNaN();
  });

  it("follows temperature: start, peak and the first time at the stop temperature", () => {
    expect(s.startTemperatureC).toBe(25);
    expect(s.peakTemperatureC).toBeCloseTo(55, 9);
    // 40 °C at k = 150 (t = 160): 60 s after onset.
    expect(s.stopTemperatureTimeS - s.onsetTimeS).toBeCloseTo(60, 6);
  });

  it("uses a late first sample (within 1 s) for the step reading, and flags it", () => {
    const coarse = stretch({ t: 0, v: 4.2 }, [[1.8, 4.0, 5], [3.6, 3.99, 5], [12, 3.98, 5]]);
    expect(coarse.stepVoltageV).toBe(4.0);
    expect(coarse.stepSampledLate).toBe(true);
    const tooCoarse = stretch({ t: 0, v: 4.2 }, [[5, 4.0, 5], [10, 3.99, 5]]);
    expect(tooCoarse.stepVoltageV).toBeNaN();
  });

  it("a stretch with no rest before it has no step reading", () => {
    expect(stretch(null, [[0, 4, 5], [1, 3.99, 5], [2, 3.98, 5]]).stepVoltageV).toBeNaN();
  });
});
