// proxy.ts only redirects: no session cookie on a signed-in area → /sign-in with a way back.
import { describe, expect, it } from "vitest";
import { NextRequest } from "next/server";
import { encodeChartState, statePath } from "@/lib/open-data/chart-state";
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
    expect(config.matcher).toEqual(
      expect.arrayContaining([
        "/account",
        "/account/:path*",
        "/submit",
        "/submit/:path*",
        "/review",
        "/review/:path*",
        "/admin",
        "/admin/:path*",
      ]),
    );
    expect(
      config.matcher.some(
        (m) =>
          m.startsWith("/packs") ||
          m === "/" ||
          m.startsWith("/sign-in") ||
          m === "/charts" ||
          m.startsWith("/charts/new"),
      ),
    ).toBe(false);
  });

  it("sends a chart link whose state is not in its canonical short segments there with a 308, and leaves canonical ones alone", () => {
    const encoded = encodeChartState({
      v: 1,
      kind: "label-check",
      group: "dc-step_a15-25_co3.3_r5-10_new",
      title: "T".repeat(100),
      note: "n".repeat(200),
    });
    const canonical = statePath(encoded);
    for (const base of ["/charts/view", "/embed/chart"]) {
      const res = proxy(new NextRequest(`http://localhost:3011${base}/${encoded}`));
      expect(res.status).toBe(308);
      expect(new URL(res.headers.get("location") ?? "").pathname).toBe(`${base}/${canonical}`);
      const ok = proxy(new NextRequest(`http://localhost:3011${base}/${canonical}`));
      expect(ok.headers.get("location")).toBeNull();
      expect(ok.headers.get("x-middleware-next")).toBe("1");
    }
    // Not a state (the page answers 404 itself), and no cookie check on public chart pages.
    expect(
      proxy(new NextRequest("http://localhost:3011/charts/view/not%20a%20state")).headers.get("location"),
    ).toBeNull();
    expect(config.matcher).toEqual(expect.arrayContaining(["/charts/view/:path+", "/embed/chart/:path+"]));
  });
});
