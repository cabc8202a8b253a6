// The packs table in SQL: the one pack filter (the table's filters and the search), sorting and paging, read from
// the catalogue and the summary tables (db/schema/summaries.ts) — no request loads the whole catalogue or counts
// results. /packs, GET /api/v1/packs, the packs download and the results' pack filter all come through here
// (server/pack-search.ts), so a filter or `q` means the same everywhere.
import "server-only";
import { and, asc, desc, eq, gte, lte, sql, type AnyColumn, type SQL } from "drizzle-orm";
import { db, type Executor } from "@/db";
import type { PgSelect } from "drizzle-orm/pg-core";
import { groupSummaries, makers, packGroupSummaries, packs, packSummaries } from "@/db/schema";
import type { PackRow } from "@/lib/catalogue";
import { pageCountOf, rankBySearch, type PackPage } from "@/lib/pack-query";
import type { PackParams, PackSortKey } from "@/lib/pack-query-params";
import { packColumns } from "./packs";
import { isCatalogueActive, makerOfPack } from "./published";
import { searchCondition, searchTx } from "./pack-search";
import { searchWords } from "@/lib/pack-search";

/** What filters the catalogue (the table's state without its order and page). */
export type PackFilterParams = Omit<PackParams, "sort" | "dir" | "page" | "size">;

const rowColumns = {
  ...packColumns,
  resultCount: sql<number>`coalesce(${packSummaries.resultCount}, 0)`.mapWith(Number),
  groupCount: sql<number>`coalesce(${packSummaries.groupCount}, 0)`.mapWith(Number),
  // Medians inside the chosen group (null without one): the sag-limited C ESTIMATE keeps the API's old field name.
  measuredC: packGroupSummaries.sagLimitedMedian,
  labelRatio: packGroupSummaries.labelRatioMedian,
  capacityRatio: packGroupSummaries.capacityRatioMedian,
  groupN: sql<number>`coalesce(${packGroupSummaries.resultCount}, 0)`.mapWith(Number),
};

const sortExpr: Record<PackSortKey, SQL | AnyColumn> = {
  maker: sql`lower(${makers.name})`,
  model: sql`lower(${packs.model})`,
  cells: packs.cellsInSeries,
  capacity: packs.ratedCapacityMah,
  labelledC: packs.labelledContinuousC,
  weight: packs.weightG,
  connector: sql`lower(${packs.connector})`,
  results: sql`coalesce(${packSummaries.resultCount}, 0)`,
  measuredC: packGroupSummaries.sagLimitedMedian,
  labelRatio: packGroupSummaries.labelRatioMedian,
  capacityRatio: packGroupSummaries.capacityRatioMedian,
};

function range(column: AnyColumn, min: number | null, max: number | null): SQL[] {
  return [...(min === null ? [] : [gte(column, min)]), ...(max === null ? [] : [lte(column, max)])];
}

/** Active packs of active makers matching the filters and the search (a range excludes a pack missing the value). */
function conditions(p: PackFilterParams): SQL | undefined {
  const search = searchCondition(p.q, sql`${packs.id}`);
  return and(
    isCatalogueActive,
    ...(p.cells === null ? [] : [eq(packs.cellsInSeries, p.cells)]),
    ...range(packs.ratedCapacityMah, p.minMah, p.maxMah),
    ...range(packs.labelledContinuousC, p.minC, p.maxC),
    ...range(packs.weightG, p.minG, p.maxG),
    ...(p.connector === null ? [] : [sql`lower(${packs.connector}) = lower(${p.connector})`]),
    ...(p.maker === null ? [] : [eq(makers.slug, p.maker)]),
    ...(search === null ? [] : [search]),
  );
}

/**
 * The catalogue joined to its summaries, with the group's medians for `group` (none for null). `only`: just the
 * packs with published results in the group (an inner join, which reads the group's rows by its index).
 */
function joined<T extends PgSelect>(qb: T, group: string | null, only: "in-group" | "all") {
  const inGroup = and(eq(packGroupSummaries.packId, packs.id), sql`${packGroupSummaries.groupKey} = ${group}`);
  const base = qb.innerJoin(makers, makerOfPack).leftJoin(packSummaries, eq(packSummaries.packId, packs.id));
  return group !== null && only === "in-group"
    ? base.innerJoin(packGroupSummaries, inGroup)
    : base.leftJoin(packGroupSummaries, inGroup);
}

/** With a group chosen, the table lists only packs that have published results in it. */
const rowsFrom = (ex: Executor, group: string | null, only: "in-group" | "all" = "in-group") =>
  joined(ex.select(rowColumns).from(packs).$dynamic(), group, only);

/** The table's order: missing values last whichever the direction ("—" is not a small number), then slug. */
function orderOf(sort: PackSortKey, dir: "asc" | "desc"): SQL[] {
  const e = sortExpr[sort];
  return [sql`${e} is null`, dir === "asc" ? asc(e) : desc(e), asc(packs.slug)];
}

/** The catalogue's own order (maker, model), which a search's ranking keeps for ties. */
const catalogueOrder = [asc(makers.name), asc(packs.model), asc(packs.id)];

/** A text search on the default order ranks by relevance; a column the reader picked wins over it. */
const ranksBySearch = (p: PackParams) => p.q.trim() !== "" && p.sort === "maker" && p.dir === "asc";

/** Every pack matching, in the table's order (the packs download; the results' pack filter takes their ids). */
export async function listMatchingPacks(p: PackParams): Promise<PackRow[]> {
  return searchTx(p.q, async (tx) => {
    const q = rowsFrom(tx, p.group).where(conditions(p));
    if (ranksBySearch(p)) return rankBySearch(await q.orderBy(...catalogueOrder), p.q);
    return q.orderBy(...orderOf(p.sort, p.dir));
  });
}

/** The ids of the packs matching the filters and the search (any order). */
export async function listMatchingPackIds(p: PackFilterParams): Promise<number[]> {
  return searchTx(p.q, async (tx) => {
    const rows = await joined(tx.select({ id: packs.id }).from(packs).$dynamic(), p.group, "in-group").where(
      conditions(p),
    );
    return rows.map((r) => r.id);
  });
}

/** The filters besides the group; with none of them set, a group's packs are group_summaries' count. */
const OTHER_FILTERS = ["cells", "minMah", "maxMah", "minC", "maxC", "minG", "maxG", "connector", "maker"] as const;

/**
 * How many packs match: a group's own pack count (one row of group_summaries, which counts the packs of active
 * makers with published results in the group, as the in-group join does) when the group is the only filter,
 * else counted over the catalogue.
 */
async function countMatching(ex: Executor, p: PackFilterParams, where: SQL | undefined): Promise<number> {
  if (p.group !== null && searchWords(p.q).length === 0 && OTHER_FILTERS.every((k) => p[k] === null)) {
    const [row] = await ex
      .select({ n: groupSummaries.packCount })
      .from(groupSummaries)
      .where(eq(groupSummaries.groupKey, p.group));
    return row?.n ?? 0;
  }
  const [counted] = await joined(
    ex
      .select({ n: sql<number>`count(*)`.mapWith(Number) })
      .from(packs)
      .$dynamic(),
    p.group,
    "in-group",
  ).where(where);
  return counted?.n ?? 0;
}

/** One page of the matching packs and how many match. A page past the last is empty (the API answers 422). */
export async function queryPackPage(p: PackParams): Promise<PackPage> {
  return searchTx(p.q, async (tx) => {
    const where = conditions(p);
    const from = (p.page - 1) * p.size;
    const done = (rows: PackRow[], total: number): PackPage => ({
      rows,
      total,
      page: p.page,
      pageCount: pageCountOf(total, p.size),
      size: p.size,
    });
    if (ranksBySearch(p)) {
      // Relevance is Fuse.js's score over the matches (lib/pack-query.ts): rank them all, then take the page.
      const found = await rowsFrom(tx, p.group)
        .where(where)
        .orderBy(...catalogueOrder);
      return done(rankBySearch(found, p.q).slice(from, from + p.size), found.length);
    }
    const total = await countMatching(tx, p, where);
    if (from >= total) return done([], total);
    const rows = await rowsFrom(tx, p.group)
      .where(where)
      .orderBy(...orderOf(p.sort, p.dir))
      .limit(p.size)
      .offset(from);
    return done(rows, total);
  });
}

/** Every active pack with its published-result counts and, with a group, its medians there (null where none). */
export async function listPackRows(group: string | null): Promise<PackRow[]> {
  return rowsFrom(db, group, "all")
    .where(isCatalogueActive)
    .orderBy(...catalogueOrder);
}

/** Active makers, by name, with their active packs and those packs' published results (from the summaries). */
export async function listMakerCounts(): Promise<
  { id: number; slug: string; name: string; packCount: number; resultCount: number }[]
> {
  return db
    .select({
      id: makers.id,
      slug: makers.slug,
      name: makers.name,
      packCount: sql<number>`count(${packs.id})`.mapWith(Number),
      resultCount: sql<number>`coalesce(sum(${packSummaries.resultCount}), 0)`.mapWith(Number),
    })
    .from(makers)
    .leftJoin(packs, and(eq(packs.makerId, makers.id), eq(packs.status, "active")))
    .leftJoin(packSummaries, eq(packSummaries.packId, packs.id))
    .where(eq(makers.status, "active"))
    .groupBy(makers.id)
    .orderBy(asc(makers.name), asc(makers.id));
}

/** What the packs table's filters offer: makers with active packs, their connectors and cell counts. */
export async function listPackFilterOptions(): Promise<{
  makers: { slug: string; name: string }[];
  connectors: string[];
  cells: number[];
}> {
  const [makerRows, connectorRows, cellRows] = await Promise.all([
    db
      .selectDistinct({ slug: makers.slug, name: makers.name })
      .from(packs)
      .innerJoin(makers, makerOfPack)
      .where(isCatalogueActive),
    db
      .selectDistinct({ connector: packs.connector })
      .from(packs)
      .innerJoin(makers, makerOfPack)
      .where(isCatalogueActive),
    db
      .selectDistinct({ cells: packs.cellsInSeries })
      .from(packs)
      .innerJoin(makers, makerOfPack)
      .where(isCatalogueActive),
  ]);
  return {
    makers: makerRows.sort((a, b) => a.name.localeCompare(b.name)),
    connectors: connectorRows.map((r) => r.connector).sort(),
    cells: cellRows.map((r) => r.cells).sort((a, b) => a - b),
  };
}

/** One active pack of an active maker as the packs table lists it (by the slug's unique index), or null. */
export async function getPackRow(slug: string): Promise<PackRow | null> {
  const [row] = await rowsFrom(db, null)
    .where(and(isCatalogueActive, eq(packs.slug, slug)))
    .limit(1);
  return row ?? null;
}
