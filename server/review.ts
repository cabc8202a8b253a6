// Moderation services. Each write runs in its own transaction in the data layer (db/mutations/review.ts,
// reader-flags.ts). A decision's e-mails are written here and queued inside the decision's transaction (the
// mail worker sends them; no request waits on SMTP). After the commit the public pages that show the result
// — and, when a proposed pack went live, the catalogue, its API and the sitemap — are revalidated by tag.
import "server-only";
import { insertReaderFlag } from "@/db/mutations/reader-flags";
import {
  writeDecision,
  writeFlagResolution,
  type Decision,
  type DecisionMailInput,
  type DecisionStatus,
  type ResultContext,
} from "@/db/mutations/review";
import type { NewOutboxMessage } from "@/db/mutations/mail-outbox";
import type { ResolvedFlag } from "@/lib/flag-resolution-message";
import { rejectReasonLabels } from "@/lib/labels";
import type { FlagResolution, ReaderFlagInput } from "@/lib/validations/review";
import { cacheTags, tagsForPublicationChange } from "@/server/cache-tags";
import { appUrl, ownResultUrl } from "@/server/links";
import { newResultOnPackMail, outboxMessage, reviewDecisionMail } from "@/server/mail";
import { revalidateTags } from "@/server/revalidate";

/** A result left publication: its own tags and every list that counted it (never another pack's page). */
function revalidatePublicationChange(c: ResultContext): void {
  revalidateTags(tagsForPublicationChange(c));
}

function decisionMails(m: DecisionMailInput, said: string | null): NewOutboxMessage[] {
  const out: NewOutboxMessage[] = [];
  if (m.contributorEmail) {
    const content = reviewDecisionMail({
      resultId: m.resultId,
      packTitle: m.packTitle,
      decision: m.status,
      reason: said,
      resultUrl: ownResultUrl(m.resultId),
    });
    out.push(outboxMessage(m.contributorEmail, content));
  }
  if (m.status === "approved" && m.packEmailRecipients.length > 0) {
    const content = newResultOnPackMail({
      packTitle: m.packTitle,
      packUrl: appUrl(`/packs/${m.packSlug}`),
      accountUrl: appUrl("/account"),
    });
    for (const to of m.packEmailRecipients) out.push(outboxMessage(to, content));
  }
  return out;
}

/**
 * Approve, reject or send back a pending result. Its e-mails are queued in the decision's transaction; after
 * the commit an approval revalidates the result's page, its pack (live at once if it was proposed), maker, group
 * and bench, and the lists that count it (newest, groups, catalogue counts) — no other pack's or result's page.
 */
export async function decideResult(
  actorId: string,
  resultId: number,
  decision: Decision,
): Promise<{ resultId: number; status: DecisionStatus; packSlug: string; queuedMail: number }> {
  const reason = decision.kind === "reject" ? `Reason: ${rejectReasonLabels[decision.reason]}.` : null;
  const said = [reason, decision.note].filter(Boolean).join(" ") || null;
  const { ctx, status, oldSlugs, queued } = await writeDecision(actorId, resultId, decision, (m) =>
    decisionMails(m, said),
  );
  if (status === "approved") revalidateTags([...tagsForPublicationChange(ctx), ...oldSlugs.map(cacheTags.pack)]);
  return { resultId, status, packSlug: ctx.packSlug, queuedMail: queued };
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
  if (resolved.status === "withdrawn") revalidatePublicationChange(ctx);
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
