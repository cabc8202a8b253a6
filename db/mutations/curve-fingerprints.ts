// Every result keeps the fingerprint of its curve (lib/analysis/curve-fingerprint.ts) and its search key,
// so the copy check of a new result finds the others by an index instead of reading every curve.
import "server-only";
import { and, asc, eq, gt, isNull, sql } from "drizzle-orm";
import { db, type Executor } from "@/db";
import { results } from "@/db/schema";
import { curveFingerprint, curveKey, MIN_LOADED_POINTS } from "@/lib/analysis/curve-fingerprint";
import type { CurvePoint } from "@/lib/analysis";

function columnsFor(curve: CurvePoint[]) {
  const fingerprint = curveFingerprint(curve);
  return { curveFingerprint: fingerprint, curveKey: fingerprint ? curveKey(fingerprint) : null };
}

/** Computes and stores one result's fingerprint from its stored curve (null when the curve is too short). */
export async function storeCurveFingerprint(resultId: number, exec: Executor = db): Promise<void> {
  const [row] = await exec.select({ curve: results.curve }).from(results).where(eq(results.id, resultId));
  if (!row) return;
  await exec.update(results).set(columnsFor(row.curve)).where(eq(results.id, resultId));
}

/**
 * Fingerprints the results that have none yet (rows from before the column, seeded rows), in batches.
 * Curves too short to fingerprint are skipped by the query, so a second run finds nothing to do.
 */
export async function backfillCurveFingerprints(exec: Executor = db, batch = 200): Promise<number> {
  let done = 0;
  let after = 0;
  for (;;) {
    const rows = await exec
      .select({ id: results.id, curve: results.curve })
      .from(results)
      .where(
        and(
          isNull(results.curveFingerprint),
          gt(results.id, after),
          sql`jsonb_array_length(${results.curve}) >= ${MIN_LOADED_POINTS}`,
        ),
      )
      .orderBy(asc(results.id))
      .limit(batch);
    if (rows.length === 0) return done;
    for (const r of rows) {
      const cols = columnsFor(r.curve);
      if (cols.curveFingerprint) {
        await exec.update(results).set(cols).where(eq(results.id, r.id));
        done++;
      }
      after = r.id;
    }
  }
}
