import { describe, expect, it } from "vitest";
import { inferCells } from "@/lib/analysis/cells";

// Rested LiPo cell voltages: 4.20 V full (4.35 V high-voltage type), about 3.8 V storage — common practice.
describe("cells in series from the rest voltage", () => {
  it.each([
    [4.2, 1],
    [8.4, 2],
    [12.6, 3],
    [16.8, 4],
    [21.0, 5],
    [25.2, 6],
    [11.4, 3],
    [22.8, 6],
    [26.1, 6],
    [50.4, 12],
  ])("%f V at rest → %iS", (restVoltageV, cells) => {
    expect(inferCells(restVoltageV, 0).cells).toBe(cells);
  });

  it("reports the other counts that would fit so the caller can warn (29.4 V: 7S full or 8S at 3.68 V)", () => {
    const guess = inferCells(29.4, 0);
    expect(guess.cells).toBe(7);
    expect(guess.alternatives).toEqual([8]);
  });

  it("is not ambiguous for common 2–6S packs when full", () => {
    for (const n of [2, 3, 4, 5, 6]) expect(inferCells(4.2 * n, 0).alternatives).toEqual([]);
  });

  it("falls back to a wider window for a low pack, and flags it", () => {
    const guess = inferCells(3.4 * 3, 3.0 * 3);
    expect(guess.cells).toBe(3);
    expect(guess.wide).toBe(true);
  });

  it("gives null for nonsense", () => {
    expect(inferCells(0, 0).cells).toBeNull();
    expect(inferCells(2.0, 0).cells).toBeNull();
  });
});
