import { describe, expect, it } from "vitest";
import { algorithmA } from "@/lib/analysis/agreement/algorithm-a";
import {
  agreementFlag,
  classifyEn,
  classifyZ,
  enNumber,
  scoreParticipants,
  zScore,
} from "@/lib/analysis/agreement/scores";

// ISO 13528:2015 clause 9: z = (x − x*)/σ_pt; Eₙ = (x − X)/√(U_x² + U_X²). Reading: |z| ≤ 2 satisfactory,
// 2 < |z| < 3 questionable, |z| ≥ 3 unsatisfactory; |Eₙ| ≤ 1 satisfactory (also ISO/IEC 17043).
describe("z and Eₙ against their definitions", () => {
  it("z = (x − x*)/σ_pt", () => {
    expect(zScore(4990, 4850, 50)).toBeCloseTo(2.8, 15);
    expect(zScore(4700, 4850, 50)).toBeCloseTo(-3, 15);
    expect(zScore(4700, 4850, 0)).toBeNull();
    expect(zScore(Number.NaN, 4850, 50)).toBeNull();
  });

  it("Eₙ = (x − X)/√(U_x² + U_X²)", () => {
    expect(enNumber(4990, 100, 4850, 40)).toBeCloseTo(140 / Math.sqrt(100 ** 2 + 40 ** 2), 15);
    expect(enNumber(19.3, 0.6, 18.1, 0.8)).toBeCloseTo(1.2, 12); // √(0.36 + 0.64) = 1
    expect(enNumber(1, 0, 1, 0)).toBeNull();
    expect(enNumber(1, -1, 1, 1)).toBeNull();
  });

  it("classes at their boundaries", () => {
    expect([2, 2.01, 2.99, 3, -3.5].map(classifyZ)).toEqual([
      "satisfactory",
      "questionable",
      "questionable",
      "unsatisfactory",
      "unsatisfactory",
    ]);
    expect([1, -1, 1.01].map(classifyEn)).toEqual(["satisfactory", "satisfactory", "unsatisfactory"]);
  });
});

describe("the moderators' flag: |z| > 3 (issue 16)", () => {
  it("raised above 3 in either direction, in words", () => {
    expect(agreementFlag(3.2, "Capacity")).toEqual({
      code: "far-from-other-benches",
      z: 3.2,
      label: "Capacity is 3.2 standard deviations above what other benches measured on this pack (|z| > 3).",
    });
    expect(agreementFlag(-4, "DC resistance")?.label).toMatch(/below/);
    expect(agreementFlag(3, "Capacity")).toBeNull();
    expect(agreementFlag(null, "Capacity")).toBeNull();
  });
});

describe("scoreParticipants", () => {
  const seven = [4790, 4820, 4835, 4850, 4860, 4880, 5100].map((value, k) => ({ benchId: `b${k}`, value, U95: 100 }));

  it("scores every bench against Algorithm A's consensus (σ_pt = s*)", () => {
    const r = scoreParticipants(seven);
    const c = algorithmA(seven.map((p) => p.value));
    expect(r.sigmaPt).toBeCloseTo(c?.s ?? 0, 12);
    const far = r.scores.find((s) => s.benchId === "b6");
    expect(far?.z).toBeCloseTo((5100 - 4851.5669) / 49.6008, 3); // ≈ 5.0, with the hand-computed x*, s*
    expect(far?.zClass).toBe("unsatisfactory");
    expect(far?.en).toBeCloseTo((5100 - (c?.x ?? 0)) / Math.sqrt(100 ** 2 + (2 * (c?.uX ?? 0)) ** 2), 12);
    expect(r.scores.find((s) => s.benchId === "b3")?.zClass).toBe("satisfactory");
  });

  it("uses a given σ_pt instead of s*", () => {
    const r = scoreParticipants(seven, { sigmaPt: 100 });
    expect(r.sigmaPt).toBe(100);
    expect(r.scores[0]?.z).toBeCloseTo((4790 - (r.consensus?.x ?? 0)) / 100, 12);
  });

  it("two benches: z is always ±0.62 with σ_pt = s* (so it is not computed); Eₙ still is", () => {
    for (const [a, b] of [
      [4800, 4810],
      [4800, 5800],
      [19.3, 25.1],
    ] as const) {
      const c = algorithmA([a, b]);
      expect(zScore(b, c?.x ?? 0, c?.s ?? 0)).toBeCloseTo(0.5 / (1.134 / Math.SQRT2), 12); // (d/2)/(1.134·d/√2)
    }
    const r = scoreParticipants([
      { benchId: "a", value: 4800, U95: 60 },
      { benchId: "b", value: 5000, U95: 60 },
    ]);
    expect(r.zMissing).toMatch(/at least three/);
    expect(r.scores.every((s) => s.z === null)).toBe(true);
    // Each against the other: Eₙ = (x − x_other)/√(U_x² + U_other²) = ±200/√7200.
    expect(r.scores[1]?.en).toBeCloseTo(200 / Math.sqrt(7200), 12);
    expect(r.scores[0]?.en).toBeCloseTo(-200 / Math.sqrt(7200), 12);
    expect(r.scores[1]?.enClass).toBe("unsatisfactory");
    // Without the other's uncertainty there is nothing to compare against.
    expect(
      scoreParticipants([
        { benchId: "a", value: 4800, U95: 60 },
        { benchId: "b", value: 5000 },
      ]).scores[0]?.en,
    ).toBeNull();
  });

  it("one bench or none: no consensus", () => {
    expect(scoreParticipants([{ benchId: "a", value: 4800 }]).consensus).toBeNull();
    expect(scoreParticipants([]).zMissing).toMatch(/Fewer than two/);
  });

  it("exact agreement on most values: no spread to score against", () => {
    const r = scoreParticipants([1, 1, 1, 2].map((value, k) => ({ benchId: `b${k}`, value })));
    expect(r.zMissing).toMatch(/no spread/);
    expect(r.scores.every((s) => s.z === null && s.en === null)).toBe(true);
  });
});
