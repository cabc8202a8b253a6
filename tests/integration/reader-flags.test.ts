// Reader flags: POST /api/v1/results/[id]/flags (public, zod-validated, rate-limited per IP) turns a
// published result disputed; a moderator resolves the flag (keep, correct with a note, withdraw) through the
// resolveFlag action. Nothing is deleted: a withdrawn result and its history stay.
import { beforeEach, describe, expect, it, vi } from "vitest";
import { asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { readerFlags, results, reviewEvents } from "@/db/schema";
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
function flagRequest(id: number | string, body: unknown, opts: { ip?: string; token?: string } = {}) {
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

describe("reader flags", () => {
  beforeEach(() => {
    requestState.token = null;
    revalidate.revalidateTags.mockClear();
  });

  it("any reader flags a published result: 201, the result is disputed for everyone, with its audit event and revalidation", async () => {
    const { pack, r } = await published();
    const res = await flagRequest(r.id, { reason: "wrong-figures", note: "Capacity is higher than the label." });
    expect(res.status).toBe(201);
    const body = (await res.json()) as { flag: { id: number } };
    const [flag] = await db.select().from(readerFlags).where(eq(readerFlags.id, body.flag.id));
    expect(flag).toMatchObject({ resultId: r.id, reason: "wrong-figures", status: "open", reporterId: null });
    expect(flag?.reporterHash).toMatch(/^[0-9a-f]{64}$/);
    expect(await statusOf(r.id)).toBe("disputed");
    expect((await eventsOf(r.id)).at(-1)).toMatchObject({
      fromStatus: "approved",
      toStatus: "disputed",
      reason: "reader-flag",
      actorId: null,
    });
    expect(revalidate.revalidateTags.mock.calls[0]?.[0]).toContain(`pack:${pack.slug}`);
  });

  it("a signed-in reader's flag records who filed it; a second flag keeps the result disputed without another transition", async () => {
    const { r } = await published();
    const reader = await signedIn("contributor", "reader");
    expect((await flagRequest(r.id, { reason: "duplicate" }, { token: reader.token })).status).toBe(201);
    expect((await flagRequest(r.id, { reason: "other", note: "Same log as another result." })).status).toBe(201);
    const flags = await db
      .select()
      .from(readerFlags)
      .where(eq(readerFlags.resultId, r.id))
      .orderBy(asc(readerFlags.id));
    expect(flags.map((f) => f.reporterId)).toEqual([reader.id, null]);
    expect((await eventsOf(r.id)).filter((e) => e.toStatus === "disputed")).toHaveLength(1);
  });

  it("refuses unpublished results (404), bad ids (404), bad reasons (422) and bad JSON (400)", async () => {
    const contributor = await createUser("contributor");
    const { pack } = await makePack();
    const pending = await makeResult({ packId: pack.id, contributorId: contributor.id });
    expect((await flagRequest(pending.id, { reason: "wrong-figures" })).status).toBe(404);
    expect((await flagRequest("abc", { reason: "wrong-figures" })).status).toBe(404);
    const { r } = await published();
    const bad = await flagRequest(r.id, { reason: "i-dislike-it", note: "x".repeat(1001) });
    expect(bad.status).toBe(422);
    expect(Object.keys(((await bad.json()) as { error: { fieldErrors: object } }).error.fieldErrors).sort()).toEqual([
      "note",
      "reason",
    ]);
    expect((await flagRequest(r.id, "{not json")).status).toBe(400);
    expect(await statusOf(r.id)).toBe("approved");
  });

  it("is rate-limited per IP (10 an hour): the 11th answers 429 with Retry-After", async () => {
    const { r } = await published();
    const ip = "192.0.2.77";
    for (let i = 0; i < 10; i++)
      expect((await flagRequest(r.id, { reason: "other", note: `try ${i}` }, { ip })).status).toBe(201);
    const limited = await flagRequest(r.id, { reason: "other" }, { ip });
    expect(limited.status).toBe(429);
    expect(Number(limited.headers.get("retry-after"))).toBeGreaterThan(0);
  });

  it("keep: the flag is closed with its resolver and the result is approved again, with an audit event", async () => {
    const { r } = await published();
    await flagRequest(r.id, { reason: "wrong-figures" });
    const [flag] = await db.select().from(readerFlags).where(eq(readerFlags.resultId, r.id));
    const mod = await signedIn("moderator");
    requestState.token = mod.token;
    expect(await resolveFlag(null, { flagId: flag!.id, resolution: "kept", note: "Figures match the log." })).toEqual({
      ok: true,
      data: { flagId: flag!.id, resolution: "kept", resultId: r.id, status: "approved", alsoClosed: 0 },
    });
    const [after] = await db.select().from(readerFlags).where(eq(readerFlags.id, flag!.id));
    expect(after).toMatchObject({ status: "kept", resolvedById: mod.id, resolutionNote: "Figures match the log." });
    expect((await eventsOf(r.id)).at(-1)).toMatchObject({
      actorId: mod.id,
      fromStatus: "disputed",
      toStatus: "approved",
      reason: "flag-kept",
    });
    expect(await resolveFlag(null, { flagId: flag!.id, resolution: "withdrawn" })).toMatchObject({
      ok: false,
      code: "conflict",
    });
  });

  it("correct needs a note; with two open flags the result stays disputed until the last is resolved", async () => {
    const { r } = await published();
    await flagRequest(r.id, { reason: "wrong-figures" });
    await flagRequest(r.id, { reason: "wrong-pack" });
    const flags = await db
      .select()
      .from(readerFlags)
      .where(eq(readerFlags.resultId, r.id))
      .orderBy(asc(readerFlags.id));
    const mod = await signedIn("moderator");
    requestState.token = mod.token;
    expect(await resolveFlag(null, { flagId: flags[0]!.id, resolution: "corrected" })).toMatchObject({
      ok: false,
      code: "validation",
    });
    expect(
      await resolveFlag(null, {
        flagId: flags[0]!.id,
        resolution: "corrected",
        note: "Pack corrected to the 4S version.",
      }),
    ).toMatchObject({ ok: true, data: { resolution: "corrected", status: "disputed", alsoClosed: 0 } });
    expect(await statusOf(r.id)).toBe("disputed");
    expect(await resolveFlag(null, { flagId: flags[1]!.id, resolution: "kept" })).toMatchObject({
      ok: true,
      data: { status: "approved" },
    });
  });

  it("withdraw: the result is withdrawn, every open flag closes, and nothing is deleted (result, flags and history stay)", async () => {
    const { r } = await published();
    await flagRequest(r.id, { reason: "not-a-measurement" });
    await flagRequest(r.id, { reason: "duplicate" });
    const [first] = await db
      .select()
      .from(readerFlags)
      .where(eq(readerFlags.resultId, r.id))
      .orderBy(asc(readerFlags.id));
    const mod = await signedIn("moderator");
    requestState.token = mod.token;
    expect(
      await resolveFlag(null, { flagId: first!.id, resolution: "withdrawn", note: "Simulated log." }),
    ).toMatchObject({ ok: true, data: { status: "withdrawn", alsoClosed: 1 } });
    expect(await statusOf(r.id)).toBe("withdrawn");
    const flags = await db.select().from(readerFlags).where(eq(readerFlags.resultId, r.id));
    expect(flags.map((f) => f.status)).toEqual(["withdrawn", "withdrawn"]);
    expect((await eventsOf(r.id)).map((e) => e.toStatus)).toEqual(["pending", "disputed", "withdrawn"]);
  });

  it("a moderator cannot resolve a flag on their own result", async () => {
    const mod = await signedIn("moderator");
    const { pack } = await makePack();
    const r = await makeResult({ packId: pack.id, contributorId: mod.id, status: "approved" });
    await flagRequest(r.id, { reason: "wrong-figures" });
    const [flag] = await db.select().from(readerFlags).where(eq(readerFlags.resultId, r.id));
    requestState.token = mod.token;
    expect(await resolveFlag(null, { flagId: flag!.id, resolution: "kept" })).toMatchObject({
      ok: false,
      code: "forbidden",
    });
    expect(await statusOf(r.id)).toBe("disputed");
  });
});
