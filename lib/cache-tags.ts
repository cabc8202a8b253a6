// Cache tag names shared by the public pages (which tag what they read) and the writes that change them
// (which revalidate those tags after their transaction commits).
export const cacheTags = {
  packs: "packs",
  results: "results",
  pack: (slug: string) => `pack:${slug}`,
  maker: (slug: string) => `maker:${slug}`,
  group: (key: string) => `group:${key}`,
} as const;

/** Every public page that shows a result of this pack: the pack, its maker, its like-for-like group, the lists. */
export function tagsForResult(p: { packSlug: string; makerSlug: string; groupKey: string }): string[] {
  return [cacheTags.pack(p.packSlug), cacheTags.maker(p.makerSlug), cacheTags.group(p.groupKey), cacheTags.packs, cacheTags.results];
}
