// The summary tables stay equal to the from-scratch aggregate of approved results (issue 18 item 1) after every
// kind of change, made through the real mutation functions of db/mutations where one exists: approve, reject,
// send back and resubmit, the tester's own withdrawal, a reader flag kept and one resolved by withdrawal, a
// label edit (ratios rescaled), a pack merge (results move), a maker merge, a deleted result, a bulk insert. Also:
// a rolled-back transaction leaves them as they were, and two approvals on one pack committed from two
// connections at once (and two sent through writeDecision at once) are both counted (the per-pack advisory lock
// in migration 0009). Every check covers group_summaries too (tests/helpers/summaries.ts; its own status-change
// cases are in group-summaries.test.ts).
import { beforeAll, describe, expect, it } from "vitest";
import { eq, inArray, sql } from "drizzle-orm";
import { db } from "@/db";
import { readerFlags, results, reviewEvents } from "@/db/schema";
import { listPacksInGroup, listPublicGroups, rankMakersInGroup } from "@/db/queries/groups";
import { writeDecision, writeFlagResolution } from "@/db/mutations/review";
import { resubmitOwnResult, withdrawOwnResult } from "@/db/mutations/results";
import { insertReaderFlag } from "@/db/mutations/reader-flags";
import { mergeMakerRows, mergePackRows, writePackLabel } from "@/db/mutations/catalogue-admin";
import { groupKey } from "@/lib/analysis";
import { emptyCatalogue, makeMaker, makePack, makeResult } from "../helpers/fixtures";
import { createUser } from "../helpers/users";
import { approveFromTwoConnections, staleSummaries, summaryOf, summarySnapshot } from "../helpers/summaries";

const warm = { resistanceMethod: "dc-step", ambientC: 22, cutoffVPerCell: 3.3, loadCurrentA: 12, ratedMah: 1500 };
const G = groupKey({ ...warm, cyclesBeforeTest: 0 }).key;
const COLD = groupKey({ ...warm, ambientC: 8, cyclesBeforeTest: 0 }).key;
const approve = { kind: "approve", note: null, catalogue: { intoPackId: null, intoMakerId: null } } as const;
const noMail = () => [];

type Pack = Awaited<ReturnType<typeof makePack>>;
type Maker = Awaited<ReturnType<typeof makeMaker>>;
let tester: { id: string };
let mod: { id: string };
let admin: { id: string };
let makerA: Maker;
let makerB: Maker;
let p1: Pack;
let p2: Pack;
let p3: Pack;

const inG = async (packId: number) => (await summaryOf(packId)).groups.find((g) => g.group_key === G);

beforeAll(async () => {
  await emptyCatalogue();
  tester = await createUser("contributor", "summaries tester");
  mod = await createUser("moderator", "summaries moderator");
  admin = await createUser("admin", "summaries admin");
  makerA = await makeMaker("Alder Sum Cells");
  makerB = await makeMaker("Birch Sum Power");
  p1 = await makePack(makerA.id, { labelledContinuousC: 50 });
  p2 = await makePack(makerA.id, { labelledContinuousC: 50 });
  p3 = await makePack(makerB.id, { labelledContinuousC: 100 });
  for (const c of [10, 20, 40]) await makeResult(p1, tester.id, { sagLimitedC: c });
  await makeResult(p1, tester.id, { sagLimitedC: 1, ambientC: 8 });
  await makeResult(p2, tester.id, { sagLimitedC: 35 });
  for (const c of [30, 30]) await makeResult(p3, tester.id, { sagLimitedC: c });
});

describe("summaries equal the from-scratch aggregate after every kind of change", () => {
  it("after inserts of approved and of pending results (a pending one changes nothing)", async () => {
    expect(await staleSummaries()).toEqual([]);
    expect(await summaryOf(p1.id)).toMatchObject({ resultCount: 4 });
    expect((await summaryOf(p1.id)).groups.map((g) => g.group_key).sort()).toEqual([COLD, G].sort());
    const before = await summarySnapshot();
    await makeResult(p1, tester.id, { sagLimitedC: 99, status: "pending" });
    expect(await summarySnapshot()).toEqual(before);
  });

  it("after a moderator approves a pending result", async () => {
    const r = await makeResult(p1, tester.id, { sagLimitedC: 60, status: "pending" });
    await writeDecision(mod.id, r.id, approve, noMail);
    expect(await staleSummaries()).toEqual([]);
    expect(await inG(p1.id)).toMatchObject({ result_count: 4, sag_limited_n: 4, sag_limited_max: 60 });
  });

  it("after a rejection (nothing changes)", async () => {
    const r = await makeResult(p1, tester.id, { sagLimitedC: 70, status: "pending" });
    const before = await summarySnapshot();
    await writeDecision(mod.id, r.id, { kind: "reject", reason: "wrong-data", note: "The log is cut short." }, noMail);
    expect(await summarySnapshot()).toEqual(before);
    expect(await staleSummaries()).toEqual([]);
  });

  it("after send back, the tester's resubmission with new figures, and its approval", async () => {
    const r = await makeResult(p1, tester.id, { sagLimitedC: 5, status: "pending" });
    const before = await summarySnapshot();
    await writeDecision(mod.id, r.id, { kind: "ask", note: "Which load did you use?" }, noMail);
    await resubmitOwnResult(
      r.id,
      tester.id,
      { sagLimitedC: 90, labelRatio: 90 / 50 },
      "A constant-current load.",
      null,
    );
    expect(await summarySnapshot()).toEqual(before);
    expect(await staleSummaries()).toEqual([]);
    await writeDecision(mod.id, r.id, approve, noMail);
    expect(await staleSummaries()).toEqual([]);
    expect(await inG(p1.id)).toMatchObject({ result_count: 5, sag_limited_max: 90 });
  });

  it("after the tester withdraws their own pending result (nothing changes)", async () => {
    const r = await makeResult(p1, tester.id, { sagLimitedC: 80, status: "pending" });
    const before = await summarySnapshot();
    await withdrawOwnResult(r.id, tester.id, null);
    expect(await summarySnapshot()).toEqual(before);
    expect(await staleSummaries()).toEqual([]);
  });

  it("after a reader flag is kept (still counted) and another is resolved by withdrawal (no longer counted)", async () => {
    const [target] = await db
      .select({ id: results.id })
      .from(results)
      .where(sql`${results.packId} = ${p1.id} and ${results.sagLimitedC} = 10`);
    if (!target) throw new Error("no result with sag-limited C 10");
    const readerOne = await createUser("contributor", "summaries reader one");
    const readerTwo = await createUser("contributor", "summaries reader two");
    const before = await summarySnapshot();
    const kept = await insertReaderFlag(
      target.id,
      { reason: "wrong-figures", note: "Looks low." },
      { userId: readerOne.id, reporterHash: null },
    );
    await writeFlagResolution(mod.id, kept.flagId, "kept", null);
    expect(await summarySnapshot()).toEqual(before);
    const flag = await insertReaderFlag(
      target.id,
      { reason: "wrong-pack", note: "A different pack." },
      { userId: readerTwo.id, reporterHash: null },
    );
    await writeFlagResolution(mod.id, flag.flagId, "withdrawn", "The log belongs to another pack.");
    expect(await staleSummaries()).toEqual([]);
    expect(await inG(p1.id)).toMatchObject({ result_count: 4, sag_limited_n: 4 });
    expect((await summaryOf(p1.id)).resultCount).toBe(5);
  });

  it("after a label edit rescales the pack's ratios (labelled 50C → 25C doubles the label ratio)", async () => {
    const before = await inG(p1.id);
    await writePackLabel(admin.id, {
      packId: p1.id,
      cellsInSeries: 4,
      ratedCapacityMah: 1500,
      labelledContinuousC: 25,
      labelledBurstC: null,
      weightG: 180,
      connector: "XT60",
      note: null,
    });
    expect(await staleSummaries()).toEqual([]);
    const after = await inG(p1.id);
    expect(after?.label_ratio_median).toBeCloseTo((before?.label_ratio_median ?? Number.NaN) * 2, 5);
  });

  it("after a pack merge moves its results", async () => {
    await mergePackRows(admin.id, p2.id, p1.id);
    expect(await staleSummaries()).toEqual([]);
    expect(await summaryOf(p2.id)).toEqual({ resultCount: null, groups: [] });
    expect(await inG(p1.id)).toMatchObject({ result_count: 5 });
  });

  it("after a maker merge (summaries are per pack; the ranking follows the packs to their new maker)", async () => {
    const before = await summarySnapshot();
    expect((await rankMakersInGroup(G)).map((m) => m.makerName)).toEqual(["Alder Sum Cells", "Birch Sum Power"]);
    await mergeMakerRows(admin.id, makerB.id, makerA.id);
    expect(await summarySnapshot()).toEqual(before);
    expect(await staleSummaries()).toEqual([]);
    expect(await rankMakersInGroup(G)).toMatchObject([{ makerName: "Alder Sum Cells", packs: 2, results: 7 }]);
  });

  it("after a result is deleted (no mutation deletes results; a direct delete, as a data fix would)", async () => {
    const [victim] = await db.select({ id: results.id }).from(results).where(eq(results.packId, p3.id)).limit(1);
    if (!victim) throw new Error("p3 has no result");
    await db.transaction(async (tx) => {
      await tx.delete(readerFlags).where(eq(readerFlags.resultId, victim.id));
      await tx.delete(reviewEvents).where(eq(reviewEvents.resultId, victim.id));
      await tx.delete(results).where(eq(results.id, victim.id));
    });
    expect(await staleSummaries()).toEqual([]);
    expect(await summaryOf(p3.id)).toMatchObject({ resultCount: 1 });
  });

  it("after a bulk insert of approved rows in one statement (the triggers fire once for it)", async () => {
    const template = await db
      .select()
      .from(results)
      .where(inArray(results.packId, [p1.id, p3.id]));
    const copies = Array.from({ length: 4 }, () =>
      template.map(({ id: _id, ...r }) => ({ ...r, status: "approved" as const })),
    );
    const before = (await summaryOf(p1.id)).resultCount ?? 0;
    const approvedP1 = template.filter((r) => r.packId === p1.id && r.status === "approved").length;
    await db.insert(results).values(copies.flat());
    expect(await staleSummaries()).toEqual([]);
    // Every p1 row copied 4 times as approved: its approved count grows by 4 × all its rows.
    const p1Rows = template.filter((r) => r.packId === p1.id).length;
    expect((await summaryOf(p1.id)).resultCount).toBe(before + 4 * p1Rows);
    expect(approvedP1).toBe(before);
  });

  it("after a refresh of more than 1,000 packs at once (a bulk load: one exclusive lock, not one per pack)", async () => {
    // Stale the tables by hand, then refresh every pack and 1,500 ids that never exist (negative) in one call.
    await db.execute(sql`delete from pack_summaries`);
    await db.execute(sql`update pack_group_summaries set result_count = result_count + 100`);
    expect((await staleSummaries()).length).toBeGreaterThan(0);
    await db.execute(
      sql`select sagline_refresh_summaries(array(select id from packs union all select generate_series(-1500, -1)))`,
    );
    expect(await staleSummaries()).toEqual([]);
  });
});

describe("summaries under transactions", () => {
  it("are unchanged by a transaction that rolls back (though inside it they had followed the change)", async () => {
    const before = await summarySnapshot();
    let inside: number | null = -1;
    await expect(
      db.transaction(async (tx) => {
        await tx.update(results).set({ status: "withdrawn" }).where(eq(results.packId, p1.id));
        inside =
          (await tx.execute<{ n: number }>(sql`select count(*)::int as n from pack_summaries where pack_id = ${p1.id}`))
            .rows[0]?.n ?? null;
        expect(await staleSummaries(tx)).toEqual([]);
        throw new Error("roll back");
      }),
    ).rejects.toThrow("roll back");
    expect(inside).toBe(0);
    expect(await summarySnapshot()).toEqual(before);
  });

  it("count both of two approvals on one pack committed from two connections at once", async () => {
    const r1 = await makeResult(p3, tester.id, { sagLimitedC: 41, status: "pending" });
    const r2 = await makeResult(p3, tester.id, { sagLimitedC: 42, status: "pending" });
    const before = (await summaryOf(p3.id)).resultCount ?? 0;
    // B's trigger waits for A's per-pack advisory lock.
    expect((await approveFromTwoConnections(r1.id, r2.id)).secondWaited).toBe(true);
    expect((await summaryOf(p3.id)).resultCount).toBe(before + 2);
    expect(await staleSummaries()).toEqual([]);
  });

  it("count both of two moderators' approvals on one pack sent at once through writeDecision", async () => {
    const other = await createUser("moderator", "summaries second moderator");
    const r1 = await makeResult(p3, tester.id, { sagLimitedC: 43, status: "pending" });
    const r2 = await makeResult(p3, tester.id, { sagLimitedC: 44, status: "pending" });
    const before = (await summaryOf(p3.id)).resultCount ?? 0;
    await Promise.all([writeDecision(mod.id, r1.id, approve, noMail), writeDecision(other.id, r2.id, approve, noMail)]);
    expect((await summaryOf(p3.id)).resultCount).toBe(before + 2);
    expect(await staleSummaries()).toEqual([]);
  });
});

describe("the group reads", () => {
  it("come from the summary tables, not from the results (a result the summaries miss is not listed)", async () => {
    const maker = await makeMaker("Cedar Sum Packs");
    const pack = await makePack(maker.id, { labelledContinuousC: 40 });
    const cycled = groupKey({ ...warm, cyclesBeforeTest: 150 }).key;
    await db.execute(sql`alter table results disable trigger results_summaries_insert`);
    try {
      await makeResult(pack, tester.id, { sagLimitedC: 20, cycles: 150 });
    } finally {
      await db.execute(sql`alter table results enable trigger results_summaries_insert`);
    }
    expect((await listPublicGroups()).map((g) => g.key)).not.toContain(cycled);
    // The missing pack row, pack-group row and group row (the group is new).
    expect(await staleSummaries()).toHaveLength(3);
    // The refresh function the triggers call mends it, as a manual repair would.
    await db.execute(sql`select sagline_refresh_summaries(array[${pack.id}]::int[])`);
    expect(await staleSummaries()).toEqual([]);
    expect(await listPublicGroups()).toContainEqual(expect.objectContaining({ key: cycled, packCount: 1 }));
    expect(await listPacksInGroup(cycled)).toMatchObject([{ packId: pack.id, n: 1, labelRatio: 0.5 }]);
  });
});
