// Reads for /admin/catalogue: every maker and pack that is not merged away, with how many results they hold.
import "server-only";
import { asc, count, eq, ne } from "drizzle-orm";
import { db } from "@/db";
import { makers, packs, results } from "@/db/schema";

export async function listCatalogueMakers() {
  return db
    .select({ id: makers.id, slug: makers.slug, name: makers.name, status: makers.status, packs: count(packs.id) })
    .from(makers)
    .leftJoin(packs, eq(packs.makerId, makers.id))
    .where(ne(makers.status, "merged"))
    .groupBy(makers.id)
    .orderBy(asc(makers.name));
}

export async function listCataloguePacks() {
  return db
    .select({
      id: packs.id,
      slug: packs.slug,
      model: packs.model,
      makerName: makers.name,
      status: packs.status,
      cellsInSeries: packs.cellsInSeries,
      ratedCapacityMah: packs.ratedCapacityMah,
      labelledContinuousC: packs.labelledContinuousC,
      labelledBurstC: packs.labelledBurstC,
      weightG: packs.weightG,
      connector: packs.connector,
      results: count(results.id),
    })
    .from(packs)
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .leftJoin(results, eq(results.packId, packs.id))
    .where(ne(packs.status, "merged"))
    .groupBy(packs.id, makers.name)
    .orderBy(asc(makers.name), asc(packs.model));
}
export type CataloguePack = Awaited<ReturnType<typeof listCataloguePacks>>[number];
