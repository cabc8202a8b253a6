// Watching and unwatching a pack; both idempotent; unknown packs are 404.
import { beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { makers, packs } from "@/db/schema";
import { isWatching, listWatchesForUser } from "@/db/queries/watches";
import { requestState } from "../helpers/next-mocks";
import { signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { watchPack } = await import("@/app/actions/watch-pack");
const { unwatchPack } = await import("@/app/actions/unwatch-pack");

let packId = 0;

beforeAll(async () => {
  const [maker] = await db.insert(makers).values({ slug: "watchmaker-w", name: "Watchmaker W" }).returning();
  if (!maker) throw new Error("no maker");
  const [pack] = await db
    .insert(packs)
    .values({
      slug: "watchmaker-w-1300",
      makerId: maker.id,
      model: "Heron 1300 4S 75C",
      cellsInSeries: 4,
      ratedCapacityMah: 1300,
      labelledContinuousC: 75,
      connector: "XT60",
    })
    .returning();
  if (!pack) throw new Error("no pack");
  packId = pack.id;
});

describe("watch a pack", () => {
  beforeEach(() => {
    requestState.token = null;
  });

  it("watches, lists, watches again harmlessly, and unwatches", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    expect(await watchPack(null, { packId })).toEqual({ ok: true, data: { packId, watching: true } });
    expect(await watchPack(null, { packId })).toMatchObject({ ok: true });
    expect(await isWatching(me.id, packId)).toBe(true);
    const list = await listWatchesForUser(me.id);
    expect(list.map((w) => `${w.makerName} ${w.model}`)).toEqual(["Watchmaker W Heron 1300 4S 75C"]);

    expect(await unwatchPack(null, { packId })).toEqual({ ok: true, data: { packId, watching: false } });
    expect(await unwatchPack(null, { packId })).toMatchObject({ ok: true });
    expect(await isWatching(me.id, packId)).toBe(false);
  });

  it("keeps each user's watches to themselves", async () => {
    const a = await signedIn("contributor", "a");
    const b = await signedIn("contributor", "b");
    requestState.token = a.token;
    await watchPack(null, { packId });
    requestState.token = b.token;
    await unwatchPack(null, { packId }); // b's unwatch cannot touch a's watch
    expect(await isWatching(a.id, packId)).toBe(true);
    expect(await isWatching(b.id, packId)).toBe(false);
  });

  it("answers 404 for a pack that does not exist and 422 for a malformed id", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    expect(await watchPack(null, { packId: 99_999_999 })).toMatchObject({ ok: false, code: "not_found" });
    const fd = new FormData();
    fd.set("packId", "abc");
    expect(await watchPack(null, fd)).toMatchObject({ ok: false, code: "validation" });
  });
});

describe("GET /api/v1/me?watching= (the pack page's Watch button asks here)", () => {
  const meRoute = () => import("@/app/api/v1/me/route");
  const get = async (query: string, token: string | null) =>
    (await meRoute()).GET(
      new Request(`http://localhost:3011/api/v1/me${query}`, {
        headers: token ? { cookie: `authjs.session-token=${token}` } : {},
      }),
      {},
    );

  it("says whether the signed-in person watches the pack, follows a watch, and is private", async () => {
    const me = await signedIn("contributor", "asker");
    requestState.token = me.token;
    let res = await get(`?watching=${packId}`, me.token);
    expect(res.status).toBe(200);
    expect(res.headers.get("cache-control")).toContain("no-store");
    expect(await res.json()).toMatchObject({ user: { role: "contributor" }, watching: false });
    await watchPack(null, { packId });
    res = await get(`?watching=${packId}`, me.token);
    expect(await res.json()).toMatchObject({ watching: true });
    // Without the parameter the answer stays as before.
    expect(await (await get("", me.token)).json()).not.toHaveProperty("watching");
  });

  it("tells nobody anything without a session, and refuses a malformed id with 422", async () => {
    const anon = await get(`?watching=${packId}`, null);
    expect(anon.status).toBe(200);
    expect(await anon.json()).toEqual({ user: null });
    for (const bad of ["abc", "-1", "1.5", "99999999999"]) {
      const res = await get(`?watching=${encodeURIComponent(bad)}`, null);
      expect(res.status, bad).toBe(422);
      expect(JSON.stringify(await res.json())).toContain("watching");
    }
  });
});
