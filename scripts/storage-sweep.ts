// npm run storage:sweep [-- --dry-run] [-- --max-age-days N] — remove draft uploads under incoming/ that no
// draft has used for INCOMING_MAX_AGE_DAYS (default 7) and no result points at (server/storage/sweep.ts).
// Prints each removed key and a summary; cron-able. Exits non-zero with one line when something is wrong.
import { parseArgs } from "node:util";
import { z } from "zod";
import { closeDb } from "@/db";
import { env } from "@/server/env";
import { sweepIncomingUploads, type SweepReport } from "@/server/storage/sweep";

const days = z.coerce
  .number()
  .int("--max-age-days must be a whole number of days")
  .min(1, "--max-age-days must be at least 1")
  .max(365, "--max-age-days must be at most 365");

const size = (bytes: number) =>
  bytes >= 1024 * 1024 ? `${(bytes / 1024 / 1024).toFixed(1)} MB` : `${(bytes / 1024).toFixed(1)} kB`;
const day = (d: Date) => d.toISOString().slice(0, 16).replace("T", " ");

function print(report: SweepReport, maxAgeDays: number): void {
  const verb = report.dryRun ? "would remove" : "removed";
  console.log(
    `sagline: storage sweep of incoming/ in ${env().S3_BUCKET}: uploads unused since ${day(report.cutoff)} UTC (${maxAgeDays} day${maxAgeDays === 1 ? "" : "s"})${report.dryRun ? " — dry run, nothing is deleted" : ""}`,
  );
  for (const o of report.removed) console.log(`${verb} ${o.key}  ${size(o.bytes)}  last used ${day(o.lastUsedAt)}`);
  for (const key of report.keptReferenced) console.log(`kept ${key}  (a result points at it)`);
  const bytes = report.removed.reduce((n, o) => n + o.bytes, 0);
  console.log(
    `sagline: ${report.removed.length} ${report.dryRun ? "would be removed" : "removed"} (${size(bytes)}), ${report.keptRecent} kept (used recently), ${report.keptReferenced.length} kept (a result points at them), ${report.examined} looked at`,
  );
}

async function main(): Promise<void> {
  const { values } = parseArgs({
    options: { "dry-run": { type: "boolean", default: false }, "max-age-days": { type: "string" } },
    strict: true,
    allowPositionals: false,
  });
  const parsed = values["max-age-days"] === undefined ? null : days.safeParse(values["max-age-days"]);
  if (parsed && !parsed.success) throw new Error(parsed.error.issues[0]?.message ?? "--max-age-days is not valid");
  const maxAgeDays = parsed?.data ?? env().INCOMING_MAX_AGE_DAYS;
  print(await sweepIncomingUploads({ maxAgeDays, dryRun: values["dry-run"] }), maxAgeDays);
}

main()
  .catch((err: unknown) => {
    console.error(`sagline: error: storage sweep stopped: ${err instanceof Error ? err.message : String(err)}`);
    process.exitCode = 1;
  })
  .finally(() => closeDb());
