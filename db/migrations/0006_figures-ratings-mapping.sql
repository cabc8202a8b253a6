ALTER TABLE "bench_profiles" ADD COLUMN "log_mapping" jsonb;--> statement-breakpoint
ALTER TABLE "results" ADD COLUMN "log_mapping" jsonb;--> statement-breakpoint
ALTER TABLE "results" ADD COLUMN "sustained_c_measured" real;--> statement-breakpoint
ALTER TABLE "results" ADD COLUMN "sustained_label_ratio" real;--> statement-breakpoint
CREATE INDEX "results_group_sustained_idx" ON "results" USING btree ("group_key","pack_id","sustained_label_ratio") WHERE "results"."status" = 'approved';--> statement-breakpoint
-- Hand-written data migration (issue 12, phase B): the like-for-like key's resistance part is the method the
-- analysis used on the log (lib/analysis/group-key.ts groupKeyForAnalysis), not the one typed on the method card.
-- Stored results get their key's first part recomputed from figures->>'dcResistanceMethod'; the other four parts
-- (ambient, cut-off, rate, age) come from the method card and stay. Key parts never hold "_" themselves.
UPDATE "results"
SET "group_key" = (CASE "figures"->>'dcResistanceMethod'
    WHEN 'iec-61960-two-level' THEN 'iec-61960-two-level'
    WHEN 'step' THEN 'dc-step'
    ELSE 'dc-none' END) || substring("group_key" from position('_' in "group_key"))
WHERE "figures" ? 'dcResistanceMethod' AND position('_' in "group_key") > 0;
--> statement-breakpoint
-- The measured rating, where the stored figures already hold it (results analysed before issue 12 do not: null).
UPDATE "results"
SET "sustained_c_measured" = ("figures"->>'sustainedCMeasured')::real,
    "sustained_label_ratio" = ("figures"->>'sustainedLabelRatio')::real
WHERE "figures" ? 'sustainedCMeasured';
--> statement-breakpoint
COMMENT ON COLUMN "results"."sag_limited_c" IS 'Sag-limited C ESTIMATE from a resistance (assumptions in figures.sagLimitedCAssumptions); never a measured rating';
--> statement-breakpoint
COMMENT ON COLUMN "results"."label_ratio" IS 'Sag-limited C estimate divided by the labelled continuous C';
--> statement-breakpoint
COMMENT ON COLUMN "results"."sustained_c_measured" IS 'Sustained C MEASURED from the run (figures.sustainedCRule); null when the run does not qualify';
--> statement-breakpoint
COMMENT ON COLUMN "results"."sustained_label_ratio" IS 'Measured sustained C divided by the labelled continuous C';
