import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { rateLimitHits } from "@/db/schema";

/** Atomically count a hit in the key's current window (a new window starts once the old one ends). */
export async function hitRateLimit(key: string, windowS: number): Promise<{ count: number; resetAt: Date }> {
  const resetAt = new Date(Date.now() + windowS * 1000);
  const [row] = await db
    .insert(rateLimitHits)
    .values({ key, count: 1, resetAt })
    .onConflictDoUpdate({
      target: rateLimitHits.key,
      set: {
        count: sql`case when ${rateLimitHits.resetAt} <= now() then 1 else ${rateLimitHits.count} + 1 end`,
        resetAt: sql`case when ${rateLimitHits.resetAt} <= now() then ${resetAt.toISOString()}::timestamptz else ${rateLimitHits.resetAt} end`,
      },
    })
    .returning({ count: rateLimitHits.count, resetAt: rateLimitHits.resetAt });
  if (!row) throw new Error("rate limit upsert returned nothing");
  return row;
}
