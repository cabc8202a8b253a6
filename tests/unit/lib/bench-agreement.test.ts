// Bench agreement over published results (lib/bench-agreement.ts): each bench's value per pack is the median of its
// results, the consensus is ISO 13528:2015 Algorithm A (Annex C.3, factors 1.483, 1.5 and 1.134), z = (x − x*)/s*
// (ISO 13528:2015 9.4, from three benches on) and the summary is benchAgreementSummary. Invented numbers.
import { describe, expect, it } from "vitest";
import { algorithmA } from "@/lib/analysis/agreement/algorithm-a";
import { benchAgreements, scoreNewResult, type AgreementRow } from "@/lib/bench-agreement";

// Five packs, five benches: 1, 2, 4 and 5 agree within a few tenths of a per cent, 3 reads capacity 4 % high.
// (With three or four benches Algorithm A's s* widens around the outlier and its z stays near 1.3: see the last test.)
const truth = [1000, 1300, 1500, 2200, 5000];
const wobble: Record<number, number[]> = {
  1: [0.999, 1.001, 0.998, 1.002, 1.0],
  2: [1.002, 0.998, 1.001, 0.999, 1.003],
  4: [1.0, 1.002, 0.999, 1.001, 0.998],
  5: [1.003, 0.999, 1.0, 0.998, 1.001],
  3: [1.04, 1.04, 1.04, 1.04, 1.04],
};
let id = 0;
const rows: AgreementRow[] = truth.flatMap((mah, p) =>
  [1, 2, 3, 4, 5].map((benchId) => ({
    resultId: ++id,
    benchId,
    packId: p,
    groupKey: "g",
    values: { capacityMah: mah * (wobble[benchId]?.[p] ?? 1) },
  })),
);

describe("benchAgreements", () => {
  const all = benchAgreements(rows);

  it("scores each bench against Algorithm A's consensus of the three benches' values on each pack", () => {
    const first = all.get(3)?.scores.find((s) => s.packId === 0);
    const consensus = algorithmA([999, 1002, 1040, 1000, 1003]);
    expect(first?.consensus).toBeCloseTo(consensus?.x ?? Number.NaN, 9);
    expect(first?.z).toBeCloseTo((1040 - (consensus?.x ?? 0)) / (consensus?.s ?? 1), 9);
    expect(first?.z).toBeGreaterThan(3);
    expect(first?.benches).toBe(5);
  });

  it("finds the bench that reads capacity high: |z| > 3 on every pack, and a shunt suggestion", () => {
    const high = all.get(3)?.summary;
    expect(high?.resultsCompared).toBe(5);
    expect(high?.shareAbsZOver3).toBe(1);
    expect(high?.suggestions.map((s) => [s.figure, s.tendency])).toEqual([["capacityMah", "runs-high"]]);
    expect(high?.suggestions[0]?.words).toMatch(/current shunt/);
    for (const ok of [1, 2, 4, 5]) {
      expect(all.get(ok)?.summary.shareAbsZOver3).toBe(0);
      expect(all.get(ok)?.summary.suggestions).toEqual([]);
    }
  });

  it("takes a bench's median when it tested a pack twice, and compares nothing across groups", () => {
    const twice = [...rows, { resultId: 99, benchId: 1, packId: 0, groupKey: "g", values: { capacityMah: 5000 } }];
    const again = benchAgreements(twice)
      .get(1)
      ?.scores.find((s) => s.packId === 0 && s.figure === "capacityMah");
    expect(again?.benchValue).toBe(median([999, 5000]));
    const apart = benchAgreements(rows.map((r) => ({ ...r, groupKey: `g${r.benchId}` })));
    expect(apart.get(3)?.summary.resultsCompared).toBe(0);
    expect(apart.get(3)?.summary.words).toMatch(/^Not compared yet/);
  });

  it("gives no z with two benches (z needs three) but an Eₙ when both state their U95", () => {
    const two = rows
      .filter((r) => r.benchId === 1 || r.benchId === 3)
      .map((r) => ({ ...r, u95: { capacityMah: (r.values.capacityMah ?? 0) * 0.01 } }));
    const s = benchAgreements(two).get(3)?.scores[0];
    expect(s?.z).toBeNull();
    // ISO 13528:2015 En against the other bench: (1040 − 999) / √(10.4² + 9.99²)
    expect(s?.en).toBeCloseTo(41 / Math.hypot(10.4, 9.99), 6);
  });
});

describe("scoreNewResult", () => {
  it("flags a new result whose capacity is far from the other benches' (|z| > 3), not one that agrees", () => {
    const published = rows.filter((r) => r.benchId !== 3);
    const high = { resultId: 501, benchId: 3, packId: 0, groupKey: "g", values: { capacityMah: 1040 } };
    const far = scoreNewResult(published, high).find((s) => s.figure === "capacityMah");
    expect(far?.benches).toBe(5);
    expect(far?.flag?.code).toBe("far-from-other-benches");
    expect(far?.flag?.label).toMatch(/^Capacity is \d+\.\d standard deviations above/);
    const fine = scoreNewResult(published, { ...high, values: { capacityMah: 1000.5 } })[0];
    expect(fine?.flag).toBeNull();
  });

  it("cannot flag 4 % with only three or four benches: Algorithm A's s* widens around the outlier (ISO 13528 C.3)", () => {
    const few = rows.filter((r) => r.benchId <= 3);
    const z = scoreNewResult(few, {
      resultId: 502,
      benchId: 3,
      packId: 0,
      groupKey: "g",
      values: { capacityMah: 1040 },
    })[0]?.z;
    expect(z).not.toBeNull();
    expect(Math.abs(z ?? 99)).toBeLessThan(3);
  });
});

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return ((s[Math.floor((s.length - 1) / 2)] ?? 0) + (s[Math.ceil((s.length - 1) / 2)] ?? 0)) / 2;
}
