"use client";
// SLOT for the reader-flag flow (another branch): until it is wired, this says how to report a problem.
export function FlagSlot({ resultId }: { resultId: number }) {
  return (
    <a href={`/results/${resultId}/flag`} data-slot="flag-button" rel="nofollow"
      className="inline-flex items-center gap-1 rounded-md border border-ink/20 px-3 py-1.5 text-sm no-underline hover:bg-paper-sunk hover:no-underline dark:border-night-line dark:hover:bg-night-sunk">
      <span aria-hidden="true">⚑</span> Flag a problem
    </a>
  );
}
