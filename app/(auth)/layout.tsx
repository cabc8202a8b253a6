import { SiteShell } from "@/components/layout/site-shell";

export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <SiteShell>
      <div className="mx-auto max-w-md">{children}</div>
    </SiteShell>
  );
}
