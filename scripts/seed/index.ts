// npm run db:seed — load the demo scenario. Idempotent: rows are matched on their natural keys
// (e-mail, slug, seeded idempotency key), so running it twice changes nothing.
// `--if-empty` skips when the catalogue already has makers (used by npm start).
import { count, eq } from "drizzle-orm";
import { drizzle } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { parseEnv } from "@/server/env";
import * as schema from "@/db/schema";
import { buildPacks, demoMakers, demoUsers } from "./scenario";
import { seedResults } from "./results";
import { seedCycling } from "./cycling";
import { seedCharts } from "./charts";
import { computeAndStoreFlags } from "@/db/mutations/review";
import { backfillCurveFingerprints } from "@/db/mutations/curve-fingerprints";

export async function seed(databaseUrl: string, opts: { ifEmpty?: boolean; log?: (s: string) => void } = {}) {
  const log = opts.log ?? (() => {});
  const pool = new Pool({ connectionString: databaseUrl, max: 4 });
  const db = drizzle(pool, { schema });
  try {
    if (opts.ifEmpty) {
      const [row] = await db.select({ n: count() }).from(schema.makers);
      if ((row?.n ?? 0) > 0) {
        log("sagline: demo data already present, seed skipped");
        return;
      }
    }
    await db
      .insert(schema.users)
      .values(
        demoUsers.map((u) => ({
          email: u.email,
          name: u.displayName,
          displayName: u.displayName,
          role: u.role,
          anonymous: u.anonymous ?? false,
          publicNameChosenAt: new Date("2026-01-01T00:00:00Z"),
          emailVerified: new Date("2026-01-01T00:00:00Z"),
        })),
      )
      .onConflictDoNothing();
    await db
      .insert(schema.makers)
      .values(demoMakers.map((m) => ({ slug: m.slug, name: m.name })))
      .onConflictDoNothing();
    const makerRows = await db.select({ id: schema.makers.id, slug: schema.makers.slug }).from(schema.makers);
    const makerId = new Map(makerRows.map((m) => [m.slug, m.id]));
    const packs = buildPacks();
    await db
      .insert(schema.packs)
      .values(
        packs.map((p) => {
          const id = makerId.get(p.makerSlug);
          if (id === undefined) throw new Error(`maker ${p.makerSlug} missing`);
          const { truth: _truth, makerSlug: _m, ...rest } = p;
          return { ...rest, makerId: id };
        }),
      )
      .onConflictDoNothing();
    const made = (await seedResults(db, packs, log)) + (await seedCycling(db, packs));
    // Every result's curve fingerprint, so a new log copied from a demo result is recognised.
    await backfillCurveFingerprints(db);
    // Pending results carry their automatic plausibility flags, as they would after a real submission.
    const pending = await db
      .select({ id: schema.results.id })
      .from(schema.results)
      .where(eq(schema.results.status, "pending"));
    for (const { id } of pending) await computeAndStoreFlags(id, db);
    const charts = await seedCharts(db);
    log(
      `sagline: demo scenario seeded (${demoMakers.length} makers, ${packs.length} packs, ${made} results, ${charts} charts)`,
    );
  } finally {
    await pool.end();
  }
}

if (require.main === module) {
  const { DATABASE_URL } = parseEnv(process.env);
  seed(DATABASE_URL, { ifEmpty: process.argv.includes("--if-empty"), log: console.log }).catch((err: unknown) => {
    console.error(`sagline: error: seeding failed: ${err instanceof Error ? err.message : String(err)}`);
    process.exit(1);
  });
}
