import { SiteShell } from "@/components/layout/site-shell";

// Admin pages check the session and role themselves (lib/page-auth.ts); this frame reads nothing.
export default function AdminLayout({ children }: { children: React.ReactNode }) {
  return <SiteShell>{children}</SiteShell>;
}
