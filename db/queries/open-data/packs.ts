// Makers and packs for the public API and downloads (active catalogue entries only).
import "server-only";
import { and, asc, count, eq, gte, ilike, lte, or, sql, type SQL } from "drizzle-orm";
import { db } from "@/db";
import { makers, packs, results } from "@/db/schema";
import type { MakerRow, PackRecord } from "@/lib/open-data/records";
import type { PackFilters } from "@/lib/validations/open-data";
import { packLabelColumns } from "@/db/queries/packs";

export type Page = { page: number; size: number };
export type Paged<T> = { rows: T[]; total: number };

const approvedCount = sql<number>`(select count(*)::int from ${results} where ${results.packId} = ${packs.id} and ${results.status} = 'approved')`;

const packColumns = {
  id: packs.id,
  slug: packs.slug,
  makerId: packs.makerId,
  makerSlug: makers.slug,
  makerName: makers.name,
  model: packs.model,
  ...packLabelColumns,
  approvedResultCount: approvedCount,
};

function escapeLike(s: string): string {
  return s.replace(/[\\%_]/g, (c) => `\\${c}`);
}

export function packConditions(f: PackFilters): SQL[] {
  const where: SQL[] = [eq(packs.status, "active"), eq(makers.status, "active")];
  if (f.maker) where.push(eq(makers.slug, f.maker));
  if (f.cells !== undefined) where.push(eq(packs.cellsInSeries, f.cells));
  if (f.connector) where.push(sql`lower(${packs.connector}) = lower(${f.connector})`);
  if (f.minMah !== undefined) where.push(gte(packs.ratedCapacityMah, f.minMah));
  if (f.maxMah !== undefined) where.push(lte(packs.ratedCapacityMah, f.maxMah));
  if (f.minC !== undefined) where.push(gte(packs.labelledContinuousC, f.minC));
  if (f.maxC !== undefined) where.push(lte(packs.labelledContinuousC, f.maxC));
  if (f.minG !== undefined) where.push(gte(packs.weightG, f.minG));
  if (f.maxG !== undefined) where.push(lte(packs.weightG, f.maxG));
  if (f.q) {
    const like = `%${escapeLike(f.q)}%`;
    const match = or(ilike(packs.model, like), ilike(makers.name, like));
    if (match) where.push(match);
  }
  return where;
}

export async function listMakersPage({ page, size }: Page): Promise<Paged<MakerRow>> {
  const where = eq(makers.status, "active");
  const rows = await db
    .select({
      id: makers.id,
      slug: makers.slug,
      name: makers.name,
      packCount: sql<number>`(select count(*)::int from ${packs} where ${packs.makerId} = ${makers.id} and ${packs.status} = 'active')`,
    })
    .from(makers)
    .where(where)
    .orderBy(asc(makers.name), asc(makers.id))
    .limit(size)
    .offset((page - 1) * size);
  const [total] = await db.select({ n: count() }).from(makers).where(where);
  return { rows, total: total?.n ?? 0 };
}

export async function getMakerBySlug(slug: string): Promise<MakerRow | null> {
  const { rows } = await listMakersPageWhere(slug);
  return rows[0] ?? null;
}

async function listMakersPageWhere(slug: string): Promise<Paged<MakerRow>> {
  const rows = await db
    .select({
      id: makers.id,
      slug: makers.slug,
      name: makers.name,
      packCount: sql<number>`(select count(*)::int from ${packs} where ${packs.makerId} = ${makers.id} and ${packs.status} = 'active')`,
    })
    .from(makers)
    .where(and(eq(makers.status, "active"), eq(makers.slug, slug)))
    .limit(1);
  return { rows, total: rows.length };
}

async function listPacksPage(f: PackFilters, { page, size }: Page): Promise<Paged<PackRecord>> {
  const where = and(...packConditions(f));
  const rows = await db
    .select(packColumns)
    .from(packs)
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(where)
    .orderBy(asc(makers.name), asc(packs.model), asc(packs.id))
    .limit(size)
    .offset((page - 1) * size);
  const [total] = await db
    .select({ n: count() })
    .from(packs)
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(where);
  return { rows, total: total?.n ?? 0 };
}

export async function getApiPackBySlug(slug: string): Promise<PackRecord | null> {
  const rows = await db
    .select(packColumns)
    .from(packs)
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(and(eq(packs.slug, slug), eq(packs.status, "active")))
    .limit(1);
  return rows[0] ?? null;
}

/** Every active maker (downloads and the Data Package). */
export async function listAllMakers(): Promise<MakerRow[]> {
  return (await listMakersPage({ page: 1, size: 1_000_000 })).rows;
}

/** Every active pack matching the filters (downloads). */
export async function listAllPacks(f: PackFilters = {}): Promise<PackRecord[]> {
  return (await listPacksPage(f, { page: 1, size: 1_000_000 })).rows;
}
