// Plumbing: a general audit trail (role changes, catalogue merges), the outgoing mail queue (so a mail
// outage never loses a message), and rate-limit counters shared by every server process.
import { sql } from "drizzle-orm";
import { boolean, check, index, integer, jsonb, pgTable, text, timestamp } from "drizzle-orm/pg-core";
import { users } from "./auth";

export const auditEvents = pgTable(
  "audit_events",
  {
    id: integer("id").primaryKey().generatedAlwaysAsIdentity(),
    actorId: text("actor_id").references(() => users.id, { onDelete: "set null" }),
    action: text("action").notNull(),
    entityType: text("entity_type").notNull(),
    entityId: text("entity_id").notNull(),
    data: jsonb("data").$type<Record<string, unknown>>().notNull().default({}),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("audit_events_entity_idx").on(t.entityType, t.entityId), index("audit_events_actor_idx").on(t.actorId)],
);

export const mailOutbox = pgTable(
  "mail_outbox",
  {
    id: integer("id").primaryKey().generatedAlwaysAsIdentity(),
    to: text("to").notNull(),
    subject: text("subject").notNull(),
    text: text("text").notNull(),
    html: text("html"),
    // Sensitive messages (sign-in links) have their body wiped once sent: the verification token is stored
    // hashed, so a readable copy of the link must not outlive its delivery.
    sensitive: boolean("sensitive").notNull().default(false),
    attempts: integer("attempts").notNull().default(0),
    lastError: text("last_error"),
    nextAttemptAt: timestamp("next_attempt_at", { withTimezone: true }).notNull().defaultNow(),
    sentAt: timestamp("sent_at", { withTimezone: true }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("mail_outbox_due_idx").on(t.sentAt, t.nextAttemptAt)],
);

export const rateLimitHits = pgTable("rate_limit_hits", {
  key: text("key").primaryKey(),
  count: integer("count").notNull(),
  resetAt: timestamp("reset_at", { withTimezone: true }).notNull(),
});

/**
 * Site settings an admin changes at /admin/settings: one row (id 1). A notice shown on every page (an
 * announcement, planned maintenance) and a pause on new submissions (a backlog in review, an incident).
 * No row means the defaults: no notice, submissions open.
 */
export const siteSettings = pgTable(
  "site_settings",
  {
    id: integer("id").primaryKey().default(1),
    notice: text("notice"),
    submissionsPaused: boolean("submissions_paused").notNull().default(false),
    pauseReason: text("pause_reason"),
    updatedById: text("updated_by_id").references(() => users.id, { onDelete: "set null" }),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [check("site_settings_one_row", sql`${t.id} = 1`), index("site_settings_updated_by_idx").on(t.updatedById)],
);
