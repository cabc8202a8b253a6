import { fmt } from "@/lib/format";

type Summary = { median: number; n: number; min: number; max: number } | null;

/** A group figure: the median, with n and the spread (min–max) underneath. Missing shows as "—", never 0. */
export function SummaryValue({ s, digits = 1, unit = "" }: { s: Summary; digits?: number; unit?: string }) {
  if (!s) return <span className="muted" title="no value in this group">—</span>;
  return (
    <span className="num whitespace-nowrap">
      {fmt(s.median, digits, unit)}
      <span className="muted block text-xs">
        n={s.n}{s.n > 1 ? ` · ${fmt(s.min, digits)}–${fmt(s.max, digits)}` : ""}
      </span>
    </span>
  );
}
