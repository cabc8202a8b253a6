// Bench agreement for pages: the published rows are cached under the `benches` tag (a decision on a result measured
// with a bench profile, or a bench profile's edit, refreshes them), a bench's own page under bench:<id>;
// the comparison itself (lib/bench-agreement.ts) is pure arithmetic done per request.
import "server-only";
import { unstable_cache } from "next/cache";
import { getAgreementRow, getPublicBench, listAgreementRows } from "@/db/queries/bench-agreement";
import { benchAgreements, scoreNewResult, type BenchAgreement, type NewResultAgreement } from "@/lib/bench-agreement";
import { benchAgreementSummary } from "@/lib/analysis/agreement/bench-summary";
import { cacheTags as t, PUBLIC_REVALIDATE_S as revalidate } from "@/server/cache-tags";

const cachedRows = unstable_cache(listAgreementRows, ["bench-agreement-rows"], { tags: [t.benches], revalidate });

const EMPTY: BenchAgreement = { summary: benchAgreementSummary([]), scores: [] };

/** One bench's agreement (empty when none of its packs was tested by another bench in the same group). */
export async function agreementOfBench(benchId: number, rows?: Awaited<ReturnType<typeof listAgreementRows>>) {
  return benchAgreements(rows ?? (await cachedRows())).get(benchId) ?? EMPTY;
}

/** Public bench page: its facts and agreement; null when it has no published result. */
export function cachedPublicBench(id: number) {
  return unstable_cache(() => getPublicBench(id), ["public-bench", String(id)], {
    tags: [t.bench(id)],
    revalidate,
  })();
}

/** For moderators and contributors (never cached: the result may be waiting for review). */
export async function agreementOfResult(
  resultId: number,
): Promise<{ benchId: number; bench: BenchAgreement; result: NewResultAgreement[] } | null> {
  const candidate = await getAgreementRow(resultId);
  if (!candidate) return null;
  const rows = await listAgreementRows();
  return {
    benchId: candidate.benchId,
    bench: await agreementOfBench(candidate.benchId, rows),
    result: scoreNewResult(rows, candidate),
  };
}
