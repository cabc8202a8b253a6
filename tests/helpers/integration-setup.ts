// Runs in each integration test file before its imports touch the database.
import { afterAll, inject } from "vitest";

process.env.DATABASE_URL = inject("databaseUrl");
process.env.SAGLINE_DEV_TOOLS = "1";

afterAll(async () => {
  const { closeDb } = await import("@/db");
  await closeDb();
});
