// group_summaries (migration 0013): one row per like-for-like group, counting approved results of active packs of
// active makers, kept by deltas from the summaries' refresh and by triggers on packs and makers. Each case checks
// the table against its from-scratch view (group_summaries_fresh, both ways, tests/helpers/summaries.ts) and the
// group list (listPublicGroups) against counts made here from the results themselves.
import { beforeAll, describe, expect, it } from "vitest";
import { and, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { makers, packs, results } from "@/db/schema";
import { listPublicGroups } from "@/db/queries/groups";
import { groupKey } from "@/lib/analysis";
import { emptyCatalogue, makeMaker, makePack, makeResult } from "../helpers/fixtures";
import { createUser } from "../helpers/users";
import { approveFromTwoConnections, staleSummaries } from "../helpers/summaries";

const warm = { resistanceMethod: "dc-step", ambientC: 22, cutoffVPerCell: 3.3, loadCurrentA: 12, ratedMah: 1500 };
const G = groupKey({ ...warm, cyclesBeforeTest: 0 }).key;

type Pack = Awaited<ReturnType<typeof makePack>>;
type Maker = Awaited<ReturnType<typeof makeMaker>>;
let tester: { id: string };
let makerA: Maker;
let makerB: Maker;
let p1: Pack;
let p2: Pack;
let p3: Pack;

/** Group G as the list shows it. */
const listed = async () => (await listPublicGroups()).find((g) => g.key === G);

/** Group G counted here from the results (the counting rule written out): results, packs, oldest result id. */
async function countedFromResults() {
  const r = await db.execute<{ results: number; packs: number; first: number | null }>(sql`
    select count(*)::int as results, count(distinct r.pack_id)::int as packs, min(r.id) as first
    from results r join packs p on p.id = r.pack_id join makers m on m.id = p.maker_id
    where r.status = 'approved' and p.status = 'active' and m.status = 'active' and r.group_key = ${G}`);
  return r.rows[0];
}

async function expectAgreement() {
  expect(await staleSummaries()).toEqual([]);
  const c = await countedFromResults();
  const row = await db.execute<{ first_result_id: number }>(
    sql`select first_result_id from group_summaries where group_key = ${G}`,
  );
  if (!c || c.results === 0) {
    expect(await listed()).toBeUndefined();
    return;
  }
  expect(await listed()).toMatchObject({ resultCount: c.results, packCount: c.packs });
  expect(row.rows[0]?.first_result_id).toBe(c.first);
}

const setPackStatus = (id: number, status: "active" | "proposed" | "merged") =>
  db.update(packs).set({ status }).where(eq(packs.id, id));
const setMakerStatus = (id: number, status: "active" | "proposed" | "merged") =>
  db.update(makers).set({ status }).where(eq(makers.id, id));

beforeAll(async () => {
  await emptyCatalogue();
  tester = await createUser("contributor", "group summaries tester");
  makerA = await makeMaker("Aspen Group Cells");
  makerB = await makeMaker("Beech Group Power");
  p1 = await makePack(makerA.id, { labelledContinuousC: 50 });
  p2 = await makePack(makerA.id, { labelledContinuousC: 50 });
  p3 = await makePack(makerB.id, { labelledContinuousC: 100 });
  // p1 holds the group's oldest result, so taking p1 out changes the representative.
  for (const c of [10, 20]) await makeResult(p1, tester.id, { sagLimitedC: c });
  await makeResult(p2, tester.id, { sagLimitedC: 35 });
  for (const c of [30, 31, 32]) await makeResult(p3, tester.id, { sagLimitedC: c });
});

describe("group_summaries follow every change that decides what a group counts", () => {
  it("hold the demo of this file: 6 results of 3 packs, the oldest p1's", async () => {
    await expectAgreement();
    expect(await listed()).toMatchObject({ resultCount: 6, packCount: 3 });
  });

  it("when a pack stops counting (no longer active) and counts again, its oldest result included", async () => {
    await setPackStatus(p1.id, "proposed");
    await expectAgreement();
    expect(await listed()).toMatchObject({ resultCount: 4, packCount: 2 });
    await setPackStatus(p1.id, "active");
    await expectAgreement();
    expect(await listed()).toMatchObject({ resultCount: 6, packCount: 3 });
  });

  it("when a maker stops counting and counts again (all its active packs at once)", async () => {
    await setMakerStatus(makerA.id, "proposed");
    await expectAgreement();
    expect(await listed()).toMatchObject({ resultCount: 3, packCount: 1 });
    await setMakerStatus(makerA.id, "active");
    await expectAgreement();
  });

  it("when a pack moves to a maker that does not count, and back", async () => {
    await setMakerStatus(makerB.id, "proposed");
    await db.update(packs).set({ makerId: makerB.id }).where(eq(packs.id, p2.id));
    await expectAgreement();
    expect(await listed()).toMatchObject({ resultCount: 2, packCount: 1 });
    await db.update(packs).set({ makerId: makerA.id }).where(eq(packs.id, p2.id));
    await setMakerStatus(makerB.id, "active");
    await expectAgreement();
    expect(await listed()).toMatchObject({ resultCount: 6, packCount: 3 });
  });

  it("when a pack's only group result is withdrawn the pack leaves the group, and the group goes with its last", async () => {
    await db
      .update(results)
      .set({ status: "withdrawn" })
      .where(and(eq(results.packId, p2.id), eq(results.status, "approved")));
    await expectAgreement();
    expect(await listed()).toMatchObject({ resultCount: 5, packCount: 2 });
    await db.update(results).set({ status: "withdrawn" }).where(eq(results.status, "approved"));
    await expectAgreement();
    expect(await listed()).toBeUndefined();
    await db
      .update(results)
      .set({ status: "approved" })
      .where(sql`${results.packId} in (${p1.id}, ${p2.id}, ${p3.id})`);
    await expectAgreement();
  });

  it("count both of two approvals on two packs of one group committed from two connections at once", async () => {
    const r1 = await makeResult(p1, tester.id, { sagLimitedC: 41, status: "pending" });
    const r3 = await makeResult(p3, tester.id, { sagLimitedC: 42, status: "pending" });
    const before = (await listed())?.resultCount ?? 0;
    // Different packs, one group: B waits for A's group lock.
    expect((await approveFromTwoConnections(r1.id, r3.id)).secondWaited).toBe(true);
    expect((await listed())?.resultCount).toBe(before + 2);
    await expectAgreement();
  });
});
