// Client addresses from trusted hops only (issue 13, item 2), replayed: 40 analyse requests and 20 flags, each
// with a new forged X-Forwarded-For, pass through the very header rewrite scripts/serve.mjs applies to every
// request (scripts/serve/forwarded.mjs, TRUSTED_PROXY_HOPS = 0) and then the real route handlers. The limits
// hold: the forged values make no new buckets. tests/e2e/forwarded-for.spec.ts replays the same against the
// running server, socket and all. Also the concurrency cap on strangers' analyses (503 + Retry-After).
import { eq, like } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { rateLimitHits } from "@/db/schema";
import { ANALYSIS_RETRY_AFTER_S } from "@/server/analysis-slots";
import { limits } from "@/server/rate-limit";
import { rewriteForwarded } from "@/scripts/serve/forwarded.mjs";
import { postRequest, sampleLog } from "../helpers/logs";
import { makePack, makeResult } from "../helpers/review-fixtures";
import { createUser, signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const analyse = await import("@/app/api/v1/analyse/route");
const flags = await import("@/app/api/v1/results/[id]/flags/route");

/** What reaches the app from a client at `socket` that sent `forged` (serve.mjs with no trusted proxy). */
function throughServe(forged: string, socket: string): Record<string, string> {
  const headers: Record<string, string> = { "x-forwarded-for": forged, "x-real-ip": forged };
  rewriteForwarded(headers, socket, 0);
  return headers;
}
const forged = (i: number) => `203.0.113.${i}, 10.${i}.0.1`;
const { csv } = sampleLog();

describe("forged X-Forwarded-For makes no new buckets", () => {
  it("40 analyse requests from one client, each with a new forged header: 30 pass, then 429", async () => {
    const socket = "198.51.100.40";
    // Other test files share this database and may leave analyse buckets of their own.
    await db.delete(rateLimitHits).where(like(rateLimitHits.key, "analyse:%"));
    const statuses: number[] = [];
    for (let i = 0; i < 40; i++) {
      const res = await analyse.POST(
        postRequest("/api/v1/analyse", csv, { "content-type": "text/csv", ...throughServe(forged(i), socket) }),
        undefined,
      );
      statuses.push(res.status);
    }
    expect(statuses.filter((s) => s === 200)).toHaveLength(limits.analysePerIp.limit);
    expect(statuses.slice(limits.analysePerIp.limit)).toEqual(Array(40 - limits.analysePerIp.limit).fill(429));
    const buckets = await db.select().from(rateLimitHits).where(like(rateLimitHits.key, "analyse:%"));
    expect(buckets.map((b) => b.key)).toContain(`analyse:${socket}`);
    expect(buckets.some((b) => b.key.includes("203.0.113.") || b.key.includes("10."))).toBe(false);
  });

  it("20 flags from one account, each with a new forged header: the account's 10 pass, then 429", async () => {
    const reader = await signedIn("contributor", "replay-reader");
    const contributor = await createUser("contributor");
    const { pack } = await makePack();
    const statuses: number[] = [];
    for (let i = 0; i < 20; i++) {
      const r = await makeResult({ packId: pack.id, contributorId: contributor.id, status: "approved" });
      const res = await flags.POST(
        new Request(`http://localhost/api/v1/results/${r.id}/flags`, {
          method: "POST",
          headers: {
            "content-type": "application/json",
            cookie: `authjs.session-token=${reader.token}`,
            ...throughServe(forged(i), "198.51.100.41"),
          },
          body: JSON.stringify({ reason: "other" }),
        }),
        { params: Promise.resolve({ id: String(r.id) }) },
      );
      statuses.push(res.status);
    }
    expect(statuses).toEqual([...Array(10).fill(201), ...Array(10).fill(429)]);
  });

  it("20 flags from 20 accounts behind one address with forged headers: the address's limit holds for the 21st", async () => {
    const contributor = await createUser("contributor");
    const { pack } = await makePack();
    const socket = "198.51.100.42";
    const flagOnce = async (i: number) => {
      const reader = await signedIn("contributor", `replay-${i}`);
      const r = await makeResult({ packId: pack.id, contributorId: contributor.id, status: "approved" });
      return flags.POST(
        new Request(`http://localhost/api/v1/results/${r.id}/flags`, {
          method: "POST",
          headers: {
            "content-type": "application/json",
            cookie: `authjs.session-token=${reader.token}`,
            ...throughServe(forged(i), socket),
          },
          body: JSON.stringify({ reason: "other" }),
        }),
        { params: Promise.resolve({ id: String(r.id) }) },
      );
    };
    for (let i = 0; i < limits.flagPerIp.limit; i++) expect((await flagOnce(i)).status).toBe(201);
    expect((await flagOnce(99)).status).toBe(429);
    const [hit] = await db
      .select()
      .from(rateLimitHits)
      .where(eq(rateLimitHits.key, `flag:ip:${socket}`));
    expect(hit?.count).toBe(limits.flagPerIp.limit + 1);
  });
});

describe("strangers' analyses share ANALYSE_MAX_CONCURRENT slots (default 2) per process", () => {
  /** A text/csv body that sends its first half and waits for `release` before the rest. */
  function heldBody(release: Promise<void>): ReadableStream<Uint8Array> {
    const bytes = new TextEncoder().encode(csv);
    const half = Math.floor(bytes.length / 2);
    let step = 0;
    return new ReadableStream({
      async pull(c) {
        if (step === 0) c.enqueue(bytes.slice(0, half));
        else if (step === 1) {
          await release;
          c.enqueue(bytes.slice(half));
        } else c.close();
        step++;
      },
    });
  }
  const post = (body: BodyInit, headers: Record<string, string>) =>
    analyse.POST(
      new Request("http://localhost/api/v1/analyse", { method: "POST", body, headers, duplex: "half" } as RequestInit),
      undefined,
    );

  it("a third anonymous analysis while two run gets 503 with Retry-After; a signed-in one is not capped; then it works again", async () => {
    let release = () => {};
    const held = new Promise<void>((r) => (release = r));
    const running = [1, 2].map((i) =>
      post(heldBody(held), { "content-type": "text/csv", "x-forwarded-for": `198.51.100.${60 + i}` }),
    );
    await new Promise((r) => setTimeout(r, 150)); // both are inside their slots, reading their bodies
    const third = await post(csv, { "content-type": "text/csv", "x-forwarded-for": "198.51.100.63" });
    expect(third.status).toBe(503);
    expect(Number(third.headers.get("retry-after"))).toBe(ANALYSIS_RETRY_AFTER_S);
    expect(((await third.json()) as { error: { message: string } }).error.message).toMatch(
      /try again in a few seconds/,
    );
    const member = await signedIn("contributor", "analyst");
    const signedInRes = await post(csv, { "content-type": "text/csv", cookie: `authjs.session-token=${member.token}` });
    expect(signedInRes.status).toBe(200);
    release();
    expect((await Promise.all(running)).map((r) => r.status)).toEqual([200, 200]);
    const after = await post(csv, { "content-type": "text/csv", "x-forwarded-for": "198.51.100.64" });
    expect(after.status).toBe(200);
  });
});
