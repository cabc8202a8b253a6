import { describe, expect, it } from "vitest";
import { benchAgreementSummary, type BenchComparison } from "@/lib/analysis/agreement/bench-summary";
import { scoreParticipants } from "@/lib/analysis/agreement/scores";
import { drawNormal, seededRng } from "@/lib/analysis/uncertainty/monte-carlo";

// The summary's rules are Sagline's own (bench-summary.ts): "runs high/low" when ≥ 3 packs, median z ≥ +1 (≤ −1)
// and ≥ 75 % of z on that side; "scatters" when median |z| > 2 without a side. |z| > 3 as in issue 16.
const cap = (packId: string, z: number | null): BenchComparison => ({ figure: "capacityMah", packId, z });
const res = (packId: string, z: number | null): BenchComparison => ({ figure: "dcResistanceMohm", packId, z });

describe("benchAgreementSummary", () => {
  it("counts, median |z| and the share with |z| > 3", () => {
    const s = benchAgreementSummary([
      cap("p1", 0.5),
      cap("p2", -1.5),
      res("p1", 3.5),
      res("p2", null),
      cap("p3", -0.2),
    ]);
    expect(s.resultsCompared).toBe(4);
    expect(s.packsCompared).toBe(3);
    expect(s.medianAbsZ).toBeCloseTo((0.5 + 1.5) / 2, 15); // |z| sorted 0.2, 0.5, 1.5, 3.5
    expect(s.shareAbsZOver3).toBeCloseTo(0.25, 15);
    expect(s.words).toMatch(/1 far from the other benches/);
  });

  it("capacity high across packs → check the current shunt's calibration", () => {
    const s = benchAgreementSummary([cap("p1", 2.1), cap("p2", 3.4), cap("p3", 1.2), cap("p4", 2.8), res("p1", 0.1)]);
    expect(s.figures.find((f) => f.figure === "capacityMah")?.tendency).toBe("runs-high");
    expect(s.suggestions).toHaveLength(1);
    expect(s.suggestions[0]?.words).toMatch(/current shunt/);
  });

  it("resistance high across packs → check leads, connectors and the timing of the step", () => {
    const s = benchAgreementSummary([res("p1", 1.5), res("p2", 2.5), res("p3", 1.1), res("p4", -0.3)]);
    expect(s.suggestions[0]).toMatchObject({ figure: "dcResistanceMohm", tendency: "runs-high" });
    expect(s.suggestions[0]?.words).toMatch(/leads and connectors/);
    expect(s.suggestions[0]?.words).toMatch(/1 s after the step/);
  });

  it("low readings, and scatter both ways, get their own suggestions", () => {
    expect(benchAgreementSummary([cap("p1", -1.4), cap("p2", -2), cap("p3", -1.1)]).suggestions[0]?.tendency).toBe(
      "runs-low",
    );
    const scatter = benchAgreementSummary([res("p1", 3), res("p2", -3), res("p3", 2.5), res("p4", -2.8)]);
    expect(scatter.suggestions[0]?.tendency).toBe("scatters");
    expect(scatter.suggestions[0]?.words).toMatch(/^DC resistance: readings scatter both ways/);
  });

  it("fewer than three packs: no suggestion, however far", () => {
    expect(benchAgreementSummary([cap("p1", 4), cap("p2", 5), cap("p2", 4.5)]).suggestions).toEqual([]);
  });

  it("a bench that agrees says so; a bench never compared says that", () => {
    expect(benchAgreementSummary([cap("p1", 0.3), cap("p2", -0.8), cap("p3", 1.1)]).words).toMatch(
      /^Agrees with other benches: 3 values on 3 packs/,
    );
    expect(benchAgreementSummary([cap("p1", null)])).toMatchObject({
      resultsCompared: 0,
      medianAbsZ: null,
      shareAbsZOver3: null,
    });
  });
});

describe("end to end: one of six benches reads capacity 4 % high (issue 16's demo case)", () => {
  it("its z run high on every pack and the summary points at the current calibration", () => {
    const rng = seededRng(16);
    const packs = ["p1", "p2", "p3", "p4", "p5"];
    const benches = ["a", "b", "c", "d", "e", "high"];
    const comparisons: Record<string, BenchComparison[]> = Object.fromEntries(benches.map((b) => [b, []]));
    for (const packId of packs) {
      const trueMah = 4700 + 60 * packs.indexOf(packId);
      // Benches differ by about 1 % (σ 48 mAh) around the truth; "high" reads 4 % above it.
      const participants = benches.map((benchId) => ({
        benchId,
        value: trueMah * (benchId === "high" ? 1.04 : 1) + drawNormal(rng, 48),
      }));
      for (const s of scoreParticipants(participants).scores)
        comparisons[s.benchId]?.push({ figure: "capacityMah", packId, z: s.z });
    }
    const high = benchAgreementSummary(comparisons.high ?? []);
    expect(high.figures[0]?.tendency).toBe("runs-high");
    expect(high.medianAbsZ).toBeGreaterThan(2);
    expect(high.suggestions[0]?.words).toMatch(/current shunt/);
    for (const b of ["a", "b", "c", "d", "e"])
      expect(benchAgreementSummary(comparisons[b] ?? []).suggestions).toEqual([]);
  });
});
