// The instrument accuracy a result's ± rests on: the bench profile's statement, with every value Sagline had to
// assume named as such (from memory of common instruments, not a maker's specification).
import type { ResolvedAccuracy } from "@/lib/analysis/uncertainty";
import { METHODS_ANCHORS, methodsHref } from "@/lib/figure-words";

export function AccuracyCard({
  resolved,
  benchProfileId,
  linkBench = false,
}: {
  resolved: ResolvedAccuracy;
  benchProfileId: number | null;
  /** On a result page: link the bench's public page (its agreement with other benches). */
  linkBench?: boolean;
}) {
  return (
    <section aria-labelledby="accuracy-h" className="card space-y-2" data-testid="accuracy">
      <h2 id="accuracy-h">Instrument accuracy</h2>
      {linkBench && benchProfileId !== null ? (
        <p className="text-sm">
          Tested on <a href={`/benches/${benchProfileId}`}>bench #{benchProfileId}</a>: how its figures agree with other
          benches on the same packs.
        </p>
      ) : null}
      <ul className="num space-y-1 text-sm">
        {resolved.summary.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
      {resolved.assumptions.length > 0 ? (
        <div className="text-sm" data-testid="accuracy-assumptions">
          <p className="font-medium">
            {benchProfileId === null
              ? "No bench profile states its accuracy, so every value above is assumed:"
              : "Assumed where the bench profile states nothing:"}
          </p>
          <ul className="list-disc space-y-1 pl-5">
            {resolved.assumptions.map((a) => (
              <li key={a.field}>{a.words}</li>
            ))}
          </ul>
          <p className="muted text-xs">
            Assumed, from common instruments — from memory: {resolved.assumptions[0]?.source}.
          </p>
        </div>
      ) : (
        <p className="muted text-sm">Every value stated by the tester&apos;s bench profile.</p>
      )}
      <p className="muted text-xs">
        The ± beside each figure is the expanded uncertainty (k = 2, about 95 %) from these accuracies, by the GUM (JCGM
        100:2008). <a href={methodsHref(METHODS_ANCHORS.uncertainty)}>How the ± is worked out</a>.
      </p>
    </section>
  );
}
