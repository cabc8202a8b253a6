import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { makers, packs } from "@/db/schema";
import { getPackBySlug, listActivePacks } from "@/db/queries/packs";

describe("pack catalogue queries", () => {
  it("lists active packs with their maker and hides proposed ones", async () => {
    const [maker] = await db.insert(makers).values({ slug: "testmaker-q", name: "Testmaker Q" }).returning();
    if (!maker) throw new Error("no maker");
    await db.insert(packs).values([
      {
        slug: "testmaker-q-a",
        makerId: maker.id,
        model: "A 1300 4S 75C",
        cellsInSeries: 4,
        ratedCapacityMah: 1300,
        labelledContinuousC: 75,
        connector: "XT60",
      },
      {
        slug: "testmaker-q-b",
        makerId: maker.id,
        model: "B 1300 4S 75C",
        cellsInSeries: 4,
        ratedCapacityMah: 1300,
        labelledContinuousC: 75,
        connector: "XT60",
        status: "proposed",
      },
    ]);
    const list = await listActivePacks();
    const slugs = list.map((p) => p.slug);
    expect(slugs).toContain("testmaker-q-a");
    expect(slugs).not.toContain("testmaker-q-b");
    expect(await getPackBySlug("testmaker-q-b")).toBeNull();
    expect((await getPackBySlug("testmaker-q-a"))?.makerName).toBe("Testmaker Q");
  });

  it("refuses a pack whose burst rating is below its continuous rating (database check)", async () => {
    const [maker] = await db.insert(makers).values({ slug: "testmaker-r", name: "Testmaker R" }).returning();
    if (!maker) throw new Error("no maker");
    await expect(
      db.insert(packs).values({
        slug: "testmaker-r-a",
        makerId: maker.id,
        model: "A",
        cellsInSeries: 3,
        ratedCapacityMah: 2200,
        labelledContinuousC: 50,
        labelledBurstC: 25,
        connector: "XT60",
      }),
    ).rejects.toThrow();
  });
});
