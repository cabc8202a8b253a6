// The review queue's reads: pending only, oldest first, filters by flag, maker and group with counts over
// the whole queue; the review page's group median now and after approval (median, summarise in lib/analysis).
import { describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { results } from "@/db/schema";
import { getReviewDetail, listReviewQueue } from "@/db/queries/review";
import { makePack, makeResult } from "../helpers/review-fixtures";
import { createUser } from "../helpers/users";

describe("review queue", () => {
  it("lists pending results oldest first and filters by maker, flag and group with counts", async () => {
    const u = await createUser("contributor");
    const { maker, pack } = await makePack();
    const group = `queue-group-${randomUUID().slice(0, 8)}`;
    const newer = await makeResult({
      packId: pack.id,
      contributorId: u.id,
      groupKey: group,
      submittedAt: new Date("2026-03-02T00:00:00Z"),
    });
    const older = await makeResult({
      packId: pack.id,
      contributorId: u.id,
      submittedAt: new Date("2026-03-01T00:00:00Z"),
    });
    await makeResult({ packId: pack.id, contributorId: u.id, status: "approved" });
    await db
      .update(results)
      .set({ flags: [{ code: "cells-mismatch", message: "x" }] })
      .where(eq(results.id, newer.id));

    const byMaker = await listReviewQueue({ maker: maker.slug });
    expect(byMaker.items.map((i) => i.id)).toEqual([older.id, newer.id]);
    expect(byMaker.counts.makers.find((m) => m.slug === maker.slug)?.n).toBe(2);
    expect(byMaker.counts.flags["cells-mismatch"]).toBeGreaterThanOrEqual(1);

    expect((await listReviewQueue({ maker: maker.slug, flag: "cells-mismatch" })).items.map((i) => i.id)).toEqual([
      newer.id,
    ]);
    expect((await listReviewQueue({ maker: maker.slug, flag: "none" })).items.map((i) => i.id)).toEqual([older.id]);
    expect((await listReviewQueue({ group })).items.map((i) => i.id)).toEqual([newer.id]);
  });

  it("the review page shows the pack's group median now and what approving would make it", async () => {
    const u = await createUser("contributor");
    const { pack } = await makePack();
    const group = `median-group-${randomUUID().slice(0, 8)}`;
    for (const capacityMah of [1200, 1250, 1300])
      await makeResult({
        packId: pack.id,
        contributorId: u.id,
        groupKey: group,
        status: "approved",
        figures: { capacityMah },
      });
    const r = await makeResult({
      packId: pack.id,
      contributorId: u.id,
      groupKey: group,
      figures: { capacityMah: 1000 },
    });
    const d = await getReviewDetail(r.id);
    expect(d?.groupNow).toMatchObject({ n: 3, capacityMah: 1250 });
    expect(d?.groupAfterApproval).toMatchObject({ n: 4, capacityMah: 1225 }); // median of 1000, 1200, 1250, 1300
    expect(d?.contributorHistory.byStatus.approved).toBe(3);
    expect(d?.events.map((e) => e.toStatus)).toEqual(["pending"]);
  });
});
