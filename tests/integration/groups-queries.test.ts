// Queries behind the home page and the packs table: groups, per-pack medians in a group, maker ranking.
import { beforeAll, describe, expect, it } from "vitest";
import { listPacksInGroup, listPublicGroups, rankMakersInGroup } from "@/db/queries/groups";
import { listPackRows } from "@/db/queries/pack-catalogue";
import { groupKey, summarise } from "@/lib/analysis";
import { emptyCatalogue, makeMaker, makePack, makeResult, makeUser, openReaderCase } from "../helpers/fixtures";

const warm = {
  resistanceMethod: "dc-step",
  ambientC: 22,
  cutoffVPerCell: 3.3,
  loadCurrentA: 12,
  ratedMah: 1500,
  cyclesBeforeTest: 0,
};
const G = groupKey(warm).key; // dc-step, 15–25 °C, 3.3 V, 5–10C, new
const COLD = groupKey({ ...warm, ambientC: 8 }).key;

let ids: { a1: number; a2: number; b1: number; c1: number } = { a1: 0, a2: 0, b1: 0, c1: 0 };

beforeAll(async () => {
  await emptyCatalogue();
  const tester = await makeUser();
  const makerA = await makeMaker("Alder Test Cells");
  const makerB = await makeMaker("Birch Test Power");
  const makerC = await makeMaker("Cedar Test Packs");
  const a1 = await makePack(makerA.id, { labelledContinuousC: 50 });
  const a2 = await makePack(makerA.id, { labelledContinuousC: 50 });
  const b1 = await makePack(makerB.id, { labelledContinuousC: 100 });
  const c1 = await makePack(makerC.id, { labelledContinuousC: 40 });
  ids = { a1: a1.id, a2: a2.id, b1: b1.id, c1: c1.id };
  // a1 in G: sag-limited C 10, 20, 40, 100 → median 30 (type-7 interpolation); the 100 has an open reader case
  // and still counts (the counting rule: approved is published).
  for (const c of [10, 20, 40]) await makeResult(a1, tester.id, { sagLimitedC: c });
  await openReaderCase((await makeResult(a1, tester.id, { sagLimitedC: 100 })).id, tester.id);
  // Not published: never counted (nor is a result on a pack that is only proposed).
  await makeResult(await makePack(makerA.id, { status: "proposed" }), tester.id, { sagLimitedC: 500 });
  await makeResult(a1, tester.id, { sagLimitedC: 500, status: "pending" });
  await makeResult(a1, tester.id, { sagLimitedC: 500, status: "rejected" });
  await makeResult(a1, tester.id, { sagLimitedC: 500, status: "withdrawn" });
  // Another group (cold shed): never mixed into G.
  await makeResult(a1, tester.id, { sagLimitedC: 1, ambientC: 8 });
  await makeResult(a2, tester.id, { sagLimitedC: 35 }); // label ratio 0.7
  // b1: five results, label ratio 0.3 each — counts once in its maker's ranking.
  for (let k = 0; k < 5; k++) await makeResult(b1, tester.id, { sagLimitedC: 30 });
  // c1 only in the cold group.
  await makeResult(c1, tester.id, { sagLimitedC: 36, ambientC: 8 });
});

describe("like-for-like group queries", () => {
  it("lists groups with published results only, most packs first, with labels from the method card", async () => {
    const groups = await listPublicGroups();
    expect(groups.map((g) => g.key)).toEqual([G, COLD]);
    const g = groups[0];
    expect(g?.packCount).toBe(3);
    expect(g?.resultCount).toBe(4 + 1 + 5); // pending, rejected, withdrawn left out
    expect(g?.label).toContain("15–25 °C");
    expect(groups[1]?.parts.ambient.label).toBe("below 15 °C");
  });

  it("gives per-pack medians in one group equal to summarise() from lib/analysis (type-7 median)", async () => {
    const rows = await listPacksInGroup(G);
    const a1 = rows.find((r) => r.packId === ids.a1);
    // Median of 10, 20, 40, 100 by linear interpolation (Hyndman & Fan type 7) is 30.
    expect(a1?.measuredC?.median).toBeCloseTo(summarise([10, 20, 40, 100])?.median ?? Number.NaN, 9);
    expect(a1?.measuredC?.median).toBeCloseTo(30, 9);
    expect(a1?.n).toBe(4);
    expect(a1?.measuredC).toMatchObject({ n: 4, min: 10, max: 100 });
    // c1 has results only in the cold group: absent from G, not a zero.
    expect(rows.find((r) => r.packId === ids.c1)).toBeUndefined();
    expect(rows.every((r) => r.measuredC === null || r.measuredC.min >= 10)).toBe(true);
  });

  it("ranks makers by the median of their packs' median label ratios, each pack counted once", async () => {
    const ranking = await rankMakersInGroup(G);
    expect(ranking.map((r) => r.makerName)).toEqual(["Alder Test Cells", "Birch Test Power"]);
    const [alder, birch] = ranking;
    // a1: label ratios 0.2, 0.4, 0.8, 2.0 → median 0.6; a2: 0.7 → maker median of (0.6, 0.7) = 0.65.
    expect(alder?.medianLabelRatio).toBeCloseTo(
      summarise([summarise([0.2, 0.4, 0.8, 2])?.median ?? 0, 0.7])?.median ?? 0,
      6,
    );
    expect(alder?.medianLabelRatio).toBeCloseTo(0.65, 6);
    expect(alder).toMatchObject({ packs: 2, results: 5 });
    expect(birch).toMatchObject({ packs: 1, results: 5 });
    expect(birch?.medianLabelRatio).toBeCloseTo(0.3, 6);
    // The cold group ranks only Cedar (and Alder's cold result), never G's figures.
    const cold = await rankMakersInGroup(COLD);
    expect(cold.map((r) => r.makerName).sort()).toEqual(["Alder Test Cells", "Cedar Test Packs"]);
    expect(cold.find((r) => r.makerName === "Alder Test Cells")?.medianLabelRatio).toBeCloseTo(1 / 50, 6);
  });

  it("adds a chosen group's medians to the packs table rows, and counts without one", async () => {
    const plain = await listPackRows(null);
    const a1 = plain.find((r) => r.id === ids.a1);
    expect(a1).toMatchObject({ resultCount: 5, groupCount: 2, measuredC: null, groupN: 0 });
    const inG = await listPackRows(G);
    expect(inG.find((r) => r.id === ids.a1)).toMatchObject({ measuredC: 30, groupN: 4 });
    expect(inG.find((r) => r.id === ids.c1)).toMatchObject({ measuredC: null, groupN: 0 });
  });

  // Last, as it adds a result: a pack's 95 % median interval for the label check's error bar. By the binomial
  // order-statistic formula 5 results reach at most 1 − 2/2⁵ = 93.75 % (no interval); 6 reach 1 − 2/2⁶ = 96.9 %
  // with the smallest and largest value as bounds.
  it("gives a pack's 95 % median interval from 6 published results on, none below", async () => {
    const before = await listPacksInGroup(G);
    expect(before.find((r) => r.packId === ids.b1)?.measuredC).toMatchObject({ n: 5, low: null, high: null });
    const tester = await makeUser();
    await makeResult({ id: ids.b1, ratedCapacityMah: 1500, labelledContinuousC: 100 }, tester.id, { sagLimitedC: 34 });
    const after = await listPacksInGroup(G);
    expect(after.find((r) => r.packId === ids.b1)?.measuredC).toMatchObject({ n: 6, low: 30, high: 34 });
    expect(after.find((r) => r.packId === ids.a1)?.measuredC).toMatchObject({ low: null, high: null });
  });
});
