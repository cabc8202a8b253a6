// Start and stop new-result e-mails about a pack. Both are idempotent: starting twice or stopping e-mails
// never asked for is fine.
import "server-only";
import { and, eq, ne } from "drizzle-orm";
import { db } from "@/db";
import { packEmails, packs } from "@/db/schema";
import { AppError } from "@/lib/errors";

export async function startPackEmails(userId: string, packId: number): Promise<void> {
  const pack = await db
    .select({ id: packs.id })
    .from(packs)
    .where(and(eq(packs.id, packId), ne(packs.status, "merged")))
    .limit(1);
  if (pack.length === 0) throw new AppError("not_found", "That pack does not exist.");
  await db.insert(packEmails).values({ userId, packId }).onConflictDoNothing();
}

export async function stopPackEmails(userId: string, packId: number): Promise<void> {
  await db.delete(packEmails).where(and(eq(packEmails.userId, userId), eq(packEmails.packId, packId)));
}
