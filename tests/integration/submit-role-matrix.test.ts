// The role matrix for submissions: every action, route handler and page added for submitting, called with
// no session and with each role. Every role may submit, so the wrong-role cases are about ownership:
// someone else's result answers exactly like a missing one (404), so nobody learns which ids exist.
import { eq } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { results, reviewEvents, userRoles, type UserRole } from "@/db/schema";
import { can } from "@/lib/permissions";
import { postRequest, sampleLog } from "../helpers/logs";
import { redirectTarget, requestState } from "../helpers/next-mocks";
import { PNG_BYTES } from "../helpers/storage";
import { makePack, submission, uploadLog } from "../helpers/submission";
import { signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { submitResult } = await import("@/app/(contributor)/submit/actions/submit-result");
const { previewStoredLog } = await import("@/app/(contributor)/submit/actions/preview-stored-log");
const { withdrawResult } = await import("@/app/(account)/account/actions/withdraw-result");
const { resubmitResult } = await import("@/app/(contributor)/submit/[resultId]/actions/resubmit-result");
const logRoute = await import("@/app/api/v1/uploads/log/route");
const photoRoute = await import("@/app/api/v1/uploads/photo/route");
const analyseRoute = await import("@/app/api/v1/analyse/route");
const SubmitPage = (await import("@/app/(contributor)/submit/page")).default;
const ResubmitPage = (await import("@/app/(contributor)/submit/[resultId]/page")).default;

const roles: (UserRole | null)[] = [null, ...userRoles];

async function as(role: UserRole | null) {
  if (role === null) {
    requestState.token = null;
    return null;
  }
  const u = await signedIn(role, `submit-matrix-${role}`);
  requestState.token = u.token;
  return u;
}

/** Someone's submitted result (a fresh contributor's unless an owner is given), in a given state. */
async function someonesResult(
  status: "pending" | "awaiting_answer" = "pending",
  ownerOf?: { id: string; token: string },
): Promise<number> {
  const owner = ownerOf ?? (await signedIn("contributor", "owner"));
  const saved = requestState.token;
  requestState.token = owner.token;
  const { packId } = await makePack();
  const res = await submitResult(null, submission(packId, await uploadLog(owner.token)));
  requestState.token = saved;
  if (!res.ok) throw new Error(res.error);
  if (status !== "pending") {
    await db.update(results).set({ status }).where(eq(results.id, res.data.resultId));
    await db.insert(reviewEvents).values({ resultId: res.data.resultId, fromStatus: "pending", toStatus: status });
  }
  return res.data.resultId;
}

function outcomeOf(err: unknown): string {
  const to = redirectTarget(err);
  if (to !== null) return to.startsWith("/sign-in?callbackUrl=") ? "redirect to sign-in" : `redirect ${to}`;
  const digest =
    typeof err === "object" && err !== null && "digest" in err
      ? String((err as { digest: unknown }).digest)
      : String(err);
  return digest === "NEXT_HTTP_ERROR_FALLBACK;403" ? "403" : digest === "NEXT_HTTP_ERROR_FALLBACK;404" ? "404" : digest;
}

describe("submission role matrix", () => {
  for (const role of roles) {
    const who = role ?? "nobody";
    const allowed = role !== null && can(role, "result.submit");

    it(`/submit as ${who} → ${allowed ? "render" : "redirect to sign-in"}`, async () => {
      await as(role);
      expect(await SubmitPage().then(() => "render", outcomeOf)).toBe(allowed ? "render" : "redirect to sign-in");
    });

    it(`/submit/[id] of someone else's result as ${who} → ${role ? "404" : "redirect to sign-in"}; own → render`, async () => {
      const id = await someonesResult("awaiting_answer");
      const me = await as(role);
      const page = (resultId: number) =>
        ResubmitPage({ params: Promise.resolve({ resultId: String(resultId) }) }).then(() => "render", outcomeOf);
      expect(await page(id)).toBe(role ? "404" : "redirect to sign-in");
      if (me) {
        expect(await page(2_000_000_000)).toBe("404");
        expect(await page(await someonesResult("awaiting_answer", me))).toBe("render");
      }
    });

    it(`POST /api/v1/uploads/log and /photo as ${who} → ${allowed ? 201 : 401}`, async () => {
      const me = await as(role);
      const cookie: Record<string, string> = me ? { cookie: `authjs.session-token=${me.token}` } : {};
      const log = await logRoute.POST(
        postRequest("/api/v1/uploads/log?filename=m.csv", sampleLog().csv, { "content-type": "text/csv", ...cookie }),
        undefined,
      );
      expect(log.status).toBe(allowed ? 201 : 401);
      const photo = await photoRoute.POST(
        postRequest("/api/v1/uploads/photo", PNG_BYTES, { "content-type": "image/png", ...cookie }),
        undefined,
      );
      expect(photo.status).toBe(allowed ? 201 : 401);
    });

    it(`POST /api/v1/analyse as ${who} → 200 (public)`, async () => {
      const me = await as(role);
      const res = await analyseRoute.POST(
        postRequest("/api/v1/analyse", sampleLog().csv, {
          "content-type": "text/csv",
          "x-forwarded-for": `10.77.0.${roles.indexOf(role)}`,
          ...(me ? { cookie: `authjs.session-token=${me.token}` } : {}),
        }),
        undefined,
      );
      expect(res.status).toBe(200);
    });

    it(`submitResult and previewStoredLog as ${who} → ${allowed ? "ok" : "unauthenticated"}`, async () => {
      const me = await as(role);
      const { packId } = await makePack();
      const log = me
        ? await uploadLog(me.token)
        : { key: "incoming/x/00000000-0000-4000-8000-000000000000.csv", filename: "x.csv" };
      const values = submission(packId, log);
      const preview = await previewStoredLog(null, { log: values.log, pack: values.pack, method: values.method });
      const submitted = await submitResult(null, values);
      for (const res of [preview, submitted])
        expect(res).toMatchObject(allowed ? { ok: true } : { ok: false, code: "unauthenticated" });
    });

    it(`withdrawResult and resubmitResult of someone else's result as ${who} → ${role ? "not_found" : "unauthenticated"}`, async () => {
      const pending = await someonesResult("pending");
      const asked = await someonesResult("awaiting_answer");
      await as(role);
      const expected = role ? "not_found" : "unauthenticated";
      expect(await withdrawResult(null, { resultId: String(pending) })).toMatchObject({ ok: false, code: expected });
      const answer = {
        resultId: String(asked),
        method: submission(1, { key: "", filename: "" }).method,
        log: null,
        photoKeys: [],
        note: "Changed.",
        declaration: true,
      };
      expect(await resubmitResult(null, answer)).toMatchObject({ ok: false, code: expected });
    });
  }
});
