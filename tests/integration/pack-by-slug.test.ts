// Existence checks by slug (db/queries/pack-by-slug.ts), the API cache guards' replacement for a search of the
// whole cached catalogue: true only for active catalogue entries.
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { makers, packs } from "@/db/schema";
import { activeMakerWithPacksExists, activePackExists } from "@/db/queries/pack-by-slug";
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

describe("pack and maker existence by slug", () => {
  it("answers true for active packs and makers with one, false for unknown, proposed and pack-less slugs", async () => {
    expect(await activePackExists(`${P}-no-such-pack`)).toBe(false);
    expect(await activePackExists(fx.packs[1]!.slug)).toBe(true);
    expect(await activePackExists(`${P}-lonely-850-2s`)).toBe(false);
    expect(await activeMakerWithPacksExists(`${P}-voltwren`)).toBe(true);
    expect(await activeMakerWithPacksExists(`${P}-lonely`)).toBe(false);
    expect(await activeMakerWithPacksExists(`${P}-nobody`)).toBe(false);
  });
});
