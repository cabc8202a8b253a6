import { describe, expect, it } from "vitest";
import { Accumulator, SampleBatch } from "@/lib/analysis/accumulator";
import { dischargeDirection } from "@/lib/analysis/direction";

function acc(samples: [number, number, number][]): Accumulator {
  const a = new Accumulator({ holdDelayS: 10, stopTemperatureC: Number.POSITIVE_INFINITY, loadThresholdA: 0.02 });
  const b = new SampleBatch();
  b.reserve(samples.length);
  samples.forEach(([t, v, i], k) => {
    b.timeS[k] = t;
    b.voltageV[k] = v;
    b.currentA[k] = i;
    b.temperatureC[k] = Number.NaN;
    b.minCellVoltageV[k] = Number.POSITIVE_INFINITY;
  });
  a.pushBatch(b, samples.length);
  a.finish();
  return a;
}

// Physics: V = OCV − I·R for discharge current I, so voltage falls when discharge current rises.
describe("which sign of current is discharge, from the data", () => {
  const discharge = (sign: number): [number, number, number][] => [
    [0, 16.8, 0],
    [1, 16.8, 0],
    [2, 16.5, 10 * sign],
    [3, 16.45, 10 * sign],
    [4, 16.4, 10 * sign],
    [5, 16.6, 0],
    [6, 16.62, 0],
  ];

  it("positive when voltage falls as positive current starts", () => {
    expect(dischargeDirection(acc(discharge(1)))).toEqual({ sign: 1, clue: "steps" });
  });

  it("negative when voltage falls as negative current starts", () => {
    expect(dischargeDirection(acc(discharge(-1)))).toEqual({ sign: -1, clue: "steps" });
  });

  it("a charge with positive current means discharge is negative", () => {
    expect(
      dischargeDirection(
        acc([
          [0, 15, 0],
          [1, 15.3, 5],
          [2, 15.4, 5],
          [3, 15.5, 5],
        ]),
      ).sign,
    ).toBe(-1);
  });

  it("falls back to the voltage drift under load when the log never steps", () => {
    expect(
      dischargeDirection(
        acc([
          [0, 16.5, -10],
          [1, 16.4, -10],
          [2, 16.3, -10],
          [3, 16.2, -10],
        ]),
      ),
    ).toEqual({ sign: -1, clue: "drift" });
  });

  it("falls back to the direction that moved more charge when nothing else tells", () => {
    expect(
      dischargeDirection(
        acc([
          [0, 16.5, 3],
          [1, 16.5, 3],
          [2, 16.5, 3],
        ]),
      ),
    ).toEqual({ sign: 1, clue: "charge" });
  });
});
