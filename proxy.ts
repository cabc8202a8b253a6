// Redirects only, decided from the URL and the presence of a cookie:
// 1. A visitor without a session cookie who opens a signed-in area goes to /sign-in and comes back
//    afterwards. The cookie's presence is all we look at here; every page, action and route handler checks
//    the session and role on the server itself.
// 2. A chart permalink or embed whose state is not split into its canonical short segments (links made
//    before the split) is sent there with a 308, so each chart is stored once and under short names.
import { NextResponse, type NextRequest } from "next/server";
import { canonicalStatePath } from "@/lib/open-data/chart-state";

const SESSION_COOKIES = ["__Secure-authjs.session-token", "authjs.session-token"];
const CHART_PAGE = /^\/(charts\/view|embed\/chart)\/(.+?)\/?$/;

export function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  const chart = CHART_PAGE.exec(pathname);
  if (chart?.[1] && chart[2]) {
    const canonical = canonicalStatePath(chart[2].split("/"));
    if (canonical === null) return NextResponse.next();
    const to = request.nextUrl.clone();
    to.pathname = `/${chart[1]}/${canonical}`;
    return NextResponse.redirect(to, 308);
  }
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
  ],
};
