// Wall time of approving a result whose pack has 100 people on its e-mail list (server/review.ts decideResult:
// lock, status change and event, catalogue check, the 101 e-mails written as outbox rows, commit), in a
// throwaway database (DATABASE_URL, created and dropped by scripts/bench-approval.sh). No SMTP is involved —
// the mail worker sends the rows later — so the figure is what a moderator's request waits for, minus the
// session look-up and the page refresh. Printed, not asserted; target < 300 ms.
import { loadavg } from "node:os";
import { performance } from "node:perf_hooks";
import { sql } from "drizzle-orm";
import { closeDb, db } from "@/db";
import { decideResult } from "@/server/review";
import { runMigrations } from "../migrate";

const READERS = 100;
const WARM = 5;
const RUNS = 30;

async function seed(): Promise<number[]> {
  await db.execute(sql`insert into users (id, email, display_name, role) values
    ('bench-contributor', 'contributor@bench.sagline.localhost', 'Bench contributor', 'contributor'),
    ('bench-moderator', 'moderator@bench.sagline.localhost', 'Bench moderator', 'moderator')`);
  await db.execute(sql`insert into users (id, email, display_name)
    select 'reader-' || g, 'reader-' || g || '@bench.sagline.localhost', 'Reader ' || g from generate_series(1, ${READERS}) g`);
  await db.execute(sql`insert into makers (slug, name) values ('bench-maker', 'Bench Maker')`);
  await db.execute(sql`insert into packs (slug, maker_id, model, cells_in_series, rated_capacity_mah, labelled_continuous_c, connector)
    values ('bench-maker-1300-4s', 1, 'Bench 1300 4S 75C', 4, 1300, 75, 'XT60')`);
  await db.execute(
    sql`insert into pack_emails (user_id, pack_id) select 'reader-' || g, 1 from generate_series(1, ${READERS}) g`,
  );
  const rows = await db.execute<{ id: number }>(sql`
    insert into results (pack_id, contributor_id, status, ambient_temperature_c, load_mode, load_current_a, cutoff_v_per_cell,
      stop_temperature_c, resistance_method, equipment, log_key, log_sha256, log_bytes, log_filename, figures, curve,
      load_rate_c, group_key)
    select 1, 'bench-contributor', 'pending', 22, 'constant-current', 13, 3.3, 60, 'dc-step', 'bench', 'k' || g, 's' || g, 1,
      'x.csv', '{}'::jsonb, '[]'::jsonb, 10, 'bench-group'
    from generate_series(1, ${WARM + RUNS}) g returning id`);
  return rows.rows.map((r) => r.id);
}

async function main() {
  await runMigrations(process.env.DATABASE_URL ?? "");
  const ids = await seed();
  // Outside a Next.js request there is no page cache to refresh: the revalidation step only warns.
  console.warn = () => undefined;
  const approve = (id: number) =>
    decideResult("bench-moderator", id, {
      kind: "approve",
      note: null,
      catalogue: { intoPackId: null, intoMakerId: null },
    });
  for (const id of ids.slice(0, WARM)) await approve(id);
  const times: number[] = [];
  for (const id of ids.slice(WARM)) {
    const t = performance.now();
    const out = await approve(id);
    times.push(performance.now() - t);
    if (out.queuedMail !== READERS + 1) throw new Error(`expected ${READERS + 1} e-mails, got ${out.queuedMail}`);
  }
  times.sort((a, b) => a - b);
  const q = (p: number) => times[Math.min(times.length - 1, Math.floor(p * times.length))] ?? Number.NaN;
  const [load1] = loadavg();
  console.log(
    `approval with ${READERS} people e-mailed (decideResult, ${RUNS} runs after ${WARM} warm-up, ` +
      `load average ${load1?.toFixed(1)} on this machine): median ${q(0.5).toFixed(0)} ms, p95 ${q(0.95).toFixed(0)} ms, ` +
      `max ${q(1).toFixed(0)} ms; target < 300 ms; ${READERS + 1} outbox rows per approval, no SMTP connection`,
  );
}

main()
  .catch((err: unknown) => {
    console.error(`sagline: error: ${err instanceof Error ? err.message : String(err)}`);
    process.exitCode = 1;
  })
  .finally(() => closeDb());
