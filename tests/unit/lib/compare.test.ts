import { describe, expect, it } from "vitest";
import { markDifferences, suggestComparisons } from "@/lib/compare";
import { cycleSeries, sustainedC, type PublicResultRow } from "@/lib/pack-summary";

let id = 0;
const r = (o: Partial<PublicResultRow>): PublicResultRow => ({
  id: ++id,
  packId: 1,
  openCase: false,
  groupKey: "k",
  ratedCapacityMah: 2000,
  ambientTemperatureC: 22,
  packStartTemperatureC: 22,
  loadMode: "constant-current",
  loadCurrentA: 16,
  loadRateC: 8,
  cutoffVPerCell: 3.3,
  stopTemperatureC: 60,
  resistanceMethod: "dc-step",
  equipment: "load",
  sampleRateHz: 1,
  cyclesBeforeTest: 0,
  testedOn: null,
  publishedAt: null,
  capacityMah: 1900,
  energyWh: 28,
  dcResistanceMohm: 10,
  resistanceAt25CMohm: 10,
  holdVoltagePerCellV: 3.8,
  temperatureRiseC: 10,
  sagLimitedC: 40,
  labelRatio: 0.8,
  capacityRatio: 0.95,
  reachedCutoff: true,
  passedStopTemperature: false,
  ...o,
});

describe("differences between compared packs", () => {
  it("marks the best value and how far the others trail; missing values get no mark", () => {
    expect(markDifferences([40, null, 30], "higher")).toEqual([
      { best: true, worseBy: null },
      { best: false, worseBy: null },
      { best: false, worseBy: 0.25 },
    ]);
    expect(markDifferences([10, 12.5], "lower")[1]?.worseBy).toBeCloseTo(0.25, 9);
    expect(markDifferences([10, null], "lower")).toEqual([
      { best: false, worseBy: null },
      { best: false, worseBy: null },
    ]);
  });
});

describe("sustained C (definition on /methods)", () => {
  it("is the highest approved constant-current rate completed to cut-off without passing the stop temperature", () => {
    const rows = [
      r({ loadRateC: 5 }),
      r({ loadRateC: 10 }),
      r({ loadRateC: 20, passedStopTemperature: true }),
      r({ loadRateC: 25, reachedCutoff: false }),
      r({ loadRateC: 40, loadMode: "constant-power" }),
    ];
    expect(sustainedC(rows)?.rateC).toBe(10);
    // A reader's open case does not stop a result counting: it counts until moderators decide.
    expect(sustainedC([...rows, r({ loadRateC: 30, openCase: true })])?.rateC).toBe(30);
    expect(sustainedC([r({ passedStopTemperature: true })])).toBeNull();
  });
});

describe("cycling series", () => {
  it("needs two cycle counts in results alike except for age", () => {
    expect(cycleSeries([r({ cyclesBeforeTest: 0 }), r({ cyclesBeforeTest: 0 })])).toBeNull();
    const s = cycleSeries([
      r({ cyclesBeforeTest: 0, capacityMah: 2000 }),
      r({ cyclesBeforeTest: 100, capacityMah: 1900 }),
      r({ cyclesBeforeTest: 50, ambientTemperatureC: 8 }),
    ]);
    expect(s?.points.map((p) => p.cycles)).toEqual([0, 100]);
    // Straight line through (0, 100 %) and (100, 95 %) reaches 80 % at cycle 400 (arithmetic).
    expect(s?.trend?.cyclesTo80).toBeCloseTo(400, 6);
  });
});

describe("suggestComparisons", () => {
  const pack = (slug: string, cells: number, mah: number) => ({
    slug,
    makerName: `Maker ${slug}`,
    model: `M ${slug}`,
    cellsInSeries: cells,
    ratedCapacityMah: mah,
  });
  const packs = [
    pack("a", 4, 1300),
    pack("b", 4, 1300),
    pack("c", 4, 1300),
    pack("d", 6, 5000),
    pack("e", 6, 5000),
    pack("f", 3, 850),
    pack("g", 4, 1500),
  ];

  it("suggests the largest same-size class in each group, up to four packs, in slug order", () => {
    const out = suggestComparisons([{ key: "g1", label: "Group 1", packSlugs: ["c", "a", "d", "b", "e", "g"] }], packs);
    expect(out).toEqual([
      {
        group: { key: "g1", label: "Group 1" },
        cells: 4,
        capacityMah: 1300,
        packs: [
          { slug: "a", title: "Maker a M a" },
          { slug: "b", title: "Maker b M b" },
          { slug: "c", title: "Maker c M c" },
        ],
      },
    ]);
  });

  it("never repeats a size class across groups, skips groups with no pair, and stops at the limit", () => {
    const groups = [
      { key: "g1", label: "G1", packSlugs: ["a", "b", "d", "e"] },
      { key: "g2", label: "G2", packSlugs: ["a", "b", "f", "g"] },
      { key: "g3", label: "G3", packSlugs: ["d", "e"] },
      { key: "g4", label: "G4", packSlugs: ["a", "b", "c"] },
    ];
    const out = suggestComparisons(groups, packs, 2);
    expect(out.map((s) => [s.group.key, s.cells, s.capacityMah])).toEqual([
      ["g1", 4, 1300],
      ["g3", 6, 5000],
    ]);
  });

  it("ignores slugs missing from the catalogue and suggests nothing without two alike", () => {
    expect(suggestComparisons([{ key: "g", label: "G", packSlugs: ["a", "zzz", "f", "g"] }], packs)).toEqual([]);
  });
});
