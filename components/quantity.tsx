// A figure the reader may see in other units (lib/units.ts): rendered in the defaults, marked up so the
// browser converts it (components/units/apply-units.ts). Hook-free, so it works inside static islands.
import { fmt } from "@/lib/format";
import { DEFAULT_UNITS, symbol, type Quantity } from "@/lib/units";

/** The value the browser converts from: six significant digits, far more than any figure shows (≤ 4), without
 * the float noise of a computed median ("2.1146943499999997"), which is sent for every figure of a page. */
export const unitValue = (v: number) => Number(v.toPrecision(6));

/** A value with its unit symbol ("23.4 °C"); the em dash when missing. `cells` for per-cell figures. */
export function Qty({
  q,
  v,
  digits,
  cells,
  bare = false,
}: {
  q: Quantity;
  v: number | null | undefined;
  digits: number;
  cells?: number;
  /** Only the number (the unit is said elsewhere, e.g. a range's second end). */
  bare?: boolean;
}) {
  if (v === null || v === undefined || !Number.isFinite(v)) return <>{fmt(null)}</>;
  const text = fmt(v, digits);
  return (
    <span data-u={q} data-v={unitValue(v)} data-s={cells} data-sym={bare ? undefined : ""}>
      {bare ? text : `${text} ${symbol(q, DEFAULT_UNITS, cells)}`}
    </span>
  );
}

/** Just the unit symbol, for headers and axis titles ("Weight, g" → "Weight, oz"). */
export function UnitSymbol({ q, cells }: { q: Quantity; cells?: number }) {
  return (
    <span data-usym={q} data-s={cells}>
      {symbol(q, DEFAULT_UNITS, cells)}
    </span>
  );
}
