// submitResult: the whole submission in one transaction, idempotent, rate-limited, figures recomputed on
// the server, files moved out of the drafts, receipt queued in the outbox and sent after the response.
import { and, eq } from "drizzle-orm";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { env } from "@/server/env";
import { mailOutbox, makers, packs, results, reviewEvents } from "@/db/schema";
import { hitRateLimit } from "@/db/mutations/rate-limits";
import { settleAfterResponse } from "@/server/after-response";
import { groupKey } from "@/lib/analysis";
import { logKey } from "@/server/storage";
import { sampleLog } from "../helpers/logs";
import { deliverQueuedMail, newestMailFor } from "../helpers/mail";
import { requestState } from "../helpers/next-mocks";
import { getObjectText, keysUnder } from "../helpers/storage";
import { makePack, noProposal, submission, uploadLog, uploadPhoto, validMethod } from "../helpers/submission";
import { createSession, createUser, signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { submitResult } = await import("@/app/(contributor)/submit/actions/submit-result");

const resultsOf = (userId: string) => db.select().from(results).where(eq(results.contributorId, userId));

describe("submitResult", () => {
  beforeEach(() => {
    requestState.token = null;
  });

  it("refuses without a session, and with a session that expired mid-form, saying the draft is kept", async () => {
    const { packId } = await makePack();
    const me = await signedIn("contributor");
    const log = await uploadLog(me.token);
    const none = await submitResult(null, submission(packId, log));
    expect(none).toMatchObject({ ok: false, code: "unauthenticated" });
    requestState.token = await createSession(me.id, -1);
    const expired = await submitResult(null, submission(packId, log));
    expect(expired).toMatchObject({ ok: false, code: "unauthenticated" });
    expect(expired.error).toMatch(/draft is kept/);
    expect(await resultsOf(me.id)).toHaveLength(0);
  });

  it.each(["contributor", "moderator", "admin"] as const)(
    "lets a %s submit: result, figures from the stored log, first review event, receipt",
    async (role) => {
      const { packId } = await makePack();
      const me = await signedIn(role);
      requestState.token = me.token;
      const { csv, truth } = sampleLog({ seed: 100 + role.length }); // a log of its own: no duplicate-log flag
      const log = await uploadLog(me.token, csv);
      const photo = await uploadPhoto(me.token);
      const res = await submitResult(null, submission(packId, log, { photoKeys: [photo] }));
      expect(res.ok).toBe(true);
      if (!res.ok) return;
      expect(res.data.created).toBe(true);
      const [row] = await resultsOf(me.id);
      expect(row).toBeDefined();
      if (!row) return;
      expect(row.status).toBe("pending");
      expect(row.packStartTemperatureC).toBe(22.5); // "22,5" typed with a decimal comma
      expect(row.capacityMah).toBeCloseTo(truth.deliveredMah, -1);
      expect(row.figures.cells).toBe(4);
      expect(row.loadRateC).toBeCloseTo(10, 5);
      expect(row.groupKey).toBe(
        groupKey({
          resistanceMethod: "dc-step",
          ambientC: 22,
          cutoffVPerCell: 3.3,
          loadCurrentA: 13,
          ratedMah: 1300,
          cyclesBeforeTest: 2,
        }).key,
      );
      expect(row.logKey).toBe(logKey(log.sha256));
      expect(row.logSha256).toBe(log.sha256);
      expect(row.logFilename).toBe("bench.csv");
      expect(row.photoKeys).toEqual([photo.replace("incoming/", "photos/").replace("/photo-", "/")]);
      // No check against the card fails; group-based plausibility flags depend on other approved results in the
      // shared test database, so they are tested on their own (plausibility-flags.test.ts).
      expect(
        row.flags.filter((f) =>
          [
            "cutoff-not-reached",
            "cells-mismatch",
            "load-mismatch",
            "stop-temperature-passed",
            "duplicate-log",
            "capacity-above-rated",
            "temperature-mismatch",
            "proposed-catalogue",
          ].includes(f.code),
        ),
      ).toEqual([]);
      expect(await getObjectText(row.logKey)).toBe(csv);
      const events = await db.select().from(reviewEvents).where(eq(reviewEvents.resultId, row.id));
      expect(events).toEqual([expect.objectContaining({ actorId: me.id, fromStatus: null, toStatus: "pending" })]);
      await settleAfterResponse();
      expect(await keysUnder(`incoming/${me.id}/`)).toEqual([]); // drafts removed once committed
      // The receipt was queued with the result and carries its number and the contributor's view of it.
      const [queued] = await db.select().from(mailOutbox).where(eq(mailOutbox.to, me.email));
      expect(queued).toMatchObject({ sentAt: null, attempts: 0 });
      await deliverQueuedMail();
      const mail = await newestMailFor(me.email);
      expect(mail.subject).toMatch(new RegExp(`^Result #${row.id} received: Testmaker`));
      expect(mail.text).toContain(`${env().APP_URL}/account/results/${row.id}`);
      expect(requestState.revalidated).toContain("/account");
    },
  );

  it("makes one result from a double click: the same idempotency key, in a row or at once", async () => {
    const { packId } = await makePack();
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const values = submission(packId, await uploadLog(me.token));
    const [a, b] = await Promise.all([submitResult(null, values), submitResult(null, values)]);
    const c = await submitResult(null, values);
    const ids = [a, b, c].map((r) => (r.ok ? r.data.resultId : null));
    expect(new Set(ids).size).toBe(1);
    expect(ids[0]).not.toBeNull();
    expect(await resultsOf(me.id)).toHaveLength(1);
    await settleAfterResponse();
    expect(await db.$count(mailOutbox, eq(mailOutbox.to, me.email))).toBe(1);
  });

  it("is rate-limited per contributor", async () => {
    const { packId } = await makePack();
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const log = await uploadLog(me.token);
    for (let k = 0; k < 20; k++) await hitRateLimit(`submit:${me.id}`, 3600);
    const res = await submitResult(null, submission(packId, log));
    expect(res).toMatchObject({ ok: false, code: "rate_limited" });
  });

  it("puts each bad value on its own field: a pack that does not exist, a method card out of bounds, a missing declaration", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const log = await uploadLog(me.token);
    const gone = await submitResult(null, submission(2_000_000_000, log));
    expect(gone.ok).toBe(false);
    expect(gone.fieldErrors?.["pack.packId"]?.[0]).toMatch(/not in the catalogue/);
    const { packId } = await makePack();
    const bad = await submitResult(
      null,
      submission(packId, log, {
        method: {
          ...validMethod,
          ambientTemperatureC: "-25",
          cutoffVPerCell: "4.5",
          stopTemperatureC: "95",
          loadCurrentA: "0",
          resistanceMethod: "guess",
        },
        declaration: false,
      }),
    );
    expect(bad).toMatchObject({ ok: false, code: "validation" });
    expect(bad.fieldErrors).toMatchObject({
      "method.ambientTemperatureC": ["Ambient temperature must be at least −20 °C."],
      "method.cutoffVPerCell": ["Cut-off must be at most 4.2 V per cell."],
      "method.stopTemperatureC": ["Stop temperature must be at most 80 °C."],
      "method.loadCurrentA": ["Load current must be above 0 A."],
      "method.resistanceMethod": ["Choose how you measured resistance."],
      declaration: ["Confirm that these are honest measurements."],
    });
    expect(await resultsOf(me.id)).toHaveLength(0);
  });

  it("refuses another contributor's upload and a draft that is no longer stored, on the log field", async () => {
    const { packId } = await makePack();
    const other = await signedIn("contributor");
    const theirs = await uploadLog(other.token);
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const res = await submitResult(null, submission(packId, theirs));
    expect(res.fieldErrors?.log?.[0]).toMatch(/no longer stored/);
    const gone = await submitResult(
      null,
      submission(packId, { key: `incoming/${me.id}/00000000-0000-4000-8000-000000000000.csv`, filename: "x.csv" }),
    );
    expect(gone.fieldErrors?.log?.[0]).toMatch(/upload it again/);
  });

  it("sends a new maker and pack to moderation as 'proposed' with the result", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const log = await uploadLog(me.token);
    const pack = {
      mode: "new" as const,
      packId: "",
      ...noProposal,
      makerName: "Brightcell Works",
      model: "BW 1300 4S 100C",
      cellsInSeries: "4",
      ratedCapacityMah: "1300",
      labelledContinuousC: "100",
      labelledBurstC: "",
      weightG: "165",
      connector: "XT60",
    };
    const res = await submitResult(null, submission(0, log, { pack }));
    expect(res.ok).toBe(true);
    const [row] = await resultsOf(me.id);
    const [p] = await db
      .select()
      .from(packs)
      .where(eq(packs.id, row?.packId ?? -1));
    expect(p).toMatchObject({ status: "proposed", proposedById: me.id, model: "BW 1300 4S 100C", cellsInSeries: 4 });
    const [m] = await db
      .select()
      .from(makers)
      .where(eq(makers.id, p?.makerId ?? -1));
    expect(m).toMatchObject({ name: "Brightcell Works", status: "proposed", proposedById: me.id });
    expect(row?.labelRatio).not.toBeNull(); // the proposal's labelled C is used for the figures
    expect(row?.flags.map((f) => f.code)).toContain("proposed-catalogue"); // computeAndStoreFlags ran in the same transaction
  });

  it("keeps the card checks as plausibility flags (a 6S log on a 4S pack)", async () => {
    const { packId } = await makePack();
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const log = await uploadLog(me.token, sampleLog({ cells: 6 }).csv);
    expect((await submitResult(null, submission(packId, log))).ok).toBe(true);
    const [row] = await resultsOf(me.id);
    expect(row?.flags.map((f) => f.code)).toContain("cells-mismatch");
  });

  it("leaves no result, proposal or receipt when the write fails after the upload, and keeps the draft files", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const log = await uploadLog(me.token);
    const photo = await uploadPhoto(me.token);
    await db.execute(
      `create or replace function sagline_test_fail() returns trigger language plpgsql as $$ begin raise exception 'injected failure'; end $$`,
    );
    await db.execute(
      `create trigger sagline_test_fail before insert on review_events for each row execute function sagline_test_fail()`,
    );
    try {
      const pack = {
        mode: "new" as const,
        packId: "",
        ...noProposal,
        makerName: "Failmaker",
        model: "F 1",
        cellsInSeries: "4",
        ratedCapacityMah: "1300",
        labelledContinuousC: "50",
        weightG: "",
        labelledBurstC: "",
        connector: "XT60",
      };
      const res = await submitResult(null, submission(0, log, { pack, photoKeys: [photo] }));
      expect(res).toMatchObject({ ok: false, code: "internal" });
      expect(res.error).toMatch(/Nothing was saved/);
    } finally {
      await db.execute(`drop trigger sagline_test_fail on review_events`);
    }
    expect(await resultsOf(me.id)).toHaveLength(0);
    expect(await db.$count(makers, eq(makers.name, "Failmaker"))).toBe(0);
    expect(await db.$count(mailOutbox, eq(mailOutbox.to, me.email))).toBe(0);
    expect((await keysUnder(`incoming/${me.id}/`)).sort()).toEqual([log.key, photo].sort());
    expect(await keysUnder(`photos/${me.id}/`)).toEqual([]);
    // The same draft goes through once the fault is gone.
    const { packId } = await makePack();
    expect((await submitResult(null, submission(packId, log))).ok).toBe(true);
  });

  it("stores the review event with the contributor as the actor even for a user created without a name", async () => {
    const u = await createUser("contributor");
    requestState.token = await createSession(u.id);
    const { packId } = await makePack();
    const res = await submitResult(null, submission(packId, await uploadLog(requestState.token)));
    expect(res.ok).toBe(true);
    const [row] = await resultsOf(u.id);
    expect(
      await db.$count(reviewEvents, and(eq(reviewEvents.resultId, row?.id ?? -1), eq(reviewEvents.actorId, u.id))),
    ).toBe(1);
  });
});
