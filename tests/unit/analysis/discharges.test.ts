import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { analyseText } from "@/lib/analysis";
import { generateLog, toCsv } from "../../helpers/ecm";

// Logs of several charge/discharge cycles from the equivalent-circuit generator, whose per-discharge
// delivered charge is exact for piecewise-constant current (closed form: I × t).

describe("a log of several discharges", async () => {
  const { rows, truth } = generateLog({
    seed: 6,
    cells: 3,
    capacityMah: 2200,
    cRate: 2,
    sampleIntervalS: 1,
    cycles: 3,
    fadePerCycle: 0.02,
    noise: { voltageV: 0.002, currentA: 0.005 },
  });
  const { figures: f } = await analyseText(toCsv(rows), { ratedMah: 2200, cutoffVPerCell: 3.3 });

  it("lists each discharge in log order with its own capacity and energy (within 0.5 % of the circuit)", () => {
    expect(f.discharges).toHaveLength(3);
    f.discharges.forEach((d, k) => {
      const t = truth.discharges[k];
      expect(d.index).toBe(k + 1);
      expect(Math.abs(d.capacityMah / (t?.deliveredMah ?? 1) - 1)).toBeLessThan(0.005);
      expect(Math.abs(d.energyWh / (t?.deliveredWh ?? 1) - 1)).toBeLessThan(0.005);
      expect(d.reachedCutoff).toBe(true);
      expect(d.meanCurrentA).toBeCloseTo(4.4, 2);
      expect(d.meanVoltageV).toBeCloseTo((d.energyWh * 1000) / d.capacityMah, 9);
      expect(d.startS).toBeCloseTo(t?.startS ?? 0, 6);
    });
    for (let k = 1; k < 3; k++)
      expect(f.discharges[k]?.startS).toBeGreaterThan(
        (f.discharges[k - 1]?.startS ?? 0) + (f.discharges[k - 1]?.durationS ?? 0),
      );
  });

  it("the headline figures describe the first discharge that reached the cut-off, never the sum, and say so", () => {
    expect(f.headlineDischarge).toBe(1);
    expect(f.capacityMah).toBe(f.discharges[0]?.capacityMah);
    expect(f.capacityRatio).toBeLessThan(1);
    expect(f.warningCodes).toContain("several-discharges");
  });

  it("gives a retention series of the one pack with a fitted line (2 % fade per cycle, closed form)", () => {
    const r = f.retention;
    expect(r?.points.map((p) => p.cycle)).toEqual([1, 2, 3]);
    // Capacity falls 2 % of the first cycle's per cycle; a CC discharge to the cut-off delivers a near-constant share of it.
    expect(r?.trend?.slopePerCycle).toBeLessThan(-0.015);
    expect(r?.trend?.slopePerCycle).toBeGreaterThan(-0.025);
    // 80 % lies about ten cycles past the third: far beyond half the observed span, so no projection.
    expect(r?.cyclesTo80).toBeNull();
    expect(r?.extrapolated).toBe(false);
  });

  it("a pause without charging stays within one discharge (the two-level pulses and the main load are one)", async () => {
    const one = generateLog({ cells: 3, capacityMah: 2200, cRate: 3, sampleIntervalS: 0.2, iecPrelude: true });
    const g = (await analyseText(toCsv(one.rows), { ratedMah: 2200 })).figures;
    expect(g.discharges).toHaveLength(1);
    expect(g.warningCodes).not.toContain("several-discharges");
    expect(g.capacityMah).toBeCloseTo(one.truth.deliveredMah, 0);
  });

  it("a run that never reaches the cut-off: the headline is the longest discharge", async () => {
    const two = generateLog({
      cells: 3,
      capacityMah: 2200,
      cRate: 2,
      sampleIntervalS: 1,
      cycles: 2,
      cutoffVPerCell: 3.75,
    });
    const g = (await analyseText(toCsv(two.rows), { cutoffVPerCell: 3.3 })).figures;
    expect(g.discharges.every((d) => !d.reachedCutoff)).toBe(true);
    const longest = g.discharges.reduce((a, b) => (b.durationS > a.durationS ? b : a));
    expect(g.headlineDischarge).toBe(longest.index);
    expect(g.warnings.join(" ")).toMatch(/none reached the cut-off; the longest/);
  });
});

describe("property: per-discharge capacities sum to the total delivered", () => {
  it("for 1–4 cycles at any rate, sampling and current noise (200 logs)", async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.integer({ min: 1, max: 4 }),
        fc.integer({ min: 1, max: 1e6 }),
        fc.constantFrom(1, 3, 8),
        fc.constantFrom(0.5, 1, 2),
        fc.boolean(),
        async (cycles, seed, cRate, sampleIntervalS, prelude) => {
          const { rows, truth } = generateLog({
            seed,
            cells: 2,
            capacityMah: 1000,
            cRate,
            sampleIntervalS,
            cycles,
            iecPrelude: prelude,
            chargeCurrentA: 1,
            chargeRestS: 20,
            noise: { currentA: 0.003, voltageV: 0.002 },
          });
          const f = (await analyseText(toCsv(rows, { decimals: { current: 4 } }))).figures;
          expect(f.discharges).toHaveLength(cycles);
          const sum = f.discharges.reduce((s, d) => s + d.capacityMah, 0);
          expect(Math.abs(sum / truth.deliveredMah - 1)).toBeLessThan(0.005);
        },
      ),
      { numRuns: 200, seed: 4242 },
    );
  });
});

describe("retention projections stay within the range the data supports", async () => {
  const { retentionSeries, projectTo80, retentionTrend } = await import("@/lib/analysis");

  it("interpolates when 80 % falls within the cycles measured, extrapolates at most half the span, else none (Sagline's rule)", () => {
    const line = (fadePerCycle: number, n: number) =>
      Array.from({ length: n }, (_, k) => ({ cycle: k + 1, capacityMah: 1000 * (1 - fadePerCycle * (k + 1)) }));
    expect(retentionSeries(line(0.05, 6), 1000)).toMatchObject({
      cyclesTo80: expect.closeTo(4, 9),
      extrapolated: false,
    });
    expect(retentionSeries(line(0.025, 6), 1000)).toMatchObject({
      cyclesTo80: expect.closeTo(8, 9),
      extrapolated: true,
    }); // 8 ≤ 6 + 0.5 × 5
    expect(retentionSeries(line(0.01, 6), 1000)).toMatchObject({ cyclesTo80: null, extrapolated: false });
    expect(retentionSeries(line(0.05, 2), 1000)?.projectionNote).toMatch(/at least 3 cycles/);
    const flat = retentionTrend(
      [
        { cycles: 0, capacityMah: 1000 },
        { cycles: 10, capacityMah: 1001 },
        { cycles: 20, capacityMah: 1002 },
      ],
      1000,
    );
    expect(projectTo80(flat, 0, 20, 3).cyclesTo80).toBeNull();
  });
});
