// One address per sign-in (issue 13, item 3): the same zod rule (lib/validations/sign-in.ts) on every path into
// Auth.js — the sign-in form's action, a raw POST /api/auth/signin/nodemailer (URL-encoded or JSON, the two
// bodies Auth.js reads) and Auth.js's own normalizeIdentifier — and applied before the limits, so a list never
// reaches the mail and never spends or dodges a limit.
import { randomUUID } from "node:crypto";
import { like } from "drizzle-orm";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { rateLimitHits, users } from "@/db/schema";
import { parseSignInEmail, signInSchema } from "@/lib/validations/sign-in";
import { requestState } from "../helpers/next-mocks";
import { caughtFor } from "../helpers/mail";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { GET, POST } = await import("@/app/api/auth/[...nextauth]/route");
const { requestSignInLink } = await import("@/app/(auth)/sign-in/actions/request-sign-in-link");
const { handlers } = await import("@/server/auth");

const base = "http://localhost:3011/api/auth";
const ctx = { params: Promise.resolve({ nextauth: [] as string[] }) };
const tag = () => randomUUID().slice(0, 8);

async function csrf(ip: string): Promise<{ token: string; cookie: string }> {
  const res = await GET(
    new Request(`${base}/csrf`, { headers: { host: "localhost:3011", "x-forwarded-for": ip } }),
    ctx,
  );
  const body = (await res.json()) as { csrfToken: string };
  return { token: body.csrfToken, cookie: (res.headers.get("set-cookie") ?? "").split(";")[0] ?? "" };
}

function rawSignIn(body: string, type: string, ip: string, cookie = ""): Request {
  return new Request(`${base}/signin/nodemailer`, {
    method: "POST",
    headers: { host: "localhost:3011", "content-type": type, "x-forwarded-for": ip, ...(cookie ? { cookie } : {}) },
    body,
  });
}

const hitsFor = async (ip: string) =>
  db
    .select()
    .from(rateLimitHits)
    .where(like(rateLimitHits.key, `sign-in:ip:${ip}`));

const LISTS = (a: string, b: string) => [
  `${a}, ${b}`,
  `${a},${b}`,
  `${a};${b}`,
  `${a} ${b}`,
  `Someone <${a}>`,
  `"${a}"@victim.test`,
  `${a}，${b}`, // a full-width comma, which NFKC turns into ","
];

describe("the one-address rule", () => {
  it("accepts one plain address (normalised as Auth.js does) and refuses lists and display names", () => {
    expect(parseSignInEmail("  Reader@Example.TEST ")).toBe("reader@example.test");
    for (const bad of LISTS("a@x.test", "b@x.test"))
      expect(signInSchema.safeParse({ email: bad }).success, bad).toBe(false);
    expect(signInSchema.safeParse({ email: "a@x.test, b@x.test" }).error?.issues[0]?.message).toBe(
      "Enter one e-mail address only.",
    );
    // Spaces without a second address are no list, just not an address.
    expect(signInSchema.safeParse({ email: "not an address" }).error?.issues[0]?.message).toBe(
      "Enter an e-mail address like name@example.com.",
    );
  });
});

describe("every path into Auth.js applies it, before the limits", () => {
  beforeEach(() => {
    requestState.token = null;
    requestState.ip = "203.0.113.10";
  });

  it("the sign-in form's action: a list is a field error; nothing is counted or sent", async () => {
    const a = `one-${tag()}@test.sagline.localhost`;
    const b = `two-${tag()}@test.sagline.localhost`;
    requestState.ip = "192.0.2.201";
    const form = new FormData();
    form.set("email", `${a}, ${b}`);
    const out = await requestSignInLink(null, form);
    expect(out).toMatchObject({
      ok: false,
      code: "validation",
      fieldErrors: { email: ["Enter one e-mail address only."] },
    });
    expect(await hitsFor("192.0.2.201")).toEqual([]);
    expect(caughtFor(a)).toHaveLength(0);
    expect(caughtFor(b)).toHaveLength(0);
  });

  it("the action refuses a call without a form (a hand-made body) as a bad request, not a crash", async () => {
    const errors = vi.spyOn(console, "error");
    expect(await requestSignInLink(null, { email: "a@x.test" } as unknown as FormData)).toMatchObject({
      ok: false,
      code: "bad_request",
    });
    expect(errors).not.toHaveBeenCalled();
    errors.mockRestore();
  });

  it.each([
    [
      "URL-encoded",
      "application/x-www-form-urlencoded",
      (email: string, t: string) => new URLSearchParams({ email, csrfToken: t }).toString(),
    ],
    ["JSON", "application/json", (email: string, t: string) => JSON.stringify({ email, csrfToken: t })],
  ])("a raw %s POST with a list or a display name: 422 before the limits, no user, no mail", async (_n, type, body) => {
    const ip = `192.0.2.${210 + (type.includes("json") ? 1 : 0)}`;
    const auth = await csrf(ip);
    const a = `raw-${tag()}@test.sagline.localhost`;
    for (const email of LISTS(a, `also-${tag()}@test.sagline.localhost`)) {
      const res = await POST(rawSignIn(body(email, auth.token), type, ip, auth.cookie), ctx);
      expect(res.status, email).toBe(422);
      expect(
        ((await res.json()) as { error: { fieldErrors: { email: string[] } } }).error.fieldErrors.email.length,
      ).toBeGreaterThan(0);
    }
    expect(await hitsFor(ip)).toEqual([]);
    await new Promise((r) => setTimeout(r, 200));
    expect(caughtFor(a)).toHaveLength(0);
    expect(
      await db
        .select()
        .from(users)
        .where(like(users.email, `%${a}%`)),
    ).toEqual([]);
  });

  it("a raw POST in another body type (which Auth.js would not read) is 415", async () => {
    const res = await POST(rawSignIn("email=a%40x.test", "text/plain", "192.0.2.220"), ctx);
    expect(res.status).toBe(415);
  });

  it("one good address still signs in through the raw route (302 to the check-your-mail step)", async () => {
    const ip = "192.0.2.221";
    const auth = await csrf(ip);
    const email = `good-${tag()}@test.sagline.localhost`;
    const res = await POST(
      rawSignIn(
        new URLSearchParams({ email, csrfToken: auth.token }).toString(),
        "application/x-www-form-urlencoded",
        ip,
        auth.cookie,
      ),
      ctx,
    );
    expect(res.status).toBe(302);
    expect(res.headers.get("location")).toMatch(/verify-request/);
    expect((await hitsFor(ip))[0]?.count).toBe(1);
  });

  it("Auth.js itself refuses a list even when our route is bypassed (normalizeIdentifier uses the same rule)", async () => {
    const ip = "192.0.2.222";
    const auth = await csrf(ip);
    const a = `bypass-${tag()}@test.sagline.localhost`;
    const b = `bypass2-${tag()}@test.sagline.localhost`;
    const res = await handlers.POST(
      rawSignIn(
        new URLSearchParams({ email: `${a}, ${b}`, csrfToken: auth.token }).toString(),
        "application/x-www-form-urlencoded",
        ip,
        auth.cookie,
      ) as never,
    );
    expect(res.headers.get("location") ?? "").toMatch(/error=/);
    await new Promise((r) => setTimeout(r, 200));
    expect(caughtFor(a)).toHaveLength(0);
    expect(caughtFor(b)).toHaveLength(0);
  });
});
