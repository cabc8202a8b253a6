// What readers and journalists leave behind: flags on published results, requests for new-result e-mails
// about a pack, saved charts.
import { sql } from "drizzle-orm";
import { index, integer, jsonb, pgEnum, pgTable, primaryKey, text, timestamp, uniqueIndex } from "drizzle-orm/pg-core";
import { users } from "./auth";
import { packs } from "./catalogue";
import { results } from "./results";
import { flagReasons, flagStatuses } from "@/lib/enums";

export { flagReasons, flagStatuses };

export const flagReason = pgEnum("flag_reason", flagReasons);
export const flagStatus = pgEnum("flag_status", flagStatuses);

export const readerFlags = pgTable(
  "reader_flags",
  {
    id: integer("id").primaryKey().generatedAlwaysAsIdentity(),
    resultId: integer("result_id")
      .notNull()
      .references(() => results.id),
    reporterId: text("reporter_id").references(() => users.id, { onDelete: "set null" }),
    reporterHash: text("reporter_hash"),
    reason: flagReason("reason").notNull(),
    note: text("note"),
    status: flagStatus("status").notNull().default("open"),
    resolvedById: text("resolved_by_id").references(() => users.id, { onDelete: "set null" }),
    resolutionNote: text("resolution_note"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    resolvedAt: timestamp("resolved_at", { withTimezone: true }),
  },
  (t) => [
    index("reader_flags_result_idx").on(t.resultId),
    index("reader_flags_status_idx").on(t.status),
    index("reader_flags_reporter_idx").on(t.reporterId),
    index("reader_flags_resolved_by_idx").on(t.resolvedById),
    // One open case per reader and result: a second flag from the same account waits for the first.
    uniqueIndex("reader_flags_open_reporter_idx")
      .on(t.resultId, t.reporterId)
      .where(sql`${t.status} = 'open' and ${t.reporterId} is not null`),
  ],
);

/** A reader asked to be e-mailed when a new result on this pack is published. */
export const packEmails = pgTable(
  "pack_emails",
  {
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    packId: integer("pack_id")
      .notNull()
      .references(() => packs.id, { onDelete: "cascade" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.userId, t.packId] }), index("pack_emails_pack_idx").on(t.packId)],
);

export const chartKinds = ["label-check", "curves", "maker-ranking"] as const;
export const chartKind = pgEnum("chart_kind", chartKinds);

/**
 * A saved chart keeps its full state, so later changes of defaults never change a published chart. Anyone
 * signed in may save one; only charts a moderator featured (featuredAt set) are listed on /charts.
 */
export const savedCharts = pgTable(
  "saved_charts",
  {
    id: text("id").primaryKey(),
    kind: chartKind("kind").notNull(),
    title: text("title").notNull(),
    note: text("note"),
    state: jsonb("state").$type<Record<string, unknown>>().notNull(),
    createdById: text("created_by_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    featuredAt: timestamp("featured_at", { withTimezone: true }),
    featuredById: text("featured_by_id").references(() => users.id, { onDelete: "set null" }),
  },
  (t) => [
    index("saved_charts_created_idx").on(t.createdAt),
    index("saved_charts_created_by_idx").on(t.createdById),
    index("saved_charts_featured_by_idx").on(t.featuredById),
    index("saved_charts_featured_idx")
      .on(t.featuredAt)
      .where(sql`${t.featuredAt} is not null`),
  ],
);
