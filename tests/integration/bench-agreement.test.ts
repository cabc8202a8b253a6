// Bench agreement read from the database (db/queries/bench-agreement.ts → lib/bench-agreement.ts): only published
// results on a bench profile count, a bench is public only through its published results, and a new result far
// from the other benches (|z| > 3 against ISO 13528:2015 Algorithm A's consensus) is flagged for moderators.
// Invented benches and packs.
import { beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { benchProfiles, results } from "@/db/schema";
import { getAgreementRow, getPublicBench, listAgreementRows } from "@/db/queries/bench-agreement";
import { computeAndStoreFlags } from "@/db/mutations/review";
import { benchAgreements, scoreNewResult } from "@/lib/bench-agreement";
import { makePack, makeResult } from "../helpers/review-fixtures";
import { createUser } from "../helpers/users";

const benchIds: number[] = [];
let high = 0;
let pendingHigh = 0;
let privateBench = 0;
let pendingFine = 0;
let packIds: number[] = [];
const group = `agree-${Date.now()}`;

async function bench(userId: string, name: string, stated: boolean) {
  const [b] = await db
    .insert(benchProfiles)
    .values({
      userId,
      name,
      loadEquipment: "Invented load",
      resistanceMethod: "dc-step",
      ...(stated
        ? {
            voltageAccuracyPct: 0.1,
            voltageOffsetV: 0.01,
            voltageResolutionV: 0.001,
            currentAccuracyPct: 0.5,
            currentOffsetA: 0.02,
            currentResolutionA: 0.001,
            temperatureAccuracyPct: 0,
            temperatureOffsetC: 1.5,
            temperatureResolutionC: 0.1,
            samplingIntervalS: 1,
          }
        : {}),
    })
    .returning({ id: benchProfiles.id });
  if (!b) throw new Error("no bench");
  return b.id;
}

async function result(
  packId: number,
  contributorId: string,
  benchId: number,
  capacityMah: number,
  status = "approved",
) {
  const r = await makeResult({
    packId,
    contributorId,
    groupKey: group,
    status: status as "approved" | "pending",
    figures: { capacityMah },
  });
  await db.update(results).set({ benchProfileId: benchId }).where(eq(results.id, r.id));
  return r.id;
}

beforeAll(async () => {
  const user = await createUser("contributor", "bench-owner");
  const packs = await Promise.all([1, 2, 3, 4].map(() => makePack()));
  packIds = packs.map((p) => p.pack.id);
  const wobble = [
    [0.999, 1.002, 1.0, 1.001],
    [1.001, 0.998, 1.002, 0.999],
    [1.0, 1.001, 0.998, 1.002],
    [1.002, 0.999, 1.001, 1.0],
  ];
  for (let b = 0; b < 4; b++) benchIds.push(await bench(user.id, `Agreeing ${b}`, b % 2 === 0));
  high = await bench(user.id, "Reads high", false);
  privateBench = await bench(user.id, "Nothing published", false);
  for (const [p, packId] of packIds.entries()) {
    for (const [b, id] of benchIds.entries()) await result(packId, user.id, id, 1250 * (wobble[b]?.[p] ?? 1));
    await result(packId, user.id, high, 1250 * 1.04);
  }
  pendingHigh = await result(packIds[0] ?? 0, user.id, high, 1250 * 1.045, "pending");
  pendingFine = await result(packIds[0] ?? 0, user.id, privateBench, 1250, "pending");
});

describe("bench agreement from the database", () => {
  it("compares published results on bench profiles only, and finds the bench that reads capacity high", async () => {
    const rows = (await listAgreementRows()).filter((r) => r.groupKey === group);
    expect(rows).toHaveLength(20); // 4 packs × 5 benches; the pending ones do not count
    const all = benchAgreements(rows);
    const summary = all.get(high)?.summary;
    expect(summary?.packsCompared).toBe(4);
    expect(summary?.shareAbsZOver3).toBe(1);
    expect(summary?.suggestions[0]?.words).toMatch(/current shunt/);
    for (const id of benchIds) expect(all.get(id)?.summary.shareAbsZOver3).toBe(0);
  });

  it("carries U95 (for Eₙ) only for benches that state every accuracy value", async () => {
    const rows = (await listAgreementRows()).filter((r) => r.groupKey === group);
    const stated = rows.find((r) => r.benchId === benchIds[0]);
    const assumed = rows.find((r) => r.benchId === benchIds[1]);
    expect(stated?.u95?.capacityMah).toBeGreaterThan(0);
    expect(assumed?.u95).toBeUndefined();
  });

  it("flags the new result of the high bench for moderators (|z| > 3), not a new one that agrees", async () => {
    const rows = await listAgreementRows();
    const candidate = await getAgreementRow(pendingHigh);
    if (!candidate) throw new Error("no candidate");
    const capacity = scoreNewResult(rows, candidate).find((s) => s.figure === "capacityMah");
    expect(capacity?.benches).toBe(5);
    expect(capacity?.flag?.code).toBe("far-from-other-benches");
    const fine = scoreNewResult(rows, { ...candidate, values: { capacityMah: 1250 } })[0];
    expect(fine?.flag).toBeNull();
  });

  it("shows a bench publicly only through its published results", async () => {
    expect(await getPublicBench(privateBench)).toBeNull();
    expect(await getPublicBench(2_000_000_000)).toBeNull();
    const pub = await getPublicBench(high);
    expect(pub).toMatchObject({ id: high, publishedResults: 4, loadEquipment: "Invented load" });
    expect(pub?.contributor).toBe("Test bench-owner"); // the public name the tester chose, as on results
    expect(JSON.stringify(pub)).not.toContain("@test.sagline.localhost");
    expect(JSON.stringify(pub)).not.toContain("Reads high"); // the profile's private name stays private
  });

  it("stores the flag with the result's plausibility flags (the queue's chips), and only where it is far", async () => {
    const flags = await computeAndStoreFlags(pendingHigh);
    const far = flags.filter((f) => f.code === "far-from-other-benches");
    expect(far).toHaveLength(1);
    expect(far[0]?.message).toMatch(/^Capacity is \d+\.\d standard deviations above what other benches measured/);
    expect((await computeAndStoreFlags(pendingFine)).map((f) => f.code)).not.toContain("far-from-other-benches");
    // Running it again keeps one flag, not two; and a stale one goes once the result no longer lies far.
    expect((await computeAndStoreFlags(pendingHigh)).filter((f) => f.code === "far-from-other-benches")).toHaveLength(
      1,
    );
    await db
      .update(results)
      .set({ figures: { ...(await figuresOf(pendingHigh)), capacityMah: 1250 } })
      .where(eq(results.id, pendingHigh));
    expect((await computeAndStoreFlags(pendingHigh)).map((f) => f.code)).not.toContain("far-from-other-benches");
  });
});

async function figuresOf(id: number) {
  const [row] = await db.select({ figures: results.figures }).from(results).where(eq(results.id, id));
  if (!row) throw new Error("no result");
  return row.figures;
}
