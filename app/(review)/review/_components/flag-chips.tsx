import { flagLabel } from "@/lib/flag-labels";

type Flag = { code: string; message: string };

/** Plausibility flags as short chips; the full explanation is in the title and on the review page. */
export function FlagChips({ flags }: { flags: Flag[] }) {
  if (flags.length === 0) return <span className="muted text-xs">No flags</span>;
  return (
    <ul className="flex flex-wrap gap-1" aria-label="Plausibility flags">
      {flags.map((f, i) => (
        <li
          key={`${f.code}-${i}`}
          title={f.message}
          className="rounded-full border border-charge-400/60 bg-charge-50 px-2 py-0.5 text-xs text-charge-700 dark:border-charge-400/40 dark:bg-charge-700/20 dark:text-charge-100"
        >
          {flagLabel(f.code)}
        </li>
      ))}
    </ul>
  );
}
