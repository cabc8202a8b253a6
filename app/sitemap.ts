// /sitemap.xml: the public pages, every active pack and every approved result, so shoppers find packs from a
// search engine. From the tagged cached reads (a decision refreshes them); read per request for APP_URL.
import type { MetadataRoute } from "next";
import { env } from "@/server/env";
import { cachedNewestResults, cachedPacks } from "@/server/public-data";

export const dynamic = "force-dynamic";

/** A sitemap file holds at most 50,000 addresses (sitemaps.org); results fill what the pages leave. */
const MAX_RESULTS = 45_000;
const PAGES: { path: string; changeFrequency: "daily" | "weekly" | "monthly"; priority: number }[] = [
  { path: "/", changeFrequency: "daily", priority: 1 },
  { path: "/packs", changeFrequency: "daily", priority: 0.9 },
  { path: "/compare", changeFrequency: "weekly", priority: 0.5 },
  { path: "/methods", changeFrequency: "monthly", priority: 0.7 },
  { path: "/analyse", changeFrequency: "monthly", priority: 0.4 },
  { path: "/data", changeFrequency: "weekly", priority: 0.6 },
  { path: "/data/api", changeFrequency: "monthly", priority: 0.4 },
  { path: "/charts", changeFrequency: "weekly", priority: 0.5 },
  { path: "/charts/new", changeFrequency: "monthly", priority: 0.3 },
];

export default async function sitemap(): Promise<MetadataRoute.Sitemap> {
  const base = env().APP_URL.replace(/\/$/, "");
  const [packs, results] = await Promise.all([cachedPacks(), cachedNewestResults(MAX_RESULTS)]);
  const newestByPack = new Map<string, string>();
  for (const r of results)
    if (r.publishedAt && !newestByPack.has(r.packSlug)) newestByPack.set(r.packSlug, r.publishedAt);
  return [
    ...PAGES.map((p) => ({ url: `${base}${p.path}`, changeFrequency: p.changeFrequency, priority: p.priority })),
    ...packs.map((p) => ({
      url: `${base}/packs/${p.slug}`,
      lastModified: newestByPack.get(p.slug),
      changeFrequency: "weekly" as const,
      priority: 0.8,
    })),
    ...results.map((r) => ({
      url: `${base}/results/${r.id}`,
      lastModified: r.publishedAt ?? undefined,
      changeFrequency: "monthly" as const,
      priority: 0.5,
    })),
  ];
}
