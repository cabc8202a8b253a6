// The contributor's own view of a result (/account/results/<id>) exists in every state for its contributor,
// and for nobody else (404: it never says whose a result is). /submit asks for the public name first.
import { eq } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { users } from "@/db/schema";
import { reviewStatuses } from "@/lib/enums";
import { redirectTarget, requestState } from "../helpers/next-mocks";
import { makePack, makeResult } from "../helpers/review-fixtures";
import { signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const OwnResultPage = (await import("@/app/(account)/account/results/[id]/page")).default;
const SubmitPage = (await import("@/app/(contributor)/submit/page")).default;

function outcomeOf(err: unknown): string {
  const to = redirectTarget(err);
  if (to !== null) return to.startsWith("/sign-in?callbackUrl=") ? "sign-in" : `redirect ${to}`;
  const digest = typeof err === "object" && err && "digest" in err ? String((err as { digest: unknown }).digest) : "";
  return digest === "NEXT_HTTP_ERROR_FALLBACK;404" ? "404" : digest || String(err);
}
const render = (id: number, search: Record<string, string> = {}) =>
  OwnResultPage({ params: Promise.resolve({ id: String(id) }), searchParams: Promise.resolve(search) }).then(
    () => "page",
    outcomeOf,
  );

describe("/account/results/[id]", () => {
  it("renders for its contributor in every state, whatever the moderators decided", async () => {
    const me = await signedIn("contributor", "own-view");
    const { pack } = await makePack({ packStatus: "proposed", makerStatus: "proposed" });
    requestState.token = me.token;
    for (const status of reviewStatuses) {
      const r = await makeResult({ packId: pack.id, contributorId: me.id, status });
      expect(await render(r.id, { sent: "answer" }), status).toBe("page");
    }
  });

  it("is 404 for anyone else (moderators use /review), and sends the signed-out to sign in", async () => {
    const owner = await signedIn("contributor", "own-view-owner");
    const { pack } = await makePack();
    const r = await makeResult({ packId: pack.id, contributorId: owner.id, status: "awaiting_answer" });
    for (const role of ["contributor", "moderator", "admin"] as const) {
      requestState.token = (await signedIn(role, `own-view-${role}`)).token;
      expect(await render(r.id), role).toBe("404");
    }
    requestState.token = null;
    expect(await render(r.id)).toBe("sign-in");
    requestState.token = owner.token;
    expect(await render(999_999_999)).toBe("404");
    expect(await render(Number.NaN)).toBe("404");
  });
});

describe("/submit and the public name", () => {
  it("sends someone who has not chosen their public name to choose it first, then back to /submit", async () => {
    const me = await signedIn("contributor", "unnamed");
    await db.update(users).set({ publicNameChosenAt: null, displayName: null }).where(eq(users.id, me.id));
    requestState.token = me.token;
    expect(await SubmitPage().then(() => "page", outcomeOf)).toBe(
      "redirect /account/public-name?callbackUrl=%2Fsubmit",
    );
    await db.update(users).set({ publicNameChosenAt: new Date(), anonymous: true }).where(eq(users.id, me.id));
    expect(await SubmitPage().then(() => "page", outcomeOf)).toBe("page");
  });
});
