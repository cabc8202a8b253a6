// Review decisions through the server actions: approve, reject (with a reason), request changes — each with
// its review event in the same transaction, revalidation of the pack/maker/group tags after approval, and
// e-mails caught by the local mail catcher. A moderator cannot decide their own result; two moderators
// cannot both decide the same one.
import { beforeEach, describe, expect, it, vi } from "vitest";
import { asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { results, reviewEvents, watches } from "@/db/schema";
import { requestState } from "../helpers/next-mocks";
import { caughtFor, newestMailFor } from "../helpers/mail";
import { makePack, makeResult } from "../helpers/review-fixtures";
import { signedIn } from "../helpers/users";

const revalidate = vi.hoisted(() => ({ revalidateTags: vi.fn() }));
vi.mock("@/server/revalidate", () => revalidate);
vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { approveResult } = await import("@/app/(review)/review/[id]/actions/approve-result");
const { rejectResult } = await import("@/app/(review)/review/[id]/actions/reject-result");
const { requestChanges } = await import("@/app/(review)/review/[id]/actions/request-changes");

async function events(resultId: number) {
  return db.select().from(reviewEvents).where(eq(reviewEvents.resultId, resultId)).orderBy(asc(reviewEvents.id));
}
async function statusOf(resultId: number) {
  const [r] = await db
    .select({ status: results.status, publishedAt: results.publishedAt })
    .from(results)
    .where(eq(results.id, resultId));
  return r;
}

describe("review decisions", () => {
  beforeEach(() => {
    requestState.token = null;
    revalidate.revalidateTags.mockClear();
  });

  it("approve publishes the result, writes the audit event, revalidates pack, maker and group tags, and e-mails contributor and watchers", async () => {
    const contributor = await signedIn("contributor", "tester");
    const watcher = await signedIn("contributor", "watcher");
    const mod = await signedIn("moderator");
    const { maker, pack } = await makePack();
    await db.insert(watches).values([
      { userId: watcher.id, packId: pack.id },
      { userId: contributor.id, packId: pack.id },
    ]);
    const r = await makeResult({ packId: pack.id, contributorId: contributor.id });
    requestState.token = mod.token;

    const res = await approveResult(null, { resultId: r.id, note: "Log and method card agree." });
    expect(res).toEqual({ ok: true, data: { resultId: r.id, status: "approved" } });
    const s = await statusOf(r.id);
    expect(s?.status).toBe("approved");
    expect(s?.publishedAt).toBeInstanceOf(Date);
    const ev = await events(r.id);
    expect(ev.at(-1)).toMatchObject({
      actorId: mod.id,
      fromStatus: "pending",
      toStatus: "approved",
      note: "Log and method card agree.",
    });
    expect(ev.at(-1)?.createdAt).toBeInstanceOf(Date);

    expect(revalidate.revalidateTags).toHaveBeenCalledTimes(1);
    const tags = revalidate.revalidateTags.mock.calls[0]?.[0] as string[];
    expect(tags).toEqual(
      expect.arrayContaining([`pack:${pack.slug}`, `maker:${maker.slug}`, `group:${r.groupKey}`, "packs", "results"]),
    );

    const decision = await newestMailFor(contributor.email);
    expect(decision.subject).toMatch(/^Result approved: /);
    expect(decision.text).toContain(`/results/${r.id}`);
    const watched = await newestMailFor(watcher.email);
    expect(watched.subject).toMatch(/^New result: /);
    expect(watched.text).toContain(`/packs/${pack.slug}`);
    // The contributor watches the pack too but gets the decision, not a second "new result" message.
    expect(caughtFor(contributor.email).filter((m) => m.subject.startsWith("New result"))).toHaveLength(0);
  });

  it("reject stores the reason from the list and the note, does not publish or revalidate, and e-mails the contributor", async () => {
    const contributor = await signedIn("contributor");
    const mod = await signedIn("moderator");
    const { pack } = await makePack();
    const r = await makeResult({ packId: pack.id, contributorId: contributor.id });
    requestState.token = mod.token;
    const res = await rejectResult(null, { resultId: r.id, reason: "incomplete-method", note: "No cut-off stated." });
    expect(res.ok).toBe(true);
    expect((await statusOf(r.id))?.status).toBe("rejected");
    expect((await statusOf(r.id))?.publishedAt).toBeNull();
    expect((await events(r.id)).at(-1)).toMatchObject({
      actorId: mod.id,
      fromStatus: "pending",
      toStatus: "rejected",
      reason: "incomplete-method",
      note: "No cut-off stated.",
    });
    expect(revalidate.revalidateTags).not.toHaveBeenCalled();
    const mail = await newestMailFor(contributor.email);
    expect(mail.subject).toMatch(/^Result not accepted: /);
    expect(mail.text).toContain("Incomplete method");
  });

  it("reject with reason “other” needs a note; an unknown reason is refused (422)", async () => {
    const contributor = await signedIn("contributor");
    const mod = await signedIn("moderator");
    const { pack } = await makePack();
    const r = await makeResult({ packId: pack.id, contributorId: contributor.id });
    requestState.token = mod.token;
    const other = await rejectResult(null, { resultId: r.id, reason: "other" });
    expect(other).toMatchObject({ ok: false, code: "validation" });
    if (!other.ok) expect(Object.keys(other.fieldErrors ?? {})).toEqual(["note"]);
    const fd = new FormData();
    fd.set("resultId", String(r.id));
    fd.set("reason", "because");
    expect(await rejectResult(null, fd)).toMatchObject({ ok: false, code: "validation" });
    expect((await statusOf(r.id))?.status).toBe("pending");
  });

  it("request changes needs a note, sends the result back and e-mails the contributor", async () => {
    const contributor = await signedIn("contributor");
    const mod = await signedIn("moderator");
    const { pack } = await makePack();
    const r = await makeResult({ packId: pack.id, contributorId: contributor.id });
    requestState.token = mod.token;
    expect(await requestChanges(null, { resultId: r.id, note: "" })).toMatchObject({ ok: false, code: "validation" });
    const res = await requestChanges(null, { resultId: r.id, note: "Where was the temperature probe?" });
    expect(res.ok).toBe(true);
    expect((await events(r.id)).at(-1)).toMatchObject({
      actorId: mod.id,
      fromStatus: "pending",
      toStatus: "changes_requested",
      note: "Where was the temperature probe?",
    });
    const mail = await newestMailFor(contributor.email);
    expect(mail.subject).toMatch(/^Changes requested: /);
    expect(mail.text).toContain("Where was the temperature probe?");
  });

  it("refuses self-review: a moderator (or admin) cannot decide their own result, and nothing is written", async () => {
    for (const role of ["moderator", "admin"] as const) {
      const me = await signedIn(role);
      const { pack } = await makePack();
      const r = await makeResult({ packId: pack.id, contributorId: me.id });
      requestState.token = me.token;
      for (const call of [
        () => approveResult(null, { resultId: r.id }),
        () => rejectResult(null, { resultId: r.id, reason: "duplicate" }),
        () => requestChanges(null, { resultId: r.id, note: "Please fix it." }),
      ]) {
        expect(await call()).toMatchObject({
          ok: false,
          code: "forbidden",
          error: expect.stringMatching(/own result/),
        });
      }
      expect((await statusOf(r.id))?.status).toBe("pending");
      expect(await events(r.id)).toHaveLength(1);
    }
  });

  it("a decided result cannot be decided again (409), and of two concurrent decisions exactly one wins", async () => {
    const contributor = await signedIn("contributor");
    const modA = await signedIn("moderator", "mod-a");
    const { pack } = await makePack();
    const r = await makeResult({ packId: pack.id, contributorId: contributor.id });
    requestState.token = modA.token;
    expect((await approveResult(null, { resultId: r.id })).ok).toBe(true);
    expect(await rejectResult(null, { resultId: r.id, reason: "duplicate" })).toMatchObject({
      ok: false,
      code: "conflict",
    });

    const { decideResult } = await import("@/server/review");
    const modB = await signedIn("moderator", "mod-b");
    const r2 = await makeResult({ packId: pack.id, contributorId: contributor.id });
    const outcomes = await Promise.allSettled([
      decideResult(modA.id, r2.id, { kind: "approve", note: null }),
      decideResult(modB.id, r2.id, { kind: "reject", reason: "wrong-data", note: null }),
    ]);
    expect(outcomes.filter((o) => o.status === "fulfilled")).toHaveLength(1);
    const decided = (await events(r2.id)).filter((e) => e.fromStatus === "pending");
    expect(decided).toHaveLength(1);
  });

  it("a missing result is a 404", async () => {
    const mod = await signedIn("moderator");
    requestState.token = mod.token;
    expect(await approveResult(null, { resultId: 999_999_999 })).toMatchObject({ ok: false, code: "not_found" });
  });
});
