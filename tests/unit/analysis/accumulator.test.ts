import { describe, expect, it } from "vitest";
import { Accumulator, SampleBatch } from "@/lib/analysis/accumulator";

type Sample = [t: number, v: number, i: number, temp?: number];

function accumulate(samples: Sample[], batchSize = 7): Accumulator {
  const acc = new Accumulator({ holdDelayS: 10, stopTemperatureC: Number.POSITIVE_INFINITY, loadThresholdA: 0.02 });
  const batch = new SampleBatch();
  for (let k = 0; k < samples.length; k += batchSize) {
    const part = samples.slice(k, k + batchSize);
    batch.reserve(part.length);
    part.forEach(([t, v, i, temp], j) => {
      batch.timeS[j] = t;
      batch.voltageV[j] = v;
      batch.currentA[j] = i;
      batch.temperatureC[j] = temp ?? Number.NaN;
      batch.minCellVoltageV[j] = Number.POSITIVE_INFINITY;
    });
    acc.pushBatch(batch, part.length);
  }
  acc.finish();
  return acc;
}

function series(from: number, to: number, dt: number, f: (t: number) => [number, number]): Sample[] {
  const out: Sample[] = [];
  for (let k = 0; from + k * dt <= to + 1e-9; k++) {
    const t = from + k * dt;
    const [v, i] = f(t);
    out.push([t, v, i]);
  }
  return out;
}

describe("coulomb counting and energy (trapezoid rule; exact for piecewise-linear signals — numerical analysis, e.g. Burden & Faires)", () => {
  it("constant current I from rest for T seconds delivers I·T (closed form)", () => {
    const log = [
      ...series(0, 10, 1, () => [16.8, 0]),
      ...series(11, 3610, 1, () => [16.0, 5]),
      ...series(3611, 3620, 1, () => [16.4, 0]),
    ];
    const acc = accumulate(log);
    // Load samples from 11 s to 3610 s; the ramps in and out count half an interval each: 5 A × 3600 s.
    expect(acc.positive.chargeAs).toBeCloseTo(5 * 3600, 9);
    expect(acc.positive.energyWs).toBeCloseTo(16.0 * 5 * 3600, 6);
    expect(acc.negative.chargeAs).toBe(0);
  });

  it("a linear current ramp I = k·t gives k·T²/2", () => {
    const acc = accumulate(series(0, 100, 0.5, (t) => [12, 0.1 * t]));
    // The first sample (I = 0) is rest, and the ramp in from it is exact for a linear signal.
    expect(acc.positive.chargeAs).toBeCloseTo((0.1 * 100 * 100) / 2, 9);
  });

  it("constant current with voltage falling linearly gives I·T·(V0 + V1)/2", () => {
    const acc = accumulate([[0, 16.8, 0], ...series(1, 1001, 1, (t) => [16.5 - 0.001 * (t - 1), 10]), [1002, 16.0, 0]]);
    // Exact for the linear part plus the two half-interval ramps at the edges.
    const middle = (10 * 1000 * (16.5 + 15.5)) / 2;
    const edges = 0.5 * 10 * 16.5 + 0.5 * 10 * 15.5;
    expect(acc.positive.energyWs).toBeCloseTo(middle + edges, 6);
  });

  it("irregular sampling: the trapezoid stays exact for constant current", () => {
    const times = [0, 0.3, 1.1, 1.2, 4.7, 5, 9.9, 10.5, 17, 20];
    const acc = accumulate([[-1, 4.2, 0], ...times.map((t): Sample => [t, 4.0, 2]), [21, 4.1, 0]]);
    // 2 A over the 20 s between first and last load sample, plus half of each 1 s ramp.
    expect(acc.positive.chargeAs).toBeCloseTo(2 * 20 + 0.5 * 2 * 1 + 0.5 * 2 * 1, 9);
  });

  it("duplicate timestamps add nothing", () => {
    const log = series(0, 50, 1, (t) => [4, t > 5 ? 3 : 0]);
    const withDup = [...log.slice(0, 20), log[19] as Sample, ...log.slice(20)];
    expect(accumulate(withDup).positive.chargeAs).toBeCloseTo(accumulate(log).positive.chargeAs, 12);
    expect(accumulate(withDup).duplicateTimes).toBe(1);
  });

  it("a rest logged once a minute after the load does not stretch the discharge (edge ramp capped at one interval)", () => {
    const log: Sample[] = [[0, 4.2, 0], ...series(1, 100, 1, () => [4.0, 10]), [160, 4.1, 0], [220, 4.1, 0]];
    expect(accumulate(log).positive.chargeAs).toBeCloseTo(10 * 99 + 0.5 * 10 * 1 + 0.5 * 10 * 1, 9);
  });
});

describe("segmentation into rest and load stretches", () => {
  const log: Sample[] = [
    ...series(0, 9, 1, () => [16.8, 0]),
    ...series(10, 40, 1, () => [16.4, 5]), // short load
    ...series(41, 60, 1, () => [16.6, 0]),
    ...series(61, 400, 1, () => [16.0, 20]), // main discharge
    ...series(401, 420, 1, () => [16.3, 0]),
    ...series(421, 450, 1, () => [16.9, -4]), // a charge
    ...series(451, 460, 1, () => [16.8, 0]),
  ];
  const acc = accumulate(log);

  it("finds every stretch in each direction and keeps the longest as the main discharge", () => {
    expect(acc.positive.stretches).toBe(2);
    expect(acc.negative.stretches).toBe(1);
    expect(acc.positive.best?.onsetTimeS).toBe(60);
    expect(acc.positive.best?.durationS).toBe(340);
    expect(acc.positive.best?.chargeAs).toBeCloseTo(20 * 340, 9);
  });

  it("keeps peaks, minimum voltage under load and the highest rest voltage", () => {
    expect(acc.positive.peakCurrentA).toBe(20);
    expect(acc.positive.minVoltageV).toBe(16.0);
    expect(acc.maxRestVoltageV).toBe(16.8);
    expect(acc.negative.peakCurrentA).toBe(4);
  });

  it("sees voltage fall when positive current rises (the discharge-direction clue)", () => {
    expect(acc.stepScore).toBeLessThan(0);
    expect(acc.trendScore).toBe(0);
  });
});
