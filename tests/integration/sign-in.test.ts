// Sign-in by e-mail link, end to end below the browser: the form's action asks Auth.js for a link, the
// link is queued in the outbox (the request sends nothing itself) and the mail worker's step sends it to the
// local mail catcher; following it creates a contributor and a database session, lands a newcomer on the
// choice of public name, and signing out deletes that session.
import { beforeEach, describe, expect, it, vi } from "vitest";
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { mailOutbox, sessions, users, verificationTokens } from "@/db/schema";
import { getSessionUserByToken } from "@/db/queries/sessions";
import { redirectTarget, requestState } from "../helpers/next-mocks";
import { caughtFor, deliverQueuedMail, firstLink, newestMailFor } from "../helpers/mail";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { requestSignInLink } = await import("@/app/(auth)/sign-in/actions/request-sign-in-link");
const { signOut } = await import("@/app/(account)/account/actions/sign-out");
const { GET } = await import("@/app/api/auth/[...nextauth]/route");

const ctx = { params: Promise.resolve({ nextauth: [] as string[] }) };

function signInForm(email: string, callbackUrl = "/account/bench-profiles"): FormData {
  const fd = new FormData();
  fd.set("email", email);
  fd.set("callbackUrl", callbackUrl);
  return fd;
}

async function request(form: FormData): Promise<{ redirect: string | null; result: unknown }> {
  try {
    return { redirect: null, result: await requestSignInLink(null, form) };
  } catch (err) {
    const to = redirectTarget(err);
    if (to === null) throw err;
    return { redirect: to, result: undefined };
  }
}

describe("sign-in by e-mail link", () => {
  beforeEach(() => {
    requestState.token = null;
    requestState.ip = `198.51.100.${Math.floor(Math.random() * 200) + 1}`;
  });

  it("mails a one-time link that signs a new address in as a contributor with a database session", async () => {
    const email = `newcomer-${randomUUID().slice(0, 8)}@test.sagline.localhost`;
    const { redirect } = await request(signInForm(`  ${email.toUpperCase()} `));
    expect(redirect).toBe("/sign-in/check-email");
    // The request only queued the link: nothing was sent while it ran.
    const [waiting] = await db.select().from(mailOutbox).where(eq(mailOutbox.to, email));
    expect(waiting).toMatchObject({ sentAt: null, attempts: 0, sensitive: true });
    expect(caughtFor(email)).toHaveLength(0);

    await deliverQueuedMail();
    const mail = await newestMailFor(email);
    expect(mail.subject).toBe("Your Sagline sign-in link");
    const link = firstLink(mail.text);
    expect(link.startsWith("http://localhost:3011/api/auth/callback/nodemailer?")).toBe(true);
    expect(new URL(link).searchParams.get("callbackUrl")).toBe("http://localhost:3011/account/bench-profiles");
    // The token is stored hashed, and the outbox copy of the message is wiped once sent.
    const token = new URL(link).searchParams.get("token") ?? "";
    const stored = await db.select().from(verificationTokens).where(eq(verificationTokens.identifier, email));
    expect(stored).toHaveLength(1);
    expect(stored[0]?.token).not.toBe(token);
    const [queued] = await db.select().from(mailOutbox).where(eq(mailOutbox.to, email));
    expect(queued?.sentAt).not.toBeNull();
    expect(queued?.text).not.toContain(token);

    const res = await GET(new Request(link, { headers: { host: "localhost:3011" } }), ctx);
    expect(res.status).toBe(302);
    // A first sign-in chooses how published results name them, then goes on to where they were heading.
    const landing = new URL(res.headers.get("location") ?? "", "http://localhost:3011");
    expect(landing.pathname).toBe("/account/public-name");
    expect(landing.searchParams.get("callbackUrl")).toBe("http://localhost:3011/account/bench-profiles");
    const cookie = /authjs\.session-token=([^;]+)/.exec(res.headers.get("set-cookie") ?? "");
    expect(cookie).not.toBeNull();
    const sessionToken = decodeURIComponent(cookie?.[1] ?? "");

    const user = await getSessionUserByToken(sessionToken);
    expect(user).toMatchObject({
      email,
      role: "contributor",
      displayName: null,
      anonymous: false,
      publicNameChosen: false,
    });

    // The link works once.
    const again = await GET(new Request(link, { headers: { host: "localhost:3011" } }), ctx);
    expect(again.headers.get("location")).toMatch(/\/sign-in\?error=Verification/);

    // Signing out deletes the database session.
    requestState.token = sessionToken;
    let to: string | null = null;
    try {
      await signOut();
    } catch (err) {
      to = redirectTarget(err);
    }
    expect(to).toBe("http://localhost:3011/");
    expect(await db.select().from(sessions).where(eq(sessions.sessionToken, sessionToken))).toHaveLength(0);
  });

  it("signs an existing user in without changing their role", async () => {
    const email = `mod-${randomUUID().slice(0, 8)}@test.sagline.localhost`;
    await db.insert(users).values({ email, role: "moderator", displayName: "Moderator Test" });
    await request(signInForm(email, "/account"));
    await deliverQueuedMail();
    const link = firstLink((await newestMailFor(email)).text);
    const res = await GET(new Request(link, { headers: { host: "localhost:3011" } }), ctx);
    // Not a newcomer: straight to where they were heading.
    expect(res.headers.get("location")).toBe("http://localhost:3011/account");
    const token = decodeURIComponent(
      /authjs\.session-token=([^;]+)/.exec(res.headers.get("set-cookie") ?? "")?.[1] ?? "",
    );
    expect((await getSessionUserByToken(token))?.role).toBe("moderator");
  });

  it("explains a malformed address and sends nothing", async () => {
    const { result } = await request(signInForm("not-an-address"));
    expect(result).toMatchObject({
      ok: false,
      code: "validation",
      fieldErrors: { email: ["Enter an e-mail address like name@example.com."] },
    });
  });

  it("never sends people to another site after signing in", async () => {
    const email = `redirect-${randomUUID().slice(0, 8)}@test.sagline.localhost`;
    await request(signInForm(email, "//evil.example/steal"));
    await deliverQueuedMail();
    const link = firstLink((await newestMailFor(email)).text);
    expect(new URL(link).searchParams.get("callbackUrl")).toBe("http://localhost:3011/account");
  });
});
