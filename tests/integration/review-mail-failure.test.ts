// A mail failure never undoes a decision: the status change and its audit event are committed first, and
// an error while telling people is logged, not thrown.
import { describe, expect, it, vi } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { results, reviewEvents } from "@/db/schema";
import { makePack, makeResult } from "../helpers/review-fixtures";
import { createUser } from "../helpers/users";

vi.mock("@/server/revalidate", () => ({ revalidateTags: vi.fn() }));
vi.mock("@/server/mail", async (orig) => ({
  ...(await orig<typeof import("@/server/mail")>()),
  sendMail: vi.fn(async () => {
    throw new Error("outbox unavailable");
  }),
}));

const { decideResult } = await import("@/server/review");

describe("decisions survive mail failures", () => {
  it("approves and records the event even when sending mail throws", async () => {
    const contributor = await createUser("contributor");
    const mod = await createUser("moderator");
    const { pack } = await makePack();
    const r = await makeResult({ packId: pack.id, contributorId: contributor.id });
    const quiet = vi.spyOn(console, "error").mockImplementation(() => undefined);
    await expect(decideResult(mod.id, r.id, { kind: "approve", note: null })).resolves.toEqual({
      resultId: r.id,
      status: "approved",
    });
    expect(quiet).toHaveBeenCalledWith(expect.stringContaining("decision mail failed"), "outbox unavailable");
    quiet.mockRestore();
    const [row] = await db.select({ status: results.status }).from(results).where(eq(results.id, r.id));
    expect(row?.status).toBe("approved");
    const events = await db.select().from(reviewEvents).where(eq(reviewEvents.resultId, r.id));
    expect(events.map((e) => e.toStatus)).toEqual(["pending", "approved"]);
  });
});
