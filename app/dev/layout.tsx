import { notFound } from "next/navigation";
import { SiteShell } from "@/components/layout/site-shell";
import { env } from "@/server/env";

export const dynamic = "force-dynamic";

// Local tools only: switched on by SAGLINE_DEV_TOOLS=1 (the project's scripts), 404 everywhere else.
export default function DevLayout({ children }: { children: React.ReactNode }) {
  if (!env().SAGLINE_DEV_TOOLS) notFound();
  return (
    <SiteShell>
      <p className="mb-4 inline-block rounded bg-charge-100 px-2 py-0.5 text-xs font-medium text-charge-700 dark:bg-charge-700/30 dark:text-charge-100">
        Local development tool — not part of the public site
      </p>
      {children}
    </SiteShell>
  );
}
