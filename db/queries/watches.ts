import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { db } from "@/db";
import { makers, packs, users, watches } from "@/db/schema";

export type WatchedPack = { packId: number; slug: string; makerName: string; model: string; watchedAt: Date };

export async function listWatchesForUser(userId: string): Promise<WatchedPack[]> {
  return db
    .select({
      packId: packs.id,
      slug: packs.slug,
      makerName: makers.name,
      model: packs.model,
      watchedAt: watches.createdAt,
    })
    .from(watches)
    .innerJoin(packs, eq(packs.id, watches.packId))
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(eq(watches.userId, userId))
    .orderBy(desc(watches.createdAt));
}

export async function isWatching(userId: string, packId: number): Promise<boolean> {
  const rows = await db
    .select({ packId: watches.packId })
    .from(watches)
    .where(and(eq(watches.userId, userId), eq(watches.packId, packId)))
    .limit(1);
  return rows.length > 0;
}

/** Addresses of the people watching a pack (for "new result published" mail), except the ones given. */
export async function listWatcherEmails(packId: number, exceptUserIds: string[] = []): Promise<string[]> {
  const rows = await db
    .select({ userId: users.id, email: users.email })
    .from(watches)
    .innerJoin(users, eq(users.id, watches.userId))
    .where(eq(watches.packId, packId));
  return rows.flatMap((r) => (r.email && !exceptUserIds.includes(r.userId) ? [r.email] : []));
}
