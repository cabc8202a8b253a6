// Single-pack reads by slug (db/queries/pack-by-slug.ts) against the whole-catalogue read they replace: the same
// row, counts included, for every pack; nothing for slugs that are not active catalogue entries.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { makers, packs, users } from "@/db/schema";
import { activeMakerWithPacksExists, activePackExists, getPackRowBySlug } from "@/db/queries/pack-by-slug";
import { listPackRows } from "@/db/queries/packs";
import { makeResult } from "../helpers/fixtures";
import { seedOpenData } from "../helpers/open-data-fixtures";

const P = "byslug";
let fx: Awaited<ReturnType<typeof seedOpenData>>;

beforeAll(async () => {
  fx = await seedOpenData(P);
  // A maker whose only pack is still a proposal: it exists but has no active pack.
  const [lone] = await db
    .insert(makers)
    .values({ slug: `${P}-lonely`, name: `${P} Lonely` })
    .returning();
  if (!lone) throw new Error("no maker");
  await db.insert(packs).values({
    slug: `${P}-lonely-850-2s`,
    makerId: lone.id,
    model: "Wisp 850 2S",
    cellsInSeries: 2,
    ratedCapacityMah: 850,
    labelledContinuousC: 30,
    connector: "XT30",
    status: "proposed",
  });
});

describe("packs by slug", () => {
  it("gives every active pack the same row as the whole-catalogue read, counts included", async () => {
    const all = await listPackRows(null);
    const mine = all.filter((p) => p.slug.startsWith(`${P}-`));
    expect(mine.map((p) => p.resultCount).sort()).toEqual([1, 1, 2]); // approved only (fixture: 2 + 1 + 1)
    for (const row of all) expect(await getPackRowBySlug(row.slug), row.slug).toEqual(row);
  });

  it("counts groups and only published results", async () => {
    const before = await getPackRowBySlug(fx.packs[0]!.slug);
    const [user] = await db
      .select({ id: users.id })
      .from(users)
      .where(eq(users.email, `${P}@example.test`));
    if (!user) throw new Error("no user");
    const userId = user.id;
    // Another like-for-like group (another ambient band) and a pending result that must not count.
    await makeResult(fx.packs[0]!, userId, { ambientC: 35 });
    await makeResult(fx.packs[0]!, userId, { ambientC: 35, status: "pending" });
    const after = await getPackRowBySlug(fx.packs[0]!.slug);
    expect(after?.resultCount).toBe((before?.resultCount ?? 0) + 1);
    expect(after?.groupCount).toBe((before?.groupCount ?? 0) + 1);
  });

  it("answers null / false for unknown, proposed and pack-less slugs", async () => {
    expect(await getPackRowBySlug(`${P}-no-such-pack`)).toBeNull();
    expect(await getPackRowBySlug(`${P}-lonely-850-2s`)).toBeNull();
    expect(await activePackExists(fx.packs[1]!.slug)).toBe(true);
    expect(await activePackExists(`${P}-lonely-850-2s`)).toBe(false);
    expect(await activeMakerWithPacksExists(`${P}-voltwren`)).toBe(true);
    expect(await activeMakerWithPacksExists(`${P}-lonely`)).toBe(false);
    expect(await activeMakerWithPacksExists(`${P}-nobody`)).toBe(false);
  });
});
