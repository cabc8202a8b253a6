import { fmt, fmtDate } from "@/lib/format";
import { METHODS_ANCHORS, methodsHref } from "@/lib/figure-words";
import { cachedGroups, cachedNewestResults } from "@/server/public-data";
import { GroupSwitcher } from "./_components/group-switcher-client";
import { HomeLabelCheck } from "./_components/home-label-check";
import { StaticIsland } from "@/components/static-island";

// Static; revalidated by the `groups`, `newest` and `group:<key>` tags when moderation changes a result. Its size
// does not grow with the data: the label check draws at most HOME_LABEL_CHECK_MAX_PACKS packs (lib/bounded-lists.ts).
export const revalidate = 3600;
/** Groups offered by the switcher: those with at least this many packs, most populated first. */
const MIN_PACKS_FOR_CHART = 3;

export default async function HomePage() {
  const [groups, newest] = await Promise.all([cachedGroups(), cachedNewestResults(8)]);
  const shown = groups.filter((g) => g.packCount >= MIN_PACKS_FOR_CHART).slice(0, 8);
  const first = shown[0];
  const chart = first ? await HomeLabelCheck({ group: first }) : null;
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
            placeholder="Search packs, e.g. ridge 1800"
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
          <a href={methodsHref(METHODS_ANCHORS.sagLimitedC)}>its assumptions</a>) or the{" "}
          <strong>sustained C it was measured to hold</strong> (the current a qualifying run actually drew to its
          cut-off; <a href={methodsHref(METHODS_ANCHORS.sustainedC)}>the rule</a>). Below the dashed line a pack falls
          short of its label by the estimate; by the measured rating it has not shown its label, since a run holds only
          the rate it was tested at.
        </p>
        {first && chart ? (
          <div className="space-y-4">
            <GroupSwitcher
              groups={shown.map(({ key, label, packCount }) => ({ key, label, packCount }))}
              target="home-lc"
            />
            <StaticIsland id="home-lc">{chart}</StaticIsland>
          </div>
        ) : (
          <p className="muted">No published results yet.</p>
        )}
      </section>

      <section aria-labelledby="newest-h" className="space-y-3">
        <h2 id="newest-h">Newest approved results</h2>
        <StaticIsland id="newest">
          <ul className="grid gap-2 sm:grid-cols-2" data-testid="newest-results">
            {newest.map((r) => (
              <li key={r.id} className="card space-y-1">
                <a href={`/packs/${r.packSlug}`} className="font-medium">
                  {r.makerName} {r.packModel}
                </a>
                <p className="num text-sm">
                  {fmt(r.capacityMah, 0, "mAh")} · sustained {fmt(r.sustainedCMeasured, 1, "C")} (measured) ·
                  sag-limited {fmt(r.sagLimitedC, 1, "C")} (estimate)
                </p>
                <p className="muted text-xs">
                  <a href={`/results/${r.id}`}>Result #{r.id}</a> · {fmtDate(r.publishedAt)}
                </p>
              </li>
            ))}
          </ul>
        </StaticIsland>
        <p className="text-sm">
          <a href="/packs">All packs →</a>
        </p>
      </section>
    </div>
  );
}
