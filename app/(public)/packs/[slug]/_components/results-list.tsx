import { MethodLine } from "@/components/method-card";
import { Qty } from "@/components/quantity";
import { PACK_PAGE_MAX_RESULTS, shownOf } from "@/lib/bounded-lists";
import { fmt, fmtC, fmtDate, fmtRatio } from "@/lib/format";
import type { PublicResultRow } from "@/lib/pack-summary";

/**
 * The pack's published results, newest first, each with its method in one line (the full card is on its page): at most PACK_PAGE_MAX_RESULTS, so the page
 * keeps its size however often a pack is tested; the rest are a link away (the API and the download list them all).
 */
export function ResultsList({
  results,
  cells,
  packSlug,
}: {
  results: (PublicResultRow & { groupLabel: string })[];
  cells: number;
  packSlug: string;
}) {
  const sorted = [...results].sort((a, b) => (b.publishedAt ?? "").localeCompare(a.publishedAt ?? "") || b.id - a.id);
  const list = sorted.slice(0, PACK_PAGE_MAX_RESULTS);
  const cut = shownOf(list.length, sorted.length, "result");
  if (list.length === 0) return <p className="muted">No published results yet.</p>;
  return (
    <>
      {cut ? (
        <p className="muted text-sm" data-testid="pack-results-cut">
          {cut}, the newest first. Every result counts in the figures above; all {sorted.length} are in{" "}
          <a href={`/data/download/results.csv?pack=${encodeURIComponent(packSlug)}`}>the download (CSV)</a> and at{" "}
          <a href={`/api/v1/results?pack=${encodeURIComponent(packSlug)}`}>
            <code>/api/v1/results?pack={packSlug}</code>
          </a>
          .
        </p>
      ) : null}
      <ol className="space-y-3" data-testid="pack-results">
        {list.map((r) => (
          <li key={r.id} className="card space-y-2">
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <a href={`/results/${r.id}`} className="font-medium">
                Result #{r.id}
              </a>
              <span className="muted text-xs">
                published {fmtDate(r.publishedAt)}
                {r.openCase ? (
                  <span className="ml-2 rounded bg-warn-soft px-1.5 py-0.5 font-medium text-warn">being checked</span>
                ) : null}
              </span>
            </div>
            <p className="muted text-xs">{r.groupLabel}</p>
            <p className="num text-sm">
              {fmt(r.capacityMah, 0, "mAh")} delivered · capacity ratio {fmtRatio(r.capacityRatio)} · sustained{" "}
              {fmtC(r.sustainedCMeasured)} (measured) · sag-limited {fmtC(r.sagLimitedC)} (estimate) · DC{" "}
              <Qty q="r" v={r.dcResistanceMohm === null ? null : r.dcResistanceMohm / cells} digits={2} cells={cells} />
              {r.retention ? ` · ${r.retention.points.length} cycles in one log` : ""}
            </p>
            <MethodLine m={r} />
          </li>
        ))}
      </ol>
    </>
  );
}
