// A result's stored files and who may see them: its state and contributor (the permission check is the
// caller's: server/evidence.ts).
import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { results, type ReviewStatus } from "@/db/schema";

export type ResultFiles = {
  status: ReviewStatus;
  contributorId: string;
  photoKeys: string[];
  logKey: string;
  logFilename: string;
  logBytes: number;
};

export async function getResultFiles(resultId: number): Promise<ResultFiles | null> {
  const [row] = await db
    .select({
      status: results.status,
      contributorId: results.contributorId,
      photoKeys: results.photoKeys,
      logKey: results.logKey,
      logFilename: results.logFilename,
      logBytes: results.logBytes,
    })
    .from(results)
    .where(eq(results.id, resultId))
    .limit(1);
  return row ?? null;
}
