// Which storage keys the database still points at: a result's log or one of its photos. The storage sweep
// asks before removing anything, so a file a result needs is never deleted, whatever its key.
import "server-only";
import { inArray, or, sql } from "drizzle-orm";
import { db } from "@/db";
import { results } from "@/db/schema";

const BATCH = 500;

/** The subset of `keys` that some result (in any review state) refers to. */
export async function findReferencedKeys(keys: string[]): Promise<Set<string>> {
  const found = new Set<string>();
  for (let i = 0; i < keys.length; i += BATCH) {
    const batch = keys.slice(i, i + BATCH);
    const list = sql`array[${sql.join(
      batch.map((k) => sql`${k}`),
      sql`, `,
    )}]::text[]`;
    const rows = await db
      .select({ logKey: results.logKey, photoKeys: results.photoKeys })
      .from(results)
      .where(or(inArray(results.logKey, batch), sql`${results.photoKeys} ?| ${list}`));
    const wanted = new Set(batch);
    for (const r of rows) for (const k of [r.logKey, ...r.photoKeys]) if (wanted.has(k)) found.add(k);
  }
  return found;
}
