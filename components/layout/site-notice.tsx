// The admin's notice (/admin/settings) under the header of every page. Read through the tagged cache, so
// static pages show a change at once; a notice is never worth an error page, so a failed read shows none.
import { cachedSiteSettings } from "@/server/public-data";

export async function SiteNotice() {
  let notice: string | null = null;
  try {
    notice = (await cachedSiteSettings()).notice;
  } catch (err) {
    console.error("[site-notice] could not read the site settings:", err instanceof Error ? err.message : err);
  }
  if (!notice) return null;
  return (
    <div
      role="note"
      aria-label="Site notice"
      data-testid="site-notice"
      className="border-b border-charge-400/40 bg-charge-50 px-4 py-2 text-center text-sm text-charge-700 dark:border-charge-400/30 dark:bg-charge-700/20 dark:text-charge-100"
    >
      {notice}
    </div>
  );
}
