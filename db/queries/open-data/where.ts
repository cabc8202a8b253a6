// What the open-data reads filter by once the server has applied the packs table's filters (lib/pack-query.ts,
// the one pack filter) to the catalogue: a set of pack ids (null: every pack), and for results a pack and a group.
import "server-only";
import { eq, inArray, sql, type SQL } from "drizzle-orm";
import { packs, results } from "@/db/schema";

export type PackWhere = { packIds: number[] | null };
export type ResultWhere = PackWhere & { pack?: string; group?: string };

export function resultConditions(w: ResultWhere): SQL[] {
  const where: SQL[] = [];
  if (w.packIds !== null) where.push(w.packIds.length > 0 ? inArray(results.packId, w.packIds) : sql`false`);
  if (w.pack) where.push(eq(packs.slug, w.pack));
  if (w.group) where.push(eq(results.groupKey, w.group));
  return where;
}
