// Redirects only: a visitor without a session cookie who opens a signed-in area goes to /sign-in and comes
// back afterwards. The cookie's presence is all we look at here; every page, action and route handler
// checks the session and role on the server itself.
import { NextResponse, type NextRequest } from "next/server";

const SESSION_COOKIES = ["__Secure-authjs.session-token", "authjs.session-token"];

export function proxy(request: NextRequest) {
  if (SESSION_COOKIES.some((name) => request.cookies.has(name))) return NextResponse.next();
  const { pathname, search } = request.nextUrl;
  const to = request.nextUrl.clone();
  to.pathname = "/sign-in";
  to.search = `?${new URLSearchParams({ callbackUrl: `${pathname}${search}` })}`;
  return NextResponse.redirect(to);
}

export const config = {
  matcher: ["/account", "/account/:path*", "/submit", "/submit/:path*", "/review", "/review/:path*", "/admin", "/admin/:path*"],
};
