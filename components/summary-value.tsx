import type { MedianInterval } from "@/lib/analysis/uncertainty";
import { fmt } from "@/lib/format";
import type { Quantity } from "@/lib/units";
import { Qty } from "./quantity";

type Summary = { median: number; n: number; min: number; max: number } | null;

/** A group figure: the median, with n and the spread (min–max) underneath. Missing shows as "—", never 0. A
 * quantity the reader may see in other units (`q`) is marked up for conversion; `divide` turns a pack's
 * figure into a per-cell one (resistances are stored per pack, shown per cell by default). */
export function SummaryValue({
  s,
  digits = 1,
  unit = "",
  q,
  cells,
  divide = 1,
  interval,
}: {
  s: Summary;
  /** The median's 95 % interval (order statistics): shown instead of the spread when it reaches 95 %. */
  interval?: MedianInterval | null;
  digits?: number;
  unit?: string;
  q?: Quantity;
  cells?: number;
  divide?: number;
}) {
  if (!s)
    return (
      <span className="muted" title="no value in this group">
        —
      </span>
    );
  return (
    <span className="sv">
      {q ? <Qty q={q} v={s.median / divide} digits={digits} cells={cells} /> : fmt(s.median, digits, unit)}
      <small>n={s.n}</small>
      {/* The spread on a line of its own keeps wide tables narrow enough for a desktop screen. */}
      {interval?.meets ? (
        <small title={interval.words} data-testid="median-interval">
          95 %:{" "}
          {q ? (
            <>
              <Qty q={q} v={interval.lower / divide} digits={digits} cells={cells} bare />–
              <Qty q={q} v={interval.upper / divide} digits={digits} cells={cells} bare />
            </>
          ) : (
            <>
              {fmt(interval.lower, digits)}–{fmt(interval.upper, digits)}
            </>
          )}
        </small>
      ) : s.n > 1 ? (
        <small>
          {q ? (
            <>
              <Qty q={q} v={s.min / divide} digits={digits} cells={cells} bare />–
              <Qty q={q} v={s.max / divide} digits={digits} cells={cells} bare />
            </>
          ) : (
            <>
              {fmt(s.min, digits)}–{fmt(s.max, digits)}
            </>
          )}
        </small>
      ) : null}
    </span>
  );
}
