// computeAndStoreFlags against the database: the group, duplicate-hash and proposed-catalogue facts are
// gathered by db/queries/review.ts and the flags stored on the result. One crafted case per flag.
import { describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { results } from "@/db/schema";
import { computeAndStoreFlags } from "@/db/mutations/review";
import { makePack, makeResult } from "../helpers/review-fixtures";
import { createUser } from "../helpers/users";

async function setup(opts: Parameters<typeof makePack>[0] = {}) {
  const u = await createUser("contributor");
  const { pack } = await makePack(opts);
  return { u, pack, groupKey: `flag-group-${randomUUID().slice(0, 8)}` };
}

async function storedCodes(resultId: number) {
  const [r] = await db.select({ flags: results.flags }).from(results).where(eq(results.id, resultId));
  return r?.flags.map((f) => f.code);
}

async function approvedGroup(
  packId: number,
  contributorId: string,
  groupKey: string,
  values: { labelRatio: number; sagLimitedC: number; capacityRatio: number }[],
) {
  for (const v of values) await makeResult({ packId, contributorId, groupKey, status: "approved", figures: v });
}

describe("computeAndStoreFlags", () => {
  it("stores nothing for a clean result", async () => {
    const { u, pack } = await setup();
    const r = await makeResult({ packId: pack.id, contributorId: u.id });
    expect(await computeAndStoreFlags(r.id)).toEqual([]);
    expect(await storedCodes(r.id)).toEqual([]);
  });

  it("capacity-above-rated: 1500 mAh from a 1300 mAh pack (common practice 110 %)", async () => {
    const { u, pack } = await setup();
    const r = await makeResult({
      packId: pack.id,
      contributorId: u.id,
      figures: { capacityMah: 1500, capacityRatio: 1500 / 1300 },
    });
    await computeAndStoreFlags(r.id);
    expect(await storedCodes(r.id)).toEqual(["capacity-above-rated"]);
  });

  it("label-ratio-outside-group and sag-c-outside-group: far from the approved group median (common practice factor 2)", async () => {
    const { u, pack, groupKey } = await setup();
    await approvedGroup(pack.id, u.id, groupKey, [
      { labelRatio: 0.5, sagLimitedC: 50, capacityRatio: 0.96 },
      { labelRatio: 0.52, sagLimitedC: 52, capacityRatio: 0.96 },
      { labelRatio: 0.48, sagLimitedC: 48, capacityRatio: 0.96 },
    ]);
    const r = await makeResult({
      packId: pack.id,
      contributorId: u.id,
      groupKey,
      figures: { labelRatio: 1.4, sagLimitedC: 140 },
    });
    await computeAndStoreFlags(r.id);
    expect(await storedCodes(r.id)).toEqual(["label-ratio-outside-group", "sag-c-outside-group"]);
  });

  it("group-outlier: modified z-score above 3.5 within the like-for-like group (Iglewicz & Hoaglin 1993)", async () => {
    const { u, pack, groupKey } = await setup();
    await approvedGroup(
      pack.id,
      u.id,
      groupKey,
      [0.95, 0.97, 0.99, 0.96, 0.98].map((capacityRatio) => ({ labelRatio: 0.5, sagLimitedC: 50, capacityRatio })),
    );
    const r = await makeResult({
      packId: pack.id,
      contributorId: u.id,
      groupKey,
      figures: { capacityMah: 1105, capacityRatio: 0.85 },
    });
    await computeAndStoreFlags(r.id);
    expect(await storedCodes(r.id)).toEqual(["group-outlier"]);
  });

  it("cutoff-mismatch: log minimum 3.0 V per cell against a stated 3.3 V cut-off (common practice tolerance)", async () => {
    const { u, pack } = await setup();
    const r = await makeResult({ packId: pack.id, contributorId: u.id, figures: { minVoltagePerCellV: 3.0 } });
    await computeAndStoreFlags(r.id);
    expect(await storedCodes(r.id)).toEqual(["cutoff-mismatch"]);
  });

  it("temperature-mismatch: ambient 21 °C, log starts at 30 °C (issue 5: more than 5 °C apart)", async () => {
    const { u, pack } = await setup();
    const r = await makeResult({
      packId: pack.id,
      contributorId: u.id,
      ambientTemperatureC: 21,
      figures: { startTemperatureC: 30 },
    });
    await computeAndStoreFlags(r.id);
    expect(await storedCodes(r.id)).toEqual(["temperature-mismatch"]);
  });

  it("cells-mismatch: a 3-cell log on a 4S pack", async () => {
    const { u, pack } = await setup();
    const r = await makeResult({ packId: pack.id, contributorId: u.id, figures: { cells: 3 } });
    await computeAndStoreFlags(r.id);
    expect(await storedCodes(r.id)).toEqual(["cells-mismatch"]);
  });

  it("duplicate-log: the same content hash as an earlier result, naming it", async () => {
    const { u, pack } = await setup();
    const sha = randomUUID().replace(/-/g, "");
    const first = await makeResult({ packId: pack.id, contributorId: u.id, logSha256: sha });
    const second = await makeResult({ packId: pack.id, contributorId: u.id, logSha256: sha });
    const flags = await computeAndStoreFlags(second.id);
    expect(flags).toEqual([
      { code: "duplicate-log", message: expect.stringContaining(`#${first.id}`), resultIds: [first.id] },
    ]);
  });

  it("proposed-catalogue: a result on a proposed pack of a proposed maker", async () => {
    const { u, pack } = await setup({ makerStatus: "proposed", packStatus: "proposed" });
    const r = await makeResult({ packId: pack.id, contributorId: u.id });
    await computeAndStoreFlags(r.id);
    expect(await storedCodes(r.id)).toEqual(["proposed-catalogue"]);
  });

  it("a missing result is a not_found error", async () => {
    await expect(computeAndStoreFlags(999_999_999)).rejects.toMatchObject({ code: "not_found" });
  });
});

describe("computeAndStoreFlags beside the submission's card checks", () => {
  it("keeps the card checks stored at submission, replaces its own codes, and is idempotent", async () => {
    const { u, pack } = await setup();
    const r = await makeResult({ packId: pack.id, contributorId: u.id, figures: { cells: 3 } });
    await db
      .update(results)
      .set({
        flags: [
          { code: "load-mismatch", message: "card" },
          { code: "cells-mismatch", message: "card says 3S" },
        ],
      })
      .where(eq(results.id, r.id));
    await computeAndStoreFlags(r.id);
    const once = await storedCodes(r.id);
    await computeAndStoreFlags(r.id);
    expect(await storedCodes(r.id)).toEqual(once);
    expect(once).toEqual(["load-mismatch", "cells-mismatch"]);
  });
});
