"use client";
import Link from "next/link";

// Rendered with status 403 (forbidden() from server/page-auth.ts) when a signed-in person opens a page their
// role does not allow. It appears inside the layout of the area they tried to open, which has the header. A client
// component so that pages carry it as a reference, not as markup (see not-found.tsx).
export default function Forbidden() {
  return (
    <div className="mx-auto max-w-lg space-y-3 py-8" data-testid="forbidden">
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
  );
}
