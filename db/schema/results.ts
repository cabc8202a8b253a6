// Results (one test of one pack) with their method card, stored files, computed figures and review
// state, plus bench profiles (a contributor's equipment) and the review audit log.
import { sql } from "drizzle-orm";
import {
  boolean,
  check,
  date,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  real,
  text,
  timestamp,
  uniqueIndex,
} from "drizzle-orm/pg-core";
import type { ColumnMapping, CurvePoint, Figures, RetentionSeries } from "@/lib/analysis";
import type { CurveFingerprint } from "@/lib/analysis/curve-fingerprint";
import { users } from "./auth";
import { packs } from "./catalogue";
import {
  loadModes,
  resistanceMethods,
  reviewStatuses,
  type LoadMode,
  type ResistanceMethod,
  type ReviewStatus,
} from "@/lib/enums";

export { loadModes, resistanceMethods, reviewStatuses, type LoadMode, type ResistanceMethod, type ReviewStatus };
export const reviewStatus = pgEnum("review_status", reviewStatuses);
export const loadMode = pgEnum("load_mode", loadModes);
export const resistanceMethod = pgEnum("resistance_method", resistanceMethods);

/** A stored plausibility flag; `resultIds` names other results it points at (a copied log), for links. */
export type PlausibilityFlag = { code: string; message: string; resultIds?: number[] };

export const benchProfiles = pgTable(
  "bench_profiles",
  {
    id: integer("id").primaryKey().generatedAlwaysAsIdentity(),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    loadEquipment: text("load_equipment").notNull(),
    logger: text("logger"),
    resistanceMeter: text("resistance_meter"),
    resistanceMethod: resistanceMethod("resistance_method").notNull(),
    calibratedOn: date("calibrated_on", { mode: "string" }),
    notes: text("notes"),
    defaultAmbientC: real("default_ambient_c"),
    defaultLoadMode: loadMode("default_load_mode"),
    defaultCutoffVPerCell: real("default_cutoff_v_per_cell"),
    defaultStopTemperatureC: real("default_stop_temperature_c"),
    defaultSampleRateHz: real("default_sample_rate_hz"),
    /** The column mapping this bench's logs need (header-less or oddly named columns); null: detect the columns. */
    logMapping: jsonb("log_mapping").$type<ColumnMapping>(),
    // Instrument accuracy as the tester reads it off a specification sheet: "± (% of reading + offset)" and the
    // read-out's resolution per channel, and the sampling interval. Null: not stated; the figures' ± then use
    // a stated default (lib/analysis/uncertainty/accuracy-classes.ts), named as an assumption on result pages.
    voltageAccuracyPct: real("voltage_accuracy_pct"),
    voltageOffsetV: real("voltage_offset_v"),
    voltageResolutionV: real("voltage_resolution_v"),
    currentAccuracyPct: real("current_accuracy_pct"),
    currentOffsetA: real("current_offset_a"),
    currentResolutionA: real("current_resolution_a"),
    temperatureAccuracyPct: real("temperature_accuracy_pct"),
    temperatureOffsetC: real("temperature_offset_c"),
    temperatureResolutionC: real("temperature_resolution_c"),
    samplingIntervalS: real("sampling_interval_s"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("bench_profiles_user_idx").on(t.userId)],
);

export const results = pgTable(
  "results",
  {
    id: integer("id").primaryKey().generatedAlwaysAsIdentity(),
    packId: integer("pack_id")
      .notNull()
      .references(() => packs.id),
    contributorId: text("contributor_id")
      .notNull()
      .references(() => users.id),
    benchProfileId: integer("bench_profile_id").references(() => benchProfiles.id, { onDelete: "set null" }),
    status: reviewStatus("status").notNull().default("pending"),
    // Method card
    ambientTemperatureC: real("ambient_temperature_c").notNull(),
    packStartTemperatureC: real("pack_start_temperature_c"),
    loadMode: loadMode("load_mode").notNull(),
    loadCurrentA: real("load_current_a").notNull(),
    cutoffVPerCell: real("cutoff_v_per_cell").notNull(),
    stopTemperatureC: real("stop_temperature_c").notNull(),
    resistanceMethod: resistanceMethod("resistance_method").notNull(),
    equipment: text("equipment").notNull(),
    sampleRateHz: real("sample_rate_hz"),
    cyclesBeforeTest: integer("cycles_before_test").notNull().default(0),
    testedOn: date("tested_on", { mode: "string" }),
    notes: text("notes"),
    // Stored files (keys in the upload bucket)
    logKey: text("log_key").notNull(),
    logSha256: text("log_sha256").notNull(),
    logBytes: integer("log_bytes").notNull(),
    logFilename: text("log_filename").notNull(),
    photoKeys: jsonb("photo_keys").$type<string[]>().notNull().default([]),
    /** The column mapping the log was analysed with (the tester's, or their bench profile's); null: detected. */
    logMapping: jsonb("log_mapping").$type<ColumnMapping>(),
    // Computed by lib/analysis; the headline figures are also columns so queries can rank and filter.
    figures: jsonb("figures").$type<Figures>().notNull(),
    curve: jsonb("curve").$type<CurvePoint[]>().notNull(),
    // The few parts of `figures` every result list reads, kept by PostgreSQL as stored generated columns (issue
    // 18): read as expressions on `figures`, each one unpacked the whole jsonb from TOAST again, four times per row
    // (at 1,000,000 results ~80 % of a pack page's result query). Results analysed before issue 12 have no
    // reachedCutoff: a time to cut-off then stood for it.
    retention: jsonb("retention")
      .$type<RetentionSeries>()
      .generatedAlwaysAs(sql`"figures" -> 'retention'`),
    reachedCutoff: boolean("reached_cutoff")
      .notNull()
      .generatedAlwaysAs(
        sql`coalesce(("figures" ->> 'reachedCutoff')::boolean, ("figures" ->> 'timeToCutoffS') is not null)`,
      ),
    passedStopTemperature: boolean("passed_stop_temperature")
      .notNull()
      .generatedAlwaysAs(sql`("figures" ->> 'timeToStopTemperatureS') is not null`),
    // The curve's normalised shape (lib/analysis/curve-fingerprint.ts) and its one-number key, to find
    // another result whose log is the same samples scaled or shifted. Null until computed.
    curveFingerprint: jsonb("curve_fingerprint").$type<CurveFingerprint>(),
    curveKey: real("curve_key"),
    capacityMah: real("capacity_mah"),
    energyWh: real("energy_wh"),
    dcResistanceMohm: real("dc_resistance_mohm"),
    resistanceAt25CMohm: real("resistance_at_25c_mohm"),
    holdVoltagePerCellV: real("hold_voltage_per_cell_v"),
    temperatureRiseC: real("temperature_rise_c"),
    /** Sag-limited C, an ESTIMATE from a resistance (figures.sagLimitedCAssumptions); never a measured rating. */
    sagLimitedC: real("sag_limited_c"),
    /** Sag-limited C estimate ÷ labelled continuous C. */
    labelRatio: real("label_ratio"),
    /** Sustained C MEASURED from the run (figures.sustainedCRule); null when the run does not qualify. */
    sustainedCMeasured: real("sustained_c_measured"),
    /** Measured sustained C ÷ labelled continuous C. */
    sustainedLabelRatio: real("sustained_label_ratio"),
    capacityRatio: real("capacity_ratio"),
    loadRateC: real("load_rate_c").notNull(),
    groupKey: text("group_key").notNull(),
    flags: jsonb("flags").$type<PlausibilityFlag[]>().notNull().default([]),
    idempotencyKey: text("idempotency_key"),
    submittedAt: timestamp("submitted_at", { withTimezone: true }).notNull().defaultNow(),
    publishedAt: timestamp("published_at", { withTimezone: true }),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("results_status_idx").on(t.status, t.submittedAt),
    // Keyset pages of one status in id order (issue 18).
    index("results_status_id_idx").on(t.status, t.id),
    index("results_bench_profile_idx").on(t.benchProfileId),
    index("results_pack_idx").on(t.packId, t.status),
    index("results_group_idx").on(t.groupKey, t.status),
    // One group's published label ratios in pack order, for an index-only scan. The maker ranking read it until
    // it moved to pack_group_summaries (issue 18); no query in db/queries/groups.ts uses it now.
    index("results_group_public_idx")
      .on(t.groupKey, t.packId, t.labelRatio)
      .where(sql`${t.status} = 'approved'`),
    // The same for the ranking by the measured rating.
    index("results_group_sustained_idx")
      .on(t.groupKey, t.packId, t.sustainedLabelRatio)
      .where(sql`${t.status} = 'approved'`),
    // The newest published results (home page, sitemap): read in order from the index, not sorted per request.
    index("results_published_newest_idx")
      .on(t.publishedAt.desc(), t.id.desc())
      .where(sql`${t.status} = 'approved'`),
    index("results_contributor_idx").on(t.contributorId),
    index("results_log_sha_idx").on(t.logSha256),
    index("results_curve_key_idx").on(t.curveKey),
    uniqueIndex("results_idempotency_idx").on(t.contributorId, t.idempotencyKey),
    check("results_ambient_range", sql`${t.ambientTemperatureC} between -20 and 60`),
    check("results_cutoff_range", sql`${t.cutoffVPerCell} between 2.5 and 4.2`),
    check("results_stop_temp_range", sql`${t.stopTemperatureC} <= 80`),
    check("results_load_positive", sql`${t.loadCurrentA} > 0`),
    check("results_cycles_nonneg", sql`${t.cyclesBeforeTest} >= 0`),
  ],
);

/** The audit log of review transitions. actorId null means the system did it. */
export const reviewEvents = pgTable(
  "review_events",
  {
    id: integer("id").primaryKey().generatedAlwaysAsIdentity(),
    resultId: integer("result_id")
      .notNull()
      .references(() => results.id),
    actorId: text("actor_id").references(() => users.id, { onDelete: "set null" }),
    fromStatus: reviewStatus("from_status"),
    toStatus: reviewStatus("to_status").notNull(),
    reason: text("reason"),
    note: text("note"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("review_events_result_idx").on(t.resultId, t.createdAt),
    index("review_events_actor_idx").on(t.actorId),
  ],
);
