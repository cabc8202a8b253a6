import { describe, expect, it } from "vitest";
import { Stretch } from "@/lib/analysis/stretch";

const settings = { holdDelayS: 10, loadThresholdA: 0.02 };

function stretch(
  prev: { t: number; v: number; i?: number; temp?: number } | null,
  samples: [number, number, number, number?][],
) {
  const first = samples[0] as [number, number, number];
  const s = new Stretch(
    settings,
    prev ? { t: prev.t, v: prev.v, i: prev.i ?? 0, temp: prev.temp ?? Number.NaN, rest: true } : null,
    { t: first[0], v: first[1] },
  );
  for (const [t, v, i, temp] of samples) s.add(t, v, i, temp ?? Number.NaN, Number.POSITIVE_INFINITY);
  s.close();
  return s;
}

// Hand-made samples on straight lines, so every interpolated reading has a closed form.
describe("one load stretch", () => {
  const samples: [number, number, number, number][] = [];
  for (let k = 1; k <= 300; k++) samples.push([100 + k * 0.4, 16.5 - 0.002 * k, 10, 25 + k * 0.1]);
  const s = stretch({ t: 100, v: 16.8, temp: 25 }, samples);

  it("starts at the last rest sample and lasts to the last load sample; the current edge lies midway to the first load sample", () => {
    expect(s.onsetTimeS).toBe(100);
    expect(s.durationS).toBeCloseTo(120, 9);
    expect(s.edgeTimeS).toBeCloseTo(100.2, 12);
    expect(s.edgeIntervalS).toBeCloseTo(0.4, 12);
  });

  it("reads the hold voltage 10 s after the edge by linear interpolation between load samples", () => {
    // 110.2 s lies between k = 25 (110.0 s) and k = 26 (110.4 s): 16.5 − 0.002 × 25.5.
    expect(s.hold.voltageV).toBeCloseTo(16.5 - 0.002 * 25.5, 12);
    expect(s.hold.lateByS).toBe(0);
  });

  it("reads voltage and current 1 s after the edge for the step resistance, with the slope around it", () => {
    // 101.2 s lies at k = 3 exactly.
    expect(s.step?.voltageV).toBeCloseTo(16.5 - 0.002 * 3, 12);
    expect(s.step?.currentA).toBe(10);
    expect(s.step?.slopeVPerS).toBeCloseTo(-0.002 / 0.4, 9);
    expect(s.step?.windowSamples).toBe(3); // 100.8, 101.2 and 101.6 s within ±0.5 s
  });

  it("finds when the voltage first reached any threshold, interpolated, and the charge delivered by then", () => {
    // 16.0 V is reached at k = 250 (t = 200): 100 s after onset.
    expect(s.timeToVoltageS(16.0)).toBeCloseTo(100, 6);
    expect(s.timeToVoltageS(10)).toBeNaN();
  });

  it("keeps the start temperature, the current's mean and the voltage's fall at the end", () => {
    expect(s.startTemperatureC).toBe(25);
    expect(s.meanCurrentA).toBe(10);
    expect(s.currentRipple).toBe(0);
    expect(s.endFallVPerS).toBeCloseTo(0.002 / 0.4, 9);
  });

  it("uses a late first sample (within 1 s) for the step reading, and says how late", () => {
    const coarse = stretch({ t: 0, v: 4.2 }, [
      [1.8, 4.0, 5],
      [3.6, 3.99, 5],
      [12, 3.98, 5],
    ]);
    // Edge at 0.9 s, reading due at 1.9 s: the first load sample (1.8 s) comes before it, the second 1.7 s after.
    expect(coarse.step?.voltageV).toBeCloseTo(4.0 + ((3.99 - 4.0) * (1.9 - 1.8)) / 1.8, 12);
    const tooCoarse = stretch({ t: 0, v: 4.2 }, [
      [5, 4.0, 5],
      [10, 3.99, 5],
    ]);
    // Edge at 2.5 s, reading due at 3.5 s; the first load sample comes 1.5 s late: no reading.
    expect(tooCoarse.step?.valid).toBe(false);
  });

  it("a stretch with no rest before it has no step reading", () => {
    expect(
      stretch(null, [
        [0, 4, 5],
        [1, 3.99, 5],
        [2, 3.98, 5],
      ]).step,
    ).toBeNull();
  });

  it("measures current ripple from sample to sample, leaving out steps between levels", () => {
    const rippled: [number, number, number][] = [];
    for (let k = 1; k <= 200; k++) rippled.push([k * 0.1, 4, k % 2 === 0 ? 12 : 8]);
    // ±2 A alternating around 10 A: successive differences of 4 A, √(16 / 2) ÷ 10 = 0.283.
    expect(stretch({ t: 0, v: 4.2 }, rippled).currentRipple).toBeCloseTo(Math.sqrt(8) / 10, 2);
    const stepped: [number, number, number][] = [];
    for (let k = 1; k <= 200; k++) stepped.push([k * 0.1, 4, k <= 100 ? 1 : 5]);
    expect(stretch({ t: 0, v: 4.2 }, stepped).currentRipple).toBe(0);
  });
});
