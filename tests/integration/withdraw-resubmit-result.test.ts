// withdrawResult and resubmitResult: only the contributor's own results, only in the states that allow
// it; every change is a review event and earlier events are kept.
import { asc, eq } from "drizzle-orm";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { env } from "@/server/env";
import { results, reviewEvents, type ReviewStatus } from "@/db/schema";
import { settleAfterResponse } from "@/server/after-response";
import { sampleLog } from "../helpers/logs";
import { deliverQueuedMail, newestMailFor } from "../helpers/mail";
import { requestState } from "../helpers/next-mocks";
import { keysUnder } from "../helpers/storage";
import { makePack, submission, uploadLog, uploadPhoto, validMethod } from "../helpers/submission";
import { signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { submitResult } = await import("@/app/(contributor)/submit/actions/submit-result");
const { withdrawResult } = await import("@/app/(account)/account/actions/withdraw-result");
const { resubmitResult } = await import("@/app/(contributor)/submit/[resultId]/actions/resubmit-result");
const { previewStoredLog } = await import("@/app/(contributor)/submit/actions/preview-stored-log");

type Role = "contributor" | "moderator" | "admin";

/** A submitted result of a fresh user's, optionally moved on to another state by a moderator. */
async function resultOf(role: Role = "contributor", status: ReviewStatus = "pending") {
  const me = await signedIn(role);
  const { packId } = await makePack();
  requestState.token = me.token;
  const res = await submitResult(null, submission(packId, await uploadLog(me.token)));
  if (!res.ok) throw new Error(res.error);
  const id = res.data.resultId;
  if (status !== "pending") {
    await db.update(results).set({ status }).where(eq(results.id, id));
    await db
      .insert(reviewEvents)
      .values({ resultId: id, actorId: null, fromStatus: "pending", toStatus: status, reason: "test" });
  }
  return { me, id, packId };
}

const eventsOf = (id: number) =>
  db.select().from(reviewEvents).where(eq(reviewEvents.resultId, id)).orderBy(asc(reviewEvents.id));
const statusOf = async (id: number) =>
  (await db.select({ s: results.status }).from(results).where(eq(results.id, id)))[0]?.s;

describe("withdrawResult", () => {
  beforeEach(() => {
    requestState.token = null;
  });

  it("needs a session", async () => {
    const { id } = await resultOf();
    requestState.token = null;
    expect(await withdrawResult(null, { resultId: String(id) })).toMatchObject({ ok: false, code: "unauthenticated" });
    expect(await statusOf(id)).toBe("pending");
  });

  it.each(["contributor", "moderator", "admin"] as const)(
    "lets a %s withdraw their own pending result, as a review event",
    async (role) => {
      const { me, id } = await resultOf(role);
      expect(await withdrawResult(null, { resultId: String(id) })).toMatchObject({ ok: true });
      expect(await statusOf(id)).toBe("withdrawn");
      const events = await eventsOf(id);
      expect(events.map((e) => [e.fromStatus, e.toStatus, e.actorId])).toEqual([
        [null, "pending", me.id],
        ["pending", "withdrawn", me.id],
      ]);
    },
  );

  it.each(["contributor", "moderator", "admin"] as const)(
    "refuses a %s withdrawing someone else's result exactly like one that does not exist (404)",
    async (role) => {
      const { id } = await resultOf();
      const other = await signedIn(role);
      requestState.token = other.token;
      const foreign = await withdrawResult(null, { resultId: String(id) });
      const missing = await withdrawResult(null, { resultId: "2000000000" });
      expect(missing).toMatchObject({ ok: false, code: "not_found" });
      expect(foreign).toEqual(missing);
      expect(await statusOf(id)).toBe("pending");
    },
  );

  it("refuses a result that is no longer waiting (approved) with a conflict", async () => {
    const { id } = await resultOf("contributor", "approved");
    const res = await withdrawResult(null, { resultId: String(id) });
    expect(res).toMatchObject({ ok: false, code: "conflict" });
    expect(await statusOf(id)).toBe("approved");
  });
});

describe("resubmitResult", () => {
  const answer = (id: number, over: Record<string, unknown> = {}) => ({
    resultId: String(id),
    method: { ...validMethod, cutoffVPerCell: "3.0", notes: "Probe taped to the middle of the wide face." },
    log: null,
    photoKeys: [],
    note: "Probe position added; cut-off corrected.",
    declaration: true,
    ...over,
  });

  beforeEach(() => {
    requestState.token = null;
  });

  it("puts a result waiting for its contributor's answer back to pending, with the edited card, recomputed figures, the history kept and a receipt", async () => {
    const { me, id } = await resultOf("contributor", "awaiting_answer");
    const before = (await db.select().from(results).where(eq(results.id, id)))[0];
    const res = await resubmitResult(null, answer(id));
    expect(res).toMatchObject({ ok: true, data: { resultId: id } });
    const after = (await db.select().from(results).where(eq(results.id, id)))[0];
    expect(after?.status).toBe("pending");
    expect(after?.cutoffVPerCell).toBe(3);
    expect(after?.notes).toMatch(/Probe taped/);
    expect(after?.groupKey).not.toBe(before?.groupKey); // the cut-off band moved
    expect(after?.figures.timeToCutoffS).not.toBe(before?.figures.timeToCutoffS);
    const events = await eventsOf(id);
    expect(events.map((e) => [e.fromStatus, e.toStatus])).toEqual([
      [null, "pending"],
      ["pending", "awaiting_answer"],
      ["awaiting_answer", "pending"],
    ]);
    expect(events[2]).toMatchObject({ actorId: me.id, note: "Probe position added; cut-off corrected." });
    // The answer's receipt was queued with it; the worker's step sends it, with the result's number and link.
    await deliverQueuedMail();
    const mail = await newestMailFor(me.email, 5000, /^Answer received/);
    expect(mail.subject).toMatch(new RegExp(`^Answer received: result #${id}, `));
    expect(mail.text).toContain(`${env().APP_URL}/account/results/${id}`);
  });

  it("takes a corrected log and extra photos", async () => {
    const { me, id } = await resultOf("moderator", "awaiting_answer");
    const log = await uploadLog(me.token, sampleLog({ seed: 77 }).csv, "corrected.csv");
    const photo = await uploadPhoto(me.token);
    expect(
      (await resubmitResult(null, answer(id, { log: { key: log.key, filename: log.filename }, photoKeys: [photo] })))
        .ok,
    ).toBe(true);
    const row = (await db.select().from(results).where(eq(results.id, id)))[0];
    expect(row?.logSha256).toBe(log.sha256);
    expect(row?.logFilename).toBe("corrected.csv");
    expect(row?.photoKeys).toHaveLength(1);
    await settleAfterResponse();
    expect(await keysUnder(`incoming/${me.id}/`)).toEqual([]);
  });

  it("refuses someone else's result (404, like a missing one), a pending one (409), no session (401), and an answer without a note (422)", async () => {
    const { id } = await resultOf("contributor", "awaiting_answer");
    expect((await resubmitResult(null, answer(id, { note: "" }))).fieldErrors?.note?.[0]).toMatch(
      /Enter the answer to the moderator/,
    );
    const other = await signedIn("admin");
    requestState.token = other.token;
    expect(await resubmitResult(null, answer(id))).toMatchObject({ ok: false, code: "not_found" });
    requestState.token = null;
    expect(await resubmitResult(null, answer(id))).toMatchObject({ ok: false, code: "unauthenticated" });
    const pending = await resultOf();
    expect(await resubmitResult(null, answer(pending.id))).toMatchObject({ ok: false, code: "conflict" });
    expect(await statusOf(id)).toBe("awaiting_answer");
  });
});

describe("previewStoredLog", () => {
  it("re-checks an uploaded draft log against the current pack and method card", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const { packId } = await makePack();
    const log = await uploadLog(me.token, sampleLog({ cells: 6 }).csv);
    const values = submission(packId, log);
    const res = await previewStoredLog(null, { log: values.log, pack: values.pack, method: values.method });
    expect(res.ok).toBe(true);
    if (!res.ok) return;
    expect(res.data.figures.cells).toBe(4);
    expect(res.data.checks.map((c) => c.code)).toContain("cells-mismatch");
    const other = await signedIn("contributor");
    requestState.token = other.token;
    expect(
      (await previewStoredLog(null, { log: values.log, pack: values.pack, method: values.method })).fieldErrors?.log,
    ).toBeDefined();
  });
});
