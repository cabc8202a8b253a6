import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { z } from "zod";
import { AccuracyCard } from "@/components/analysis/accuracy-card";
import { BenchAgreementTable } from "@/components/analysis/bench-agreement-table";
import { resolveAccuracy } from "@/lib/analysis/uncertainty";
import { statedAccuracyOf } from "@/lib/bench-accuracy";
import { METHODS_ANCHORS, methodsHref } from "@/lib/figure-words";
import { fmtDate } from "@/lib/format";
import { resistanceMethodLabels } from "@/lib/labels";
import { recordId } from "@/lib/validations/ids";
import { agreementOfBench, cachedPublicBench } from "@/server/bench-agreement";

// A bench profile's public page: what it states about its instruments and how its published figures agree with
// other benches' on the same packs (ISO 13528 Algorithm A, z). Public only through published results.
export const revalidate = 3600;
export async function generateStaticParams() {
  return [];
}

const params = z.object({ id: recordId });
type Props = { params: Promise<{ id: string }> };

export async function generateMetadata(props: Props): Promise<Metadata> {
  const parsed = params.safeParse(await props.params);
  return parsed.success ? { title: `Bench #${parsed.data.id}` } : {};
}

export default async function BenchPage(props: Props) {
  const parsed = params.safeParse(await props.params);
  if (!parsed.success) notFound();
  const bench = await cachedPublicBench(parsed.data.id);
  if (!bench) notFound();
  const agreement = await agreementOfBench(bench.id);
  const resolved = resolveAccuracy(statedAccuracyOf(bench, bench.resistanceMethod));
  return (
    <article className="space-y-8">
      <header className="space-y-2">
        <h1>Bench #{bench.id}</h1>
        <p className="text-sm">
          Tester: <strong>{bench.contributor}</strong> · {bench.publishedResults} published result
          {bench.publishedResults === 1 ? "" : "s"}
        </p>
        <p className="muted text-sm">
          Load: {bench.loadEquipment} · resistance: {resistanceMethodLabels[bench.resistanceMethod]}
          {bench.calibratedOn ? ` · last calibrated ${fmtDate(bench.calibratedOn)} (as the tester states)` : ""}
        </p>
      </header>

      <section aria-labelledby="agreement-h" className="card space-y-3" data-testid="bench-agreement">
        <h2 id="agreement-h">How it agrees with other benches</h2>
        <p data-testid="bench-agreement-words">{agreement.summary.words}</p>
        <BenchAgreementTable summary={agreement.summary} />
        {agreement.summary.suggestions.length > 0 ? (
          <div className="text-sm" data-testid="bench-suggestions">
            <p className="font-medium">Suggestions</p>
            <ul className="list-disc space-y-1 pl-5">
              {agreement.summary.suggestions.map((s) => (
                <li key={`${s.figure}-${s.tendency}`}>{s.words}</li>
              ))}
            </ul>
            <p className="muted text-xs">
              Suggestions only: follow the instruments&apos; makers&apos; instructions when checking or calibrating
              them.
            </p>
          </div>
        ) : null}
        <p className="muted text-xs">
          Where a pack was tested by several benches in one like-for-like group, the benches&apos; values are combined
          into a robust consensus (ISO 13528:2015 Algorithm A) and each bench gets a z-score: how many robust standard
          deviations it lies from the consensus. |z| above 3 is far. These figures compare benches under stated
          conditions; they certify nothing about a bench or a pack.{" "}
          <a href={methodsHref(METHODS_ANCHORS.uncertaintyAgreement)}>How agreement is worked out</a>.
        </p>
      </section>

      <AccuracyCard resolved={resolved} benchProfileId={bench.id} />
    </article>
  );
}
