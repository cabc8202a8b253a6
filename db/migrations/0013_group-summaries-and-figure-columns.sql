CREATE TABLE "group_summaries" (
	"group_key" text PRIMARY KEY NOT NULL,
	"result_count" integer NOT NULL,
	"pack_count" integer NOT NULL,
	"first_result_id" integer NOT NULL
);
--> statement-breakpoint
ALTER TABLE "results" ADD COLUMN "retention" jsonb GENERATED ALWAYS AS ("figures" -> 'retention') STORED;--> statement-breakpoint
ALTER TABLE "results" ADD COLUMN "reached_cutoff" boolean GENERATED ALWAYS AS (coalesce(("figures" ->> 'reachedCutoff')::boolean, ("figures" ->> 'timeToCutoffS') is not null)) STORED NOT NULL;--> statement-breakpoint
ALTER TABLE "results" ADD COLUMN "passed_stop_temperature" boolean GENERATED ALWAYS AS (("figures" ->> 'timeToStopTemperatureS') is not null) STORED NOT NULL;--> statement-breakpoint
CREATE INDEX "pack_group_summaries_first_idx" ON "pack_group_summaries" USING btree ("group_key","first_result_id");--> statement-breakpoint
CREATE INDEX "pack_group_summaries_sag_limited_median_asc_idx" ON "pack_group_summaries" USING btree ("group_key",("sag_limited_median" is null),"sag_limited_median");--> statement-breakpoint
CREATE INDEX "pack_group_summaries_sag_limited_median_desc_idx" ON "pack_group_summaries" USING btree ("group_key",("sag_limited_median" is null),"sag_limited_median" DESC NULLS FIRST);--> statement-breakpoint
CREATE INDEX "pack_group_summaries_label_ratio_median_asc_idx" ON "pack_group_summaries" USING btree ("group_key",("label_ratio_median" is null),"label_ratio_median");--> statement-breakpoint
CREATE INDEX "pack_group_summaries_label_ratio_median_desc_idx" ON "pack_group_summaries" USING btree ("group_key",("label_ratio_median" is null),"label_ratio_median" DESC NULLS FIRST);--> statement-breakpoint
CREATE INDEX "pack_group_summaries_capacity_ratio_median_asc_idx" ON "pack_group_summaries" USING btree ("group_key",("capacity_ratio_median" is null),"capacity_ratio_median");--> statement-breakpoint
CREATE INDEX "pack_group_summaries_capacity_ratio_median_desc_idx" ON "pack_group_summaries" USING btree ("group_key",("capacity_ratio_median" is null),"capacity_ratio_median" DESC NULLS FIRST);--> statement-breakpoint
-- Hand-written (issue 18): group_summaries' definition as a view (the from-scratch aggregate over approved results
-- of active packs of active makers), kept by deltas: every refresh of a pack's summaries first subtracts the pack's
-- rows of pack_group_summaries from its groups and adds them back once recomputed, and a change of a pack's status
-- or maker, or of a maker's status, subtracts or adds the packs that stop or start counting. Locks, always in this
-- order (so two never deadlock): the pack locks of migrations 0009/0011, then one advisory lock per group (class 19,
-- the key's hash, in order), taken before any write to group_summaries; statements after them read with a fresh
-- snapshot (READ COMMITTED), so the group's oldest published result is recomputed from committed rows.
CREATE VIEW "group_summaries_fresh" AS
SELECT s.group_key, sum(s.result_count)::int AS result_count, count(*)::int AS pack_count,
       min(s.first_result_id) AS first_result_id
FROM "pack_group_summaries_fresh" s
JOIN "packs" p ON p.id = s.pack_id
JOIN "makers" m ON m.id = p.maker_id
WHERE p.status = 'active' AND m.status = 'active'
GROUP BY s.group_key;--> statement-breakpoint
-- The pack locks of migration 0011, shared by every path that changes a pack's summaries or whether it counts.
CREATE FUNCTION "sagline_lock_packs"(touched integer[]) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  IF cardinality(touched) > 1000 THEN
    PERFORM pg_advisory_xact_lock(18, 0);
  ELSE
    PERFORM pg_advisory_xact_lock_shared(18, 0);
    PERFORM pg_advisory_xact_lock(18, p) FROM (SELECT DISTINCT unnest(touched) AS p ORDER BY 1) s;
  END IF;
END $$;--> statement-breakpoint
CREATE FUNCTION "sagline_lock_groups"(keys text[]) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  PERFORM pg_advisory_xact_lock(19, h) FROM (SELECT DISTINCT hashtext(k) AS h FROM unnest(keys) k ORDER BY 1) s;
END $$;--> statement-breakpoint
-- Adds `sign` (1 or -1) times the current pack_group_summaries rows of `counted` packs to their groups.
CREATE FUNCTION "sagline_group_delta"(counted integer[], sign integer) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  IF cardinality(counted) = 0 THEN RETURN; END IF;
  INSERT INTO group_summaries AS g (group_key, result_count, pack_count, first_result_id)
  SELECT s.group_key, sign * sum(s.result_count), sign * count(*), min(s.first_result_id)
  FROM pack_group_summaries s WHERE s.pack_id = ANY(counted)
  GROUP BY s.group_key ORDER BY s.group_key
  ON CONFLICT (group_key) DO UPDATE
    SET result_count = g.result_count + excluded.result_count, pack_count = g.pack_count + excluded.pack_count;
END $$;--> statement-breakpoint
-- After the deltas: groups left without packs go, and each group's oldest published result is read again (a
-- subtraction may have taken it away) from pack_group_summaries_first_idx, the first row of a counting pack.
CREATE FUNCTION "sagline_group_tidy"(keys text[]) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  IF cardinality(keys) = 0 THEN RETURN; END IF;
  DELETE FROM group_summaries WHERE group_key = ANY(keys) AND pack_count <= 0;
  UPDATE group_summaries g SET first_result_id = f.id
  FROM (
    SELECT k, (SELECT s.first_result_id FROM pack_group_summaries s
               JOIN packs p ON p.id = s.pack_id JOIN makers m ON m.id = p.maker_id
               WHERE s.group_key = k AND p.status = 'active' AND m.status = 'active'
               ORDER BY s.first_result_id LIMIT 1) AS id
    FROM unnest(keys) k
  ) f
  WHERE g.group_key = f.k AND f.id IS NOT NULL AND g.first_result_id <> f.id;
END $$;--> statement-breakpoint
CREATE OR REPLACE FUNCTION "sagline_refresh_summaries"(touched integer[]) RETURNS void LANGUAGE plpgsql AS $$
DECLARE
  keys text[];
  counted integer[];
BEGIN
  IF cardinality(touched) = 0 THEN RETURN; END IF;
  PERFORM sagline_lock_packs(touched);
  -- The groups the packs are in before the change and after it.
  keys := ARRAY(SELECT group_key FROM pack_group_summaries WHERE pack_id = ANY(touched)
                UNION SELECT group_key FROM results WHERE pack_id = ANY(touched) AND status = 'approved');
  PERFORM sagline_lock_groups(keys);
  counted := ARRAY(SELECT p.id FROM packs p JOIN makers m ON m.id = p.maker_id
                   WHERE p.id = ANY(touched) AND p.status = 'active' AND m.status = 'active');
  IF cardinality(touched) <= 1000 THEN PERFORM sagline_group_delta(counted, -1); END IF;
  DELETE FROM pack_group_summaries WHERE pack_id = ANY(touched);
  INSERT INTO pack_group_summaries SELECT * FROM pack_group_summaries_fresh WHERE pack_id = ANY(touched);
  DELETE FROM pack_summaries WHERE pack_id = ANY(touched);
  INSERT INTO pack_summaries SELECT * FROM pack_summaries_fresh WHERE pack_id = ANY(touched);
  IF cardinality(touched) <= 1000 THEN
    PERFORM sagline_group_delta(counted, 1);
    PERFORM sagline_group_tidy(keys);
  ELSE
    -- A bulk refresh (under the one exclusive lock, so no other change runs) recounts its groups from the pack
    -- rows, which also mends group rows a hand-made change left wrong.
    DELETE FROM group_summaries WHERE group_key = ANY(keys);
    INSERT INTO group_summaries
    SELECT s.group_key, sum(s.result_count)::int, count(*)::int, min(s.first_result_id)
    FROM pack_group_summaries s JOIN packs p ON p.id = s.pack_id JOIN makers m ON m.id = p.maker_id
    WHERE s.group_key = ANY(keys) AND p.status = 'active' AND m.status = 'active'
    GROUP BY s.group_key;
  END IF;
END $$;--> statement-breakpoint
-- A pack that starts or stops counting (its status, or its maker, changes): its groups lose or gain its rows. The
-- old and new makers' rows are share-locked first, so a maker's status change (below) and a pack moving to or from
-- that maker see each other's result.
CREATE FUNCTION "sagline_packs_updated"() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  changed integer[];
  keys text[];
BEGIN
  changed := ARRAY(SELECT n.id FROM new_rows n JOIN old_rows o ON o.id = n.id
                   WHERE n.status IS DISTINCT FROM o.status OR n.maker_id IS DISTINCT FROM o.maker_id ORDER BY 1);
  IF cardinality(changed) = 0 THEN RETURN NULL; END IF;
  PERFORM 1 FROM makers WHERE id IN (SELECT maker_id FROM old_rows WHERE id = ANY(changed)
                                     UNION SELECT maker_id FROM new_rows WHERE id = ANY(changed))
    ORDER BY id FOR SHARE;
  PERFORM sagline_lock_packs(changed);
  keys := ARRAY(SELECT DISTINCT group_key FROM pack_group_summaries WHERE pack_id = ANY(changed));
  PERFORM sagline_lock_groups(keys);
  PERFORM sagline_group_delta(ARRAY(SELECT o.id FROM old_rows o JOIN makers m ON m.id = o.maker_id
    WHERE o.id = ANY(changed) AND o.status = 'active' AND m.status = 'active'), -1);
  PERFORM sagline_group_delta(ARRAY(SELECT n.id FROM new_rows n JOIN makers m ON m.id = n.maker_id
    WHERE n.id = ANY(changed) AND n.status = 'active' AND m.status = 'active'), 1);
  PERFORM sagline_group_tidy(keys);
  RETURN NULL;
END $$;--> statement-breakpoint
-- A maker that starts or stops counting: its active packs' groups lose or gain their rows.
CREATE FUNCTION "sagline_makers_updated"() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  stopped integer[];
  started integer[];
  mine integer[];
  keys text[];
BEGIN
  stopped := ARRAY(SELECT n.id FROM new_rows n JOIN old_rows o ON o.id = n.id
                   WHERE o.status = 'active' AND n.status <> 'active');
  started := ARRAY(SELECT n.id FROM new_rows n JOIN old_rows o ON o.id = n.id
                   WHERE o.status <> 'active' AND n.status = 'active');
  IF cardinality(stopped) + cardinality(started) = 0 THEN RETURN NULL; END IF;
  mine := ARRAY(SELECT id FROM packs WHERE maker_id = ANY(stopped || started) ORDER BY 1);
  PERFORM sagline_lock_packs(mine);
  keys := ARRAY(SELECT DISTINCT group_key FROM pack_group_summaries WHERE pack_id = ANY(mine));
  PERFORM sagline_lock_groups(keys);
  PERFORM sagline_group_delta(ARRAY(SELECT id FROM packs WHERE id = ANY(mine) AND maker_id = ANY(stopped)
    AND status = 'active'), -1);
  PERFORM sagline_group_delta(ARRAY(SELECT id FROM packs WHERE id = ANY(mine) AND maker_id = ANY(started)
    AND status = 'active'), 1);
  PERFORM sagline_group_tidy(keys);
  RETURN NULL;
END $$;--> statement-breakpoint
CREATE TRIGGER "packs_group_summaries_update" AFTER UPDATE ON "packs"
  REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION sagline_packs_updated();--> statement-breakpoint
CREATE TRIGGER "makers_group_summaries_update" AFTER UPDATE ON "makers"
  REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION sagline_makers_updated();--> statement-breakpoint
INSERT INTO "group_summaries" SELECT * FROM "group_summaries_fresh";
