"use client";
// The pack page's new-result e-mails control. Pack pages are static and never read cookies, so this asks
// /api/v1/me whether someone is signed in and already gets these e-mails: signed in, it is the toggle (a
// server action checks the session again); signed out or before the answer, a link to sign in and come back.
import { useEffect, useState } from "react";
import { PackEmailsToggle } from "./pack-emails-toggle-client";

type Me = { signedIn: false } | { signedIn: true; on: boolean };

export function PackEmailsSlot({
  packId,
  packSlug,
  packTitle,
}: {
  packId: number;
  packSlug: string;
  packTitle: string;
}) {
  const [me, setMe] = useState<Me | null>(null);
  useEffect(() => {
    let live = true;
    fetch(`/api/v1/me?packEmails=${packId}`, { cache: "no-store", credentials: "same-origin" })
      .then((r) => (r.ok ? (r.json() as Promise<{ user: unknown; packEmails?: boolean }>) : null))
      .then((body) => {
        if (!live || !body) return;
        setMe(body.user ? { signedIn: true, on: body.packEmails === true } : { signedIn: false });
      })
      .catch(() => undefined); // offline or the API down: the sign-in link stays, which still works
    return () => {
      live = false;
    };
  }, [packId]);

  if (me?.signedIn) return <PackEmailsToggle packId={packId} initialOn={me.on} />;
  return (
    <a
      href={`/sign-in?${new URLSearchParams({ callbackUrl: `/packs/${packSlug}` })}`}
      data-slot="pack-emails"
      className="btn-line"
      aria-label={`E-mail me new results for ${packTitle}: sign in first`}
    >
      E-mail me new results for this pack
    </a>
  );
}
