// Site settings (/admin/settings): only admins save them, each save is audited, the notice reaches every
// page through the `settings` tag, and a pause really refuses submissions (checked in the database, not a
// cache) until it is lifted — with the draft's files left in place.
import { and, desc, eq } from "drizzle-orm";
import { afterAll, beforeEach, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { auditEvents, results } from "@/db/schema";
import { getSiteSettings } from "@/db/queries/site-settings";
import { requestState } from "../helpers/next-mocks";
import { keysUnder } from "../helpers/storage";
import { makePack, submission, uploadLog } from "../helpers/submission";
import { signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { saveSiteSettings } = await import("@/app/(admin)/admin/settings/actions/save-site-settings");
const { submitResult } = await import("@/app/(contributor)/submit/actions/submit-result");

function form(values: Record<string, string>): FormData {
  const fd = new FormData();
  for (const [k, v] of Object.entries(values)) fd.set(k, v);
  return fd;
}

describe("site settings", () => {
  beforeEach(() => {
    requestState.token = null;
    requestState.revalidated = [];
  });
  afterAll(async () => {
    // Leave the shared test database open for submissions.
    requestState.token = (await signedIn("admin", "settings-cleanup")).token;
    await saveSiteSettings(null, form({ notice: "" }));
  });

  it("starts from the defaults: no notice, submissions open", async () => {
    expect(await getSiteSettings()).toMatchObject({ notice: null, submissionsPaused: false, pauseReason: null });
  });

  it("lets an admin set a notice (whitespace tidied), audits it and revalidates the settings tag", async () => {
    const admin = await signedIn("admin", "settings");
    requestState.token = admin.token;
    const res = await saveSiteSettings(null, form({ notice: "  Planned maintenance   on Sunday 09:00 UTC. " }));
    expect(res).toEqual({
      ok: true,
      data: { notice: "Planned maintenance on Sunday 09:00 UTC.", submissionsPaused: false, pauseReason: null },
    });
    expect(await getSiteSettings()).toMatchObject({
      notice: "Planned maintenance on Sunday 09:00 UTC.",
      submissionsPaused: false,
    });
    expect(requestState.revalidated).toContain("tag:settings");
    const [event] = await db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.action, "settings.edit"), eq(auditEvents.actorId, admin.id)))
      .orderBy(desc(auditEvents.id))
      .limit(1);
    expect(event?.data).toMatchObject({ to: { notice: "Planned maintenance on Sunday 09:00 UTC." } });
  });

  it("refuses moderators and contributors (403) and nobody (401), changing nothing", async () => {
    const before = await getSiteSettings();
    for (const role of ["contributor", "moderator"] as const) {
      requestState.token = (await signedIn(role)).token;
      expect(await saveSiteSettings(null, form({ notice: "hijack" }))).toMatchObject({ ok: false, code: "forbidden" });
    }
    requestState.token = null;
    expect(await saveSiteSettings(null, form({ notice: "hijack" }))).toMatchObject({
      ok: false,
      code: "unauthenticated",
    });
    expect(await getSiteSettings()).toEqual(before);
  });

  it("explains bad input: a pause needs a reason, texts have a length limit", async () => {
    requestState.token = (await signedIn("admin")).token;
    const noReason = await saveSiteSettings(null, form({ submissionsPaused: "on", pauseReason: "   " }));
    expect(noReason).toMatchObject({ ok: false, code: "validation" });
    expect(noReason.ok ? null : noReason.fieldErrors?.pauseReason?.[0]).toMatch(/Say why/);
    const long = await saveSiteSettings(null, form({ notice: "x".repeat(301) }));
    expect(long.ok ? null : long.fieldErrors?.notice?.[0]).toMatch(/at most 300/);
    expect((await getSiteSettings()).submissionsPaused).toBe(false);
  });

  it("a pause refuses submissions with its reason and keeps the draft's files; lifting it lets the same submission through", async () => {
    const admin = await signedIn("admin", "pauser");
    requestState.token = admin.token;
    expect(
      await saveSiteSettings(null, form({ submissionsPaused: "on", pauseReason: "moving to a new server" })),
    ).toMatchObject({ ok: true });

    const { packId } = await makePack();
    const me = await signedIn("contributor", "paused-tester");
    requestState.token = me.token;
    const log = await uploadLog(me.token);
    const refused = await submitResult(null, submission(packId, log));
    expect(refused).toMatchObject({ ok: false, code: "conflict" });
    expect(refused.error).toContain("Submissions are paused: moving to a new server");
    expect(await db.select().from(results).where(eq(results.contributorId, me.id))).toHaveLength(0);
    expect(await keysUnder(`incoming/${me.id}/`)).toContain(log.key);

    requestState.token = admin.token;
    expect(await saveSiteSettings(null, form({}))).toMatchObject({
      ok: true,
      data: { submissionsPaused: false, pauseReason: null },
    });
    requestState.token = me.token;
    expect(await submitResult(null, submission(packId, log))).toMatchObject({ ok: true, data: { created: true } });
  });
});
