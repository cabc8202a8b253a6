// GET|POST /api/auth/* — Auth.js (sign-in link requests, the link callback, sign-out, CSRF token).
// A POST asking for a sign-in link has its address checked with the sign-in form's own rule (one address;
// 422 otherwise), then is rate-limited per address and per client address (429 + Retry-After).
import { NextRequest } from "next/server";
import { AppError } from "@/lib/errors";
import { handlers } from "@/server/auth";
import { clientAddress } from "@/server/client-address";
import { withPermission } from "@/server/route";
import { enforceSignInLimits } from "@/server/sign-in-limits";
import { signInEmail } from "@/lib/validations/sign-in";

type Ctx = { params: Promise<{ nextauth: string[] }> };

const toNext = (req: Request) => (req instanceof NextRequest ? req : new NextRequest(req));

/** The `email` field exactly as Auth.js reads the body: JSON or a URL-encoded form; nothing else. */
async function emailOf(req: Request): Promise<unknown> {
  const type = req.headers.get("content-type") ?? "";
  const copy = req.clone();
  if (type.includes("application/json")) {
    const body: unknown = await copy.json().catch(() => null);
    return body && typeof body === "object" && "email" in body ? body.email : undefined;
  }
  if (type.includes("application/x-www-form-urlencoded")) return new URLSearchParams(await copy.text()).get("email");
  throw new AppError("unsupported_media_type", "Send the sign-in form as application/x-www-form-urlencoded.");
}

export const GET = withPermission<Ctx>("public", async (req) => handlers.GET(toNext(req)));

export const POST = withPermission<Ctx>("public", async (req) => {
  if (new URL(req.url).pathname.endsWith("/signin/nodemailer")) {
    const parsed = signInEmail.safeParse(await emailOf(req));
    if (!parsed.success)
      throw new AppError("validation", "Enter one e-mail address.", {
        email: parsed.error.issues.map((i) => i.message),
      });
    await enforceSignInLimits(parsed.data, clientAddress(req.headers));
  }
  return handlers.POST(toNext(req));
});
