// The curve a pack page, /compare and the curves chart draw for a result: its headline discharge only, with
// capacity counted from that discharge's start. Checked on a log of three cycles from the equivalent-circuit
// generator (invented pack), whose per-discharge charge the generator knows exactly.
import { describe, expect, it } from "vitest";
import { analyseText } from "@/lib/analysis";
import { headlineCurve, prepareCurve } from "@/lib/curves";
import { generateLog, toCsv } from "@/lib/synthetic/equivalent-circuit";

async function analysed(cycles: number, timeOffsetS = 0) {
  const { rows, truth } = generateLog({
    seed: 5,
    cells: 4,
    capacityMah: 1300,
    loadCurrentA: 13,
    cycles,
    chargeCurrentA: 2.6,
    chargeRestS: 30,
    initialRestS: 5,
    finalRestS: 5,
  });
  const csv = toCsv(rows.map((r) => ({ ...r, timeS: r.timeS + timeOffsetS })));
  return { analysis: await analyseText(csv, { cells: 4, cutoffVPerCell: 3.3 }), truth };
}

describe("headlineCurve", () => {
  it("keeps only the headline discharge of a three-cycle log, its capacity from 0 to about that discharge's", async () => {
    const { analysis, truth } = await analysed(3, 1000); // a logger clock that does not start at 0
    const f = analysis.figures;
    expect(f.discharges).toHaveLength(3);
    const whole = analysis.curve;
    const head = headlineCurve(whole, f);
    const d = f.discharges[0];
    if (!d) throw new Error("no discharge");
    expect(Math.max(...whole.map((p) => p.capacityMah))).toBeGreaterThan(2.5 * d.capacityMah); // cumulative
    expect(head.length).toBeGreaterThan(5);
    expect(head.every((p) => p.timeS >= 1000 + d.startS && p.timeS <= 1000 + d.startS + d.durationS)).toBe(true);
    const top = Math.max(...head.map((p) => p.capacityMah));
    // Within one downsampled point of the discharge's own charge (generator truth, exact for constant current).
    expect(top).toBeLessThanOrEqual((truth.discharges[0]?.deliveredMah ?? 0) * 1.01);
    expect(top).toBeGreaterThan((truth.discharges[0]?.deliveredMah ?? 0) * 0.9);
    expect(Math.min(...head.map((p) => p.capacityMah))).toBeGreaterThanOrEqual(0);
    const drawn = prepareCurve(head, 4, 120);
    expect(Math.max(...drawn.map((p) => p.mah))).toBeLessThan(1.05 * d.capacityMah);
  });

  it("gives a one-discharge log's curve back whole, and a curve stored before discharges were listed too", async () => {
    const { analysis } = await analysed(1);
    expect(headlineCurve(analysis.curve, analysis.figures)).toBe(analysis.curve);
    expect(headlineCurve(analysis.curve, {})).toBe(analysis.curve);
    expect(headlineCurve(analysis.curve, null)).toBe(analysis.curve);
  });
});
