// Capacity kept over the cycles of ONE log (one physical pack): the points, the fitted line and the
// projection to 80 % only as far as the data supports it, with the note that says which case applies.
import type { RetentionSeries } from "@/lib/analysis";
import { fmt } from "@/lib/format";

export function retentionWords(r: RetentionSeries): string {
  const first = r.points[0];
  const last = r.points[r.points.length - 1];
  const span = first && last ? `cycles ${first.cycle}–${last.cycle} of this log` : "this log";
  const of = r.reference === "rated" ? "rated capacity" : "the first cycle's capacity";
  const slope = r.trend ? `; fitted line ${fmt(r.trend.slopePerCycle * 100, 3)} % of ${of} per cycle` : "";
  const to80 =
    r.cyclesTo80 !== null
      ? ` — 80 % at about cycle ${fmt(r.cyclesTo80, 0)}${r.extrapolated ? " (projected past the cycles measured)" : ""}`
      : "";
  return `${r.points.length} discharges to the cut-off over ${span}${slope}${to80}. ${r.projectionNote}`;
}

export function RetentionSummary({ retention }: { retention: RetentionSeries | null | undefined }) {
  if (!retention) return null;
  return (
    <details className="text-sm" data-testid="retention">
      <summary className="cursor-pointer">
        Capacity kept over the cycles of this log ({retention.points.length} cycles)
      </summary>
      <div className="space-y-2 pt-2">
        <p>{retentionWords(retention)}</p>
        <table className="num text-sm">
          <caption className="sr-only">Capacity kept per cycle of this log</caption>
          <thead>
            <tr>
              <th scope="col" className="pr-4 text-left font-sans font-medium">
                Cycle
              </th>
              <th scope="col" className="pr-4 text-right font-sans font-medium">
                Capacity
              </th>
              <th scope="col" className="text-right font-sans font-medium">
                Kept ({retention.reference === "rated" ? "of rated" : "of cycle 1"})
              </th>
            </tr>
          </thead>
          <tbody>
            {retention.points.map((p) => (
              <tr key={p.cycle}>
                <td className="pr-4">{p.cycle}</td>
                <td className="pr-4 text-right">{fmt(p.capacityMah, 0, "mAh")}</td>
                <td className="text-right">{fmt(p.retained * 100, 1, "%")}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </details>
  );
}
