// A reader flags a published result: the flag is stored and the result turns disputed for everyone (with
// its review event) in one transaction; the service (server/review.ts) revalidates the pages after it.
import "server-only";
import { db } from "@/db";
import { readerFlags } from "@/db/schema";
import { AppError } from "@/lib/errors";
import type { ReaderFlagInput } from "@/lib/validations/review";
import { lockResult, transition, type ResultContext } from "./review";

export async function insertReaderFlag(
  resultId: number,
  input: ReaderFlagInput,
  reporter: { userId: string | null; reporterHash: string | null },
): Promise<{ ctx: ResultContext; flagId: number }> {
  return db.transaction(async (tx) => {
    const c = await lockResult(tx, resultId);
    // Only published results can be flagged; anything else is not public, so it "does not exist" here.
    if (c.status !== "approved" && c.status !== "disputed")
      throw new AppError("not_found", "That result is not published.");
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
    if (c.status === "approved") {
      await transition(tx, {
        resultId,
        actorId: reporter.userId,
        from: "approved",
        to: "disputed",
        reason: "reader-flag",
        note: `A reader flagged this result: ${input.reason}.`,
      });
    }
    return { ctx: c, flagId: row.id };
  });
}
