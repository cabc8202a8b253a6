import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { env } from "@/server/env";
import { listCaughtMail } from "@/server/mail/catcher";

export const metadata: Metadata = { title: "Caught mail", robots: { index: false } };
export const dynamic = "force-dynamic";

const time = (iso: string) => new Date(iso).toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "medium" });

export default async function DevMailPage() {
  // Checked here as well as in the layout: a page must never render its data on the layout's word alone.
  if (!env().SAGLINE_DEV_TOOLS) notFound();
  const messages = await listCaughtMail();
  return (
    <div className="space-y-4">
      <div className="space-y-1">
        <h1>Caught mail</h1>
        <p className="muted">
          Every e-mail the app sends locally lands in the mail catcher (
          <code className="num">{env().MAIL_CATCHER_DIR}</code>), newest first. Open a sign-in e-mail and click its link
          to sign in.
        </p>
      </div>
      {messages.length === 0 ? (
        <p className="card muted">
          No mail caught yet. Ask for a sign-in link on the <Link href="/sign-in">sign-in page</Link>.
        </p>
      ) : (
        <ul
          className="divide-y divide-ink/10 rounded-lg border border-ink/10 bg-paper-raised dark:divide-night-line dark:border-night-line dark:bg-night-raised"
          data-testid="caught-mail"
        >
          {messages.map((m) => (
            <li key={m.id}>
              <Link
                href={`/dev/mail/${m.id}`}
                className="grid gap-x-4 px-4 py-2 no-underline hover:bg-paper-sunk hover:no-underline sm:grid-cols-[1fr_2fr_auto] dark:hover:bg-night-sunk"
              >
                <span className="truncate text-ink dark:text-paper">{m.to.join(", ")}</span>
                <span className="truncate font-medium">{m.subject || "(no subject)"}</span>
                <span className="num muted text-sm">{time(m.receivedAt)}</span>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
