// Answering a moderator's request: the contributor edits the method card (and may upload a corrected log or
// add photos); the figures are recomputed from the stored log and the result goes back to pending with a
// review event (awaiting_answer → pending) carrying their answer, and a receipt queued in the same
// transaction. Earlier events stay as they were.
import "server-only";
import { getResultForEdit } from "@/db/queries/submissions";
import { resubmitOwnResult } from "@/db/mutations/results";
import { afterResponse } from "@/server/after-response";
import { answerReceiptMail, outboxMessage } from "@/server/mail";
import { ownResultUrl } from "@/server/links";
import { AppError } from "@/lib/errors";
import { enforceRateLimit, limits } from "@/server/rate-limit";
import { assertSubmissionsOpen } from "./pause";
import type { SessionUser } from "@/server/session";
import { MAX_PHOTOS, type ResubmitResultInput } from "@/lib/validations/result";
import { moveFiles } from "./files";
import { analyseForCard, checkFiles, resultFields, type PackFacts } from "./prepare";

export async function resubmitResultFor(input: ResubmitResultInput, user: SessionUser): Promise<{ resultId: number }> {
  const current = await getResultForEdit(input.resultId);
  // Someone else's result answers exactly like a missing one: no existence oracle.
  if (!current || current.contributorId !== user.id) throw new AppError("not_found", "That result does not exist.");
  if (current.status !== "awaiting_answer")
    throw new AppError("conflict", "Only a result waiting for your answer can be answered.");
  if (current.photoKeys.length + input.photoKeys.length > MAX_PHOTOS) {
    throw new AppError("validation", "Too many photos.", {
      photoKeys: [`A result can have at most ${MAX_PHOTOS} photos; it has ${current.photoKeys.length} already.`],
    });
  }
  await assertSubmissionsOpen();
  await enforceRateLimit(`submit:${user.id}`, limits.submitPerUser);
  const p = current.pack;
  const facts: PackFacts = {
    title: `${p.makerName} ${p.model}`,
    cells: p.cellsInSeries,
    ratedMah: p.ratedCapacityMah,
    labelledC: p.labelledContinuousC,
    weightG: p.weightG,
  };
  await checkFiles(input.log?.key ?? null, input.photoKeys, user.id);
  // A new log comes with the mapping it was read with; the stored log keeps the one it was stored with.
  const figured = await analyseForCard(
    input.log?.key ?? current.logKey,
    facts,
    input.method,
    input.log ? input.log.mapping : current.logMapping,
  );
  const files = await moveFiles(input.log?.key ?? null, input.log ? figured.sha256 : null, input.photoKeys);
  try {
    const fields = await resultFields(
      input.method,
      facts,
      figured,
      {
        logKey: input.log ? files.logKey : current.logKey,
        logFilename: input.log?.filename ?? current.logFilename,
        photoKeys: [...current.photoKeys, ...files.photoKeys],
      },
      current.id,
    );
    const receipt = user.email
      ? outboxMessage(
          user.email,
          answerReceiptMail({
            resultId: current.id,
            packTitle: facts.title,
            resultUrl: ownResultUrl(current.id),
            answeredAt: new Date(),
          }),
        )
      : null;
    await resubmitOwnResult(current.id, user.id, fields, input.note, receipt);
  } catch (err) {
    await files.undo();
    throw err;
  }
  afterResponse(files.discardDrafts);
  return { resultId: current.id };
}
