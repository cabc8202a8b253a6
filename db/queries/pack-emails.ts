// Who asked to be e-mailed about new results on which pack.
import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { db } from "@/db";
import { makers, packEmails, packs } from "@/db/schema";

export type PackWithEmails = { packId: number; slug: string; makerName: string; model: string; since: Date };

/** The packs a user gets new-result e-mails about, newest request first. */
export async function listPackEmailsForUser(userId: string): Promise<PackWithEmails[]> {
  return db
    .select({
      packId: packs.id,
      slug: packs.slug,
      makerName: makers.name,
      model: packs.model,
      since: packEmails.createdAt,
    })
    .from(packEmails)
    .innerJoin(packs, eq(packs.id, packEmails.packId))
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(eq(packEmails.userId, userId))
    .orderBy(desc(packEmails.createdAt));
}

/** Whether the user gets new-result e-mails about this pack. */
export async function getsPackEmails(userId: string, packId: number): Promise<boolean> {
  const rows = await db
    .select({ packId: packEmails.packId })
    .from(packEmails)
    .where(and(eq(packEmails.userId, userId), eq(packEmails.packId, packId)))
    .limit(1);
  return rows.length > 0;
}
