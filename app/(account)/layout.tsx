import Link from "next/link";
import { SiteShell } from "@/components/layout/site-shell";

// Signed-in pages: each page looks up the session itself (server/page-auth.ts); this frame reads nothing.
export default function AccountLayout({ children }: { children: React.ReactNode }) {
  return (
    <SiteShell>
      <nav
        aria-label="Account"
        className="mb-6 flex flex-wrap gap-x-4 gap-y-1 border-b border-ink/10 pb-3 text-sm dark:border-night-line"
      >
        <Link href="/account">Overview</Link>
        <Link href="/account/bench-profiles">Bench profiles</Link>
      </nav>
      {children}
    </SiteShell>
  );
}
