// Saving the site settings: the row and its audit event (before and after) in one transaction.
import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { auditEvents, siteSettings } from "@/db/schema";
import type { SiteSettingsInput } from "@/lib/validations/site-settings";

export async function saveSiteSettings(actorId: string, input: SiteSettingsInput): Promise<SiteSettingsInput> {
  return db.transaction(async (tx) => {
    const [before] = await tx.select().from(siteSettings).where(eq(siteSettings.id, 1)).for("update");
    const values = {
      notice: input.notice,
      submissionsPaused: input.submissionsPaused,
      pauseReason: input.submissionsPaused ? input.pauseReason : null,
      updatedById: actorId,
      updatedAt: new Date(),
    };
    await tx
      .insert(siteSettings)
      .values({ id: 1, ...values })
      .onConflictDoUpdate({ target: siteSettings.id, set: values });
    const from = before
      ? { notice: before.notice, submissionsPaused: before.submissionsPaused, pauseReason: before.pauseReason }
      : null;
    const to = { notice: values.notice, submissionsPaused: values.submissionsPaused, pauseReason: values.pauseReason };
    await tx
      .insert(auditEvents)
      .values({ actorId, action: "settings.edit", entityType: "site-settings", entityId: "1", data: { from, to } });
    return to;
  });
}
