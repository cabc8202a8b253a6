// proxy.ts only redirects: no session cookie on a signed-in area → /sign-in with a way back.
import { describe, expect, it } from "vitest";
import { NextRequest } from "next/server";
import { config, proxy } from "@/proxy";

describe("proxy redirects", () => {
  it("sends a visitor without a session cookie to /sign-in with the path and query to return to", () => {
    const res = proxy(new NextRequest("http://localhost:3011/account/bench-profiles?x=1"));
    expect(res.status).toBe(307);
    const to = new URL(res.headers.get("location") ?? "");
    expect(to.pathname).toBe("/sign-in");
    expect(to.searchParams.get("callbackUrl")).toBe("/account/bench-profiles?x=1");
  });

  it("lets a request with a session cookie through (the page checks the session itself)", () => {
    for (const name of ["authjs.session-token", "__Secure-authjs.session-token"]) {
      const res = proxy(new NextRequest("http://localhost:3011/admin/users", { headers: { cookie: `${name}=abc` } }));
      expect(res.headers.get("location")).toBeNull();
      expect(res.headers.get("x-middleware-next")).toBe("1");
    }
  });

  it("covers exactly the signed-in areas", () => {
    expect(config.matcher).toEqual(expect.arrayContaining(["/account", "/account/:path*", "/submit", "/submit/:path*", "/review", "/review/:path*", "/admin", "/admin/:path*"]));
    expect(config.matcher.some((m) => m.startsWith("/packs") || m === "/" || m.startsWith("/sign-in"))).toBe(false);
  });
});
