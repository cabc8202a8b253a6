// An admin can pause new submissions (/admin/settings). Read from the database itself, not a cache: a
// submission must never slip through a pause or be refused after it is lifted.
import "server-only";
import { getSiteSettings } from "@/db/queries/site-settings";
import { AppError } from "@/lib/errors";

export async function assertSubmissionsOpen(): Promise<void> {
  const s = await getSiteSettings();
  if (s.submissionsPaused) {
    throw new AppError(
      "conflict",
      `Submissions are paused: ${s.pauseReason ?? "please try again later"}. Your draft is kept in this browser; submit it once they reopen.`,
    );
  }
}
