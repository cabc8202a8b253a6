-- Hand-written (issue 15 item 5): the pack search's trigram operators and index class come from pg_trgm, which
-- ships with PostgreSQL. It is a trusted extension (PostgreSQL 13+), so the database's owner (the sagline role)
-- may create it without being a superuser. Then the trigram indexes of the search and an index for every foreign
-- key that had none, and (status, id) on results (issue 18 item 1).
CREATE EXTENSION IF NOT EXISTS pg_trgm;--> statement-breakpoint
CREATE INDEX "accounts_user_idx" ON "accounts" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "makers_proposed_by_idx" ON "makers" USING btree ("proposed_by_id");--> statement-breakpoint
CREATE INDEX "makers_name_trgm_idx" ON "makers" USING gin (lower("name") gin_trgm_ops);--> statement-breakpoint
CREATE INDEX "packs_proposed_by_idx" ON "packs" USING btree ("proposed_by_id");--> statement-breakpoint
CREATE INDEX "packs_model_trgm_idx" ON "packs" USING gin (lower("model") gin_trgm_ops);--> statement-breakpoint
CREATE INDEX "results_status_id_idx" ON "results" USING btree ("status","id");--> statement-breakpoint
CREATE INDEX "results_bench_profile_idx" ON "results" USING btree ("bench_profile_id");--> statement-breakpoint
CREATE INDEX "review_events_actor_idx" ON "review_events" USING btree ("actor_id");--> statement-breakpoint
CREATE INDEX "reader_flags_reporter_idx" ON "reader_flags" USING btree ("reporter_id");--> statement-breakpoint
CREATE INDEX "reader_flags_resolved_by_idx" ON "reader_flags" USING btree ("resolved_by_id");--> statement-breakpoint
CREATE INDEX "saved_charts_created_by_idx" ON "saved_charts" USING btree ("created_by_id");--> statement-breakpoint
CREATE INDEX "saved_charts_featured_by_idx" ON "saved_charts" USING btree ("featured_by_id");--> statement-breakpoint
CREATE INDEX "audit_events_actor_idx" ON "audit_events" USING btree ("actor_id");--> statement-breakpoint
CREATE INDEX "site_settings_updated_by_idx" ON "site_settings" USING btree ("updated_by_id");