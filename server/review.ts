// Moderation services. Each write runs in its own transaction in the data layer (db/mutations/review.ts,
// reader-flags.ts); after the commit the public pages that show the result are revalidated by tag, and
// people are told by e-mail. Mail goes through the outbox, so a relay outage queues it and never undoes
// the decision; any other failure of an after-effect is logged, not thrown.
import "server-only";
import { insertReaderFlag } from "@/db/mutations/reader-flags";
import {
  writeDecision,
  writeFlagResolution,
  type Decision,
  type DecisionStatus,
  type ResultContext,
} from "@/db/mutations/review";
import { listWatcherEmails } from "@/db/queries/watches";
import type { ResolvedFlag } from "@/lib/flag-resolution-message";
import { rejectReasonLabels, type FlagResolution, type ReaderFlagInput } from "@/lib/validations/review";
import { cacheTags, tagsForResult } from "@/server/cache-tags";
import { env } from "@/server/env";
import { reviewDecisionMail, sendMail, watchedPackResultMail, type ReviewDecision } from "@/server/mail";
import { revalidateTags } from "@/server/revalidate";

function revalidateResult(c: ResultContext): void {
  revalidateTags(tagsForResult(c));
}

async function safely(what: string, fn: () => Promise<unknown>): Promise<void> {
  try {
    await fn();
  } catch (err) {
    console.error(`[review] ${what} failed after the decision was saved:`, err instanceof Error ? err.message : err);
  }
}

async function notifyDecision(c: ResultContext, decision: ReviewDecision, note: string | null): Promise<void> {
  const base = env().APP_URL.replace(/\/$/, "");
  if (c.contributorEmail) {
    const to = c.contributorEmail;
    await safely("decision mail", () =>
      sendMail(
        to,
        reviewDecisionMail({
          packTitle: c.packTitle,
          decision,
          reason: note,
          resultUrl: `${base}/results/${c.resultId}`,
        }),
      ),
    );
  }
  if (decision !== "approved") return;
  await safely("watcher mail", async () => {
    const mail = watchedPackResultMail({
      packTitle: c.packTitle,
      packUrl: `${base}/packs/${c.packSlug}`,
      accountUrl: `${base}/account`,
    });
    for (const to of await listWatcherEmails(c.packId, [c.contributorId])) await sendMail(to, mail);
  });
}

/** Approve, reject or request changes on a pending result; then revalidate (when published) and tell people. */
export async function decideResult(
  actorId: string,
  resultId: number,
  decision: Decision,
): Promise<{ resultId: number; status: DecisionStatus }> {
  const { ctx, status } = await writeDecision(actorId, resultId, decision);
  if (status === "approved") revalidateResult(ctx);
  const reason = decision.kind === "reject" ? `Reason: ${rejectReasonLabels[decision.reason]}.` : null;
  const said = [reason, decision.note].filter(Boolean).join(" ");
  await notifyDecision(ctx, status, said || null);
  return { resultId, status };
}

/**
 * Resolves an open reader flag: dismiss it (kept, or corrected with a note) or take the result out of
 * publication. Dismissing changes no figure or count, so only the result's page and its pack's list (which
 * show the open check) are refreshed; a withdrawal refreshes everything that counted the result.
 */
export async function resolveReaderFlag(
  actorId: string,
  flagId: number,
  resolution: FlagResolution,
  note: string | null,
): Promise<ResolvedFlag> {
  const { ctx, resolved } = await writeFlagResolution(actorId, flagId, resolution, note);
  if (resolved.status === "withdrawn") revalidateResult(ctx);
  else revalidateOpenCase(ctx);
  return resolved;
}

function revalidateOpenCase(c: ResultContext): void {
  revalidateTags([cacheTags.result(c.resultId), cacheTags.pack(c.packSlug)]);
}

/**
 * A signed-in reader flags a published result: a case opens for moderators, nothing else changes (the
 * result stays published and counted). Its page and its pack's list then show the open check.
 */
export async function fileReaderFlag(
  resultId: number,
  input: ReaderFlagInput,
  reporter: { userId: string; reporterHash: string | null },
): Promise<{ flagId: number }> {
  const { ctx, flagId } = await insertReaderFlag(resultId, input, reporter);
  revalidateOpenCase(ctx);
  return { flagId };
}
