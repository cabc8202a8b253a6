// The query behind /compare: one like-for-like group at a time, exclusions said with their reason.
import { beforeAll, describe, expect, it } from "vitest";
import { getComparison } from "@/db/queries/compare";
import { groupKey, summarise } from "@/lib/analysis";
import { exclusionText } from "@/lib/like-for-like";
import { emptyCatalogue, makeMaker, makePack, makeResult, makeUser } from "../helpers/fixtures";

const card = {
  resistanceMethod: "dc-step",
  ambientC: 22,
  cutoffVPerCell: 3.3,
  loadCurrentA: 12,
  ratedMah: 1500,
  cyclesBeforeTest: 0,
};
const WARM = groupKey(card).key;
const COLD = groupKey({ ...card, ambientC: 8 }).key;
const curve = Array.from({ length: 50 }, (_, k) => ({
  timeS: k * 10,
  voltageV: 16.4 - k * 0.05,
  currentA: k === 0 ? 0 : 12,
  temperatureC: 22 + k * 0.2,
  capacityMah: k * 33,
}));

let slugs: string[] = [];
const values = { p: [20, 30, 40], q: [50, 60], cold: [5, 6, 7, 8] };

beforeAll(async () => {
  await emptyCatalogue();
  const tester = await makeUser();
  const m = await makeMaker("Dogwood Test Cells");
  const p = await makePack(m.id);
  const q = await makePack(m.id);
  const r = await makePack(m.id);
  slugs = [p.slug, q.slug, r.slug];
  for (const c of values.p) await makeResult(p, tester.id, { sagLimitedC: c, curve });
  for (const c of values.q) await makeResult(q, tester.id, { sagLimitedC: c, curve });
  // Cold results of p and r: four results below 15 °C, plus one of r at a 3.0 V cut-off.
  for (const c of values.cold) await makeResult(c < 7 ? p : r, tester.id, { sagLimitedC: c, ambientC: 8, curve });
  await makeResult(r, tester.id, { sagLimitedC: 99, cutoffVPerCell: 3.0, curve });
});

describe("comparison of packs", () => {
  it("picks the group covering most packs and never mixes another group's results in", async () => {
    const cmp = await getComparison(slugs, null);
    expect(cmp.group?.key).toBe(WARM);
    expect(cmp.groups.map((g) => g.key)).toContain(COLD);
    const [p, q, r] = cmp.compared;
    expect(p?.figures.sagLimitedC?.median).toBe(summarise(values.p)?.median);
    expect(p?.figures.sagLimitedC?.max).toBe(40); // cold 5 and 6 are not in
    expect(q?.figures.sagLimitedC?.median).toBe(55);
    // r has nothing in the warm group: missing, not zero.
    expect(r?.n).toBe(0);
    expect(r?.figures.sagLimitedC).toBeNull();
    expect(r?.curveResultId).toBeNull();
  });

  it("lists what it left out and which group part differs", async () => {
    const cmp = await getComparison(slugs, null);
    const [p, , r] = cmp.compared;
    expect(p?.excluded.map(exclusionText)).toEqual(["2 results hidden: ambient below 15 °C"]);
    expect(r?.excludedCount).toBe(3);
    expect(r?.excluded.map(exclusionText)).toEqual([
      "2 results hidden: ambient below 15 °C",
      "1 result hidden: 3.0 V cut-off",
    ]);
  });

  it("compares inside another group when asked, with only that group's values", async () => {
    const cmp = await getComparison(slugs, COLD);
    expect(cmp.group?.key).toBe(COLD);
    const [p, q, r] = cmp.compared;
    expect(p?.figures.sagLimitedC?.median).toBe(summarise([5, 6])?.median);
    expect(q?.n).toBe(0);
    expect(r?.figures.sagLimitedC?.median).toBe(summarise([7, 8])?.median);
    expect(q?.excluded.map(exclusionText)).toEqual(["2 results hidden: ambient 15–25 °C"]);
  });

  it("falls back to the best group for an unknown group, skips unknown packs and prepares one small curve per pack", async () => {
    const cmp = await getComparison([...slugs, "no-such-pack"], "dc-step_a99-100_co9.9_r0-1_new");
    expect(cmp.group?.key).toBe(WARM);
    expect(cmp.unknownSlugs).toEqual(["no-such-pack"]);
    expect(cmp.curves.map((c) => c.packSlug)).toEqual(slugs.slice(0, 2));
    for (const c of cmp.curves) {
      expect(c.points.length).toBeLessThanOrEqual(120);
      expect(c.points[0]?.vpc).toBeCloseTo((16.4 - 0.05) / 4, 3); // rest sample dropped, volts per cell
    }
  });
});
