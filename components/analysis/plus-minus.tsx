// "19.3 ± 0.6 mΩ": a figure with its expanded uncertainty (k = 2, about 95 %), rounded the GUM's way
// (formatPlusMinus), with the plain words in a `title`. Without a U95 the figure shows as before.
import { formatPlusMinus } from "@/lib/analysis/uncertainty";
import { fmt } from "@/lib/format";

export const PLUS_MINUS_WORDS =
  "The ± is the expanded uncertainty (k = 2): the true value very likely (about 95 %) lies within it, given the bench's instrument accuracy as stated or assumed. An estimate, not a measurement.";

export function PlusMinus(props: {
  value: number | null | undefined;
  u95?: number | null;
  digits: number;
  unit?: string;
}) {
  const unit = props.unit ?? "";
  const pm =
    props.value !== null && props.value !== undefined && props.u95 !== null && props.u95 !== undefined
      ? formatPlusMinus(props.value, props.u95)
      : null;
  if (!pm) return <>{fmt(props.value, props.digits, unit)}</>;
  const text = unit === "C" ? `${pm.value} ± ${pm.U}C` : `${pm.value} ± ${pm.U}${unit ? ` ${unit}` : ""}`;
  return (
    <span title={`${text}. ${PLUS_MINUS_WORDS}`} data-testid="plus-minus">
      {text}
    </span>
  );
}
