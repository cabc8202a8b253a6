// The summary tables (db/schema/summaries.ts) against their definition: the views pack_group_summaries_fresh and
// pack_summaries_fresh aggregate the approved results from scratch (migration 0009), group_summaries_fresh those of
// active packs of active makers per group (migration 0013). A row in one and not the other, either way round, is a
// stale summary.
import { sql } from "drizzle-orm";
import { Client } from "pg";
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

/**
 * Two approvals committed from two connections at once: A approves `firstId` and holds its transaction open while B
 * approves `secondId`; once B is seen waiting on an advisory lock (or 5 s have passed), A commits, then B. Answers
 * whether B waited, so a test shows the summaries' lock, not luck.
 */
export async function approveFromTwoConnections(firstId: number, secondId: number): Promise<{ secondWaited: boolean }> {
  const a = new Client({ connectionString: process.env.DATABASE_URL });
  const b = new Client({ connectionString: process.env.DATABASE_URL });
  await a.connect();
  await b.connect();
  try {
    const approveSql = "update results set status = 'approved', published_at = now() where id = $1";
    await a.query("begin");
    await a.query(approveSql, [firstId]);
    await b.query("begin");
    const bPid = (await b.query<{ pid: number }>("select pg_backend_pid() as pid")).rows[0]?.pid;
    const bUpdate = b.query(approveSql, [secondId]);
    let waiting = false;
    for (let i = 0; i < 50 && !waiting; i++) {
      const w = await db.execute<{ wait_event: string | null }>(
        sql`select wait_event from pg_stat_activity where pid = ${bPid}`,
      );
      waiting = w.rows[0]?.wait_event === "advisory";
      if (!waiting) await new Promise((r) => setTimeout(r, 100));
    }
    await a.query("commit");
    await bUpdate;
    await b.query("commit");
    return { secondWaited: waiting };
  } finally {
    await a.end();
    await b.end();
  }
}
