// Per-pack and per-pack-in-group summaries of APPROVED results, kept by PostgreSQL itself: statement-level
// triggers on `results` (hand-written in migration 0009) recompute the rows of every (pack, group) an insert,
// update or delete touches, inside the same transaction as the change. So every kind of decision — approve,
// withdraw, reinstate, a pack merge moving results, a label edit rescaling ratios — leaves them equal to a
// from-scratch aggregate (tests/integration/summaries.test.ts checks it), and no request aggregates results.
// Readers still join packs and makers for the counting rule's catalogue half (db/queries/published.ts): a
// summary counts approved results of a pack whatever the pack's or maker's status.
import { sql } from "drizzle-orm";
import {
  doublePrecision,
  index,
  integer,
  pgTable,
  primaryKey,
  text,
  type ExtraConfigColumn,
} from "drizzle-orm/pg-core";
import { packs } from "./catalogue";

/** Indexes in the packs table's order over one median of a group, ascending and descending (missing last). */
function groupMedianOrderIndexes(groupKey: ExtraConfigColumn, name: string, median: ExtraConfigColumn) {
  return [
    index(`pack_group_summaries_${name}_asc_idx`).on(groupKey, sql`(${median} is null)`, median.asc().nullsLast()),
    index(`pack_group_summaries_${name}_desc_idx`).on(groupKey, sql`(${median} is null)`, median.desc().nullsFirst()),
  ];
}

/** One row per pack with at least one approved result. */
export const packSummaries = pgTable("pack_summaries", {
  packId: integer("pack_id")
    .primaryKey()
    .references(() => packs.id, { onDelete: "cascade" }),
  resultCount: integer("result_count").notNull(),
  groupCount: integer("group_count").notNull(),
});

/**
 * One row per (pack, like-for-like group) with at least one approved result. Medians are percentile_cont(0.5)
 * (the "type 7" quantile of lib/analysis summarise()); each `…N` counts the non-null values its figure is over.
 */
export const packGroupSummaries = pgTable(
  "pack_group_summaries",
  {
    packId: integer("pack_id")
      .notNull()
      .references(() => packs.id, { onDelete: "cascade" }),
    groupKey: text("group_key").notNull(),
    resultCount: integer("result_count").notNull(),
    /** The oldest approved result (a group's representative method card is its oldest published result). */
    firstResultId: integer("first_result_id").notNull(),
    sagLimitedN: integer("sag_limited_n").notNull(),
    sagLimitedMedian: doublePrecision("sag_limited_median"),
    sagLimitedMin: doublePrecision("sag_limited_min"),
    sagLimitedMax: doublePrecision("sag_limited_max"),
    /** Every sag-limited C estimate, for the median's order-statistic interval. */
    sagLimitedValues: doublePrecision("sag_limited_values").array().notNull(),
    labelRatioN: integer("label_ratio_n").notNull(),
    labelRatioMedian: doublePrecision("label_ratio_median"),
    sustainedN: integer("sustained_n").notNull(),
    sustainedMax: doublePrecision("sustained_max"),
    sustainedLabelRatioN: integer("sustained_label_ratio_n").notNull(),
    sustainedLabelRatioMax: doublePrecision("sustained_label_ratio_max"),
    capacityRatioMedian: doublePrecision("capacity_ratio_median"),
    capacityMahMedian: doublePrecision("capacity_mah_median"),
    dcResistanceMedian: doublePrecision("dc_resistance_mohm_median"),
  },
  (t) => [
    primaryKey({ columns: [t.packId, t.groupKey] }),
    // A group's packs, best label ratio first (the label check, the packs table's measured columns).
    index("pack_group_summaries_group_idx").on(t.groupKey, t.labelRatioMedian),
    // A group's oldest published result, read in order (group_summaries' representative, migration 0013).
    index("pack_group_summaries_first_idx").on(t.groupKey, t.firstResultId),
    // The packs table with a group chosen (db/queries/pack-catalogue.ts): an index-only read of the group's packs
    // with every column it sorts and counts by, instead of scanning the wide rows (the value arrays).
    index("pack_group_summaries_table_idx").on(
      t.groupKey,
      t.packId,
      t.resultCount,
      t.sagLimitedMedian,
      t.labelRatioMedian,
      t.capacityRatioMedian,
    ),
    // The packs table with a group, sorted by one of its medians (missing last, both ways; then slug): the first
    // page read in order instead of sorting the group's ~20,000 rows (migration 0013). One index per direction:
    // `x is null, x desc` is no index's backward order; each names PostgreSQL's own null order for the direction
    // (asc: last, desc: first), which the query's ORDER BY implies.
    ...groupMedianOrderIndexes(t.groupKey, "sag_limited_median", t.sagLimitedMedian),
    ...groupMedianOrderIndexes(t.groupKey, "label_ratio_median", t.labelRatioMedian),
    ...groupMedianOrderIndexes(t.groupKey, "capacity_ratio_median", t.capacityRatioMedian),
  ],
);

/**
 * One row per like-for-like group with approved results of active packs of active makers (the counting rule): its
 * published results, its packs and its oldest published result (the group's representative method card). Kept by
 * the same triggers as the tables above, plus triggers on packs and makers for status and maker changes (migration
 * 0013): each change adds and subtracts the touched packs' rows of pack_group_summaries, so a decision costs the
 * same at any size, and listPublicGroups reads one row per group instead of summing every pack's row.
 */
export const groupSummaries = pgTable("group_summaries", {
  groupKey: text("group_key").primaryKey(),
  resultCount: integer("result_count").notNull(),
  packCount: integer("pack_count").notNull(),
  firstResultId: integer("first_result_id").notNull(),
});
