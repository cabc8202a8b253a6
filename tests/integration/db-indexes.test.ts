// Issue 18: every foreign key has an index that starts with its columns (joins from the parent, and ON DELETE
// on a user or pack, then read by index instead of scanning the child table), and results can be paged by
// keyset within a status — (status, id). Read from the migrated database's own catalogue (pg_constraint, pg_index).
import { sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";

describe("database indexes", () => {
  it("has an index led by the columns of every foreign key", async () => {
    const keys = await db.execute<{ fk: string }>(sql`
      select c.conrelid::regclass || '.' || c.conname as fk
      from pg_constraint c
      where c.contype = 'f' and c.connamespace = 'public'::regnamespace`);
    // The check below must have something to check.
    expect(keys.rows.length).toBeGreaterThan(10);
    const uncovered = await db.execute<{ fk: string }>(sql`
      select c.conrelid::regclass || '.' || c.conname as fk
      from pg_constraint c
      where c.contype = 'f' and c.connamespace = 'public'::regnamespace
        and not exists (
          select 1 from pg_index i
          where i.indrelid = c.conrelid and i.indpred is null
            -- the index's first n key columns (int2vector is 0-based) are exactly the key's n columns
            and (i.indkey::int2[])[0:array_length(c.conkey, 1) - 1] @> c.conkey
            and (i.indkey::int2[])[0:array_length(c.conkey, 1) - 1] <@ c.conkey)
      order by 1`);
    expect(uncovered.rows.map((r) => r.fk)).toEqual([]);
  });

  it("has (status, id) on results for keyset pages", async () => {
    const idx = await db.execute<{ def: string }>(
      sql`select indexdef as def from pg_indexes where tablename = 'results' and indexname = 'results_status_id_idx'`,
    );
    expect(idx.rows[0]?.def).toMatch(/USING btree \(status, id\)$/);
  });
});
