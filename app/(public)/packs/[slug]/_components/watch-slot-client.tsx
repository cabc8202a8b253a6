"use client";
// The pack page's Watch control. Pack pages are static and never read cookies, so this asks /api/v1/me
// whether someone is signed in and already watches the pack: signed in, it is the WatchButton (a server
// action checks the session again); signed out or before the answer, a link to sign in and come back.
import { useEffect, useState } from "react";
import { WatchButton } from "./watch-button-client";

type Me = { signedIn: false } | { signedIn: true; watching: boolean };

export function WatchSlot({ packId, packSlug, packTitle }: { packId: number; packSlug: string; packTitle: string }) {
  const [me, setMe] = useState<Me | null>(null);
  useEffect(() => {
    let live = true;
    fetch(`/api/v1/me?watching=${packId}`, { cache: "no-store", credentials: "same-origin" })
      .then((r) => (r.ok ? (r.json() as Promise<{ user: unknown; watching?: boolean }>) : null))
      .then((body) => {
        if (!live || !body) return;
        setMe(body.user ? { signedIn: true, watching: body.watching === true } : { signedIn: false });
      })
      .catch(() => undefined); // offline or the API down: the sign-in link stays, which still works
    return () => {
      live = false;
    };
  }, [packId]);

  if (me?.signedIn) return <WatchButton packId={packId} initialWatching={me.watching} />;
  return (
    <a
      href={`/sign-in?${new URLSearchParams({ callbackUrl: `/packs/${packSlug}` })}`}
      data-slot="watch-button"
      className="inline-flex items-center gap-1 rounded-md border border-ink/20 px-3 py-1.5 text-sm no-underline hover:bg-paper-sunk hover:no-underline dark:border-night-line dark:hover:bg-night-sunk"
      aria-label={`Watch ${packTitle}: sign in to get an e-mail when a new result is published`}
    >
      <span aria-hidden="true">☆</span> Watch
    </a>
  );
}
