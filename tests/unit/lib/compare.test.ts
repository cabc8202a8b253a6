import { describe, expect, it } from "vitest";
import { medianInterval } from "@/lib/analysis/uncertainty";
import { markDistinguished, suggestComparisons } from "@/lib/compare";
import { retentionSeries } from "@/lib/analysis";
import { cycleSeries, onePackSeries, sustainedC } from "@/lib/pack-summary";
import { publicResultRow as r } from "../../helpers/public-result-row";

describe("best on /compare only where packs really differ (95 % median intervals, order statistics)", () => {
  const six = (base: number) => [0, 1, 2, 3, 4, 5].map((k) => base + k * 0.1);
  it("marks the one pack whose interval lies wholly above every other's, and the others as behind", () => {
    // Six results each: the 95 % interval is the lowest to the highest (coverage 1 − 2/64 = 96.9 %).
    const out = markDistinguished([medianInterval(six(40)), null, medianInterval(six(30))], "higher");
    expect(out.marks).toEqual([
      { best: true, note: null },
      { best: false, note: null },
      { best: false, note: "behind" },
    ]);
    expect(out.note).toBeNull();
    expect(markDistinguished([medianInterval(six(10)), medianInterval(six(12))], "lower").marks[0]?.best).toBe(true);
  });

  it("crowns nobody when the intervals overlap, and says so", () => {
    const out = markDistinguished([medianInterval(six(8)), medianInterval(six(8.3))], "higher");
    expect(out.marks.every((m) => !m.best)).toBe(true);
    expect(out.note).toBe("Not distinguishable: the 95 % intervals of the medians overlap.");
  });

  it("crowns nobody with too few results for an interval, however far apart the medians are (four packs at 8C each)", () => {
    const one = (v: number) => medianInterval([v]);
    const out = markDistinguished([one(8), one(8), one(8), one(8)], "higher");
    expect(out.marks.some((m) => m.best)).toBe(false);
    expect(out.note).toMatch(/too few results/);
    expect(markDistinguished([medianInterval([50, 51]), medianInterval([10, 11])], "higher").note).toMatch(
      /too few results/,
    );
  });

  it("marks nothing with fewer than two packs holding results", () => {
    expect(markDistinguished([medianInterval(six(5)), null], "higher")).toEqual({
      marks: [
        { best: false, note: null },
        { best: false, note: null },
      ],
      note: null,
    });
  });
});

describe("sustained C (definition on /methods#sustained-c)", () => {
  it("is the highest MEASURED value among approved results, whatever rate the tester stated", () => {
    const rows = [
      r({ loadRateC: 5, sustainedCMeasured: 4.9 }),
      r({ loadRateC: 10, sustainedCMeasured: 9.7 }),
      r({ loadRateC: 20, sustainedCMeasured: null }), // did not qualify
    ];
    expect(sustainedC(rows)).toEqual({ rateC: 9.7, resultId: rows[1]?.id });
    expect(sustainedC([r({ sustainedCMeasured: null })])).toBeNull();
    // A reader's open case does not stop a result counting: it counts until moderators decide.
    expect(sustainedC([...rows, r({ loadRateC: 30, sustainedCMeasured: 29, openCase: true })])?.rateC).toBe(29);
  });
});

describe("one pack's ageing", () => {
  const s = (n: number) =>
    retentionSeries(
      Array.from({ length: n }, (_, i) => ({ cycle: i + 1, capacityMah: 2000 - 5 * i })),
      2000,
    );
  it("comes from the published result with the longest retention series", () => {
    const rows = [r({ retention: s(3) }), r({ retention: s(10) }), r({ retention: s(5) })];
    const one = onePackSeries(rows);
    expect(one?.resultId).toBe(rows[1]?.id);
    expect(one?.retention.points).toHaveLength(10);
    expect(one?.otherSeries).toBe(2);
    expect(onePackSeries([r({})])).toBeNull();
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
    // Straight line through (0, 100 %) and (100, 95 %) reaches 80 % at cycle 400 (arithmetic) — but two cycle
    // counts support no projection (at least 3 are needed, lib/analysis/cycles.ts).
    expect(s?.trend?.cyclesTo80).toBeCloseTo(400, 6);
    expect(s?.projection.cyclesTo80).toBeNull();
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
