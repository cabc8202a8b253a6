// Queries behind /results/[id] and the home page's newest results.
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { eq } from "drizzle-orm";
import { benchProfiles, results, reviewEvents } from "@/db/schema";
import { getPublicResult, listNewestApprovedResults } from "@/db/queries/results";
import { emptyCatalogue, makeMaker, makePack, makeResult, makeUser, openReaderCase } from "../helpers/fixtures";

const ids = { approved: 0, anon: 0, pending: 0, openCase: 0, older: 0, proposedPack: 0 };

beforeAll(async () => {
  await emptyCatalogue();
  const named = await makeUser({ displayName: "Fen Bench" });
  const anon = await makeUser({ displayName: "Secret Name", anonymous: true });
  const moderator = await makeUser({ displayName: "Mod" });
  const m = await makeMaker("Furze Test Cells");
  const pack = await makePack(m.id);
  const day = (d: number) => new Date(Date.UTC(2026, 2, d));
  ids.older = (await makeResult(pack, named.id, { publishedAt: day(1) })).id;
  ids.approved = (await makeResult(pack, named.id, { publishedAt: day(3) })).id;
  ids.anon = (await makeResult(pack, anon.id, { publishedAt: day(2) })).id;
  ids.pending = (await makeResult(pack, named.id, { status: "pending" })).id;
  ids.openCase = (await makeResult(pack, named.id, { publishedAt: day(5) })).id;
  await openReaderCase(ids.openCase, anon.id);
  // Approved, but its pack is only proposed: not in the catalogue, so not published (the counting rule).
  ids.proposedPack = (
    await makeResult(await makePack(m.id, { status: "proposed" }), named.id, { publishedAt: day(6) })
  ).id;
  await db.insert(reviewEvents).values([
    {
      resultId: ids.approved,
      actorId: moderator.id,
      fromStatus: "pending",
      toStatus: "approved",
      createdAt: new Date(Date.now() + 1000),
    },
  ]);
});

describe("published results", () => {
  it("returns a published result with its contributor and review history, actors named by role", async () => {
    const r = await getPublicResult(ids.approved);
    expect(r?.contributor).toBe("Fen Bench");
    expect(r?.events.map((e) => [e.actor, e.to])).toEqual([
      ["contributor", "pending"],
      ["moderator", "approved"],
    ]);
    expect(r?.pack.makerName).toBe("Furze Test Cells");
  });

  it("says anonymous when the contributor chose it, never their name", async () => {
    const r = await getPublicResult(ids.anon);
    expect(r?.contributor).toBe("Anonymous tester");
    expect(JSON.stringify(r)).not.toContain("Secret Name");
  });

  it("keeps a result with an open reader case published, with the case's reason; hides pending ones and those off the catalogue", async () => {
    const flagged = await getPublicResult(ids.openCase);
    expect(flagged).toMatchObject({ openCase: true, openCaseReasons: ["wrong-figures"] });
    // A flag changes no status: the history has no step for it.
    expect(flagged?.events.map((e) => e.to)).toEqual(["pending"]);
    expect(await getPublicResult(ids.approved)).toMatchObject({ openCase: false, openCaseReasons: [] });
    expect(await getPublicResult(ids.pending)).toBeNull();
    expect(await getPublicResult(ids.proposedPack)).toBeNull();
    expect(await getPublicResult(999_999)).toBeNull();
  });

  it("carries the bench's stated accuracy (blank parts left to be assumed) and none without a bench profile", async () => {
    const r0 = await getPublicResult(ids.approved);
    if (!r0) throw new Error("no result");
    expect(r0.benchProfileId).toBeNull();
    expect(r0.statedAccuracy.current?.percentOfReading).toBeUndefined();
    expect(r0.statedAccuracy.resistanceMethod).toBe(r0.resistanceMethod);
    const [bench] = await db
      .insert(benchProfiles)
      .values({
        userId: (await makeUser({ displayName: "Bench Owner" })).id,
        name: "Shunt bench",
        loadEquipment: "Invented load",
        resistanceMethod: "dc-step",
        currentAccuracyPct: 0.2,
        samplingIntervalS: 0.5,
      })
      .returning({ id: benchProfiles.id });
    if (!bench) throw new Error("no bench");
    await db.update(results).set({ benchProfileId: bench.id }).where(eq(results.id, ids.anon));
    const r = await getPublicResult(ids.anon);
    expect(r?.benchProfileId).toBe(bench.id);
    expect(r?.statedAccuracy.current?.percentOfReading).toBeCloseTo(0.2, 6);
    expect(r?.statedAccuracy.current?.offsetA).toBeUndefined();
    expect(r?.statedAccuracy.samplingIntervalS).toBe(0.5);
  });

  it("lists the newest published results first (an open case counts; pending and proposed packs do not)", async () => {
    const list = await listNewestApprovedResults(10);
    expect(list.map((r) => r.id)).toEqual([ids.openCase, ids.approved, ids.anon, ids.older]);
  });
});
