// Like-for-like groups: which exist, and the per-pack and per-maker figures inside one group. Every read here
// comes from the summary tables (db/schema/summaries.ts), which PostgreSQL's triggers on `results` keep equal to
// the from-scratch aggregate of approved results, so no request aggregates results. Their medians are
// percentile_cont (linear interpolation between order statistics, the same "type 7" quantile as summarise() in
// lib/analysis — tests/integration/summaries.test.ts and groups-queries.test.ts check they agree). The per-pack
// summaries count approved results whatever the pack's or maker's status, so each read of them joins packs and
// makers and keeps the counting rule's catalogue half (isCatalogueActive); group_summaries counts only active packs
// of active makers (its triggers follow status changes), so the group list reads it as it is.
import "server-only";
import { and, desc, eq, inArray, sql } from "drizzle-orm";
import { db } from "@/db";
import { groupSummaries, makers, packGroupSummaries, packs, results } from "@/db/schema";
import { medianInterval } from "@/lib/analysis/uncertainty";
import type { AnyPgColumn } from "drizzle-orm/pg-core";
import { describeStoredGroup, type DescribedGroup } from "@/lib/like-for-like";
import { isCatalogueActive, makerOfPack, packOfResult } from "./published";

const s = packGroupSummaries;
const packOfSummary = eq(packs.id, s.packId);

/**
 * A stored maximum or minimum back in the results column's own type: the summaries hold float8, the results
 * columns are real, and a real read back as real prints as entered (2.3, not 2.299999952316284) as before.
 */
const asReal = (column: AnyPgColumn) => sql<number | null>`${column}::real`;

export type GroupSummary = DescribedGroup & { resultCount: number; packCount: number };

/**
 * Groups that hold published results, the most packs first: one row per group from group_summaries (kept by the
 * triggers, counting active packs of active makers only). Labels come from a representative method card, the
 * group's oldest published result.
 */
export async function listPublicGroups(): Promise<GroupSummary[]> {
  const g = groupSummaries;
  const rows = await db
    .select({
      key: g.groupKey,
      resultCount: g.resultCount,
      packCount: g.packCount,
      resistanceMethod: results.resistanceMethod,
      ambientTemperatureC: results.ambientTemperatureC,
      cutoffVPerCell: results.cutoffVPerCell,
      loadCurrentA: results.loadCurrentA,
      cyclesBeforeTest: results.cyclesBeforeTest,
      ratedCapacityMah: packs.ratedCapacityMah,
    })
    .from(g)
    .innerJoin(results, eq(results.id, g.firstResultId))
    .innerJoin(packs, packOfResult);
  return rows
    .map((r) => ({
      ...describeStoredGroup(r.key, {
        resistanceMethod: r.resistanceMethod,
        ambientC: r.ambientTemperatureC,
        cutoffVPerCell: r.cutoffVPerCell,
        loadCurrentA: r.loadCurrentA,
        ratedMah: r.ratedCapacityMah,
        cyclesBeforeTest: r.cyclesBeforeTest,
      }),
      key: r.key,
      resultCount: r.resultCount,
      packCount: r.packCount,
    }))
    .sort((a, b) => b.packCount - a.packCount || b.resultCount - a.resultCount || a.key.localeCompare(b.key));
}

export type PackInGroup = {
  packId: number;
  packSlug: string;
  model: string;
  makerName: string;
  makerSlug: string;
  labelledC: number;
  /** Published results of the pack in the group. */
  n: number;
  /**
   * Sag-limited C ESTIMATE: median over the pack's published results (the field keeps its old name, which the
   * packs API also uses; pages call it "sag-limited C (estimate)").
   */
  measuredC: {
    median: number;
    n: number;
    min: number;
    max: number;
    /** The median's 95 % interval (order statistics), from 6 results on; null below. */
    low: number | null;
    high: number | null;
  } | null;
  /** Sag-limited C estimate ÷ labelled C, median. */
  labelRatio: number | null;
  /** The pack's sustained C (MEASURED) in the group: the highest among its published results, with their count. */
  sustainedC: { value: number; n: number } | null;
  capacityRatio: number | null;
  capacityMah: number | null;
  dcResistanceMohm: number | null;
};

/** The `limit` packs of a group with the most published results, ties by slug (a subquery). */
function topPackIds(groupKey: string, limit: number) {
  return db
    .select({ id: s.packId })
    .from(s)
    .innerJoin(packs, packOfSummary)
    .innerJoin(makers, makerOfPack)
    .where(and(eq(s.groupKey, groupKey), isCatalogueActive))
    .orderBy(desc(s.resultCount), packs.slug)
    .limit(limit);
}

/**
 * Per-pack medians of one group (the label check, and the measured columns of the packs table). With `limit`, only
 * that many packs: those with the most published results in the group, ties by slug (the home label check's rule).
 */
export async function listPacksInGroup(groupKey: string, limit?: number): Promise<PackInGroup[]> {
  const query = db
    .select({
      packId: packs.id,
      packSlug: packs.slug,
      model: packs.model,
      makerName: makers.name,
      makerSlug: makers.slug,
      labelledC: packs.labelledContinuousC,
      n: s.resultCount,
      measuredN: s.sagLimitedN,
      measuredMedian: s.sagLimitedMedian,
      measuredMin: asReal(s.sagLimitedMin),
      measuredMax: asReal(s.sagLimitedMax),
      measuredValues: s.sagLimitedValues,
      labelRatio: s.labelRatioMedian,
      sustainedMax: asReal(s.sustainedMax),
      sustainedN: s.sustainedN,
      capacityRatio: s.capacityRatioMedian,
      capacityMah: s.capacityMahMedian,
      dcResistanceMohm: s.dcResistanceMedian,
    })
    .from(s)
    .innerJoin(packs, packOfSummary)
    .innerJoin(makers, makerOfPack)
    .where(and(eq(s.groupKey, groupKey), isCatalogueActive))
    .$dynamic();
  const rows = await (limit === undefined
    ? // Descending puts packs without a label ratio first (PostgreSQL's default for DESC), as before.
      query.orderBy(desc(s.labelRatioMedian), packs.slug)
    : query
        // The chosen packs first, from the narrow index (pack_group_summaries_table_idx) without the wide rows.
        .where(and(eq(s.groupKey, groupKey), isCatalogueActive, inArray(s.packId, topPackIds(groupKey, limit))))
        .orderBy(desc(s.resultCount), packs.slug));
  return rows.map(
    ({ measuredN, measuredMedian, measuredMin, measuredMax, measuredValues, sustainedMax, sustainedN, ...r }) => {
      const interval = medianInterval(measuredValues.map(Number));
      return {
        ...r,
        sustainedC: sustainedMax === null || sustainedN === 0 ? null : { value: Number(sustainedMax), n: sustainedN },
        measuredC:
          measuredMedian === null || measuredN === 0
            ? null
            : {
                median: measuredMedian,
                n: measuredN,
                min: Number(measuredMin),
                max: Number(measuredMax),
                low: interval?.meets ? interval.lower : null,
                high: interval?.meets ? interval.upper : null,
              },
      };
    },
  );
}

export type MakerRank = {
  makerSlug: string;
  makerName: string;
  medianLabelRatio: number;
  packs: number;
  results: number;
  min: number;
  max: number;
  /** Each pack's value once (its median, or its highest measured), for the maker's median interval. */
  packValues: number[];
};

/** Which label ratio a ranking orders by: of the sag-limited C estimate, or of the measured sustained C. */
export type RankingRating = "estimate" | "measured";

/**
 * Makers ranked by the median over their packs inside one group; each pack counts once, so a pack tested twenty
 * times does not outweigh the rest of its maker's range. "estimate": a pack's value is the median label ratio of
 * its published results (sag-limited C estimate ÷ labelled C). "measured": the pack's sustained C ÷ labelled C,
 * the highest among its published results (content/methods/figures.md). The order is a listing, not a verdict:
 * pages mark a maker ahead only where the median intervals say so (lib/analysis/uncertainty distinguishedBest).
 */
export async function rankMakersInGroup(groupKey: string, rating: RankingRating = "estimate"): Promise<MakerRank[]> {
  // One value per pack in the catalogue (the counting rule's catalogue half) with its count of non-null ratios.
  const [m, n] =
    rating === "estimate"
      ? [sql`${s.labelRatioMedian}`, s.labelRatioN]
      : [sql`${asReal(s.sustainedLabelRatioMax)}`, s.sustainedLabelRatioN];
  const rows = await db.execute<{
    maker_slug: string;
    maker_name: string;
    median: number;
    packs: number;
    results: number;
    min: number;
    max: number;
    pack_values: number[];
  }>(sql`
    with per_pack as (
      select ${s.packId} as pack_id, ${makers.id} as maker_id, ${m} as m, ${n} as n
      from ${s}
      join ${packs} on ${packOfSummary}
      join ${makers} on ${makerOfPack}
      where ${s.groupKey} = ${groupKey} and ${isCatalogueActive} and ${n} > 0
    )
    select mk.slug as maker_slug, mk.name as maker_name, percentile_cont(0.5) within group (order by pp.m) as median,
           count(*)::int as packs, sum(pp.n)::int as results, min(pp.m) as min, max(pp.m) as max,
           array_agg(pp.m::float8 order by pp.pack_id) as pack_values
    from per_pack pp
    join ${makers} mk on mk.id = pp.maker_id
    group by mk.id
    order by median desc, mk.name`);
  return rows.rows.map((r) => ({
    makerSlug: r.maker_slug,
    makerName: r.maker_name,
    medianLabelRatio: Number(r.median),
    packs: Number(r.packs),
    results: Number(r.results),
    min: Number(r.min),
    max: Number(r.max),
    packValues: r.pack_values.map(Number),
  }));
}
