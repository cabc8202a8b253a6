// Plausibility flags: one crafted case per flag, plus a clean result that raises none.
import { describe, expect, it } from "vitest";
import { groupModifiedZ, plausibilityFlags, type PlausibilityInput } from "@/lib/analysis/plausibility";

function clean(): PlausibilityInput {
  return {
    figures: {
      capacityMah: 1280,
      capacityRatio: 1280 / 1300,
      labelRatio: 0.5,
      sagLimitedC: 50,
      minVoltagePerCellV: 3.3,
      startTemperatureC: 22,
      cells: 4,
      timeToStopTemperatureS: null,
    },
    method: { ambientTemperatureC: 21, cutoffVPerCell: 3.3 },
    pack: { cellsInSeries: 4, ratedCapacityMah: 1300 },
    group: {
      labelRatios: [0.45, 0.5, 0.55, 0.48, 0.52, 0.47],
      sagLimitedCs: [45, 50, 55, 48, 52, 47],
      capacityRatios: [0.95, 0.97, 0.99, 0.96, 0.98, 0.97],
    },
    duplicateLogResultIds: [],
    makerProposed: false,
    packProposed: false,
  };
}
const codes = (i: PlausibilityInput) => plausibilityFlags(i).map((f) => f.code);

describe("plausibility flags", () => {
  it("a clean, typical result raises no flag", () => {
    expect(plausibilityFlags(clean())).toEqual([]);
  });

  it("capacity-above-rated: 1450 mAh from a 1300 mAh pack is above 110 % of rated (common practice)", () => {
    const i = clean();
    i.figures.capacityMah = 1450;
    i.figures.capacityRatio = 1450 / 1300;
    i.group.capacityRatios = [];
    expect(codes(i)).toEqual(["capacity-above-rated"]);
    expect(plausibilityFlags(i)[0]?.message).toMatch(/112 % of the rated 1300 mAh/);
  });

  it("capacity at exactly 110 % is not flagged (common practice threshold, strictly above)", () => {
    const i = clean();
    i.figures.capacityMah = 1430;
    i.figures.capacityRatio = 1.1;
    i.group.capacityRatios = [];
    expect(codes(i)).toEqual([]);
  });

  it("label-ratio-outside-group: more than 2× the group median (common practice)", () => {
    const i = clean();
    i.figures.labelRatio = 1.2;
    i.group.labelRatios = [0.45, 0.5, 0.55]; // too few for a z-score, enough for the range check
    expect(codes(i)).toEqual(["label-ratio-outside-group"]);
  });

  it("sag-c-outside-group: below half the group median (common practice)", () => {
    const i = clean();
    i.figures.sagLimitedC = 20;
    expect(codes(i)).toEqual(["sag-c-outside-group"]);
  });

  it("group-outlier: modified z-score above 3.5 (Iglewicz & Hoaglin 1993) on capacity ratio", () => {
    const i = clean();
    i.figures.capacityMah = 1170;
    i.figures.capacityRatio = 0.9;
    const z = groupModifiedZ(0.9, i.group.capacityRatios);
    expect(z).not.toBeNull();
    expect(Math.abs(z ?? 0)).toBeGreaterThan(3.5);
    expect(codes(i)).toEqual(["group-outlier"]);
    expect(plausibilityFlags(i)[0]?.message).toMatch(/Iglewicz & Hoaglin 1993/);
  });

  it("group-outlier needs at least 5 approved values before scoring (modified z, Iglewicz & Hoaglin 1993)", () => {
    expect(groupModifiedZ(0.5, [0.95, 0.97, 0.99, 0.96])).toBeNull();
  });

  it("cutoff-mismatch: log minimum 0.2 V per cell below the stated cut-off (common practice tolerance 0.1 V)", () => {
    const i = clean();
    i.figures.minVoltagePerCellV = 3.1;
    expect(codes(i)).toEqual(["cutoff-mismatch"]);
  });

  it("cutoff-mismatch: log never reaches the cut-off and no stop temperature (common practice tolerance 0.15 V)", () => {
    const i = clean();
    i.figures.minVoltagePerCellV = 3.6;
    expect(codes(i)).toEqual(["cutoff-mismatch"]);
    i.figures.timeToStopTemperatureS = 300; // stopped on temperature: a high minimum is explained
    expect(codes(i)).toEqual([]);
  });

  it("temperature-mismatch: ambient and logged start more than 5 °C apart (issue 5)", () => {
    const i = clean();
    i.figures.startTemperatureC = 29;
    expect(codes(i)).toEqual(["temperature-mismatch"]);
    i.figures.startTemperatureC = 26; // 5 °C exactly is fine
    expect(codes(i)).toEqual([]);
  });

  it("cells-mismatch: the log's cell count disagrees with the pack", () => {
    const i = clean();
    i.figures.cells = 3;
    expect(codes(i)).toEqual(["cells-mismatch"]);
  });

  it("duplicate-log: the same content hash was already submitted (with the other result's id, for a link)", () => {
    const i = clean();
    i.duplicateLogResultIds = [17];
    expect(plausibilityFlags(i)).toEqual([
      { code: "duplicate-log", message: expect.stringMatching(/#17/), resultIds: [17] },
    ]);
  });

  it("proposed-catalogue: a new maker and pack are proposed", () => {
    const i = clean();
    i.makerProposed = true;
    i.packProposed = true;
    expect(plausibilityFlags(i)).toEqual([
      { code: "proposed-catalogue", message: expect.stringMatching(/a new maker and a new pack/) },
    ]);
  });

  it("missing figures raise nothing rather than guessing", () => {
    const i = clean();
    i.figures = {
      capacityMah: null,
      capacityRatio: null,
      labelRatio: null,
      sagLimitedC: null,
      minVoltagePerCellV: null,
      startTemperatureC: null,
      cells: null,
      timeToStopTemperatureS: null,
    };
    expect(codes(i)).toEqual([]);
  });
});
