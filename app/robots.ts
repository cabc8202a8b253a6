// /robots.txt: everything public may be crawled; signed-in areas, sign-in, the dev pages, the API (for
// programs, with its own docs at /data/api; oEmbed excepted) and the bare embeds (already noindex) may
// not. Read per request so the sitemap address follows APP_URL where the app runs, not where it was built.
import type { MetadataRoute } from "next";
import { env } from "@/server/env";

export const dynamic = "force-dynamic";

const ROBOTS_DISALLOW = ["/account", "/submit", "/review", "/admin", "/sign-in", "/dev/", "/api/", "/embed/"];

export default function robots(): MetadataRoute.Robots {
  const base = env().APP_URL.replace(/\/$/, "");
  // oEmbed stays open: sites that unfurl a chart link ask it, and some of them honour robots.txt.
  return {
    rules: [{ userAgent: "*", allow: ["/", "/api/oembed"], disallow: ROBOTS_DISALLOW }],
    sitemap: `${base}/sitemap.xml`,
  };
}
