// New-result e-mails about a pack: starting and stopping them; both idempotent; unknown packs are 404.
import { beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { makers, packs } from "@/db/schema";
import { getsPackEmails, listPackEmailsForUser } from "@/db/queries/pack-emails";
import { requestState } from "../helpers/next-mocks";
import { signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { startPackEmails } = await import("@/app/actions/start-pack-emails");
const { stopPackEmails } = await import("@/app/actions/stop-pack-emails");

let packId = 0;

beforeAll(async () => {
  const [maker] = await db.insert(makers).values({ slug: "mailmaker-w", name: "Mailmaker W" }).returning();
  if (!maker) throw new Error("no maker");
  const [pack] = await db
    .insert(packs)
    .values({
      slug: "mailmaker-w-1300",
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

describe("new-result e-mails about a pack", () => {
  beforeEach(() => {
    requestState.token = null;
  });

  it("starts, lists, starts again harmlessly, and stops", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    expect(await startPackEmails(null, { packId })).toEqual({ ok: true, data: { packId, emails: true } });
    expect(await startPackEmails(null, { packId })).toMatchObject({ ok: true });
    expect(await getsPackEmails(me.id, packId)).toBe(true);
    const list = await listPackEmailsForUser(me.id);
    expect(list.map((w) => `${w.makerName} ${w.model}`)).toEqual(["Mailmaker W Heron 1300 4S 75C"]);

    expect(await stopPackEmails(null, { packId })).toEqual({ ok: true, data: { packId, emails: false } });
    expect(await stopPackEmails(null, { packId })).toMatchObject({ ok: true });
    expect(await getsPackEmails(me.id, packId)).toBe(false);
  });

  it("keeps each user's e-mail requests to themselves", async () => {
    const a = await signedIn("contributor", "a");
    const b = await signedIn("contributor", "b");
    requestState.token = a.token;
    await startPackEmails(null, { packId });
    requestState.token = b.token;
    await stopPackEmails(null, { packId }); // b stopping cannot touch a's request
    expect(await getsPackEmails(a.id, packId)).toBe(true);
    expect(await getsPackEmails(b.id, packId)).toBe(false);
  });

  it("answers 404 for a pack that does not exist and 422 for a malformed id", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    expect(await startPackEmails(null, { packId: 99_999_999 })).toMatchObject({ ok: false, code: "not_found" });
    const fd = new FormData();
    fd.set("packId", "abc");
    expect(await startPackEmails(null, fd)).toMatchObject({ ok: false, code: "validation" });
  });
});

describe("GET /api/v1/me?packEmails= (the pack page's toggle asks here)", () => {
  const meRoute = () => import("@/app/api/v1/me/route");
  const get = async (query: string, token: string | null) =>
    (await meRoute()).GET(
      new Request(`http://localhost:3011/api/v1/me${query}`, {
        headers: token ? { cookie: `authjs.session-token=${token}` } : {},
      }),
      {},
    );

  it("says whether the signed-in person gets the pack's e-mails, follows a change, and is private", async () => {
    const me = await signedIn("contributor", "asker");
    requestState.token = me.token;
    let res = await get(`?packEmails=${packId}`, me.token);
    expect(res.status).toBe(200);
    expect(res.headers.get("cache-control")).toContain("no-store");
    expect(await res.json()).toMatchObject({ user: { role: "contributor" }, packEmails: false });
    await startPackEmails(null, { packId });
    res = await get(`?packEmails=${packId}`, me.token);
    expect(await res.json()).toMatchObject({ packEmails: true });
    // Without the parameter the answer stays as before.
    expect(await (await get("", me.token)).json()).not.toHaveProperty("packEmails");
  });

  it("tells nobody anything without a session, and refuses a malformed id with 422", async () => {
    const anon = await get(`?packEmails=${packId}`, null);
    expect(anon.status).toBe(200);
    expect(await anon.json()).toEqual({ user: null });
    for (const bad of ["abc", "-1", "1.5", "99999999999"]) {
      const res = await get(`?packEmails=${encodeURIComponent(bad)}`, null);
      expect(res.status, bad).toBe(422);
      expect(JSON.stringify(await res.json())).toContain("packEmails");
    }
  });
});
