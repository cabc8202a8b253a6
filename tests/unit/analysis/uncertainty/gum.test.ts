import { describe, expect, it } from "vitest";
import {
  COVERAGE_FACTOR,
  combine,
  rectangularU,
  relativeU95,
  resolutionU,
  scaleUncertainty,
  type Contribution,
} from "@/lib/analysis/uncertainty/gum";

const c = (source: Contribution["source"], u: number): Contribution => ({
  source,
  label: source,
  kind: "systematic",
  u,
});

describe("GUM building blocks (JCGM 100:2008)", () => {
  it("rectangular ± a: u = a/√3 (4.3.7), the standard deviation of a uniform distribution of half-width a", () => {
    expect(rectangularU(0.3)).toBeCloseTo(0.17320508075688773, 15);
    expect(rectangularU(-0.3)).toBeCloseTo(0.17320508075688773, 15);
  });

  it("resolution δ: u = δ/√12 (F.2.2.1)", () => {
    expect(resolutionU(0.01)).toBeCloseTo(0.002886751345948129, 15);
  });

  it("uncorrelated inputs add in quadrature (5.1.2) and U = k·u_c with k = 2 (6.2.1)", () => {
    const r = combine(10, [c("current-gain", 0.3), c("current-offset", -0.4), c("sampling-edges", 0)]);
    expect(COVERAGE_FACTOR).toBe(2);
    expect(r).toMatchObject({ value: 10, u: 0.5, U95: 1, k: 2 });
    expect(r?.contributions.map((x) => [x.source, x.u])).toEqual([
      ["current-offset", 0.4],
      ["current-gain", 0.3],
    ]);
    expect(relativeU95(r ?? { value: 0, u: 0, U95: 0, k: 2, contributions: [] })).toBeCloseTo(0.1, 15);
  });

  it("a non-finite value or contribution gives no uncertainty rather than a wrong one", () => {
    expect(combine(Number.NaN, [c("current-gain", 1)])).toBeNull();
    expect(combine(1, [c("current-gain", Number.POSITIVE_INFINITY)])).toBeNull();
  });

  it("scaling by an exact factor scales every contribution and keeps notes", () => {
    const r = combine(20, [c("voltage-gain", 0.6), c("voltage-offset", 0.8)], "first");
    const s = r ? scaleUncertainty(r, -0.25, "second") : null;
    expect(s?.value).toBe(-5);
    expect(s?.u).toBeCloseTo(0.25, 15);
    expect(s?.note).toBe("first second");
    expect(r && scaleUncertainty(r, Number.NaN)).toBeNull();
  });
});
