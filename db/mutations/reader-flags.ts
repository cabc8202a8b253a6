// A signed-in reader flags a published result: the flag opens a case for moderators and changes nothing
// else — the result stays approved and counted until a moderator decides (db/mutations/review.ts).
import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { readerFlags } from "@/db/schema";
import { AppError } from "@/lib/errors";
import type { ReaderFlagInput } from "@/lib/validations/review";
import { lockResult, type ResultContext } from "./review";

export async function insertReaderFlag(
  resultId: number,
  input: ReaderFlagInput,
  reporter: { userId: string; reporterHash: string | null },
): Promise<{ ctx: ResultContext; flagId: number }> {
  return db.transaction(async (tx) => {
    const c = await lockResult(tx, resultId);
    // Only published results can be flagged; anything else is not public, so it "does not exist" here.
    if (c.status !== "approved") throw new AppError("not_found", "That result is not published.");
    const [open] = await tx
      .select({ id: readerFlags.id })
      .from(readerFlags)
      .where(
        and(
          eq(readerFlags.resultId, resultId),
          eq(readerFlags.reporterId, reporter.userId),
          eq(readerFlags.status, "open"),
        ),
      )
      .limit(1);
    if (open)
      throw new AppError("conflict", "You already asked moderators to check this result; they will look at it.");
    const [row] = await tx
      .insert(readerFlags)
      .values({
        resultId,
        reporterId: reporter.userId,
        reporterHash: reporter.reporterHash,
        reason: input.reason,
        note: input.note,
      })
      .returning({ id: readerFlags.id });
    if (!row) throw new Error("flag insert returned nothing");
    return { ctx: c, flagId: row.id };
  });
}
