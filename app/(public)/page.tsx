import Link from "next/link";
import { fmt, fmtDate } from "@/lib/format";
import { cachedGroups, cachedMakerRanking, cachedNewestResults, cachedPacksInGroup } from "@/server/public-data";
import type { LabelCheckPoint } from "@/components/charts/label-check-chart";
import { METHODS_ANCHORS, methodsHref } from "@/lib/figure-words";
import { rankingVerdict } from "@/lib/maker-ranking";
import { HomeLabelCheck, type HomeGroup, type HomeRating } from "./_components/home-label-check-client";

// Static; revalidated by the `results`, `packs` and `group:<key>` tags when moderation changes a result.
export const revalidate = 3600;
/** Groups offered by the switcher: those with at least this many packs, most populated first. */
const MIN_PACKS_FOR_CHART = 3;

type PackRow = Awaited<ReturnType<typeof cachedPacksInGroup>>[number];
type RankRow = Awaited<ReturnType<typeof cachedMakerRanking>>[number];

function estimatePoints(packs: PackRow[]): LabelCheckPoint[] {
  return packs.flatMap((p) =>
    p.measuredC
      ? [
          {
            packSlug: p.packSlug,
            label: p.model,
            makerName: p.makerName,
            labelledC: p.labelledC,
            measuredC: Math.round(p.measuredC.median * 10) / 10,
            n: p.measuredC.n,
          },
        ]
      : [],
  );
}

function measuredPoints(packs: PackRow[]): LabelCheckPoint[] {
  return packs.flatMap((p) =>
    p.sustainedC
      ? [
          {
            packSlug: p.packSlug,
            label: p.model,
            makerName: p.makerName,
            labelledC: p.labelledC,
            measuredC: Math.round(p.sustainedC.value * 10) / 10,
            n: p.sustainedC.n,
          },
        ]
      : [],
  );
}

function ranked(rows: RankRow[]): HomeRating["ranking"] {
  const verdict = rankingVerdict(rows);
  return {
    leader: verdict.leader,
    verdict: verdict.words,
    makers: rows.map(({ makerSlug, makerName, medianLabelRatio, packs: n, results }, i) => ({
      makerSlug,
      makerName,
      medianLabelRatio,
      packs: n,
      results,
      interval: verdict.intervals[i]?.meets
        ? { lower: verdict.intervals[i].lower, upper: verdict.intervals[i].upper }
        : null,
    })),
  };
}

export default async function HomePage() {
  const [groups, newest] = await Promise.all([cachedGroups(), cachedNewestResults(8)]);
  const shown = groups.filter((g) => g.packCount >= MIN_PACKS_FOR_CHART).slice(0, 8);
  const homeGroups: HomeGroup[] = await Promise.all(
    shown.map(async (g) => {
      const [packs, byEstimate, byMeasured] = await Promise.all([
        cachedPacksInGroup(g.key),
        cachedMakerRanking(g.key, "estimate"),
        cachedMakerRanking(g.key, "measured"),
      ]);
      return {
        key: g.key,
        label: g.label,
        packCount: g.packCount,
        ratings: {
          measured: { points: measuredPoints(packs), ranking: ranked(byMeasured) },
          estimate: { points: estimatePoints(packs), ranking: ranked(byEstimate) },
        },
      };
    }),
  );
  return (
    <div className="space-y-10">
      <section className="space-y-4">
        <h1>What the label says, and what the bench measured</h1>
        <p className="muted max-w-3xl">
          Independent testers log discharges of lithium-polymer packs; Sagline computes the figures from their raw logs
          by published methods, moderators vet every result, and packs are compared only with results taken the same
          way.
        </p>
        <form action="/packs" method="get" role="search" className="flex max-w-xl gap-2">
          <label htmlFor="home-q" className="sr-only">
            Search packs by maker or model
          </label>
          <input
            id="home-q"
            name="q"
            type="search"
            placeholder="Search packs, e.g. ridge 1300"
            autoComplete="off"
            className="flex-1 rounded-md border border-ink/20 bg-paper-raised px-3 py-2 dark:border-night-line dark:bg-night-sunk"
          />
          <button
            type="submit"
            className="rounded-md bg-charge-500 px-4 py-2 font-medium text-night hover:bg-charge-400"
          >
            Search
          </button>
        </form>
      </section>

      <section aria-labelledby="label-check-h" className="space-y-3">
        <h2 id="label-check-h">Label check</h2>
        <p className="muted max-w-3xl text-sm">
          Each point is a pack: its labelled continuous C across, and up either the{" "}
          <strong>sag-limited C estimate</strong> from its DC resistance (an estimate, not a tested rate;{" "}
          <Link href={methodsHref(METHODS_ANCHORS.sagLimitedC)}>its assumptions</Link>) or the{" "}
          <strong>sustained C it was measured to hold</strong> (the current a qualifying run actually drew to its
          cut-off; <Link href={methodsHref(METHODS_ANCHORS.sustainedC)}>the rule</Link>). Below the dashed line a pack
          falls short of its label by the estimate; by the measured rating it has not shown its label, since a run holds
          only the rate it was tested at.
        </p>
        <HomeLabelCheck groups={homeGroups} />
      </section>

      <section aria-labelledby="newest-h" className="space-y-3">
        <h2 id="newest-h">Newest approved results</h2>
        <ul className="grid gap-2 sm:grid-cols-2" data-testid="newest-results">
          {newest.map((r) => (
            <li key={r.id} className="card space-y-1">
              <Link href={`/packs/${r.packSlug}`} className="font-medium">
                {r.makerName} {r.packModel}
              </Link>
              <p className="num text-sm">
                {fmt(r.capacityMah, 0, "mAh")} · sustained {fmt(r.sustainedCMeasured, 1, "C")} (measured) · sag-limited{" "}
                {fmt(r.sagLimitedC, 1, "C")} (estimate)
              </p>
              <p className="muted text-xs">
                <Link href={`/results/${r.id}`}>Result #{r.id}</Link> · {fmtDate(r.publishedAt)}
              </p>
            </li>
          ))}
        </ul>
        <p className="text-sm">
          <Link href="/packs">All packs →</Link>
        </p>
      </section>
    </div>
  );
}
