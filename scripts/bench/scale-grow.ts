// Grows the bench database (DATABASE_URL, a throwaway copy made by scripts/bench-scale.sh) from the demo scenario to
// SCALE_PACKS packs and SCALE_RESULTS approved results, set-based (INSERT … SELECT over generate_series), never row by
// row. New makers and packs get invented names built from syllables, so trigram search meets look-alike words as it
// would in a real catalogue. New results are copies of the demo's approved results — their figures, curves and
// fingerprints come from the equivalent-circuit generator (lib/synthetic), so each row carries a realistic curve —
// assigned to packs with the same number of cells, so every like-for-like group key stays true to its pack.
import { sql } from "drizzle-orm";
import { db } from "@/db";

const SYLLABLES = [
  "ash",
  "bel",
  "cor",
  "dun",
  "eld",
  "fen",
  "gal",
  "hal",
  "ist",
  "jor",
  "kel",
  "lum",
  "mor",
  "nor",
  "orr",
  "pel",
  "quin",
  "ros",
  "sel",
  "tor",
  "ul",
  "vel",
  "wyn",
  "yar",
  "zed",
  "bran",
  "crest",
  "dale",
  "fell",
  "glen",
];
const SUFFIXES = ["Cells", "Power", "Energy", "Packs", "Works", "Volt", "Labs", "Supply"];
const MODELS = ["Ridge", "Summit", "Comet", "Falcon", "Harbor", "Tempest", "Granite", "Swift", "Ember", "Drift"];
const pgArray = (xs: string[]) => `{${xs.join(",")}}`;

/** Columns of `table` other than those the caller sets itself (so new columns from later migrations are copied). */
async function copyableColumns(table: string, set: string[]): Promise<string[]> {
  const rows = await db.execute<{ column_name: string }>(sql`
    select column_name from information_schema.columns
    where table_schema = 'public' and table_name = ${table} and is_generated = 'NEVER' and identity_generation is null
    order by ordinal_position`);
  return rows.rows.map((r) => r.column_name).filter((c) => !set.includes(c));
}

export async function grow(targetPacks: number, targetResults: number, log: (s: string) => void): Promise<void> {
  const count = async (q: ReturnType<typeof sql>) => Number((await db.execute<{ n: string }>(q)).rows[0]?.n ?? 0);
  const havePacks = await count(sql`select count(*) as n from packs where status = 'active'`);
  const newPacks = Math.max(0, targetPacks - havePacks);
  const newMakers = Math.ceil(newPacks / 50);

  let t = Date.now();
  await db.execute(sql`
    insert into makers (slug, name)
    select 'scale-' || g || '-' || lower(n), n from (
      select g, initcap(s[1 + g % ${SYLLABLES.length}] || s[1 + (g / ${SYLLABLES.length}) % ${SYLLABLES.length}])
        || ' ' || x[1 + (g / 7) % ${SUFFIXES.length}] as n
      from generate_series(1, ${newMakers}) g,
        (select ${pgArray(SYLLABLES)}::text[] as s, ${pgArray(SUFFIXES)}::text[] as x) a
    ) m`);
  await db.execute(sql`
    insert into packs (slug, maker_id, model, cells_in_series, rated_capacity_mah, labelled_continuous_c,
      labelled_burst_c, weight_g, connector)
    select 'scale-pack-' || g, mk.id, model, cells, cap, c, c * 2, round(cells * cap * 0.021), 'XT60'
    from (
      select g,
        initcap(m[1 + g % ${MODELS.length}]) || ' ' || initcap(s[1 + (g / 3) % ${SYLLABLES.length}])
          || ' ' || (1000 + (g % 9) * 500) as model,
        2 + g % 5 as cells, 1000 + (g % 9) * 500 as cap, 25 + (g % 12) * 10 as c,
        1 + (g % ${newMakers}) as maker_n
      from generate_series(1, ${newPacks}) g,
        (select ${pgArray(MODELS)}::text[] as m, ${pgArray(SYLLABLES)}::text[] as s) a
    ) p
    join (select id, row_number() over (order by id) as n from makers where slug like 'scale-%') mk
      on mk.n = p.maker_n`);
  log(`bench:scale: ${newMakers} makers and ${newPacks} packs added in ${((Date.now() - t) / 1000).toFixed(1)} s`);

  // Templates: the demo's approved results, numbered within each cell count (plain tables: the pool's connections
  // do not share temporary ones).
  await db.execute(sql`drop table if exists scale_templates, scale_packs`);
  await db.execute(sql`
    create unlogged table scale_templates as
    select r.id, p.cells_in_series as cells,
      row_number() over (partition by p.cells_in_series order by r.id) - 1 as k,
      count(*) over (partition by p.cells_in_series) as of_cells
    from results r join packs p on p.id = r.pack_id where r.status = 'approved'`);
  await db.execute(sql`
    create unlogged table scale_packs as
    select id, cells_in_series as cells, row_number() over (order by id) - 1 as n from packs
    where status = 'active' and cells_in_series in (select cells from scale_templates)`);
  const packCount = await count(sql`select count(*) as n from scale_packs`);
  const haveResults = await count(sql`select count(*) as n from results where status = 'approved'`);
  const add = Math.max(0, targetResults - haveResults);
  const set = ["pack_id", "status", "published_at", "submitted_at", "updated_at", "idempotency_key", "log_key"];
  const cols = await copyableColumns("results", set);
  const list = sql.raw(cols.map((c) => `"${c}"`).join(", "));
  const fromT = sql.raw(cols.map((c) => `t."${c}"`).join(", "));
  const batch = 100_000;
  t = Date.now();
  await withSummariesRebuilt(async () => {
    for (let from = 0; from < add; from += batch) {
      const to = Math.min(add, from + batch);
      await db.execute(sql`
      insert into results (pack_id, status, published_at, submitted_at, updated_at, log_key, ${list})
      select sp.id, 'approved', now() - (g % 700) * interval '1 day', now() - (g % 700) * interval '1 day', now(),
        t.log_key, ${fromT}
      from generate_series(${from + 1}::int, ${to}::int) g
      join scale_packs sp on sp.n = (g::bigint * 7919) % ${packCount}::int
      join scale_templates st on st.cells = sp.cells and st.k = g % st.of_cells
      join results t on t.id = st.id`);
      log(`bench:scale: ${to} of ${add} results added (${((Date.now() - t) / 1000).toFixed(0)} s)`);
    }
  }, log);
  await db.execute(sql`drop table scale_templates, scale_packs`);
  t = Date.now();
  await db.execute(sql`vacuum analyze`);
  log(`bench:scale: vacuum analyze in ${((Date.now() - t) / 1000).toFixed(1)} s`);
}

/**
 * Runs the grow's inserts with the summaries' insert trigger (migration 0009) off, then rebuilds the summary
 * tables from their views in one transaction. The trigger fires once per statement, but each 100,000-row batch
 * would recompute every pack it touches from all of that pack's results, a cost that grows with every batch
 * (measured here, 2 cores under other load: 4.9 s to refresh 20,000 packs at 200,000 results, against 3.6 s for
 * the whole rebuild at that size), and take one advisory lock per pack (tens of thousands near the lock table's
 * size). The bench's throwaway database has no other writer while it grows.
 */
async function withSummariesRebuilt(insert: () => Promise<void>, log: (s: string) => void): Promise<void> {
  await db.execute(sql`alter table results disable trigger results_summaries_insert`);
  try {
    await insert();
  } finally {
    await db.execute(sql`alter table results enable trigger results_summaries_insert`);
  }
  const t = Date.now();
  await db.transaction(async (tx) => {
    await tx.execute(sql`truncate group_summaries, pack_group_summaries, pack_summaries`);
    await tx.execute(sql`insert into pack_group_summaries select * from pack_group_summaries_fresh`);
    await tx.execute(sql`insert into pack_summaries select * from pack_summaries_fresh`);
    await tx.execute(sql`insert into group_summaries select * from group_summaries_fresh`);
  });
  log(`bench:scale: summaries rebuilt from their views in ${((Date.now() - t) / 1000).toFixed(1)} s`);
}
