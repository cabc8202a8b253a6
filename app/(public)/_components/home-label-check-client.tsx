"use client";
// The home page's label check with a group switcher and a rating switch (the measured sustained C, or the
// sag-limited C estimate). Every group's points and rankings are prepared on the server (a few kilobytes),
// so switching is instant and the page stays static. The maker list names a leader only where the median
// intervals say one maker is ahead; otherwise it says the makers are not distinguishable.
import { useState } from "react";
import { LabelCheckChart, type LabelCheckPoint } from "@/components/charts/label-check-chart";
import { LABEL_CHECK_WORDS, LABEL_RATIO_LABELS, RATING_LABELS, type RatingKind } from "@/lib/figure-words";

export type HomeRating = {
  points: LabelCheckPoint[];
  ranking: {
    leader: number | null;
    verdict: string;
    makers: {
      makerSlug: string;
      makerName: string;
      medianLabelRatio: number;
      packs: number;
      results: number;
      /** The 95 % interval of the maker's median (null below 6 packs). */
      interval: { lower: number; upper: number } | null;
    }[];
  };
};

export type HomeGroup = {
  key: string;
  label: string;
  packCount: number;
  ratings: Record<RatingKind, HomeRating>;
};

// The estimate first: inside one like-for-like group (one band of load rates) the measured rating mostly restates
// the rate the group was tested at, which the chart's notes say when it is shown.
const RATING_ORDER: RatingKind[] = ["estimate", "measured"];

export function HomeLabelCheck({ groups }: { groups: HomeGroup[] }) {
  const [key, setKey] = useState(groups[0]?.key ?? "");
  const [rating, setRating] = useState<RatingKind>("estimate");
  const group = groups.find((g) => g.key === key) ?? groups[0];
  if (!group) return <p className="muted">No published results yet.</p>;
  const shown = group.ratings[rating];
  const ranking = shown.ranking;
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-x-6 gap-y-2">
        <label className="flex flex-wrap items-center gap-2 text-sm">
          <span className="font-medium">Like-for-like group</span>
          <select
            value={group.key}
            onChange={(e) => setKey(e.target.value)}
            data-testid="group-switcher"
            className="max-w-full rounded-md border border-ink/20 bg-paper-raised px-2 py-1.5 dark:border-night-line dark:bg-night-sunk"
          >
            {groups.map((g) => (
              <option key={g.key} value={g.key}>
                {g.label} — {g.packCount} packs
              </option>
            ))}
          </select>
        </label>
        <fieldset className="flex flex-wrap items-center gap-3 text-sm" data-testid="rating-switch">
          <legend className="sr-only">Rating on the vertical axis</legend>
          <span className="font-medium" aria-hidden="true">
            Rating
          </span>
          {RATING_ORDER.map((r) => (
            <label key={r} className="flex items-center gap-1">
              <input type="radio" name="home-rating" value={r} checked={rating === r} onChange={() => setRating(r)} />
              {RATING_LABELS[r]}
            </label>
          ))}
        </fieldset>
      </div>
      <div className="grid gap-4 lg:grid-cols-[2fr_1fr]">
        <LabelCheckChart
          points={shown.points}
          groupLabel={group.label}
          rating={rating}
          title={LABEL_CHECK_WORDS[rating].title}
        />
        <section aria-labelledby="ranking-h" className="card space-y-2">
          <h3 id="ranking-h">Makers by median label ratio</h3>
          <p className="muted text-xs">
            {LABEL_RATIO_LABELS[rating]}. Median over each maker&apos;s packs (each pack counts once), in this group
            only; 1.00 means packs deliver their label.
          </p>
          <p className="text-xs" data-testid="ranking-verdict">
            {ranking.verdict}
          </p>
          <ul className="space-y-1 text-sm" data-testid="maker-ranking">
            {ranking.makers.map((m, i) => (
              <li key={m.makerSlug} className="grid grid-cols-[1fr_auto] items-baseline gap-2">
                <span>
                  {m.makerName}
                  {ranking.leader === i ? (
                    <span className="ml-1 rounded bg-cell-100 px-1 text-xs font-medium text-cell-700 dark:bg-cell-700/40 dark:text-cell-100">
                      ahead
                    </span>
                  ) : null}{" "}
                  <span className="muted text-xs">
                    ({m.packs} pack{m.packs === 1 ? "" : "s"}, {m.results} result{m.results === 1 ? "" : "s"}
                    {m.interval ? `; 95 % interval ${m.interval.lower.toFixed(2)}–${m.interval.upper.toFixed(2)}` : ""})
                  </span>
                </span>
                <span className="num">{m.medianLabelRatio.toFixed(2)}</span>
                <span
                  aria-hidden="true"
                  className="col-span-2 -mt-0.5 block h-1.5 rounded bg-paper-sunk dark:bg-night-sunk"
                >
                  <span
                    className={`block h-1.5 rounded ${m.medianLabelRatio < 1 ? "bg-[#D55E00]" : "bg-[#0072B2]"}`}
                    style={{ width: `${Math.min(100, m.medianLabelRatio * 50)}%` }}
                  />
                </span>
              </li>
            ))}
          </ul>
          {ranking.makers.length === 0 ? <p className="muted text-sm">No label ratios in this group yet.</p> : null}
        </section>
      </div>
    </div>
  );
}
