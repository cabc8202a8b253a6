// Admin catalogue actions: edit a pack's label (ratios of its results rescaled), merge duplicate packs and
// makers (results move, the duplicate stays as "merged", an audit event records it, tags revalidated).
import { beforeEach, describe, expect, it, vi } from "vitest";
import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { auditEvents, makers, packEmails, packs, results } from "@/db/schema";
import { requestState } from "../helpers/next-mocks";
import { makePack, makeResult } from "../helpers/review-fixtures";
import { createUser, signedIn } from "../helpers/users";

const revalidate = vi.hoisted(() => ({ revalidateTags: vi.fn() }));
vi.mock("@/server/revalidate", () => revalidate);
vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { editPackLabel } = await import("@/app/(admin)/admin/catalogue/actions/edit-pack-label");
const { mergePacks } = await import("@/app/(admin)/admin/catalogue/actions/merge-packs");
const { mergeMakers } = await import("@/app/(admin)/admin/catalogue/actions/merge-makers");

const audit = (entityType: string, id: number) =>
  db
    .select()
    .from(auditEvents)
    .where(and(eq(auditEvents.entityType, entityType), eq(auditEvents.entityId, String(id))));

describe("catalogue admin", () => {
  beforeEach(async () => {
    revalidate.revalidateTags.mockClear();
    requestState.token = (await signedIn("admin")).token;
  });

  it("edits a pack's label figures, rescales its results' ratios, audits the change and revalidates the pack", async () => {
    const u = await createUser("contributor");
    const { pack, maker } = await makePack();
    const r = await makeResult({
      packId: pack.id,
      contributorId: u.id,
      status: "approved",
      figures: { capacityMah: 1300, labelRatio: 0.5 },
    });
    const fd = new FormData();
    for (const [k, v] of Object.entries({
      packId: pack.id,
      cellsInSeries: 4,
      ratedCapacityMah: 1000,
      labelledContinuousC: "50",
      labelledBurstC: "",
      weightG: "150,5",
      connector: "XT60",
      note: "Label photo shows 1000 mAh 50C.",
    }))
      fd.set(k, String(v));
    const res = await editPackLabel(null, fd);
    expect(res).toEqual({ ok: true, data: { packId: pack.id } });
    const [after] = await db.select().from(packs).where(eq(packs.id, pack.id));
    expect(after).toMatchObject({
      ratedCapacityMah: 1000,
      labelledContinuousC: 50,
      labelledBurstC: null,
      weightG: 150.5,
    });
    const [rr] = await db.select().from(results).where(eq(results.id, r.id));
    expect(rr?.capacityRatio).toBeCloseTo(1.3, 5);
    expect(rr?.labelRatio).toBeCloseTo(1.0, 5); // measured C ÷ labelled C: half of 100C = all of 50C
    expect(rr?.figures.labelRatio).toBeCloseTo(1.0, 5);
    const [ev] = await audit("pack", pack.id);
    expect(ev).toMatchObject({
      action: "pack.edit-label",
      data: {
        from: { ratedCapacityMah: 1300 },
        to: { ratedCapacityMah: 1000 },
        note: "Label photo shows 1000 mAh 50C.",
      },
    });
    expect(revalidate.revalidateTags.mock.calls[0]?.[0]).toEqual(
      expect.arrayContaining([`pack:${pack.slug}`, `maker:${maker.slug}`, `group:${r.groupKey}`]),
    );
  });

  it("refuses a burst rating below the continuous rating (422)", async () => {
    const { pack } = await makePack();
    const res = await editPackLabel(null, {
      packId: pack.id,
      cellsInSeries: 4,
      ratedCapacityMah: 1300,
      labelledContinuousC: 100,
      labelledBurstC: 50,
      weightG: null,
      connector: "XT60",
    });
    expect(res).toMatchObject({ ok: false, code: "validation", fieldErrors: { labelledBurstC: expect.any(Array) } });
  });

  it("merges a duplicate pack: results and new-result e-mail requests move, the duplicate is kept as merged, the merge is audited", async () => {
    const u = await createUser("contributor");
    const a = await makePack();
    const b = await makePack();
    const r1 = await makeResult({ packId: a.pack.id, contributorId: u.id, status: "approved" });
    const r2 = await makeResult({ packId: a.pack.id, contributorId: u.id, status: "withdrawn" });
    await db.insert(packEmails).values({ userId: u.id, packId: a.pack.id });
    const res = await mergePacks(null, { sourceId: a.pack.id, targetId: b.pack.id });
    expect(res).toEqual({ ok: true, data: { movedResults: 2 } });
    const moved = await db.select({ packId: results.packId }).from(results).where(eq(results.packId, b.pack.id));
    expect(moved).toHaveLength(2);
    const [src] = await db.select().from(packs).where(eq(packs.id, a.pack.id));
    expect(src).toMatchObject({ status: "merged", mergedIntoId: b.pack.id });
    expect(await db.select().from(packEmails).where(eq(packEmails.packId, b.pack.id))).toHaveLength(1);
    const [ev] = await audit("pack", a.pack.id);
    expect(ev).toMatchObject({ action: "pack.merge", data: { into: b.pack.id, movedResultIds: [r1.id, r2.id] } });
    expect(revalidate.revalidateTags.mock.calls[0]?.[0]).toEqual(
      expect.arrayContaining([`pack:${a.pack.slug}`, `pack:${b.pack.slug}`]),
    );
    expect(await mergePacks(null, { sourceId: a.pack.id, targetId: b.pack.id })).toMatchObject({
      ok: false,
      code: "conflict",
    });
    expect(await mergePacks(null, { sourceId: b.pack.id, targetId: b.pack.id })).toMatchObject({
      ok: false,
      code: "validation",
    });
  });

  it("refuses to merge packs with different cell counts", async () => {
    const a = await makePack({ cells: 3 });
    const b = await makePack({ cells: 4 });
    expect(await mergePacks(null, { sourceId: a.pack.id, targetId: b.pack.id })).toMatchObject({
      ok: false,
      code: "conflict",
    });
  });

  it("merges a duplicate maker: its packs move, the duplicate is kept as merged, the merge is audited", async () => {
    const a = await makePack();
    const b = await makePack();
    const res = await mergeMakers(null, { sourceId: a.maker.id, targetId: b.maker.id });
    expect(res).toEqual({ ok: true, data: { movedPacks: 1 } });
    const [p] = await db.select().from(packs).where(eq(packs.id, a.pack.id));
    expect(p?.makerId).toBe(b.maker.id);
    const [m] = await db.select().from(makers).where(eq(makers.id, a.maker.id));
    expect(m).toMatchObject({ status: "merged", mergedIntoId: b.maker.id });
    const [ev] = await audit("maker", a.maker.id);
    expect(ev).toMatchObject({ action: "maker.merge", data: { into: b.maker.id, movedPackIds: [a.pack.id] } });
  });
});
