// The public API reads through tagged caches (server/public-data.ts): a read is served from the cache until a
// tag it carries is revalidated, and a moderation decision revalidates exactly those tags. Uses a next/cache
// stand-in that really caches by key and drops entries by tag (tests/helpers/next-mocks.ts).
import { beforeAll, describe, expect, it, vi } from "vitest";
import { GET as getMakers } from "@/app/api/v1/makers/route";
import { GET as getPack } from "@/app/api/v1/packs/[slug]/route";
import { GET as getResults } from "@/app/api/v1/results/route";
import { GET as getGroup } from "@/app/api/v1/groups/[key]/route";
import { db } from "@/db";
import { decideResult } from "@/server/review";
import { makers } from "@/db/schema";
import { taggedCache } from "../helpers/next-mocks";
import { makeResult } from "../helpers/fixtures";
import { makeModerator, seedOpenData } from "../helpers/open-data-fixtures";

vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).taggedCache);

const P = "apic";
let fx: Awaited<ReturnType<typeof seedOpenData>>;
let moderatorId = "";
let ip = 0;
const req = (path: string) =>
  new Request(`http://localhost:3000${path}`, { headers: { "x-forwarded-for": `10.9.0.${++ip % 250}` } });
const noParams = { params: Promise.resolve({}) };
type Json = { data: unknown; meta: { total?: number } };

beforeAll(async () => {
  fx = await seedOpenData(P);
  moderatorId = await makeModerator(P);
  // Enough published results (in a group of their own) for a page beyond the cached first twenty.
  for (let i = 0; i < 21; i++) await makeResult(fx.packs[2]!, moderatorId, { ambientC: 30 });
});

async function total(path: string): Promise<number> {
  const res = await getResults(req(path), noParams);
  expect(res.status).toBe(200);
  return ((await res.json()) as Json).meta.total ?? -1;
}

describe("tagged caching of the public API", () => {
  it("serves a repeated read from the cache, and an approval refreshes results, group and pack at once", async () => {
    const path = `/api/v1/results?group=${fx.group}`;
    const before = await total(path);
    expect(before).toBe(4);
    const groupBefore = (await (
      await getGroup(req(`/api/v1/groups/${fx.group}`), { params: Promise.resolve({ key: fx.group }) })
    ).json()) as { data: { resultCount: number } };
    expect(groupBefore.data.resultCount).toBe(4);
    const slug = fx.packs[0]!.slug;
    const packBefore = await (
      await getPack(req(`/api/v1/packs/${slug}`), { params: Promise.resolve({ slug }) })
    ).text();
    const cachedKeys = taggedCache.store.size;
    expect(cachedKeys).toBeGreaterThanOrEqual(3);

    // Same query again: no new cache entry, same answer.
    expect(await total(path)).toBe(before);
    expect(taggedCache.store.size).toBe(cachedKeys);

    const pending = fx.results.find((r) => r.status === "pending");
    if (!pending) throw new Error("fixture has no pending result");
    await decideResult(moderatorId, pending.id, {
      kind: "approve",
      note: null,
      catalogue: { intoPackId: null, intoMakerId: null },
    });

    expect(await total(path)).toBe(before + 1);
    const groupAfter = (await (
      await getGroup(req(`/api/v1/groups/${fx.group}`), { params: Promise.resolve({ key: fx.group }) })
    ).json()) as { data: { resultCount: number } };
    expect(groupAfter.data.resultCount).toBe(5);
    const packAfter = await (await getPack(req(`/api/v1/packs/${slug}`), { params: Promise.resolve({ slug }) })).text();
    expect(packAfter).not.toBe(packBefore);
  });

  it("keeps a cached list until its tag is revalidated: a maker written behind the cache's back shows only after `catalogue`", async () => {
    const names = async () =>
      (
        (await (await getMakers(req("/api/v1/makers?size=200"), noParams)).json()) as { data: { slug: string }[] }
      ).data.map((m) => m.slug);
    const first = await names();
    await db.insert(makers).values({ slug: `${P}-latecomer`, name: `${P} Latecomer` });
    // No revalidation yet: the cached page still answers.
    expect(await names()).toEqual(first);
    taggedCache.revalidateTag("catalogue");
    expect(await names()).toContain(`${P}-latecomer`);
  });

  it("keeps the cache bounded: made-up filters, slugs and far pages are read from the database, not stored", async () => {
    // Warm what the guards themselves read (the cached catalogue and groups), then count.
    await total(`/api/v1/results?group=${fx.group}`);
    await getPack(req(`/api/v1/packs/${fx.packs[0]!.slug}`), { params: Promise.resolve({ slug: fx.packs[0]!.slug }) });
    const size = taggedCache.store.size;
    expect(await total(`/api/v1/results?q=${encodeURIComponent("anything at all")}`)).toBeGreaterThanOrEqual(0);
    const madeUp = await getResults(req(`/api/v1/results?group=${P}_made_up_group`), noParams);
    expect(madeUp.status).toBe(404);
    expect(await total(`/api/v1/results?minMah=1000&maxMah=1400`)).toBeGreaterThan(0);
    // Pages by key (any id) are read from the database; numbered pages stop at the cap.
    expect(await total(`/api/v1/results?after=1&size=1`)).toBeGreaterThanOrEqual(1);
    expect((await getResults(req(`/api/v1/results?page=21&size=1`), noParams)).status).toBe(422);
    const missing = await getPack(req(`/api/v1/packs/${P}-no-such-pack`), {
      params: Promise.resolve({ slug: `${P}-no-such-pack` }),
    });
    expect(missing.status).toBe(404);
    const unknownGroup = await getGroup(req(`/api/v1/groups/${P}_nothing_here`), {
      params: Promise.resolve({ key: `${P}_nothing_here` }),
    });
    expect(unknownGroup.status).toBe(404);
    expect(taggedCache.store.size).toBe(size);
  });
});
