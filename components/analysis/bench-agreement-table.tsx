// One bench's agreement in numbers: values compared, median |z|, the share with |z| > 3, and each figure's
// median z with how it runs (reads high, reads low, scatters) where it runs one way across several packs.
import type { BenchAgreementSummary } from "@/lib/analysis/agreement/bench-summary";
import { AGREEMENT_FIGURE_LABELS } from "@/lib/analysis/agreement/bench-summary";
import { fmt } from "@/lib/format";
import { tendencyLabels } from "@/lib/labels";

export function BenchAgreementTable({ summary }: { summary: BenchAgreementSummary }) {
  if (summary.resultsCompared === 0) return null;
  return (
    <div className="space-y-2">
      <dl className="grid grid-cols-3 gap-3 text-sm">
        <div>
          <dt className="muted">Values compared</dt>
          <dd className="num" data-testid="bench-compared">
            {summary.resultsCompared} on {summary.packsCompared} pack{summary.packsCompared === 1 ? "" : "s"}
          </dd>
        </div>
        <div>
          <dt className="muted">Median |z|</dt>
          <dd className="num">{fmt(summary.medianAbsZ, 1)}</dd>
        </div>
        <div>
          <dt className="muted">Share with |z| &gt; 3</dt>
          <dd className="num" data-testid="bench-far-share">
            {fmt((summary.shareAbsZOver3 ?? 0) * 100, 0)} %
          </dd>
        </div>
      </dl>
      <div className="overflow-x-auto">
        <table className="text-sm">
          <caption className="sr-only">Agreement by figure</caption>
          <thead>
            <tr>
              <th scope="col" className="pr-4 text-left">
                Figure
              </th>
              <th scope="col" className="pr-4 text-right">
                Packs compared
              </th>
              <th scope="col" className="pr-4 text-right">
                Median z
              </th>
              <th scope="col" className="text-left">
                Runs
              </th>
            </tr>
          </thead>
          <tbody>
            {summary.figures.map((f) => (
              <tr key={f.figure} data-testid={`bench-figure-${f.figure}`}>
                <th scope="row" className="pr-4 text-left font-normal">
                  {AGREEMENT_FIGURE_LABELS[f.figure]}
                </th>
                <td className="num pr-4 text-right">{f.compared}</td>
                <td className="num pr-4 text-right">{fmt(f.medianZ, 1)}</td>
                <td>{f.tendency ? tendencyLabels[f.tendency] : "no clear tendency"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
