// Published results of one pack for its public page: approved ones, and disputed ones (shown as disputed to
// everyone until a moderator resolves the reader flag). Pending, rejected and withdrawn results never show.
import "server-only";
import { and, desc, eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import { results } from "@/db/schema";

export type PublishedResultRow = {
  id: number; status: "approved" | "disputed"; capacityMah: number | null; labelRatio: number | null; sagLimitedC: number | null;
  loadRateC: number; groupKey: string; publishedAt: string | null;
};

export async function listPublishedResultsForPack(packId: number): Promise<PublishedResultRow[]> {
  const rows = await db
    .select({
      id: results.id, status: results.status, capacityMah: results.capacityMah, labelRatio: results.labelRatio, sagLimitedC: results.sagLimitedC,
      loadRateC: results.loadRateC, groupKey: results.groupKey, publishedAt: results.publishedAt,
    })
    .from(results)
    .where(and(eq(results.packId, packId), inArray(results.status, ["approved", "disputed"])))
    .orderBy(desc(results.publishedAt), desc(results.id));
  // Plain strings, so the rows survive the data cache's JSON round trip unchanged.
  return rows.map((r) => ({ ...r, status: r.status as "approved" | "disputed", publishedAt: r.publishedAt?.toISOString() ?? null }));
}
