// What happens after a moderation write commits: the public pages that show the result are revalidated by
// tag, and people are told by e-mail. Mail goes through the outbox, so a relay outage queues it and never
// undoes the decision; any other failure here is logged, not thrown.
import "server-only";
import { listWatcherEmails } from "@/db/queries/watches";
import { tagsForResult } from "@/lib/cache-tags";
import { env } from "@/lib/env";
import { reviewDecisionMail, sendMail, watchedPackResultMail, type ReviewDecision } from "@/lib/mail";
import { revalidateTags } from "@/lib/revalidate";

export type ResultContext = {
  resultId: number; packId: number; packSlug: string; makerSlug: string; groupKey: string; packTitle: string;
  contributorId: string; contributorEmail: string | null;
};

export function revalidateResult(c: ResultContext): void {
  revalidateTags(tagsForResult(c));
}

async function safely(what: string, fn: () => Promise<unknown>): Promise<void> {
  try {
    await fn();
  } catch (err) {
    console.error(`[review] ${what} failed after the decision was saved:`, err instanceof Error ? err.message : err);
  }
}

export async function notifyDecision(c: ResultContext, decision: ReviewDecision, note: string | null): Promise<void> {
  const base = env().APP_URL.replace(/\/$/, "");
  if (c.contributorEmail) {
    const to = c.contributorEmail;
    await safely("decision mail", () =>
      sendMail(to, reviewDecisionMail({ packTitle: c.packTitle, decision, reason: note, resultUrl: `${base}/results/${c.resultId}` })),
    );
  }
  if (decision !== "approved") return;
  await safely("watcher mail", async () => {
    const mail = watchedPackResultMail({ packTitle: c.packTitle, packUrl: `${base}/packs/${c.packSlug}`, accountUrl: `${base}/account` });
    for (const to of await listWatcherEmails(c.packId, [c.contributorId])) await sendMail(to, mail);
  });
}
