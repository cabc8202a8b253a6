// The site settings row (one row, id 1); the defaults when an admin never saved any.
import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { siteSettings } from "@/db/schema";

export type SiteSettings = {
  notice: string | null;
  submissionsPaused: boolean;
  pauseReason: string | null;
  updatedAt: string | null;
};

const DEFAULT_SITE_SETTINGS: SiteSettings = {
  notice: null,
  submissionsPaused: false,
  pauseReason: null,
  updatedAt: null,
};

export async function getSiteSettings(): Promise<SiteSettings> {
  const [row] = await db.select().from(siteSettings).where(eq(siteSettings.id, 1));
  if (!row) return DEFAULT_SITE_SETTINGS;
  return {
    notice: row.notice,
    submissionsPaused: row.submissionsPaused,
    pauseReason: row.pauseReason,
    updatedAt: row.updatedAt.toISOString(),
  };
}
