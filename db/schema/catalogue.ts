// Makers and packs: the catalogue. Proposed entries arrive with a submission and wait for moderation;
// merged entries point at the survivor so old links and audit history keep working.
import { sql } from "drizzle-orm";
import {
  check,
  index,
  integer,
  pgEnum,
  pgTable,
  real,
  smallint,
  text,
  timestamp,
  uniqueIndex,
} from "drizzle-orm/pg-core";
import { users } from "./auth";

export const catalogueStatuses = ["active", "proposed", "merged"] as const;
export const catalogueStatus = pgEnum("catalogue_status", catalogueStatuses);

export const makers = pgTable(
  "makers",
  {
    id: integer("id").primaryKey().generatedAlwaysAsIdentity(),
    slug: text("slug").notNull().unique(),
    name: text("name").notNull(),
    status: catalogueStatus("status").notNull().default("active"),
    mergedIntoId: integer("merged_into_id"),
    proposedById: text("proposed_by_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("makers_name_lower_idx").on(sql`lower(${t.name})`),
    index("makers_status_idx").on(t.status),
    index("makers_proposed_by_idx").on(t.proposedById),
    // Pack search (db/queries/pack-search.ts): trigram matches and substrings of the lower-cased name (pg_trgm).
    index("makers_name_trgm_idx").using("gin", sql`lower(${t.name}) gin_trgm_ops`),
  ],
);

export const packs = pgTable(
  "packs",
  {
    id: integer("id").primaryKey().generatedAlwaysAsIdentity(),
    slug: text("slug").notNull().unique(),
    makerId: integer("maker_id")
      .notNull()
      .references(() => makers.id),
    model: text("model").notNull(),
    cellsInSeries: smallint("cells_in_series").notNull(),
    ratedCapacityMah: integer("rated_capacity_mah").notNull(),
    labelledContinuousC: real("labelled_continuous_c").notNull(),
    labelledBurstC: real("labelled_burst_c"),
    weightG: real("weight_g"),
    connector: text("connector").notNull(),
    status: catalogueStatus("status").notNull().default("active"),
    mergedIntoId: integer("merged_into_id"),
    proposedById: text("proposed_by_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("packs_maker_idx").on(t.makerId),
    index("packs_status_idx").on(t.status),
    index("packs_proposed_by_idx").on(t.proposedById),
    // Pack search: the model's half of "maker + model" (a generated column cannot read the maker's table, so
    // each table indexes its own lower-cased text and the search takes a word's matches from both).
    index("packs_model_trgm_idx").using("gin", sql`lower(${t.model}) gin_trgm_ops`),
    check("packs_cells_range", sql`${t.cellsInSeries} between 1 and 14`),
    check("packs_rated_positive", sql`${t.ratedCapacityMah} > 0`),
    check("packs_labelled_c_positive", sql`${t.labelledContinuousC} > 0`),
    check(
      "packs_burst_ge_continuous",
      sql`${t.labelledBurstC} is null or ${t.labelledBurstC} >= ${t.labelledContinuousC}`,
    ),
    check("packs_weight_positive", sql`${t.weightG} is null or ${t.weightG} > 0`),
  ],
);
