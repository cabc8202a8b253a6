import Link from "next/link";
import { SiteShell } from "@/components/layout/site-shell";

// Review pages check the session and role themselves (server/page-auth.ts); this frame reads nothing.
export default function ReviewLayout({ children }: { children: React.ReactNode }) {
  return (
    <SiteShell>
      <nav
        aria-label="Moderation"
        className="mb-6 flex flex-wrap gap-x-4 gap-y-1 border-b border-ink/10 pb-3 text-sm dark:border-night-line"
      >
        <Link href="/review">Review queue</Link>
        <Link href="/review/flags">Reader flags</Link>
        <Link href="/review/charts">Saved charts</Link>
      </nav>
      {children}
    </SiteShell>
  );
}
