// The cache tags of public pages and the public API, in one place. Cached reads (server/public-data.ts) carry
// them; moderation, catalogue merges and withdrawals call revalidateTag(tag, "max") with them, e.g.
//   for (const t of tagsForResult({ packSlug, makerSlug, groupKey, resultId })) revalidateTag(t, "max");
export const cacheTags = {
  /** The catalogue and anything listing packs (table, home, API). */
  packs: "packs",
  /** Every list of published results (newest results, groups, rankings). */
  results: "results",
  pack: (slug: string) => `pack:${slug}`,
  maker: (slug: string) => `maker:${slug}`,
  group: (key: string) => `group:${key}`,
  result: (id: number) => `result:${id}`,
  /** The featured charts (/charts and GET /api/v1/charts): featuring or unfeaturing one revalidates it. */
  charts: "charts",
  /** The site settings (the notice every page shows, the submissions pause). */
  settings: "settings",
} as const;

/** Seconds after which cached public data is refreshed even without a tag (a safety net, not the mechanism). */
export const PUBLIC_REVALIDATE_S = 3600;

/** Every tag a change of one result's status touches (approve, withdraw, dispute, resolve). */
export function tagsForResult(r: {
  packSlug: string;
  makerSlug: string;
  groupKey: string;
  resultId?: number;
}): string[] {
  const tags: string[] = [
    cacheTags.packs,
    cacheTags.results,
    cacheTags.pack(r.packSlug),
    cacheTags.maker(r.makerSlug),
    cacheTags.group(r.groupKey),
  ];
  if (r.resultId !== undefined) tags.push(cacheTags.result(r.resultId));
  return tags;
}
