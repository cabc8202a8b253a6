-- Hand-written (issue 15 item 5): the pack search's trigram operators and index class come from pg_trgm, which
-- ships with PostgreSQL. It is a trusted extension (PostgreSQL 13+), so the database's owner (the sagline role)
-- may create it without being a superuser.
CREATE EXTENSION IF NOT EXISTS pg_trgm;--> statement-breakpoint
CREATE INDEX "makers_name_trgm_idx" ON "makers" USING gin (lower("name") gin_trgm_ops);--> statement-breakpoint
CREATE INDEX "packs_model_trgm_idx" ON "packs" USING gin (lower("model") gin_trgm_ops);
