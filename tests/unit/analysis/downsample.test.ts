import { describe, expect, it } from "vitest";
import { lttb } from "@/lib/analysis/downsample";

type P = { x: number; y: number };
const X = (p: P) => p.x;
const Y = (p: P) => p.y;

describe("LTTB downsampling (Steinarsson 2013)", () => {
  it("hand-worked example from the thesis's algorithm: 6 points to 4 keeps (0,0) (2,0) (3,5) (5,0)", () => {
    // every = (6−2)/(4−2) = 2. Bucket 1 = points 1–2, next-bucket mean (3.5, 2.5): triangle areas
    // 0.5 and 2.5 → point 2. Bucket 2 = points 3–4, next = point 5: areas 7.5 and 0 → point 3.
    const points: P[] = [
      { x: 0, y: 0 },
      { x: 1, y: 1 },
      { x: 2, y: 0 },
      { x: 3, y: 5 },
      { x: 4, y: 0 },
      { x: 5, y: 0 },
    ];
    expect(lttb(points, 4, X, Y).map((p) => p.x)).toEqual([0, 2, 3, 5]);
  });

  it("returns exactly `threshold` points, first and last kept, in order", () => {
    const points: P[] = Array.from({ length: 10_000 }, (_, k) => ({ x: k, y: Math.sin(k / 100) + (k % 7) / 10 }));
    const out = lttb(points, 400, X, Y);
    expect(out).toHaveLength(400);
    expect(out[0]).toBe(points[0]);
    expect(out[399]).toBe(points[9999]);
    for (let k = 1; k < out.length; k++) expect((out[k] as P).x).toBeGreaterThan((out[k - 1] as P).x);
  });

  it("keeps a one-sample spike (the point of LTTB over plain decimation)", () => {
    const points: P[] = Array.from({ length: 1000 }, (_, k) => ({ x: k, y: k === 567 ? -50 : 0 }));
    expect(lttb(points, 20, X, Y).some((p) => p.y === -50)).toBe(true);
  });

  it("passes short input through and handles tiny thresholds", () => {
    const points: P[] = [
      { x: 0, y: 1 },
      { x: 1, y: 2 },
      { x: 2, y: 3 },
    ];
    expect(lttb(points, 10, X, Y)).toEqual(points);
    expect(lttb(points, 2, X, Y)).toEqual([points[0], points[2]]);
    expect(lttb(points, 0, X, Y)).toEqual([]);
    expect(lttb([], 5, X, Y)).toEqual([]);
  });
});
