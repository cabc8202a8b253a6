-- Issue 13 (hand-written data steps first, then drizzle-kit's schema steps).
-- 1. A reader's flag no longer changes a result's status: it is an open case on an approved result. Results
--    in 'disputed' go back to 'approved' (their open flags stay open, as cases). The status steps flags
--    caused leave the review history (the reader_flags rows keep who flagged, why, and how it was resolved);
--    a withdrawal after a flag keeps its event, now from 'approved'.
DROP INDEX "results_group_public_idx";--> statement-breakpoint
UPDATE "results" SET "status" = 'approved' WHERE "status" = 'disputed';--> statement-breakpoint
DELETE FROM "review_events" WHERE "to_status" = 'disputed';--> statement-breakpoint
DELETE FROM "review_events" WHERE "from_status" = 'disputed' AND "to_status" = 'approved';--> statement-breakpoint
UPDATE "review_events" SET "from_status" = 'approved' WHERE "from_status" = 'disputed';--> statement-breakpoint
-- 2. One open case per reader and result: a later open duplicate from the same account is closed.
UPDATE "reader_flags" f SET "status" = 'kept', "resolved_at" = now(), "resolution_note" = 'Closed when flags became cases: the same reader''s earlier flag on this result is still open.' WHERE f."status" = 'open' AND f."reporter_id" IS NOT NULL AND EXISTS (SELECT 1 FROM "reader_flags" o WHERE o."result_id" = f."result_id" AND o."reporter_id" = f."reporter_id" AND o."status" = 'open' AND o."id" < f."id");--> statement-breakpoint
ALTER TABLE "results" ALTER COLUMN "status" SET DATA TYPE text;--> statement-breakpoint
ALTER TABLE "results" ALTER COLUMN "status" SET DEFAULT 'pending'::text;--> statement-breakpoint
ALTER TABLE "review_events" ALTER COLUMN "from_status" SET DATA TYPE text;--> statement-breakpoint
ALTER TABLE "review_events" ALTER COLUMN "to_status" SET DATA TYPE text;--> statement-breakpoint
DROP TYPE "public"."review_status";--> statement-breakpoint
CREATE TYPE "public"."review_status" AS ENUM('pending', 'changes_requested', 'approved', 'rejected', 'withdrawn');--> statement-breakpoint
ALTER TABLE "results" ALTER COLUMN "status" SET DEFAULT 'pending'::"public"."review_status";--> statement-breakpoint
ALTER TABLE "results" ALTER COLUMN "status" SET DATA TYPE "public"."review_status" USING "status"::"public"."review_status";--> statement-breakpoint
ALTER TABLE "review_events" ALTER COLUMN "from_status" SET DATA TYPE "public"."review_status" USING "from_status"::"public"."review_status";--> statement-breakpoint
ALTER TABLE "review_events" ALTER COLUMN "to_status" SET DATA TYPE "public"."review_status" USING "to_status"::"public"."review_status";--> statement-breakpoint
ALTER TABLE "results" ADD COLUMN "curve_fingerprint" jsonb;--> statement-breakpoint
ALTER TABLE "results" ADD COLUMN "curve_key" real;--> statement-breakpoint
ALTER TABLE "saved_charts" ADD COLUMN "featured_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "saved_charts" ADD COLUMN "featured_by_id" text;--> statement-breakpoint
ALTER TABLE "saved_charts" ADD CONSTRAINT "saved_charts_featured_by_id_users_id_fk" FOREIGN KEY ("featured_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "results_curve_key_idx" ON "results" USING btree ("curve_key");--> statement-breakpoint
CREATE UNIQUE INDEX "reader_flags_open_reporter_idx" ON "reader_flags" USING btree ("result_id","reporter_id") WHERE "reader_flags"."status" = 'open' and "reader_flags"."reporter_id" is not null;--> statement-breakpoint
CREATE INDEX "saved_charts_featured_idx" ON "saved_charts" USING btree ("featured_at") WHERE "saved_charts"."featured_at" is not null;--> statement-breakpoint
CREATE INDEX "results_group_public_idx" ON "results" USING btree ("group_key","pack_id","label_ratio") WHERE "results"."status" = 'approved';--> statement-breakpoint
-- 3. /charts lists featured charts only: charts saved by moderators and admins stay listed (featured when they
--    were saved); everyone else's wait for a moderator.
UPDATE "saved_charts" SET "featured_at" = "created_at", "featured_by_id" = "created_by_id" WHERE "created_by_id" IN (SELECT "id" FROM "users" WHERE "role" IN ('moderator', 'admin'));
