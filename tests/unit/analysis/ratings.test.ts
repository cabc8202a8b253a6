import { describe, expect, it } from "vitest";
import {
  DEFAULT_RATING_STOP_TEMPERATURE_C,
  FLOOR_HELD_SHARE,
  MAX_CURRENT_SPREAD,
  MIN_DELIVERED_SHARE,
  analyseText,
} from "@/lib/analysis";
import { type EcmOptions, generateLog, toCsv } from "../../helpers/ecm";

// Equivalent-circuit logs (lib/synthetic) with known current, so the measured rating has a closed form:
// a constant-current discharge at n C draws n × rated Ah.
const PACK: EcmOptions = {
  seed: 9,
  cells: 4,
  capacityMah: 2000,
  cRate: 5,
  r0PerCellMohm: 3,
  r1PerCellMohm: 1,
  sampleIntervalS: 1,
  cutoffVPerCell: 3.3,
  ambientC: 22,
};

async function rated(
  ecm: EcmOptions,
  options: Parameters<typeof analyseText>[1] = {},
  dialect: Parameters<typeof toCsv>[1] = {},
) {
  const { rows } = generateLog({ ...PACK, ...ecm });
  return (await analyseText(toCsv(rows, dialect), { ratedMah: 2000, cutoffVPerCell: 3.3, labelledC: 20, ...options }))
    .figures;
}

describe("sustained C, measured from the run itself", () => {
  it("states its rule: 60 °C stop temperature (common practice), floor held to 90 % of the charge, current spread ≤ 25 %, at least half the rating", () => {
    expect([DEFAULT_RATING_STOP_TEMPERATURE_C, FLOOR_HELD_SHARE, MAX_CURRENT_SPREAD, MIN_DELIVERED_SHARE]).toEqual([
      60, 0.9, 0.25, 0.5,
    ]);
  });

  it("a 5C constant-current run to the cut-off under the stop temperature: 5C, the current actually drawn ÷ rated Ah", async () => {
    const f = await rated({});
    expect(f.sustainedCReason).toBeNull();
    expect(f.sustainedCMeasured).toBeCloseTo(5, 2);
    expect(f.sustainedCMeasured).toBeCloseTo((f.discharges[0]?.meanCurrentA ?? 0) / 2, 12);
    expect(f.sustainedLabelRatio).toBeCloseTo(5 / 20, 3);
    expect(f.sustainedCRule).toMatchObject({ floorVPerCell: 3.3, stopTemperatureC: 60 });
  });

  it("uses the current drawn, not the stated one: a load that ran 10 % low rates 4.5C", async () => {
    expect((await rated({ loadCurrentA: 9 })).sustainedCMeasured).toBeCloseTo(4.5, 2);
  });

  it("gives null and the reason when the run does not qualify", async () => {
    const cases: [string, Promise<Awaited<ReturnType<typeof rated>>>][] = [
      ["cutoff-not-reached", rated({ cutoffVPerCell: 3.7 })],
      ["no-rated-capacity", rated({}, { ratedMah: undefined })],
      ["no-temperature", rated({}, {}, { columns: ["time", "voltage", "current"] })],
      ["stop-temperature-reached", rated({}, { stopTemperatureC: 25 })],
      ["partial-discharge", rated({ startSoc: 0.4 })],
      [
        "fell-below-floor",
        rated({ r0PerCellMohm: 60, cutoffVPerCell: 3.0, thermalResistanceKPerWPerCell: 1 }, { cutoffVPerCell: 3.0 }),
      ],
      ["current-not-steady", rated({ rippleFraction: 0.6 })],
      [
        "cell-below-cutoff",
        rated(
          { cellOffsetsV: [-0.2, 0.2 / 3, 0.2 / 3, 0.2 / 3] },
          {},
          { columns: ["time", "voltage", "current", "temperature", "cells"] },
        ),
      ],
    ];
    for (const [reason, run] of cases) {
      const f = await run;
      expect(f.sustainedCReason, reason).toBe(reason);
      expect(f.sustainedCMeasured, reason).toBeNull();
    }
  });
});

describe("sag-limited C: an estimate, with its assumptions beside it", () => {
  it("reads R 10 s after the edge (more polarisation than at 1 s), so it estimates less than the 1 s formula would", async () => {
    const f = await rated({ sampleIntervalS: 0.2, tau1S: 20 });
    const a = f.sagLimitedCAssumptions;
    expect(a).toMatchObject({
      resistancePoint: "hold",
      resistanceAtS: 10,
      nominalVPerCell: 3.7,
      floorVPerCell: 3.3,
      indicative: false,
    });
    expect(a?.currentA).toBeCloseTo(10, 1);
    expect(a?.temperatureC).not.toBeNull();
    const oneSecond = (4 * 0.4) / ((f.dcResistanceMohm ?? 1) / 1000) / 2;
    expect(f.sagLimitedCEstimate).toBeLessThan(oneSecond);
    expect(f.sagLimitedCEstimate).toBeCloseTo((4 * 0.4) / ((a?.resistanceMohm ?? 1) / 1000) / 2, 9);
  });

  it("falls back to the 1 s reading, and says so, when the load is shorter than the hold delay", async () => {
    const f = await rated({ sampleIntervalS: 0.2 }, { holdDelayS: 5000 });
    expect(f.sagLimitedCAssumptions?.resistancePoint).toBe("step-1s");
    expect(f.sagLimitedCEstimate).toBeCloseTo((4 * 0.4) / ((f.dcResistanceMohm ?? 1) / 1000) / 2, 9);
  });
});
