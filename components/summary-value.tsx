import { fmt } from "@/lib/format";

type Summary = { median: number; n: number; min: number; max: number } | null;

/** A group figure: the median, with n and the spread (min–max) underneath. Missing shows as "—", never 0. */
export function SummaryValue({ s, digits = 1, unit = "" }: { s: Summary; digits?: number; unit?: string }) {
  if (!s)
    return (
      <span className="muted" title="no value in this group">
        —
      </span>
    );
  return (
    <span className="num whitespace-nowrap">
      {fmt(s.median, digits, unit)}
      <span className="muted block text-xs">n={s.n}</span>
      {/* The spread on a line of its own keeps wide tables narrow enough for a desktop screen. */}
      {s.n > 1 ? (
        <span className="muted block text-xs">
          {fmt(s.min, digits)}–{fmt(s.max, digits)}
        </span>
      ) : null}
    </span>
  );
}
