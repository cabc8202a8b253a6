// A mail outage never blocks or undoes a submission: the request never talks to SMTP — the receipt waits in
// the outbox — and the worker's attempt while the relay is down keeps it queued for a retry.
import { eq } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.SMTP_URL = "smtp://127.0.0.1:9"; // nothing listens here
});

import { db } from "@/db";
import { mailOutbox, results } from "@/db/schema";
import { settleAfterResponse } from "@/server/after-response";
import { requestState } from "../helpers/next-mocks";
import { deliverQueuedMail } from "../helpers/mail";
import { makePack, submission, uploadLog } from "../helpers/submission";
import { signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { submitResult } = await import("@/app/(contributor)/submit/actions/submit-result");

describe("submitting while mail is down", () => {
  it("commits the result and keeps the receipt queued for a retry", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const { packId } = await makePack();
    const res = await submitResult(null, submission(packId, await uploadLog(me.token)));
    expect(res.ok).toBe(true);
    await settleAfterResponse();
    expect(await db.$count(results, eq(results.contributorId, me.id))).toBe(1);
    let [queued] = await db.select().from(mailOutbox).where(eq(mailOutbox.to, me.email));
    expect(queued).toMatchObject({ sentAt: null, attempts: 0, lastError: null });
    // The worker tries while the relay is down: the receipt stays, with the error and a later attempt.
    await deliverQueuedMail();
    [queued] = await db.select().from(mailOutbox).where(eq(mailOutbox.to, me.email));
    expect(queued).toMatchObject({ sentAt: null, attempts: 1 });
    expect(queued?.lastError).toBeTruthy();
    expect(queued?.nextAttemptAt.getTime()).toBeGreaterThan(Date.now());
  });
});
