"use client";
// SLOT for the auth branch's <WatchButton packId=… />: public pages are static and never read cookies, so
// until it is wired this only sends readers to their account, where watches are managed.
export function WatchSlot({ packSlug, packTitle }: { packSlug: string; packTitle: string }) {
  return (
    <a href={`/account?watch=${encodeURIComponent(packSlug)}`} data-slot="watch-button"
      className="inline-flex items-center gap-1 rounded-md border border-ink/20 px-3 py-1.5 text-sm no-underline hover:bg-paper-sunk hover:no-underline dark:border-night-line dark:hover:bg-night-sunk"
      aria-label={`Watch ${packTitle} (sign in to get new results by e-mail)`}>
      <span aria-hidden="true">☆</span> Watch
    </a>
  );
}
