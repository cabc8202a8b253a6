// The one Drizzle client. Only db/ imports it.
import "server-only";
import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { env } from "@/server/env";
import * as schema from "./schema";

export type Database = NodePgDatabase<typeof schema>;
export type Transaction = Parameters<Parameters<Database["transaction"]>[0]>[0];
export type Executor = Database | Transaction;

const globalForDb = globalThis as unknown as { saglinePool?: Pool; saglineDb?: Database };

function createPool(): Pool {
  const pool = new Pool({
    connectionString: env().DATABASE_URL,
    max: env().DATABASE_POOL_MAX,
    connectionTimeoutMillis: 5_000,
  });
  // An idle client's error (the database restarting) must not crash the server; the pool reconnects.
  pool.on("error", (err) => console.error("[db] idle client error:", err.message));
  return pool;
}

export function getDb(): Database {
  if (!globalForDb.saglineDb) {
    globalForDb.saglinePool = createPool();
    globalForDb.saglineDb = drizzle(globalForDb.saglinePool, { schema });
  }
  return globalForDb.saglineDb;
}

/** Lazily created so importing this module never opens a connection (e.g. during type checks). */
export const db: Database = new Proxy({} as Database, {
  get(_target, prop) {
    const real = getDb() as unknown as Record<string | symbol, unknown>;
    const value = real[prop];
    return typeof value === "function" ? (value as (...a: unknown[]) => unknown).bind(real) : value;
  },
});

export async function closeDb(): Promise<void> {
  await globalForDb.saglinePool?.end();
  globalForDb.saglinePool = undefined;
  globalForDb.saglineDb = undefined;
}
