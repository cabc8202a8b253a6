import type { Metadata } from "next";
import Link from "next/link";
import { env } from "@/server/env";

export const metadata: Metadata = { title: "Check your e-mail" };
export const dynamic = "force-dynamic"; // the local-tools hint depends on the running environment

export default function CheckEmailPage() {
  return (
    <div className="space-y-6">
      <div className="space-y-2">
        <h1>Check your e-mail</h1>
        <p>We have sent you a sign-in link. Open it on this device to sign in.</p>
      </div>
      <div className="card space-y-2 text-sm">
        <p>The link works once and for 24 hours.</p>
        <p className="muted">
          Nothing arrived after a few minutes? Look in your spam folder, check the address, or{" "}
          <Link href="/sign-in">ask for a new link</Link>.
        </p>
      </div>
      {env().SAGLINE_DEV_TOOLS ? (
        <p className="muted text-sm">
          Local development: mail is caught, not sent. Open <Link href="/dev/mail">the caught mail</Link> to click the
          link.
        </p>
      ) : null}
    </div>
  );
}
