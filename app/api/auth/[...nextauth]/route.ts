// GET|POST /api/auth/* — Auth.js (sign-in link requests, the link callback, sign-out, CSRF token).
// A POST asking for a sign-in link is rate-limited per address and per IP first (429 + Retry-After).
import { NextRequest } from "next/server";
import { z } from "zod";
import { handlers } from "@/server/auth";
import { clientIp } from "@/server/rate-limit";
import { withPermission } from "@/server/route";
import { enforceSignInLimits } from "@/server/sign-in-limits";

type Ctx = { params: Promise<{ nextauth: string[] }> };

const toNext = (req: Request) => (req instanceof NextRequest ? req : new NextRequest(req));

export const GET = withPermission<Ctx>("public", async (req) => handlers.GET(toNext(req)));

export const POST = withPermission<Ctx>("public", async (req) => {
  if (new URL(req.url).pathname.endsWith("/signin/nodemailer")) {
    const form = await req
      .clone()
      .formData()
      .catch(() => null);
    const email = z.string().catch("").parse(form?.get("email"));
    await enforceSignInLimits(email, clientIp(req.headers));
  }
  return handlers.POST(toNext(req));
});
