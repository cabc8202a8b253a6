// Tag-based revalidation of the statically generated public pages, in one place so tests can spy on it.
// Called after a transaction commits, never inside it: a rolled-back write must not refresh anything.
import "server-only";
import { revalidateTag } from "next/cache";

export function revalidateTags(tags: readonly string[]): void {
  for (const tag of new Set(tags)) {
    try {
      // expire: 0 — the next request renders fresh data (from actions and route handlers alike).
      revalidateTag(tag, { expire: 0 });
    } catch (err) {
      // Outside a request (scripts, tests without Next) there is no cache to refresh.
      console.warn(`[revalidate] ${tag}: ${err instanceof Error ? err.message : String(err)}`);
    }
  }
}
