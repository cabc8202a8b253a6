// proxy.ts: no session cookie on a signed-in area → /sign-in with a way back; old chart links → their canonical
// split; too many new chart states from one client → 429; a server action call with a non-form body → 400.
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
          typeof m === "string" &&
          (m.startsWith("/packs") ||
            m === "/" ||
            m.startsWith("/sign-in") ||
            m === "/charts" ||
            m.startsWith("/charts/new")),
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

  it("lets at most 30 charts nobody asked for lately be drawn per client and minute (429 + Retry-After); seen ones pass", () => {
    const state = (i: number) =>
      statePath(
        encodeChartState({ v: 1, kind: "label-check", group: "dc-step_a15-25_co3.3_r5-10_new", title: `Gate ${i}` }),
      );
    const ask = (i: number, ip: string) =>
      proxy(new NextRequest(`http://localhost:3011/charts/view/${state(i)}`, { headers: { "x-forwarded-for": ip } }));
    for (let i = 0; i < 30; i++) expect(ask(i, "192.0.2.50").status, `chart ${i}`).toBe(200);
    const refused = ask(30, "192.0.2.50");
    expect(refused.status).toBe(429);
    expect(Number(refused.headers.get("retry-after"))).toBeGreaterThan(0);
    expect(refused.headers.get("cache-control")).toBe("no-store");
    // A chart already drawn passes for anyone; another client has its own allowance.
    expect(ask(3, "192.0.2.50").status).toBe(200);
    expect(ask(30, "192.0.2.51").status).toBe(200);
  });

  it("refuses a server action call with a JSON body (400) and lets form bodies through to the action", () => {
    const call = (type: string) =>
      proxy(
        new NextRequest("http://localhost:3011/sign-in", {
          method: "POST",
          headers: { "next-action": "60ccd1d914250047f581accb72c7d4ce757ac1b94e", "content-type": type },
          body: "{}",
        }),
      );
    expect(call("application/json").status).toBe(400);
    const big = proxy(
      new NextRequest("http://localhost:3011/sign-in", {
        method: "POST",
        headers: {
          "next-action": "60ccd1",
          "content-type": "multipart/form-data; boundary=x",
          "content-length": "2000000",
        },
        body: "x",
      }),
    );
    expect(big.status).toBe(413);
    expect(call("application/xml").status).toBe(400);
    for (const type of [
      "multipart/form-data; boundary=x",
      "application/x-www-form-urlencoded",
      "text/plain;charset=UTF-8",
    ])
      expect(call(type).headers.get("x-middleware-next"), type).toBe("1");
    expect(config.matcher).toEqual(
      expect.arrayContaining([{ source: "/:path*", has: [{ type: "header", key: "next-action" }] }]),
    );
  });
});
