// p95 of the maker-ranking query (db/queries/groups.ts rankMakersInGroup) over 100,000 results in a
// throwaway database (DATABASE_URL, created and dropped by scripts/bench-pages.sh). Results are spread
// over 20 like-for-like groups with a skew like the demo's: the ranked group holds 30 % of them.
import { loadavg } from "node:os";
import { performance } from "node:perf_hooks";
import { sql } from "drizzle-orm";
import { closeDb, db } from "@/db";
import { rankMakersInGroup } from "@/db/queries/groups";
import { runMigrations } from "../migrate";

const RESULTS = 100_000;
const MAKERS = 60;
const PACKS = 3000;
const GROUPS = 20;
const RUNS = 200;

async function seed(): Promise<string> {
  await db.execute(
    sql`insert into users (id, email, display_name) values ('bench-user', 'bench@sagline.localhost', 'Bench')`,
  );
  await db.execute(
    sql`insert into makers (slug, name) select 'maker-' || g, 'Maker ' || g from generate_series(1, ${MAKERS}) g`,
  );
  await db.execute(sql`
    insert into packs (slug, maker_id, model, cells_in_series, rated_capacity_mah, labelled_continuous_c, connector)
    select 'pack-' || g, 1 + (g % ${MAKERS}), 'Model ' || g, 2 + (g % 5), 1000 + (g % 8) * 500, 25 + (g % 10) * 10, 'XT60'
    from generate_series(1, ${PACKS}) g`);
  // Group 0 gets 30 % of the rows, the other 19 share the rest; 82 % approved, the rest not public.
  await db.execute(sql`
    insert into results (pack_id, contributor_id, status, ambient_temperature_c, load_mode, load_current_a, cutoff_v_per_cell,
      stop_temperature_c, resistance_method, equipment, log_key, log_sha256, log_bytes, log_filename, figures, curve,
      sag_limited_c, label_ratio, capacity_ratio, load_rate_c, group_key)
    select 1 + (hashint % ${PACKS}), 'bench-user',
      (case when g % 5 = 0 then 'pending' else 'approved' end)::review_status,
      22, 'constant-current', 10, 3.3, 60, 'dc-step', 'bench', 'k' || g, 's' || g, 1, 'x.csv', '{}'::jsonb, '[]'::jsonb,
      20 + (hashint % 100), 0.3 + (hashint % 90) / 100.0, 0.9, 8,
      case when g % 10 < 3 then 'group-0' else 'group-' || (1 + g % (${GROUPS} - 1)) end
    from (select g, abs(hashtext(g::text)) as hashint from generate_series(1, ${RESULTS}) g) s`);
  // As autovacuum would after a bulk load: statistics, and the visibility map index-only scans rely on.
  await db.execute(sql`vacuum analyze results`);
  await db.execute(sql`analyze`);
  return "group-0";
}

async function main() {
  const url = process.env.DATABASE_URL ?? "";
  await runMigrations(url);
  const t0 = performance.now();
  const key = await seed();
  const seeded = performance.now() - t0;
  for (let i = 0; i < 20; i++) await rankMakersInGroup(key);
  const times: number[] = [];
  let makers = 0;
  for (let i = 0; i < RUNS; i++) {
    const t = performance.now();
    makers = (await rankMakersInGroup(key)).length;
    times.push(performance.now() - t);
  }
  times.sort((a, b) => a - b);
  const q = (p: number) => times[Math.min(times.length - 1, Math.floor(p * times.length))] ?? Number.NaN;
  const [{ n } = { n: 0 }] = (
    await db.execute<{ n: number }>(
      sql`select count(*)::int as n from results where group_key = ${key} and status = 'approved'`,
    )
  ).rows;
  console.log(
    `maker ranking over ${RESULTS.toLocaleString("en-GB")} results (${n.toLocaleString("en-GB")} published in the ranked group, ${makers} makers): ` +
      `p50 ${q(0.5).toFixed(1)} ms, p95 ${q(0.95).toFixed(1)} ms, max ${q(1).toFixed(1)} ms over ${RUNS} runs (target p95 ≤ 50 ms; seeded in ${(seeded / 1000).toFixed(1)} s; machine load ${loadavg()[0]?.toFixed(1)})`,
  );
  await closeDb();
}

main().catch((err: unknown) => {
  console.error(`sagline: error: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
