"use client";
// The home page's label check with a group switcher. Every group's points are prepared on the server
// (a few kilobytes), so switching is instant and the page stays static.
import { useState } from "react";
import { LabelCheckChart, type LabelCheckPoint } from "@/components/charts/label-check-chart";

export type HomeGroup = {
  key: string;
  label: string;
  packCount: number;
  points: LabelCheckPoint[];
  ranking: { makerSlug: string; makerName: string; medianLabelRatio: number; packs: number; results: number }[];
};

export function HomeLabelCheck({ groups }: { groups: HomeGroup[] }) {
  const [key, setKey] = useState(groups[0]?.key ?? "");
  const group = groups.find((g) => g.key === key) ?? groups[0];
  if (!group) return <p className="muted">No published results yet.</p>;
  return (
    <div className="space-y-4">
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
      <div className="grid gap-4 lg:grid-cols-[2fr_1fr]">
        <LabelCheckChart
          points={group.points}
          groupLabel={group.label}
          title="Label check: labelled C against measured C"
        />
        <section aria-labelledby="ranking-h" className="card space-y-2">
          <h3 id="ranking-h">Makers by median label ratio</h3>
          <p className="muted text-xs">
            Median of each maker&apos;s packs (each pack&apos;s own median counts once), in this group only. 1.00 means
            packs deliver their label.
          </p>
          <ol className="space-y-1 text-sm" data-testid="maker-ranking">
            {group.ranking.map((m, i) => (
              <li key={m.makerSlug} className="grid grid-cols-[1.5rem_1fr_auto] items-baseline gap-2">
                <span className="num muted">{i + 1}</span>
                <span>
                  {m.makerName}{" "}
                  <span className="muted text-xs">
                    ({m.packs} pack{m.packs === 1 ? "" : "s"}, {m.results} result{m.results === 1 ? "" : "s"})
                  </span>
                </span>
                <span className="num">{m.medianLabelRatio.toFixed(2)}</span>
                <span
                  aria-hidden="true"
                  className="col-span-3 col-start-2 -mt-0.5 block h-1.5 rounded bg-paper-sunk dark:bg-night-sunk"
                >
                  <span
                    className={`block h-1.5 rounded ${m.medianLabelRatio < 1 ? "bg-[#D55E00]" : "bg-[#0072B2]"}`}
                    style={{ width: `${Math.min(100, m.medianLabelRatio * 50)}%` }}
                  />
                </span>
              </li>
            ))}
          </ol>
          {group.ranking.length === 0 ? <p className="muted text-sm">No label ratios in this group yet.</p> : null}
        </section>
      </div>
    </div>
  );
}
