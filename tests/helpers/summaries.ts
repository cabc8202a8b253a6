// The summary tables (db/schema/summaries.ts) against their definition: the views pack_group_summaries_fresh and
// pack_summaries_fresh aggregate the approved results from scratch (migration 0009), group_summaries_fresh those of
// active packs of active makers per group (migration 0013). A row in one and not the other, either way round, is a
// stale summary.
import { sql } from "drizzle-orm";
import { db, type Executor } from "@/db";

export type StaleRow = { side: string; pack_id: number | null; group_key: string | null; result_count: number };

/** Every row on which a summary table and its from-scratch view disagree (empty when they are equal). */
export async function staleSummaries(exec: Executor = db): Promise<StaleRow[]> {
  const r = await exec.execute<StaleRow>(sql`
    select 'pack_group_summaries only' as side, pack_id, group_key, result_count
      from (select * from pack_group_summaries except select * from pack_group_summaries_fresh) a
    union all
    select 'pack_group_summaries_fresh only', pack_id, group_key, result_count
      from (select * from pack_group_summaries_fresh except select * from pack_group_summaries) b
    union all
    select 'pack_summaries only', pack_id, null, result_count
      from (select * from pack_summaries except select * from pack_summaries_fresh) c
    union all
    select 'pack_summaries_fresh only', pack_id, null, result_count
      from (select * from pack_summaries_fresh except select * from pack_summaries) d
    union all
    select 'group_summaries only', null, group_key, result_count
      from (select * from group_summaries except select * from group_summaries_fresh) e
    union all
    select 'group_summaries_fresh only', null, group_key, result_count
      from (select * from group_summaries_fresh except select * from group_summaries) f
    order by 2, 3, 1`);
  return r.rows;
}

/** Both tables in full, in key order, for before/after comparisons. */
export async function summarySnapshot(exec: Executor = db) {
  const groups = await exec.execute(sql`select * from pack_group_summaries order by pack_id, group_key`);
  const packs = await exec.execute(sql`select * from pack_summaries order by pack_id`);
  const perGroup = await exec.execute(sql`select * from group_summaries order by group_key`);
  return { groups: groups.rows, packs: packs.rows, perGroup: perGroup.rows };
}

export type PackGroupRow = {
  group_key: string;
  result_count: number;
  sag_limited_n: number;
  sag_limited_max: number | null;
  label_ratio_median: number | null;
  capacity_ratio_median: number | null;
};

/** One pack's stored summary: its total and its per-group rows (group key order). */
export async function summaryOf(packId: number): Promise<{ resultCount: number | null; groups: PackGroupRow[] }> {
  const total = await db.execute<{ result_count: number }>(
    sql`select result_count from pack_summaries where pack_id = ${packId}`,
  );
  const groups = await db.execute<PackGroupRow>(sql`
    select group_key, result_count, sag_limited_n, sag_limited_max, label_ratio_median, capacity_ratio_median
    from pack_group_summaries where pack_id = ${packId} order by group_key`);
  return { resultCount: total.rows[0]?.result_count ?? null, groups: groups.rows };
}
