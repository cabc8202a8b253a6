import * as ss from "simple-statistics";
import { describe, expect, it } from "vitest";
import { END_OF_LIFE_RETAINED, retentionTrend } from "@/lib/analysis/cycles";

describe("capacity retained over cycles, least-squares line (checked against simple-statistics)", () => {
  const points = [
    { cycles: 0, capacityMah: 5100 },
    { cycles: 25, capacityMah: 5020 },
    { cycles: 60, capacityMah: 4930 },
    { cycles: 110, capacityMah: 4790 },
    { cycles: 150, capacityMah: 4700 },
  ];

  it("slope, intercept and r² equal ss.linearRegression / ss.rSquared on retained fractions", () => {
    const xy = points.map((p) => [p.cycles, p.capacityMah / 5000]);
    const line = ss.linearRegression(xy);
    const r2 = ss.rSquared(xy, ss.linearRegressionLine(line));
    const trend = retentionTrend(points, 5000);
    expect(trend?.slopePerCycle).toBeCloseTo(line.m, 12);
    expect(trend?.intercept).toBeCloseTo(line.b, 12);
    expect(trend?.r2).toBeCloseTo(r2, 12);
  });

  it("projects the cycle count where the line crosses 80 % (end-of-life mark, common practice)", () => {
    expect(END_OF_LIFE_RETAINED).toBe(0.8);
    const trend = retentionTrend(points, 5000);
    const line = ss.linearRegression(points.map((p) => [p.cycles, p.capacityMah / 5000]));
    expect(trend?.cyclesTo80).toBeCloseTo((0.8 - line.b) / line.m, 9);
  });

  it("closed form: a pack losing exactly 0.1 % of rating per cycle from 100 % reaches 80 % at cycle 200", () => {
    const exact = [0, 50, 100].map((c) => ({ cycles: c, capacityMah: 2000 * (1 - 0.001 * c) }));
    const trend = retentionTrend(exact, 2000);
    expect(trend?.slopePerCycle).toBeCloseTo(-0.001, 12);
    expect(trend?.cyclesTo80).toBeCloseTo(200, 9);
    expect(trend?.r2).toBeCloseTo(1, 12);
  });

  it("gives no projection when capacity does not fall, and null with too little data", () => {
    expect(
      retentionTrend(
        [
          { cycles: 0, capacityMah: 1000 },
          { cycles: 10, capacityMah: 1010 },
        ],
        1000,
      )?.cyclesTo80,
    ).toBeNull();
    expect(retentionTrend([{ cycles: 0, capacityMah: 1000 }], 1000)).toBeNull();
    expect(
      retentionTrend(
        [
          { cycles: 5, capacityMah: 1000 },
          { cycles: 5, capacityMah: 990 },
        ],
        1000,
      ),
    ).toBeNull();
    expect(
      retentionTrend(
        [
          { cycles: 0, capacityMah: 1000 },
          { cycles: 10, capacityMah: 990 },
        ],
        0,
      ),
    ).toBeNull();
  });

  it("r² is null with two points (a line through two points always fits)", () => {
    expect(
      retentionTrend(
        [
          { cycles: 0, capacityMah: 1000 },
          { cycles: 10, capacityMah: 990 },
        ],
        1000,
      )?.r2,
    ).toBeNull();
  });
});
