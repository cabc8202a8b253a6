// Admin catalogue services: a pack's label edit and merges of duplicate makers or packs. The write and its
// audit event share one transaction (db/mutations/catalogue-admin.ts); after the commit the pages of the touched
// packs and makers, of every published result on them (its page shows the pack's label and name), their groups
// and benches, and the lists that name packs, are revalidated — no other pack's or result's page.
import "server-only";
import { mergeMakerRows, mergePackRows, writePackLabel, type Touched } from "@/db/mutations/catalogue-admin";
import { listPublishedResultPlaces } from "@/db/queries/result-tag-sources";
import type { PackLabelInput } from "@/lib/validations/catalogue-admin";
import { cacheTags, tagsForResult } from "@/server/cache-tags";
import { revalidateTags } from "@/server/revalidate";

async function revalidateTouched(t: Touched): Promise<void> {
  const places = await listPublishedResultPlaces({ packIds: t.packIds });
  revalidateTags([
    ...t.packSlugs.map(cacheTags.pack),
    ...t.makerSlugs.map(cacheTags.maker),
    ...places.flatMap(tagsForResult),
    // Lists that name packs or count them per group.
    cacheTags.catalogue,
    cacheTags.groups,
    cacheTags.newest,
    cacheTags.resultLists,
  ]);
}

/** Edits a pack's label; the label-dependent ratios of its results are rescaled in the same transaction. */
export async function updatePackLabel(actorId: string, input: PackLabelInput): Promise<{ packId: number }> {
  await revalidateTouched(await writePackLabel(actorId, input));
  return { packId: input.packId };
}

/** Merges a duplicate pack into another: its results and new-result e-mail requests move, the duplicate is kept as "merged". */
export async function mergePacks(
  actorId: string,
  sourceId: number,
  targetId: number,
): Promise<{ movedResults: number }> {
  const { movedResults, touched } = await mergePackRows(actorId, sourceId, targetId);
  await revalidateTouched(touched);
  return { movedResults };
}

/** Merges a duplicate maker into another: its packs (and so their results) move, the duplicate is kept as "merged". */
export async function mergeMakers(
  actorId: string,
  sourceId: number,
  targetId: number,
): Promise<{ movedPacks: number }> {
  const { movedPacks, touched } = await mergeMakerRows(actorId, sourceId, targetId);
  await revalidateTouched(touched);
  return { movedPacks };
}
