// After a bench profile's edit: its stated accuracy sets the ± of every published result measured with it, so
// those results' pages, packs, makers and groups, the bench's page and the bench agreement are refreshed, and the
// API's results lists that are not narrowed to a pack, maker or group (they show the ±). Nothing else: another
// bench's results, and the catalogue's counts, do not change.
import "server-only";
import { listPublishedResultPlaces } from "@/db/queries/result-tag-sources";
import { cacheTags, tagsForResult } from "@/server/cache-tags";
import { revalidateTags } from "@/server/revalidate";

export async function revalidateBenchProfile(benchProfileId: number): Promise<void> {
  const places = await listPublishedResultPlaces({ benchProfileId });
  const tags = [cacheTags.bench(benchProfileId), cacheTags.benches, ...places.flatMap(tagsForResult)];
  if (places.length > 0) tags.push(cacheTags.resultLists);
  revalidateTags(tags);
}
