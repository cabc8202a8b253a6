// Admin catalogue services: a pack's label edit and merges of duplicate makers or packs. The write and its
// audit event share one transaction (db/mutations/catalogue-admin.ts); after the commit every page that
// shows a touched pack, maker or group, and every list of packs and results, is revalidated.
import "server-only";
import { mergeMakerRows, mergePackRows, writePackLabel, type Touched } from "@/db/mutations/catalogue-admin";
import { listGroupKeysOfPacks } from "@/db/queries/catalogue-admin";
import type { PackLabelInput } from "@/lib/validations/catalogue-admin";
import { cacheTags } from "@/server/cache-tags";
import { revalidateTags } from "@/server/revalidate";

async function revalidateTouched(t: Touched): Promise<void> {
  const groups = await listGroupKeysOfPacks(t.packIds);
  revalidateTags([
    ...t.packSlugs.map(cacheTags.pack),
    ...t.makerSlugs.map(cacheTags.maker),
    cacheTags.packs,
    cacheTags.results,
    ...groups.map(cacheTags.group),
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
