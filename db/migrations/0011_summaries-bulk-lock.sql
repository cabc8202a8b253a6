-- Hand-written (issue 18): a refresh touching very many packs (a bulk load) takes one exclusive lock instead of
-- one lock per pack, which ran the lock table out of shared memory at ~60,000 packs. Every refresh first takes the
-- shared side of that lock, so a big refresh still waits for, and blocks, the small ones.
CREATE OR REPLACE FUNCTION "sagline_refresh_summaries"(touched integer[]) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  IF cardinality(touched) = 0 THEN RETURN; END IF;
  IF cardinality(touched) > 1000 THEN
    PERFORM pg_advisory_xact_lock(18, 0);
  ELSE
    PERFORM pg_advisory_xact_lock_shared(18, 0);
    PERFORM pg_advisory_xact_lock(18, p) FROM (SELECT DISTINCT unnest(touched) AS p ORDER BY 1) s;
  END IF;
  DELETE FROM pack_group_summaries WHERE pack_id = ANY(touched);
  INSERT INTO pack_group_summaries SELECT * FROM pack_group_summaries_fresh WHERE pack_id = ANY(touched);
  DELETE FROM pack_summaries WHERE pack_id = ANY(touched);
  INSERT INTO pack_summaries SELECT * FROM pack_summaries_fresh WHERE pack_id = ANY(touched);
END $$;
