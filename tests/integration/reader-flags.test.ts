// Reader flags: POST /api/v1/results/[id]/flags needs a signed-in account (401 without one), is limited per
// account and per client address, and opens a case for moderators — it never changes the result's status, so
// the result stays published and counted, its page showing the open check. A moderator resolves the case
// through the resolveFlag action: dismiss it (kept / corrected), or take the result out of publication with a
// reason (approved → withdrawn with its review event). Nothing is deleted.
import { beforeEach, describe, expect, it, vi } from "vitest";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { rateLimitHits, readerFlags, results, reviewEvents } from "@/db/schema";
import { getPublicResult } from "@/db/queries/results";
import { requestState } from "../helpers/next-mocks";
import { makePack, makeResult } from "../helpers/review-fixtures";
import { createUser, signedIn } from "../helpers/users";

const revalidate = vi.hoisted(() => ({ revalidateTags: vi.fn() }));
vi.mock("@/server/revalidate", () => revalidate);
vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { POST } = await import("@/app/api/v1/results/[id]/flags/route");
const { resolveFlag } = await import("@/app/(review)/review/flags/actions/resolve-flag");

let ipCounter = 0;
function flagRequest(id: number | string, body: unknown, opts: { ip?: string; token?: string | null } = {}) {
  const headers: Record<string, string> = {
    "content-type": "application/json",
    "x-forwarded-for": opts.ip ?? `198.51.100.${++ipCounter % 250}`,
  };
  if (opts.token) headers.cookie = `authjs.session-token=${opts.token}`;
  const req = new Request(`http://localhost:3014/api/v1/results/${id}/flags`, {
    method: "POST",
    headers,
    body: typeof body === "string" ? body : JSON.stringify(body),
  });
  return POST(req, { params: Promise.resolve({ id: String(id) }) });
}

async function published() {
  const contributor = await createUser("contributor");
  const { pack } = await makePack();
  const r = await makeResult({ packId: pack.id, contributorId: contributor.id, status: "approved" });
  return { contributor, pack, r };
}
const statusOf = async (id: number) =>
  (await db.select({ s: results.status }).from(results).where(eq(results.id, id)))[0]?.s;
const eventsOf = (id: number) =>
  db.select().from(reviewEvents).where(eq(reviewEvents.resultId, id)).orderBy(asc(reviewEvents.id));
const flagsOf = (id: number) =>
  db.select().from(readerFlags).where(eq(readerFlags.resultId, id)).orderBy(asc(readerFlags.id));

/** Flags a result as a fresh signed-in reader; returns the flag's id. */
async function flagAsReader(resultId: number, reason = "wrong-figures"): Promise<number> {
  const reader = await signedIn("contributor", "reader");
  const res = await flagRequest(resultId, { reason }, { token: reader.token });
  expect(res.status).toBe(201);
  return ((await res.json()) as { flag: { id: number } }).flag.id;
}

describe("reader flags open cases and never change a result by themselves", () => {
  beforeEach(() => {
    requestState.token = null;
    revalidate.revalidateTags.mockClear();
  });

  it("a signed-out reader gets 401 and nothing is stored", async () => {
    const { r } = await published();
    const res = await flagRequest(r.id, { reason: "wrong-figures" });
    expect(res.status).toBe(401);
    expect(await flagsOf(r.id)).toEqual([]);
  });

  it("a signed-in reader's flag opens a case: 201, who filed it, the result stays approved with no status step", async () => {
    const { pack, r } = await published();
    const reader = await signedIn("contributor", "reader");
    const res = await flagRequest(
      r.id,
      { reason: "wrong-figures", note: "Capacity is above the label." },
      { token: reader.token },
    );
    expect(res.status).toBe(201);
    const [flag] = await flagsOf(r.id);
    expect(flag).toMatchObject({ reason: "wrong-figures", status: "open", reporterId: reader.id });
    expect(flag?.reporterHash).toMatch(/^[0-9a-f]{64}$/);
    expect(await statusOf(r.id)).toBe("approved");
    expect((await eventsOf(r.id)).map((e) => e.toStatus)).toEqual(["pending"]);
    // Only the result's page and its pack's list (which show the open check) are refreshed: counts did not move.
    expect(revalidate.revalidateTags.mock.calls[0]?.[0]).toEqual([`result:${r.id}`, `pack:${pack.slug}`]);
    // The public result page shows the case with its reason (our words come from the reason code).
    expect(await getPublicResult(r.id)).toMatchObject({ openCase: true, openCaseReasons: ["wrong-figures"] });
  });

  it("one open case per reader and result (409), refuses unpublished results, bad ids, bad reasons and bad JSON", async () => {
    const reader = await signedIn("contributor", "reader");
    const token = reader.token;
    const contributor = await createUser("contributor");
    const { pack } = await makePack();
    const pending = await makeResult({ packId: pack.id, contributorId: contributor.id });
    expect((await flagRequest(pending.id, { reason: "wrong-figures" }, { token })).status).toBe(404);
    for (const id of ["abc", "0", "-3", "1e3", "2147483648", "99999999999999999999"])
      expect((await flagRequest(id, { reason: "wrong-figures" }, { token })).status, id).toBe(404);
    const { r } = await published();
    const bad = await flagRequest(r.id, { reason: "i-dislike-it", note: "x".repeat(1001) }, { token });
    expect(bad.status).toBe(422);
    expect(Object.keys(((await bad.json()) as { error: { fieldErrors: object } }).error.fieldErrors).sort()).toEqual([
      "note",
      "reason",
    ]);
    expect((await flagRequest(r.id, "{not json", { token })).status).toBe(400);
    expect((await flagRequest(r.id, { reason: "duplicate" }, { token })).status).toBe(201);
    const again = await flagRequest(r.id, { reason: "other" }, { token });
    expect(again.status).toBe(409);
    expect((await flagsOf(r.id)).length).toBe(1);
    expect(await statusOf(r.id)).toBe("approved");
  });

  it("is limited per account (10 an hour) whatever the address, and per address (20 an hour) whatever the account", async () => {
    const reader = await signedIn("contributor", "busy-reader");
    for (let i = 0; i < 10; i++) {
      const { r } = await published();
      expect((await flagRequest(r.id, { reason: "other" }, { token: reader.token })).status).toBe(201);
    }
    const { r: eleventh } = await published();
    const limited = await flagRequest(eleventh.id, { reason: "other" }, { token: reader.token });
    expect(limited.status).toBe(429);
    expect(Number(limited.headers.get("retry-after"))).toBeGreaterThan(0);

    const ip = "192.0.2.77";
    for (let i = 0; i < 20; i++) {
      const { r } = await published();
      const someone = await signedIn("contributor", `reader-${i}`);
      expect((await flagRequest(r.id, { reason: "other" }, { ip, token: someone.token })).status).toBe(201);
    }
    const { r: more } = await published();
    const fresh = await signedIn("contributor", "fresh-reader");
    expect((await flagRequest(more.id, { reason: "other" }, { ip, token: fresh.token })).status).toBe(429);
    const hits = await db
      .select()
      .from(rateLimitHits)
      .where(eq(rateLimitHits.key, `flag:ip:${ip}`));
    expect(hits[0]?.count).toBe(21);
  });

  it("dismiss (kept): the flag closes with its resolver; the result never left 'approved'; no status step", async () => {
    const { pack, r } = await published();
    const flagId = await flagAsReader(r.id);
    const mod = await signedIn("moderator");
    requestState.token = mod.token;
    revalidate.revalidateTags.mockClear();
    expect(await resolveFlag(null, { flagId, resolution: "kept", note: "Figures match the log." })).toEqual({
      ok: true,
      data: { flagId, resolution: "kept", resultId: r.id, status: "approved", alsoClosed: 0, stillOpen: 0 },
    });
    const [after] = await db.select().from(readerFlags).where(eq(readerFlags.id, flagId));
    expect(after).toMatchObject({ status: "kept", resolvedById: mod.id, resolutionNote: "Figures match the log." });
    expect(await statusOf(r.id)).toBe("approved");
    expect((await eventsOf(r.id)).map((e) => e.toStatus)).toEqual(["pending"]);
    expect(revalidate.revalidateTags.mock.calls[0]?.[0]).toEqual([`result:${r.id}`, `pack:${pack.slug}`]);
    expect(await getPublicResult(r.id)).toMatchObject({ openCase: false, openCaseReasons: [] });
    expect(await resolveFlag(null, { flagId, resolution: "withdrawn", note: "Too late." })).toMatchObject({
      ok: false,
      code: "conflict",
    });
  });

  it("corrected needs a note; the case stays open while another reader's flag is open", async () => {
    const { r } = await published();
    const first = await flagAsReader(r.id, "wrong-figures");
    const second = await flagAsReader(r.id, "wrong-pack");
    expect((await getPublicResult(r.id))?.openCaseReasons).toEqual(["wrong-figures", "wrong-pack"]);
    const mod = await signedIn("moderator");
    requestState.token = mod.token;
    expect(await resolveFlag(null, { flagId: first, resolution: "corrected" })).toMatchObject({
      ok: false,
      code: "validation",
    });
    expect(
      await resolveFlag(null, { flagId: first, resolution: "corrected", note: "Pack corrected to the 4S version." }),
    ).toMatchObject({ ok: true, data: { resolution: "corrected", status: "approved", stillOpen: 1 } });
    expect((await getPublicResult(r.id))?.openCaseReasons).toEqual(["wrong-pack"]);
    expect(await resolveFlag(null, { flagId: second, resolution: "kept" })).toMatchObject({
      ok: true,
      data: { status: "approved", stillOpen: 0 },
    });
  });

  it("take out of publication: needs a reason, withdraws with a review event, closes every open flag, deletes nothing", async () => {
    const { r } = await published();
    const first = await flagAsReader(r.id, "not-a-measurement");
    await flagAsReader(r.id, "duplicate");
    const mod = await signedIn("moderator");
    requestState.token = mod.token;
    expect(await resolveFlag(null, { flagId: first, resolution: "withdrawn" })).toMatchObject({
      ok: false,
      code: "validation",
      fieldErrors: { note: [expect.stringMatching(/Say why/)] },
    });
    revalidate.revalidateTags.mockClear();
    expect(await resolveFlag(null, { flagId: first, resolution: "withdrawn", note: "Simulated log." })).toMatchObject({
      ok: true,
      data: { status: "withdrawn", alsoClosed: 1, stillOpen: 0 },
    });
    expect(await statusOf(r.id)).toBe("withdrawn");
    expect((await flagsOf(r.id)).map((f) => f.status)).toEqual(["withdrawn", "withdrawn"]);
    expect((await eventsOf(r.id)).at(-1)).toMatchObject({
      actorId: mod.id,
      fromStatus: "approved",
      toStatus: "withdrawn",
      reason: "flag-withdrawn",
      note: "Simulated log.",
    });
    // Counts changed: every list that counted it is refreshed.
    expect(revalidate.revalidateTags.mock.calls[0]?.[0]).toEqual(
      expect.arrayContaining(["newest", "groups", "catalogue"]),
    );
    expect(await getPublicResult(r.id)).toBeNull();
  });

  it("a moderator cannot resolve a flag on their own result (403: they can see it)", async () => {
    const mod = await signedIn("moderator");
    const { pack } = await makePack();
    const r = await makeResult({ packId: pack.id, contributorId: mod.id, status: "approved" });
    const flagId = await flagAsReader(r.id);
    requestState.token = mod.token;
    expect(await resolveFlag(null, { flagId, resolution: "kept" })).toMatchObject({ ok: false, code: "forbidden" });
    const open = await db
      .select()
      .from(readerFlags)
      .where(and(eq(readerFlags.id, flagId), eq(readerFlags.status, "open")));
    expect(open).toHaveLength(1);
  });
});
