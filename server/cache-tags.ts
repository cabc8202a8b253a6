// The cache tags of public pages and the public API, in one place. Each cached read (server/public-data.ts,
// server/bench-agreement.ts) carries only the tags of what it shows, and each change revalidates only the tags it
// touches (revalidateTags in server/revalidate.ts, after the commit):
//   a pack page           pack:<slug>            a result page        result:<id>
//   a maker's lists       maker:<slug>           a group's ranking, label check, charts   group:<key>
//   a bench's page        bench:<id>             bench agreement (all benches)            benches
//   the newest results    newest                 the groups list and chart coverage       groups
//   catalogue lists (/packs, the API's packs and makers lists, the sitemap)              catalogue
//   the API's results lists not narrowed to a pack, maker or group                       result-lists
// There is no site-wide tag: one decision refreshes its own result, pack, maker, group and bench and the lists
// that count it, never every pack page, result page and ranking.
export const cacheTags = {
  pack: (slug: string) => `pack:${slug}`,
  maker: (slug: string) => `maker:${slug}`,
  group: (key: string) => `group:${key}`,
  result: (id: number) => `result:${id}`,
  bench: (id: number) => `bench:${id}`,
  /** Agreement between benches (every bench's scores are read from one list of published results). */
  benches: "benches",
  /** The newest published results (home, sitemap). */
  newest: "newest",
  /** The like-for-like groups with their counts, and the chart builder's coverage. */
  groups: "groups",
  /** Lists over the whole catalogue with counts: /packs, GET /api/v1/packs and makers, the compare picker. */
  catalogue: "catalogue",
  /** GET /api/v1/results pages not narrowed to a pack, maker or group (unfiltered, or by cells only). */
  resultLists: "result-lists",
  /** The featured charts (/charts and GET /api/v1/charts): featuring or unfeaturing one revalidates it. */
  charts: "charts",
  /** The site settings (the notice every page shows, the submissions pause). */
  settings: "settings",
} as const;

/** Seconds after which cached public data is refreshed even without a tag (a safety net, not the mechanism). */
export const PUBLIC_REVALIDATE_S = 3600;

/** What a result's tags are made from: where it sits in the catalogue and which bench measured it. */
export type ResultTagSource = {
  packSlug: string;
  makerSlug: string;
  groupKey: string;
  resultId?: number;
  benchProfileId?: number | null;
};

/**
 * The tags of one published result itself: its page, its pack, maker and group, and its bench. The single place
 * that lists a result's tags; what else a change touches (the lists that count it) is added by the caller.
 */
export function tagsForResult(r: ResultTagSource): string[] {
  const tags: string[] = [cacheTags.pack(r.packSlug), cacheTags.maker(r.makerSlug), cacheTags.group(r.groupKey)];
  if (r.resultId !== undefined) tags.push(cacheTags.result(r.resultId));
  if (r.benchProfileId != null) tags.push(cacheTags.bench(r.benchProfileId), cacheTags.benches);
  return tags;
}

/**
 * A result entering or leaving publication (approval, withdrawal): the result's own tags, and every list that
 * counts published results — newest, groups, the catalogue's counts and the unnarrowed API results lists.
 */
export function tagsForPublicationChange(r: ResultTagSource): string[] {
  return [...tagsForResult(r), cacheTags.newest, cacheTags.groups, cacheTags.catalogue, cacheTags.resultLists];
}
