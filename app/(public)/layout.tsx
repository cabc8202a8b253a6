import { SiteShell } from "@/components/layout/site-shell";

// Static: the account menu in the header is a client component that asks /api/v1/me.
export default function PublicLayout({ children }: { children: React.ReactNode }) {
  return <SiteShell>{children}</SiteShell>;
}
