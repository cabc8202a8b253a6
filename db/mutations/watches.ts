// Watch and unwatch a pack. Both are idempotent: watching twice or unwatching a pack not watched is fine.
import "server-only";
import { and, eq, ne } from "drizzle-orm";
import { db } from "@/db";
import { packs, watches } from "@/db/schema";
import { AppError } from "@/lib/errors";

export async function watchPack(userId: string, packId: number): Promise<void> {
  const pack = await db
    .select({ id: packs.id })
    .from(packs)
    .where(and(eq(packs.id, packId), ne(packs.status, "merged")))
    .limit(1);
  if (pack.length === 0) throw new AppError("not_found", "That pack does not exist.");
  await db.insert(watches).values({ userId, packId }).onConflictDoNothing();
}

export async function unwatchPack(userId: string, packId: number): Promise<void> {
  await db.delete(watches).where(and(eq(watches.userId, userId), eq(watches.packId, packId)));
}
