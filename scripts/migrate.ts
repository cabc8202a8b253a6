// Apply the committed drizzle-kit migrations to DATABASE_URL (or the local default).
import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { Pool } from "pg";
import path from "node:path";
import { parseEnv } from "@/server/env";
import { backfillCurveFingerprints } from "@/db/mutations/curve-fingerprints";
import * as schema from "@/db/schema";

export async function runMigrations(databaseUrl: string): Promise<void> {
  const pool = new Pool({ connectionString: databaseUrl, max: 1 });
  try {
    const db = drizzle(pool, { schema });
    await migrate(db, { migrationsFolder: path.resolve(__dirname, "../db/migrations") });
    // Results stored before curve fingerprints existed get theirs (a no-op once every curve has one).
    const filled = await backfillCurveFingerprints(db);
    if (filled > 0) console.log(`sagline: curve fingerprints computed for ${filled} results`);
  } finally {
    await pool.end();
  }
}

if (require.main === module) {
  const { DATABASE_URL } = parseEnv(process.env);
  runMigrations(DATABASE_URL).then(
    () => console.log("sagline: database migrated"),
    (err: unknown) => {
      console.error(`sagline: error: migration failed: ${err instanceof Error ? err.message : String(err)}`);
      process.exit(1);
    },
  );
}
