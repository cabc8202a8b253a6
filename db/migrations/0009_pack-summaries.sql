CREATE TABLE "pack_group_summaries" (
	"pack_id" integer NOT NULL,
	"group_key" text NOT NULL,
	"result_count" integer NOT NULL,
	"first_result_id" integer NOT NULL,
	"sag_limited_n" integer NOT NULL,
	"sag_limited_median" double precision,
	"sag_limited_min" double precision,
	"sag_limited_max" double precision,
	"sag_limited_values" double precision[] NOT NULL,
	"label_ratio_n" integer NOT NULL,
	"label_ratio_median" double precision,
	"sustained_n" integer NOT NULL,
	"sustained_max" double precision,
	"sustained_label_ratio_n" integer NOT NULL,
	"sustained_label_ratio_max" double precision,
	"capacity_ratio_median" double precision,
	"capacity_mah_median" double precision,
	"dc_resistance_mohm_median" double precision,
	CONSTRAINT "pack_group_summaries_pack_id_group_key_pk" PRIMARY KEY("pack_id","group_key")
);
--> statement-breakpoint
CREATE TABLE "pack_summaries" (
	"pack_id" integer PRIMARY KEY NOT NULL,
	"result_count" integer NOT NULL,
	"group_count" integer NOT NULL
);
--> statement-breakpoint
ALTER TABLE "pack_group_summaries" ADD CONSTRAINT "pack_group_summaries_pack_id_packs_id_fk" FOREIGN KEY ("pack_id") REFERENCES "public"."packs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pack_summaries" ADD CONSTRAINT "pack_summaries_pack_id_packs_id_fk" FOREIGN KEY ("pack_id") REFERENCES "public"."packs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "pack_group_summaries_group_idx" ON "pack_group_summaries" USING btree ("group_key","label_ratio_median");--> statement-breakpoint
-- Hand-written (issue 18 item 1): the summaries' definition as two views (the from-scratch aggregate over approved
-- results), the function that refreshes the rows of touched (pack, group) pairs from them, the statement-level
-- triggers on results that call it in the changing transaction, and the back-fill.
CREATE VIEW "pack_group_summaries_fresh" AS
SELECT r.pack_id, r.group_key,
       count(*)::int AS result_count,
       min(r.id) AS first_result_id,
       count(r.sag_limited_c)::int AS sag_limited_n,
       percentile_cont(0.5) WITHIN GROUP (ORDER BY r.sag_limited_c) AS sag_limited_median,
       min(r.sag_limited_c)::float8 AS sag_limited_min,
       max(r.sag_limited_c)::float8 AS sag_limited_max,
       coalesce(array_agg(r.sag_limited_c::float8 ORDER BY r.sag_limited_c) FILTER (WHERE r.sag_limited_c IS NOT NULL),
                '{}') AS sag_limited_values,
       count(r.label_ratio)::int AS label_ratio_n,
       percentile_cont(0.5) WITHIN GROUP (ORDER BY r.label_ratio) AS label_ratio_median,
       count(r.sustained_c_measured)::int AS sustained_n,
       max(r.sustained_c_measured)::float8 AS sustained_max,
       count(r.sustained_label_ratio)::int AS sustained_label_ratio_n,
       max(r.sustained_label_ratio)::float8 AS sustained_label_ratio_max,
       percentile_cont(0.5) WITHIN GROUP (ORDER BY r.capacity_ratio) AS capacity_ratio_median,
       percentile_cont(0.5) WITHIN GROUP (ORDER BY r.capacity_mah) AS capacity_mah_median,
       percentile_cont(0.5) WITHIN GROUP (ORDER BY r.dc_resistance_mohm) AS dc_resistance_mohm_median
FROM "results" r
WHERE r.status = 'approved'
GROUP BY r.pack_id, r.group_key;--> statement-breakpoint
CREATE VIEW "pack_summaries_fresh" AS
SELECT r.pack_id, count(*)::int AS result_count, count(DISTINCT r.group_key)::int AS group_count
FROM "results" r
WHERE r.status = 'approved'
GROUP BY r.pack_id;--> statement-breakpoint
-- Recomputes the summaries of every touched pack (all its groups: a pack has few). Refreshes of one pack are
-- serialised by a transaction-scoped advisory lock taken in pack order (so two never deadlock); each statement
-- after it reads with a fresh snapshot (READ COMMITTED, the app's level), so a concurrent decision on the same pack
-- that committed first is counted.
CREATE FUNCTION "sagline_refresh_summaries"(touched integer[]) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  IF cardinality(touched) = 0 THEN RETURN; END IF;
  PERFORM pg_advisory_xact_lock(18, p) FROM (SELECT DISTINCT unnest(touched) AS p ORDER BY 1) s;
  DELETE FROM pack_group_summaries WHERE pack_id = ANY(touched);
  INSERT INTO pack_group_summaries SELECT * FROM pack_group_summaries_fresh WHERE pack_id = ANY(touched);
  DELETE FROM pack_summaries WHERE pack_id = ANY(touched);
  INSERT INTO pack_summaries SELECT * FROM pack_summaries_fresh WHERE pack_id = ANY(touched);
END $$;--> statement-breakpoint
-- Only approved rows change a summary: a new pending result or a rejection of one touches nothing.
CREATE FUNCTION "sagline_results_inserted"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM sagline_refresh_summaries(ARRAY(SELECT DISTINCT pack_id FROM new_rows WHERE status = 'approved'));
  RETURN NULL;
END $$;--> statement-breakpoint
CREATE FUNCTION "sagline_results_updated"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM sagline_refresh_summaries(ARRAY(
    SELECT pack_id FROM old_rows WHERE status = 'approved'
    UNION SELECT pack_id FROM new_rows WHERE status = 'approved'));
  RETURN NULL;
END $$;--> statement-breakpoint
CREATE FUNCTION "sagline_results_deleted"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM sagline_refresh_summaries(ARRAY(SELECT DISTINCT pack_id FROM old_rows WHERE status = 'approved'));
  RETURN NULL;
END $$;--> statement-breakpoint
CREATE TRIGGER "results_summaries_insert" AFTER INSERT ON "results"
  REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION sagline_results_inserted();--> statement-breakpoint
CREATE TRIGGER "results_summaries_update" AFTER UPDATE ON "results"
  REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION sagline_results_updated();--> statement-breakpoint
CREATE TRIGGER "results_summaries_delete" AFTER DELETE ON "results"
  REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION sagline_results_deleted();--> statement-breakpoint
INSERT INTO "pack_group_summaries" SELECT * FROM "pack_group_summaries_fresh";--> statement-breakpoint
INSERT INTO "pack_summaries" SELECT * FROM "pack_summaries_fresh";
