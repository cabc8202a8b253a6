"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Alert, buttonClass } from "@/components/ui/form";
import { unwatchPack } from "@/app/actions/unwatch-pack";

type Watched = { packId: number; slug: string; title: string };

export function WatchList({ watches }: { watches: Watched[] }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState<string | null>(null);
  if (watches.length === 0) {
    return (
      <p className="muted">
        You are not watching any packs. Use “Watch” on a pack’s page to get an e-mail when a new result on it is
        published.
      </p>
    );
  }
  const unwatch = (packId: number) =>
    startTransition(async () => {
      const res = await unwatchPack(null, { packId });
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
        data-testid="watch-list"
      >
        {watches.map((w) => (
          <li key={w.packId} className="flex items-center justify-between gap-3 px-4 py-2">
            <Link href={`/packs/${w.slug}`}>{w.title}</Link>
            <button
              type="button"
              className={buttonClass("secondary", "shrink-0")}
              disabled={pending}
              onClick={() => unwatch(w.packId)}
            >
              Unwatch
            </button>
          </li>
        ))}
      </ul>
    </div>
  );
}
