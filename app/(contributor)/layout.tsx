import { SiteShell } from "@/components/layout/site-shell";

// Contributor pages (submitting and resubmitting results): each page checks the session itself.
export default function ContributorLayout({ children }: { children: React.ReactNode }) {
  return <SiteShell>{children}</SiteShell>;
}
