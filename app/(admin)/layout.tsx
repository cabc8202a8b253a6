import Link from "next/link";
import { SiteShell } from "@/components/layout/site-shell";

// Admin pages check the session and role themselves (server/page-auth.ts); this frame reads nothing.
export default function AdminLayout({ children }: { children: React.ReactNode }) {
  return (
    <SiteShell>
      <nav
        aria-label="Admin"
        className="mb-6 flex flex-wrap gap-x-4 gap-y-1 border-b border-ink/10 pb-3 text-sm dark:border-night-line"
      >
        <Link href="/admin/users">Users and roles</Link>
        <Link href="/admin/catalogue">Catalogue</Link>
        <Link href="/admin/settings">Site settings</Link>
        <Link href="/admin/mail">Mail</Link>
        <Link href="/review">Review queue</Link>
      </nav>
      {children}
    </SiteShell>
  );
}
