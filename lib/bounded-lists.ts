// How many rows a page's chart or list shows, whatever the size of the data, and the rule that picks them: a page
// keeps its size as the catalogue grows, and says where it was cut, with a link to the full table.

/** Packs drawn in the home page's label check (one group at a time). */
export const HOME_LABEL_CHECK_MAX_PACKS = 60;
/** Makers listed beside it. */
export const HOME_RANKING_MAX_MAKERS = 12;

/** Results listed on a pack page, newest first (every result stays in its figures, the API and the downloads).
 * Ten keeps a much-tested pack's page within its size (≈ 1.2 KB of HTML per listed result with its method card). */
export const PACK_PAGE_MAX_RESULTS = 10;

/** Like-for-like groups in a pack page's figures table, most results first; all of them at /packs/<slug>/groups. */
export const PACK_PAGE_MAX_GROUPS = 6;

/** Results drawn in a pack page's "results at different cycle counts" charts, newest first (the fit uses all). */
export const PACK_PAGE_MAX_CYCLE_POINTS = 24;

/** Points of a saved chart's label check (the chart builder, its views, embeds and images). */
export const CHART_MAX_PACKS = 200;

/** The rule the label check and the curves chart use to pick their packs, in the words pages show. */
export const TOP_PACKS_RULE = "the packs with the most published results in this group (ties by the pack's URL name)";

/** "Showing 60 of 245 packs" when cut; null when everything is shown. */
export function shownOf(shown: number, total: number, noun: string, nouns = `${noun}s`): string | null {
  if (total <= shown) return null;
  return `Showing ${shown} of ${total} ${total === 1 ? noun : nouns}`;
}

/** The packs table of one group, most published results first: the full table behind a cut chart or list. */
export function groupTableHref(groupKey: string, sort: "results" | "labelRatio" = "results"): string {
  return `/packs?group=${encodeURIComponent(groupKey)}&sort=${sort}&dir=desc`;
}

/** Orders packs by TOP_PACKS_RULE (most results first, ties by slug; slugs are ASCII, so code-unit order is byte order). */
export function byTopPacksRule<T extends { resultCount: number; packSlug: string }>(a: T, b: T): number {
  return b.resultCount - a.resultCount || (a.packSlug < b.packSlug ? -1 : a.packSlug > b.packSlug ? 1 : 0);
}
