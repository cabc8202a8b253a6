// Approving a result on a proposed pack puts the catalogue right in the decision's transaction: the pack (and
// its proposed maker) go live under short readable slugs, and the API, the packs list and the sitemap show
// it at once (the cached reads are dropped by tag after the commit) — or the moderator merges the proposal
// into an existing pack with the same label, or its maker into an existing maker. Every step is audited.
import { beforeAll, describe, expect, it, vi } from "vitest";
import { eq } from "drizzle-orm";
import { GET as getPack } from "@/app/api/v1/packs/[slug]/route";
import { GET as listPacks } from "@/app/api/v1/packs/route";
import sitemap from "@/app/sitemap";
import { db } from "@/db";
import { auditEvents, makers, packEmails, packs, results } from "@/db/schema";
import { createProposedPack } from "@/db/mutations/catalogue";
import { decideResult } from "@/server/review";
import { makeResult } from "../helpers/review-fixtures";
import { createUser } from "../helpers/users";

vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).taggedCache);

let ip = 0;
const req = (path: string) =>
  new Request(`http://localhost:3000${path}`, { headers: { "x-forwarded-for": `10.8.0.${++ip % 250}` } });
const apiPack = (slug: string) => getPack(req(`/api/v1/packs/${slug}`), { params: Promise.resolve({ slug }) });
const apiSlugs = async (maker: string) => {
  const res = await listPacks(req(`/api/v1/packs?maker=${maker}`), { params: Promise.resolve({}) });
  expect(res.status).toBe(200);
  return ((await res.json()) as { data: { slug: string }[] }).data.map((p) => p.slug);
};
const live = { intoPackId: null, intoMakerId: null };

let contributorId = "";
let moderatorId = "";
beforeAll(async () => {
  contributorId = (await createUser("contributor", "proposer")).id;
  moderatorId = (await createUser("moderator", "catalogue-mod")).id;
});

const label = {
  cellsInSeries: 4,
  ratedCapacityMah: 1300,
  labelledContinuousC: 75,
  labelledBurstC: null,
  weightG: 160,
  connector: "XT60",
};

/** A result filed against a new pack (and a new maker unless one is given), as /submit makes it. */
async function proposal(makerName: string, model: string, makerId: number | null = null) {
  const { packId, makerId: mId } = await db.transaction((tx) =>
    createProposedPack(tx, { makerId, makerName, model, ...label }, contributorId),
  );
  const r = await makeResult({ packId, contributorId });
  return { packId, makerId: mId, resultId: r.id };
}

async function packRow(id: number) {
  const [row] = await db.select().from(packs).where(eq(packs.id, id));
  if (!row) throw new Error("pack missing");
  return row;
}

describe("approving a result on a proposed pack", () => {
  it("puts the pack and its maker live under short slugs; the API, the packs list and the sitemap show it at once", async () => {
    const longModel = "Stormpetrel Competition Series Ultra High Discharge Graphene Enhanced 1300 4S 75C";
    const p = await proposal("Ternwick Proposal Cells", longModel);
    const proposedSlug = (await packRow(p.packId)).slug;
    expect(proposedSlug.length).toBeLessThanOrEqual(60);
    // Before: not public anywhere (and the list is now cached).
    expect((await apiPack(proposedSlug)).status).toBe(404);
    expect(await apiSlugs("ternwick-proposal-cells")).toEqual([]);

    const out = await decideResult(moderatorId, p.resultId, { kind: "approve", note: null, catalogue: live });
    const pack = await packRow(p.packId);
    expect(pack.status).toBe("active");
    expect(out.packSlug).toBe(pack.slug);
    expect(pack.slug).toMatch(/^ternwick-proposal-cells-stormpetrel-[a-z0-9-]*4s-1300mah$/);
    expect(pack.slug.length).toBeLessThanOrEqual(60);
    const [maker] = await db.select().from(makers).where(eq(makers.id, p.makerId));
    expect(maker).toMatchObject({ status: "active", slug: "ternwick-proposal-cells" });

    const res = await apiPack(pack.slug);
    expect(res.status).toBe(200);
    expect(((await res.json()) as { data: { slug: string; model: string } }).data).toMatchObject({
      slug: pack.slug,
      model: longModel,
    });
    expect(await apiSlugs("ternwick-proposal-cells")).toEqual([pack.slug]);
    const urls = (await sitemap()).map((e) => new URL(e.url).pathname);
    expect(urls).toContain(`/packs/${pack.slug}`);
    expect(urls).toContain(`/results/${p.resultId}`);

    const audit = await db.select().from(auditEvents).where(eq(auditEvents.actorId, moderatorId));
    expect(audit.map((a) => [a.action, a.entityId])).toEqual(
      expect.arrayContaining([
        ["pack.activate", String(p.packId)],
        ["maker.activate", String(p.makerId)],
      ]),
    );
  });

  it("keeps slugs unique: a second pack with the same words gets a numbered slug, still within 60 characters", async () => {
    const a = await proposal("Gullhaven Proposals", "Twin 1300 4S 75C");
    await decideResult(moderatorId, a.resultId, { kind: "approve", note: null, catalogue: live });
    const b = await proposal("Gullhaven Proposals", "Twin 1300 4S 75C");
    expect(b.makerId).toBe(a.makerId); // the maker is found by name, not proposed twice
    await decideResult(moderatorId, b.resultId, { kind: "approve", note: null, catalogue: live });
    expect((await packRow(a.packId)).slug).toBe("gullhaven-proposals-twin-1300-4s-75c");
    expect((await packRow(b.packId)).slug).toBe("gullhaven-proposals-twin-1300-4s-75c-2");
  });

  it("merges the proposal into an existing pack with the same label: its results and e-mail requests move", async () => {
    const existing = await proposal("Ospreyline Merge Cells", "Dart 1300 4S 75C");
    await decideResult(moderatorId, existing.resultId, { kind: "approve", note: null, catalogue: live });
    const target = await packRow(existing.packId);
    const dup = await proposal("Ospreyline Merge Cells", "DART 1300mAh 4S1P 75C");
    const reader = await createUser("contributor", "merge-reader");
    await db.insert(packEmails).values({ userId: reader.id, packId: dup.packId });

    const out = await decideResult(moderatorId, dup.resultId, {
      kind: "approve",
      note: null,
      catalogue: { intoPackId: target.id, intoMakerId: null },
    });
    expect(out.packSlug).toBe(target.slug);
    const [moved] = await db.select().from(results).where(eq(results.id, dup.resultId));
    expect(moved).toMatchObject({ packId: target.id, status: "approved" });
    expect(await packRow(dup.packId)).toMatchObject({ status: "merged", mergedIntoId: target.id });
    expect(await db.select().from(packEmails).where(eq(packEmails.packId, target.id))).toEqual([
      expect.objectContaining({ userId: reader.id }),
    ]);
    const [merge] = await db.select().from(auditEvents).where(eq(auditEvents.action, "pack.merge-proposal"));
    expect(merge).toMatchObject({
      entityId: String(dup.packId),
      data: { into: target.id, movedResultIds: [dup.resultId] },
    });
  });

  it("refuses to merge into a pack whose label differs, and nothing changes", async () => {
    const other = await proposal("Plovermark Cells", "Other 1300 4S 75C");
    await db.update(packs).set({ labelledContinuousC: 95, status: "active" }).where(eq(packs.id, other.packId));
    await db.update(makers).set({ status: "active" }).where(eq(makers.id, other.makerId));
    const p = await proposal("Plovermark Cells", "Another 1300 4S 75C");
    await expect(
      decideResult(moderatorId, p.resultId, {
        kind: "approve",
        note: null,
        catalogue: { intoPackId: other.packId, intoMakerId: null },
      }),
    ).rejects.toMatchObject({ code: "conflict" });
    expect((await packRow(p.packId)).status).toBe("proposed");
    const [r] = await db.select({ status: results.status }).from(results).where(eq(results.id, p.resultId));
    expect(r?.status).toBe("pending");
  });

  it("puts the pack live under an existing maker when its proposed maker is the same as one in the catalogue", async () => {
    const known = await proposal("Sanderling Known Cells", "Known 1300 4S 75C");
    await decideResult(moderatorId, known.resultId, { kind: "approve", note: null, catalogue: live });
    const p = await proposal("Sanderling Cells (typo)", "Fresh 1300 4S 75C");
    expect(p.makerId).not.toBe(known.makerId);
    await decideResult(moderatorId, p.resultId, {
      kind: "approve",
      note: null,
      catalogue: { intoPackId: null, intoMakerId: known.makerId },
    });
    const pack = await packRow(p.packId);
    expect(pack).toMatchObject({ status: "active", makerId: known.makerId });
    expect(pack.slug).toBe("sanderling-known-cells-fresh-1300-4s-75c");
    const [retired] = await db.select().from(makers).where(eq(makers.id, p.makerId));
    expect(retired).toMatchObject({ status: "merged", mergedIntoId: known.makerId });
  });
});
