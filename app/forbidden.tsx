import Link from "next/link";
import { SiteShell } from "@/components/layout/site-shell";

// Rendered with status 403 when a signed-in person opens a page their role does not allow.
export default function Forbidden() {
  return (
    <SiteShell>
      <div className="mx-auto max-w-lg space-y-3 py-8">
        <p className="num muted text-sm">403 · forbidden</p>
        <h1>This page is not open to your role</h1>
        <p className="muted">
          You are signed in, but your account’s role does not include this area. If you think it should, ask one of the
          site’s admins.
        </p>
        <p>
          <Link href="/account">Go to your account</Link> · <Link href="/">Home</Link>
        </p>
      </div>
    </SiteShell>
  );
}
