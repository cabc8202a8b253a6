// Sign-in link requests are limited per address (5 per 15 min) and per IP (20 per 15 min): the Auth.js
// route answers 429 with Retry-After, and the sign-in form's action returns a clear message.
import { beforeEach, describe, expect, it, vi } from "vitest";
import { randomUUID } from "node:crypto";
import { limits } from "@/server/rate-limit";
import { requestState } from "../helpers/next-mocks";
import { caughtFor, deliverQueuedMail } from "../helpers/mail";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { GET, POST } = await import("@/app/api/auth/[...nextauth]/route");
const { requestSignInLink } = await import("@/app/(auth)/sign-in/actions/request-sign-in-link");

const base = "http://localhost:3011/api/auth";
const ctx = { params: Promise.resolve({ nextauth: [] as string[] }) };

async function csrf(ip: string): Promise<{ token: string; cookie: string }> {
  const res = await GET(
    new Request(`${base}/csrf`, { headers: { host: "localhost:3011", "x-forwarded-for": ip } }),
    ctx,
  );
  const body = (await res.json()) as { csrfToken: string };
  const cookie = (res.headers.get("set-cookie") ?? "").split(";")[0] ?? "";
  return { token: body.csrfToken, cookie };
}

function postSignIn(email: string, ip: string, auth?: { token: string; cookie: string }): Promise<Response> {
  const body = new URLSearchParams({ email, ...(auth ? { csrfToken: auth.token } : {}) });
  return POST(
    new Request(`${base}/signin/nodemailer`, {
      method: "POST",
      headers: {
        host: "localhost:3011",
        "content-type": "application/x-www-form-urlencoded",
        "x-forwarded-for": ip,
        ...(auth ? { cookie: auth.cookie } : {}),
      },
      body,
    }),
    ctx,
  );
}

describe("sign-in rate limits", () => {
  beforeEach(() => {
    requestState.token = null;
  });

  it("sends links up to the per-address limit, then answers 429 with Retry-After", async () => {
    const email = `limited-${randomUUID().slice(0, 8)}@test.sagline.localhost`;
    const ip = "192.0.2.10";
    const auth = await csrf(ip);
    for (let i = 0; i < limits.signInPerEmail.limit; i++) {
      const res = await postSignIn(email, ip, auth);
      expect(res.status).toBe(302);
      expect(res.headers.get("location")).toMatch(/\/verify-request\?provider=nodemailer/);
    }
    // The same address in another case counts too (Auth.js lower-cases it).
    const refused = await postSignIn(email.toUpperCase(), ip, auth);
    expect(refused.status).toBe(429);
    const retryAfter = Number(refused.headers.get("retry-after"));
    expect(retryAfter).toBeGreaterThan(0);
    expect(retryAfter).toBeLessThanOrEqual(limits.signInPerEmail.windowS);
    const body = (await refused.json()) as { error: { code: string; message: string } };
    expect(body.error.code).toBe("rate_limited");
    expect(body.error.message).toMatch(/wait 15 minutes/);
    await deliverQueuedMail();
    await new Promise((r) => setTimeout(r, 200));
    expect(caughtFor(email)).toHaveLength(limits.signInPerEmail.limit);
  });

  it("limits one IP across many addresses", async () => {
    const ip = "192.0.2.77";
    // Without a CSRF token Auth.js refuses each request after it was counted, so no mail goes out.
    for (let i = 0; i < limits.signInPerIp.limit; i++) {
      const res = await postSignIn(`ip-${i}-${randomUUID().slice(0, 6)}@test.sagline.localhost`, ip);
      expect(res.status).not.toBe(429);
    }
    const refused = await postSignIn(`ip-last-${randomUUID().slice(0, 6)}@test.sagline.localhost`, ip);
    expect(refused.status).toBe(429);
    expect(Number(refused.headers.get("retry-after"))).toBeGreaterThan(0);
    // Another IP is unaffected.
    expect(
      (await postSignIn(`other-${randomUUID().slice(0, 6)}@test.sagline.localhost`, "192.0.2.78")).status,
    ).not.toBe(429);
  });

  it("shows the sign-in form a clear message once the address is limited", async () => {
    const email = `form-${randomUUID().slice(0, 8)}@test.sagline.localhost`;
    requestState.ip = "192.0.2.150";
    const fd = new FormData();
    fd.set("email", email);
    for (let i = 0; i < limits.signInPerEmail.limit; i++) {
      await requestSignInLink(null, fd).catch(() => undefined); // success redirects (throws NEXT_REDIRECT)
    }
    const res = await requestSignInLink(null, fd);
    expect(res).toMatchObject({ ok: false, code: "rate_limited" });
    expect(res.ok ? "" : res.error).toMatch(/^Too many sign-in links were requested\. Please wait 15 minutes/);
  });
});
