// Review decisions through the server actions: approve, reject (with a reason), send back for an answer —
// each with its review event and its e-mails queued in the same transaction, revalidation of the
// pack/maker/group tags after approval, and the e-mails the worker's step then sends caught by the local mail
// catcher. Every e-mail about a result links to the contributor's own view of it. A moderator cannot decide
// their own result; two moderators cannot both decide the same one.
import { beforeEach, describe, expect, it, vi } from "vitest";
import { asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { env } from "@/server/env";
import { mailOutbox, packEmails, results, reviewEvents } from "@/db/schema";
import { requestState } from "../helpers/next-mocks";
import { caughtFor, deliverQueuedMail, newestMailFor } from "../helpers/mail";
import { makePack, makeResult } from "../helpers/review-fixtures";
import { signedIn } from "../helpers/users";

const revalidate = vi.hoisted(() => ({ revalidateTags: vi.fn() }));
vi.mock("@/server/revalidate", () => revalidate);
vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { approveResult } = await import("@/app/(review)/review/[id]/actions/approve-result");
const { rejectResult } = await import("@/app/(review)/review/[id]/actions/reject-result");
const { askContributor } = await import("@/app/(review)/review/[id]/actions/ask-contributor");

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

  it("approve publishes the result, writes the audit event, revalidates pack, maker and group tags, and e-mails the contributor and the pack's e-mail list", async () => {
    const contributor = await signedIn("contributor", "tester");
    const reader = await signedIn("contributor", "reader");
    const mod = await signedIn("moderator");
    const { maker, pack } = await makePack();
    await db.insert(packEmails).values([
      { userId: reader.id, packId: pack.id },
      { userId: contributor.id, packId: pack.id },
    ]);
    const r = await makeResult({ packId: pack.id, contributorId: contributor.id });
    requestState.token = mod.token;

    const res = await approveResult(null, { resultId: r.id, note: "Log and method card agree." });
    expect(res).toEqual({ ok: true, data: { resultId: r.id, status: "approved", packSlug: pack.slug, queuedMail: 2 } });
    // Both e-mails were queued with the decision, none sent by the request itself.
    const queued = await db.select().from(mailOutbox).where(eq(mailOutbox.to, reader.email));
    expect(queued).toMatchObject([{ sentAt: null, attempts: 0 }]);
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
      expect.arrayContaining([
        `pack:${pack.slug}`,
        `maker:${maker.slug}`,
        `group:${r.groupKey}`,
        "catalogue",
        "newest",
      ]),
    );
    // Scoped: no tag that every pack page, result page and ranking carried (scoped-revalidation.test.ts has the rest).
    expect(tags).not.toContain("packs");
    expect(tags).not.toContain("results");

    await deliverQueuedMail();
    const decision = await newestMailFor(contributor.email);
    expect(decision.subject).toMatch(new RegExp(`^Approved and published: result #${r.id}, `));
    expect(decision.text).toContain(`/account/results/${r.id}`);
    const news = await newestMailFor(reader.email);
    expect(news.subject).toMatch(/^New result: /);
    expect(news.text).toContain(`/packs/${pack.slug}`);
    // The contributor asked for the pack's e-mails too but gets the decision, not a second "new result" message.
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
    await deliverQueuedMail();
    const mail = await newestMailFor(contributor.email);
    expect(mail.subject).toMatch(new RegExp(`^Not accepted: result #${r.id}, `));
    expect(mail.text).toContain("Incomplete method");
    expect(mail.text).toContain(`/account/results/${r.id}`);
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

  it("sending back needs a note, waits for the contributor's answer and e-mails them a link to their view", async () => {
    const contributor = await signedIn("contributor");
    const mod = await signedIn("moderator");
    const { pack } = await makePack();
    const r = await makeResult({ packId: pack.id, contributorId: contributor.id });
    requestState.token = mod.token;
    expect(await askContributor(null, { resultId: r.id, note: "" })).toMatchObject({ ok: false, code: "validation" });
    const res = await askContributor(null, { resultId: r.id, note: "Where was the temperature probe?" });
    expect(res.ok).toBe(true);
    expect((await events(r.id)).at(-1)).toMatchObject({
      actorId: mod.id,
      fromStatus: "pending",
      toStatus: "awaiting_answer",
      note: "Where was the temperature probe?",
    });
    await deliverQueuedMail();
    const mail = await newestMailFor(contributor.email);
    expect(mail.subject).toMatch(new RegExp(`^Waiting for your answer: result #${r.id}, `));
    expect(mail.text).toContain("Where was the temperature probe?");
    expect(mail.text).toContain(`${env().APP_URL}/account/results/${r.id}`);
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
        () => askContributor(null, { resultId: r.id, note: "Please fix it." }),
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
      decideResult(modA.id, r2.id, { kind: "approve", note: null, catalogue: { intoPackId: null, intoMakerId: null } }),
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
