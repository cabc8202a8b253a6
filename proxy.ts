// Redirects and two refusals, decided from the URL, a few headers, the presence of a cookie and the client
// address (never the session: every page, action and route handler checks that on the server):
// 1. A visitor without a session cookie who opens a signed-in area goes to /sign-in and comes back
//    afterwards. The cookie's presence is all we look at here; every page, action and route handler checks
//    the session and role on the server itself.
// 2. A chart permalink or embed whose state is not split into its canonical short segments (links made
//    before the split) is sent there with a 308, so each chart has one address.
// 3. Chart pages are drawn per request (nothing is stored per link; Cache-Control lets a CDN keep them), so
//    one client may have at most NEW_CHART_GATE.limit charts nobody asked for lately drawn per minute: past
//    that, 429 with Retry-After (lib/open-data/new-chart-gate.ts; one gate per server process).
// 4. A server action call (a POST with Next-Action) whose body is not one Next.js's own client sends — a
//    form (multipart or URL-encoded) or its text encoding — is refused with 400 before the action runs, so
//    a JSON body never reaches an action's code (Next.js would decode it into arguments the action does not
//    expect). A body declared larger than next.config.mjs's 1 MB limit gets 413 here, before Next.js reads it.
import { NextResponse, type NextRequest } from "next/server";
import { addressBucket, pickForwardedAddress } from "@/lib/client-address";
import { canonicalStatePath, stateFromSegments } from "@/lib/open-data/chart-state";
import { NewChartGate } from "@/lib/open-data/new-chart-gate";
import { env } from "@/server/env";

const SESSION_COOKIES = ["__Secure-authjs.session-token", "authjs.session-token"];
const CHART_PAGE = /^\/(charts\/view|embed\/chart)\/(.+?)\/?$/;

const gate = new NewChartGate();

function chartPage(request: NextRequest, kind: string, path: string): NextResponse {
  const segments = path.split("/");
  const canonical = canonicalStatePath(segments);
  if (canonical !== null) {
    const to = request.nextUrl.clone();
    to.pathname = `/${kind}/${canonical}`;
    return NextResponse.redirect(to, 308);
  }
  const state = stateFromSegments(segments);
  if (state === null || env().SAGLINE_RATE_LIMITS === "off") return NextResponse.next();
  const client = addressBucket(pickForwardedAddress(request.headers.get("x-forwarded-for"), env().TRUSTED_PROXY_HOPS));
  const answer = gate.check(state, client, Date.now());
  if (answer.ok) return NextResponse.next();
  return new NextResponse("Too many new charts from your address — please wait a minute and try again.", {
    status: 429,
    headers: {
      "Retry-After": String(answer.retryAfterS),
      "Cache-Control": "no-store",
      "Content-Type": "text/plain; charset=utf-8",
    },
  });
}

const ACTION_BODY_TYPES = ["multipart/form-data", "application/x-www-form-urlencoded", "text/plain"];
/** next.config.mjs's serverActions.bodySizeLimit ("1mb"). */
const ACTION_BODY_LIMIT_BYTES = 1024 * 1024;

function refuseActionBody(request: NextRequest): NextResponse | null {
  if (request.method !== "POST" || !request.headers.has("next-action")) return null;
  const refuse = (status: number, code: string, message: string) =>
    NextResponse.json({ error: { code, message } }, { status, headers: { "Cache-Control": "no-store" } });
  const type = (request.headers.get("content-type") ?? "").split(";")[0]?.trim().toLowerCase() ?? "";
  if (!ACTION_BODY_TYPES.includes(type))
    return refuse(400, "bad_request", "Server actions take the form's fields, not this kind of body.");
  if (Number(request.headers.get("content-length") ?? 0) > ACTION_BODY_LIMIT_BYTES)
    return refuse(413, "payload_too_large", "A form sends at most 1 MB; files go through the upload routes.");
  return null;
}

export function proxy(request: NextRequest) {
  const refused = refuseActionBody(request);
  if (refused) return refused;
  if (request.headers.has("next-action")) return NextResponse.next();
  const { pathname, search } = request.nextUrl;
  const chart = CHART_PAGE.exec(pathname);
  if (chart?.[1] && chart[2]) return chartPage(request, chart[1], chart[2]);
  if (SESSION_COOKIES.some((name) => request.cookies.has(name))) return NextResponse.next();
  const to = request.nextUrl.clone();
  to.pathname = "/sign-in";
  to.search = `?${new URLSearchParams({ callbackUrl: `${pathname}${search}` })}`;
  return NextResponse.redirect(to);
}

export const config = {
  matcher: [
    "/account",
    "/account/:path*",
    "/submit",
    "/submit/:path*",
    "/review",
    "/review/:path*",
    "/admin",
    "/admin/:path*",
    "/charts/view/:path+",
    "/embed/chart/:path+",
    // Every server action call, wherever it is posted (its page's path).
    { source: "/:path*", has: [{ type: "header", key: "next-action" }] },
  ],
};
