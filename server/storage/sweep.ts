// Removes abandoned draft uploads. Files uploaded while filling in /submit live under incoming/ until the
// result is submitted (then they are copied to logs/ and photos/ and the drafts removed). A draft the
// contributor never submits leaves them behind. An incoming/ object is removed only when
//   - its last use is older than the cut-off: neither uploaded nor used by a draft since (a draft that is
//     opened again renews its files: server/submissions/draft-files.ts), and
//   - no result points at its key (checked in the database right before removing).
// Run by `npm run storage:sweep` (cron-able). A hosted bucket should also expire incoming/ by a lifecycle
// rule, as a backstop set longer than INCOMING_MAX_AGE_DAYS.
import "server-only";
import { findReferencedKeys } from "@/db/queries/stored-files";
import { INCOMING_PREFIX } from "@/lib/storage-keys";
import { deleteObject, listObjects, objectInfo } from "./index";

type SweptObject = { key: string; bytes: number; lastUsedAt: Date };
export type SweepReport = {
  cutoff: Date;
  dryRun: boolean;
  examined: number;
  /** Removed (or, in a dry run, that would be). */
  removed: SweptObject[];
  keptRecent: number;
  keptReferenced: string[];
};

export type SweepOptions = { maxAgeDays: number; now?: Date; dryRun?: boolean; prefix?: string };

const DAY_MS = 24 * 60 * 60 * 1000;

export async function sweepIncomingUploads({
  maxAgeDays,
  now = new Date(),
  dryRun = false,
  prefix = INCOMING_PREFIX,
}: SweepOptions): Promise<SweepReport> {
  if (!prefix.startsWith(INCOMING_PREFIX))
    throw new Error(`The sweep only looks under ${INCOMING_PREFIX}, not ${prefix}.`);
  if (!Number.isFinite(maxAgeDays) || maxAgeDays <= 0) throw new Error("maxAgeDays must be a positive number of days.");
  const cutoff = new Date(now.getTime() - maxAgeDays * DAY_MS);
  const report: SweepReport = { cutoff, dryRun, examined: 0, removed: [], keptRecent: 0, keptReferenced: [] };

  // The listing's LastModified rules most objects in or out; the old ones are looked at closely, because a
  // draft opened again records its use in the object's metadata (which the listing does not show).
  const stale: SweptObject[] = [];
  for await (const o of listObjects(prefix)) {
    report.examined++;
    if (o.lastModified >= cutoff) {
      report.keptRecent++;
      continue;
    }
    const info = await objectInfo(o.key);
    if (!info) continue; // removed meanwhile (a submission finished)
    if (info.lastUsedAt >= cutoff) report.keptRecent++;
    else stale.push({ key: o.key, bytes: info.bytes, lastUsedAt: info.lastUsedAt });
  }

  const referenced = await findReferencedKeys(stale.map((o) => o.key));
  for (const o of stale) {
    if (referenced.has(o.key)) {
      report.keptReferenced.push(o.key);
      continue;
    }
    if (!dryRun) {
      // Looked at once more: a draft may have been opened while the sweep ran.
      const info = await objectInfo(o.key);
      if (!info) continue;
      if (info.lastUsedAt >= cutoff) {
        report.keptRecent++;
        continue;
      }
      await deleteObject(o.key);
    }
    report.removed.push(o);
  }
  return report;
}
