"use client";
// The packs whose new results the signed-in person is e-mailed about, each with a way to stop.
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Alert, buttonClass } from "@/components/ui/form";
import { stopPackEmails } from "@/app/actions/stop-pack-emails";

type PackRow = { packId: number; slug: string; title: string };

export function PackEmailsList({ packs }: { packs: PackRow[] }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState<string | null>(null);
  if (packs.length === 0) {
    return (
      <p className="muted">
        No e-mails about packs. Use “E-mail me new results for this pack” on a pack’s page to hear when a new result on
        it is published.
      </p>
    );
  }
  const stop = (packId: number) =>
    startTransition(async () => {
      const res = await stopPackEmails(null, { packId });
      if (res.ok) {
        setError(null);
        router.refresh();
      } else setError(res.error);
    });
  return (
    <div className="space-y-2">
      {error ? <Alert tone="error">{error}</Alert> : null}
      <ul
        className="divide-y divide-ink/10 rounded-lg border border-ink/10 bg-paper-raised dark:divide-night-line dark:border-night-line dark:bg-night-raised"
        data-testid="pack-emails-list"
      >
        {packs.map((p) => (
          <li key={p.packId} className="flex items-center justify-between gap-3 px-4 py-2">
            <Link href={`/packs/${p.slug}`}>{p.title}</Link>
            <button
              type="button"
              className={buttonClass("secondary", "shrink-0")}
              disabled={pending}
              onClick={() => stop(p.packId)}
              aria-label={`Stop e-mails about ${p.title}`}
            >
              Stop e-mails
            </button>
          </li>
        ))}
      </ul>
    </div>
  );
}
