// Existence checks by slug, each one row through a unique index (packs.slug, makers.slug) and packs (maker_id):
// their cost does not grow with the catalogue, unlike a search of the whole cached pack list. The API's cache
// guards (server/public-data.ts boundedFilters) use them.
import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { makers, packs } from "@/db/schema";
import { makerOfPack } from "./published";

const activeCatalogue = and(eq(packs.status, "active"), eq(makers.status, "active"));

/** Whether an active pack of an active maker has this slug (one row by the unique slug index). */
export async function activePackExists(slug: string): Promise<boolean> {
  const rows = await db
    .select({ id: packs.id })
    .from(packs)
    .innerJoin(makers, makerOfPack)
    .where(and(eq(packs.slug, slug), activeCatalogue))
    .limit(1);
  return rows.length > 0;
}

/** Whether an active maker with this slug has an active pack (makers.slug, then packs (maker_id); stops at one). */
export async function activeMakerWithPacksExists(slug: string): Promise<boolean> {
  const rows = await db
    .select({ id: packs.id })
    .from(makers)
    .innerJoin(packs, makerOfPack)
    .where(and(eq(makers.slug, slug), activeCatalogue))
    .limit(1);
  return rows.length > 0;
}
