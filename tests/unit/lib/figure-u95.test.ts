// U95 of every published figure, from a result's stored figures and its bench's accuracy (lib/figure-u95.ts).
// Checks: the closed forms of the GUM (JCGM 100:2008 4.3.7 rectangular u = a/√3, 5.1.2 propagation, 6.2.1
// U = k·u_c with k = 2) on a real analysis of a synthetic log; ratios by an exact divisor (GUM 5.1.2, c = 1/rated).
import { beforeAll, describe, expect, it } from "vitest";
import { analyseText, type Figures } from "@/lib/analysis";
import { ACCURACY_CLASSES, resolveAccuracy, type InstrumentAccuracy } from "@/lib/analysis/uncertainty";
import { figureU95, U95_FIGURES } from "@/lib/figure-u95";
import { generateLog, toCsv } from "../../helpers/ecm";

const pack = { cells: 4, ratedMah: 1300, labelledC: 50 };
let f: Figures;

beforeAll(async () => {
  const { rows } = generateLog({ seed: 7, cells: 4, capacityMah: 1300, loadCurrentA: 13, sampleIntervalS: 1 });
  const a = await analyseText(toCsv(rows), { cells: 4, ratedMah: 1300, labelledC: 50, cutoffVPerCell: 3.3 });
  f = a.figures;
});

/** Only a gain error on the current: capacity's U95 is then 2·Q·(p/100)/√3 and nothing else contributes. */
const gainOnly: InstrumentAccuracy = {
  voltage: { percentOfReading: 0, offsetV: 0, resolutionV: 0 },
  current: { percentOfReading: 1, offsetA: 0, resolutionA: 0 },
  temperature: { percentOfReading: 0, offsetC: 0, resolutionC: 0 },
  samplingIntervalS: 1,
  resistanceMethod: "dc-step",
};

describe("figureU95", () => {
  it("gives every headline figure a positive U95 under the default (assumed) accuracy", () => {
    const u = figureU95(f, resolveAccuracy(null).accuracy, pack);
    for (const name of U95_FIGURES) {
      const value = f[name === "sagLimitedC" ? "sagLimitedCEstimate" : name];
      if (value === null) expect(u[name], name).toBeNull();
      else expect(u[name], name).toBeGreaterThan(0);
    }
    expect(u.capacityMah).not.toBeNull();
    expect(u.dcResistanceMohm).not.toBeNull();
  });

  it("capacity: the closed form 2·Q·(1 %)/√3 plus the sampling edges I·Δt/√6 (GUM 4.3.7, 5.1.2)", () => {
    const u = figureU95(f, gainOnly, pack);
    const q = f.capacityMah ?? Number.NaN;
    const headline = f.discharges.find((d) => d.index === f.headlineDischarge);
    const edges = ((headline?.meanCurrentA ?? Number.NaN) * (f.sampleIntervalS ?? 1)) / 3.6 / Math.sqrt(6);
    const gain = (q * 0.01) / Math.sqrt(3);
    expect(u.capacityMah).toBeCloseTo(2 * Math.hypot(gain, edges), 6);
    // The ratio carries the same relative U95: the rated capacity is exact by definition.
    expect(u.capacityRatio).toBeCloseTo((u.capacityMah ?? Number.NaN) / pack.ratedMah, 9);
  });

  it("DC resistance: a current gain error alone gives 2·R·(1 %)/√3 plus the step timing; offsets cancel", () => {
    const withOffset: InstrumentAccuracy = { ...gainOnly, current: { ...gainOnly.current, offsetA: 5 } };
    const a = figureU95(f, gainOnly, pack).dcResistanceMohm;
    const b = figureU95(f, withOffset, pack).dcResistanceMohm;
    expect(a).not.toBeNull();
    expect(b).toBeCloseTo(a ?? Number.NaN, 9); // an offset cancels in ΔU/ΔI (same instrument, one second apart)
    expect(a).toBeGreaterThanOrEqual((2 * (f.dcResistanceMohm ?? 0) * 0.01) / Math.sqrt(3));
  });

  it("a better instrument gives a smaller ± on every figure it measures", () => {
    const wide = figureU95(f, ACCURACY_CLASSES["hobby-charger-readout"].accuracy, pack);
    const narrow = figureU95(f, ACCURACY_CLASSES["bench-meter-logger"].accuracy, pack);
    for (const name of ["capacityMah", "energyWh", "meanVoltagePerCellV", "dcResistanceMohm"] as const) {
      expect(narrow[name], name).toBeLessThan(wide[name] ?? 0);
    }
  });

  it("missing inputs give null, never a number made up", () => {
    const bare = { ...f, discharges: [], mainDischargeCurrentA: null, mainDischargeDurationS: null };
    const u = figureU95(bare, gainOnly, pack);
    expect(u.capacityMah).toBeNull();
    expect(u.energyWh).toBeNull();
    expect(u.sustainedCMeasured).toBeNull();
    expect(figureU95({ ...f, capacityMah: null }, gainOnly, pack).capacityMah).toBeNull();
  });
});
