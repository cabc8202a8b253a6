// Beside a result under review: how its figures sit against the other benches that tested the same pack in the
// same group (z against the ISO 13528 Algorithm A consensus; a warning where |z| > 3), and how its bench agrees
// overall. Nothing here decides anything: it is a reason to look closer.
import Link from "next/link";
import { BenchAgreementTable } from "@/components/analysis/bench-agreement-table";
import { AGREEMENT_FIGURE_LABELS } from "@/lib/analysis/agreement/bench-summary";
import { fmt } from "@/lib/format";
import { agreementOfResult } from "@/server/bench-agreement";

export async function BenchAgreementSection({ resultId }: { resultId: number }) {
  const a = await agreementOfResult(resultId);
  return (
    <section className="card space-y-3" aria-labelledby="agreement-h" data-testid="review-agreement">
      <h2 id="agreement-h">Agreement with other benches</h2>
      {a === null ? (
        <p className="muted text-sm">Tested without a bench profile, so it is not compared with other benches.</p>
      ) : (
        <>
          {a.result.some((s) => s.flag) ? (
            <ul className="space-y-1 text-sm" data-testid="agreement-warnings">
              {a.result.flatMap((s) =>
                s.flag
                  ? [
                      <li key={s.figure} className="rounded-md border border-warn/40 bg-warn-soft px-3 py-2 text-warn">
                        Far from other benches: {s.flag.label}
                      </li>,
                    ]
                  : [],
              )}
            </ul>
          ) : null}
          <p className="text-sm">
            {a.result.length === 0
              ? "No other bench has a published result on this pack in this group yet."
              : a.result
                  .map((s) =>
                    s.z === null
                      ? `${AGREEMENT_FIGURE_LABELS[s.figure]}: no z (${s.benches} benches; z needs three)`
                      : `${AGREEMENT_FIGURE_LABELS[s.figure]} z ${fmt(s.z, 1)}`,
                  )
                  .join(" · ")}
          </p>
          <h3 className="text-sm font-semibold">
            Its bench, <Link href={`/benches/${a.benchId}`}>bench #{a.benchId}</Link>, over its published results
          </h3>
          <p className="text-sm">{a.bench.summary.words}</p>
          <BenchAgreementTable summary={a.bench.summary} />
        </>
      )}
    </section>
  );
}
