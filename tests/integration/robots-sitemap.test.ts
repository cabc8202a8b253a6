// /robots.txt and /sitemap.xml: crawlers may read the public site, not the signed-in areas; the sitemap lists
// the public pages, every active pack and approved results only, under APP_URL.
import { describe, expect, it, vi } from "vitest";
import robots from "@/app/robots";
import sitemap from "@/app/sitemap";
import { env } from "@/server/env";
import { seedOpenData } from "../helpers/open-data-fixtures";

vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

describe("robots and sitemap", () => {
  it("keeps crawlers out of the signed-in areas, the API and embeds, and points at the sitemap", () => {
    const r = robots();
    const base = env().APP_URL.replace(/\/$/, "");
    expect(r.sitemap).toBe(`${base}/sitemap.xml`);
    const rules = Array.isArray(r.rules) ? r.rules[0] : r.rules;
    expect(rules?.allow).toEqual(["/", "/api/oembed"]);
    expect(rules?.disallow).toEqual(
      expect.arrayContaining(["/account", "/submit", "/review", "/admin", "/api/", "/embed/"]),
    );
    expect(rules?.disallow).not.toContain("/packs");
  });

  it("lists public pages, active packs and approved results only", async () => {
    const fx = await seedOpenData("smap");
    const urls = (await sitemap()).map((e) => e.url);
    const base = env().APP_URL.replace(/\/$/, "");
    expect(urls).toEqual(expect.arrayContaining([`${base}/`, `${base}/packs`, `${base}/methods`, `${base}/data`]));
    for (const p of fx.packs) expect(urls).toContain(`${base}/packs/${p.slug}`);
    for (const r of fx.results) {
      if (r.status === "approved") expect(urls).toContain(`${base}/results/${r.id}`);
      else expect(urls, `${r.status} result ${r.id}`).not.toContain(`${base}/results/${r.id}`);
    }
    expect(
      urls.filter((u) => /^\/(account|submit|review|admin|api|embed|dev)(\/|$)/.test(new URL(u).pathname)),
    ).toEqual([]);
    expect(new Set(urls).size).toBe(urls.length);
  });
});
