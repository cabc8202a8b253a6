// Runs in each integration test file before its imports touch the database.
import { afterAll, inject } from "vitest";

process.env.DATABASE_URL = inject("databaseUrl");
process.env.SAGLINE_DEV_TOOLS = "1";
// Uploads go to the stand-in's test bucket, never the demo bucket.
process.env.S3_BUCKET = "sagline-test";
// What next.config.mjs's experimental.authInterrupts sets at build time, so forbidden() works when pages
// are called directly in tests.
process.env.__NEXT_EXPERIMENTAL_AUTH_INTERRUPTS = "true";

afterAll(async () => {
  const { closeDb } = await import("@/db");
  await closeDb();
});
export {};
