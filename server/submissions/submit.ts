// Submitting a result, start to end: idempotency, rate limit, pack, files, figures recomputed from the
// stored log, one transaction (result + proposal + review event + receipt in the outbox), then — after
// the response — the drafts are removed. The mail worker sends the receipt; no request waits on SMTP.
import "server-only";
import { findResultByIdempotencyKey } from "@/db/queries/submissions";
import { createSubmission } from "@/db/mutations/results";
import { afterResponse } from "@/server/after-response";
import { outboxMessage, submissionReceiptMail } from "@/server/mail";
import { ownResultUrl } from "@/server/links";
import { enforceRateLimit, limits } from "@/server/rate-limit";
import { assertSubmissionsOpen } from "./pause";
import type { SessionUser } from "@/server/session";
import type { SubmitResultInput } from "@/lib/validations/result";
import { analyseForCard, checkFiles, resolvePack, resultFields } from "./prepare";
import { moveFiles } from "./files";

export type Submitted = { resultId: number; created: boolean };

export async function submitResultFor(input: SubmitResultInput, user: SessionUser): Promise<Submitted> {
  const earlier = await findResultByIdempotencyKey(user.id, input.idempotencyKey);
  if (earlier) return { resultId: earlier.id, created: false };
  try {
    return await submitNew(input, user);
  } catch (err) {
    // A double click races: the first request may finish (and move the draft's files away) while the second
    // is half-way, which then fails on files that are gone. If the first made the result, that is the answer.
    const made = await findResultByIdempotencyKey(user.id, input.idempotencyKey).catch(() => null);
    if (made) return { resultId: made.id, created: false };
    throw err;
  }
}

async function submitNew(input: SubmitResultInput, user: SessionUser): Promise<Submitted> {
  await assertSubmissionsOpen();
  await enforceRateLimit(`submit:${user.id}`, limits.submitPerUser);
  const { target, facts } = await resolvePack(input.pack, user.id);
  await checkFiles(input.log.key, input.photoKeys, user.id);
  const figured = await analyseForCard(input.log.key, facts, input.method, input.log.mapping);
  const files = await moveFiles(input.log.key, figured.sha256, input.photoKeys);
  const email = user.email;
  const submittedAt = new Date();
  const receipt = email
    ? (resultId: number) =>
        outboxMessage(
          email,
          submissionReceiptMail({ resultId, packTitle: facts.title, resultUrl: ownResultUrl(resultId), submittedAt }),
        )
    : null;
  let out: Submitted;
  try {
    const fields = await resultFields(input.method, facts, figured, {
      logKey: files.logKey,
      logFilename: input.log.filename,
      photoKeys: files.photoKeys,
    });
    out = await createSubmission({
      contributorId: user.id,
      idempotencyKey: input.idempotencyKey,
      pack: target,
      fields,
      receipt,
    });
  } catch (err) {
    await files.undo();
    throw err;
  }
  afterResponse(files.discardDrafts);
  return out;
}
