"use client";
// The chart builder: choose, preview (the server-drawn SVG), then go to the permalink that carries the state.
import { useRouter, useSearchParams } from "next/navigation";
import { useDeferredValue, useMemo, useState } from "react";
import { RATING_LABELS } from "@/lib/figure-words";
import {
  CHART_KINDS,
  CHART_KIND_LABELS,
  CHART_RATINGS,
  chartState,
  decodeChartState,
  encodeChartState,
  statePath,
  type ChartKind,
  type ChartRating,
} from "@/lib/open-data/chart-state";

type Group = { key: string; label: string; resultCount: number; packCount: number };
type Maker = { slug: string; name: string };

const input =
  "mt-1 block w-full rounded border border-ink/20 bg-paper-raised px-2 py-1 dark:border-night-line dark:bg-night-raised";
const defaultTitle: Record<ChartKind, string> = {
  "label-check": "Labelled C against the rating",
  curves: "Discharge curves compared",
  "maker-ranking": "How close makers come to their labels",
};

export function ChartBuilder({ groups, makers }: { groups: Group[]; makers: Maker[] }) {
  const router = useRouter();
  const from = decodeChartState(useSearchParams().get("from") ?? "");
  const [kind, setKind] = useState<ChartKind>(from?.kind ?? "label-check");
  const [group, setGroup] = useState(from?.group ?? groups[0]?.key ?? "");
  const [maker, setMaker] = useState(from?.maker ?? "");
  const [cells, setCells] = useState(from?.cells ? String(from.cells) : "");
  const [title, setTitle] = useState(from?.title ?? "");
  const [note, setNote] = useState(from?.note ?? "");
  // A chart copied from an older permalink keeps the estimate it drew (a state without a rating means it).
  const [rating, setRating] = useState<ChartRating>(from?.rating ?? "estimate");
  const rated = kind === "label-check" || kind === "maker-ranking";

  const parsed = useMemo(
    () =>
      chartState.safeParse({
        v: 1,
        kind,
        group,
        maker: maker || undefined,
        cells: cells ? Number(cells) : undefined,
        rating: rated ? rating : undefined,
        title: title.trim() || defaultTitle[kind],
        note: note.trim() || undefined,
      }),
    [kind, group, maker, cells, rated, rating, title, note],
  );
  const encoded = parsed.success ? encodeChartState(parsed.data) : null;
  const preview = useDeferredValue(encoded);
  const errors = parsed.success ? [] : parsed.error.issues.map((i) => i.message);

  return (
    <div className="grid gap-6 lg:grid-cols-[22rem_1fr]">
      <form
        className="card space-y-3"
        onSubmit={(e) => {
          e.preventDefault();
          if (encoded) router.push(`/charts/view/${statePath(encoded)}`);
        }}
      >
        <fieldset className="space-y-1">
          <legend className="text-sm font-medium">Chart</legend>
          {CHART_KINDS.map((k) => (
            <label key={k} className="flex items-start gap-2 text-sm">
              <input
                type="radio"
                name="kind"
                value={k}
                checked={kind === k}
                onChange={() => setKind(k)}
                className="mt-1"
              />
              <span>{CHART_KIND_LABELS[k]}</span>
            </label>
          ))}
        </fieldset>
        {rated ? (
          <fieldset className="space-y-1" data-testid="chart-rating">
            <legend className="text-sm font-medium">Rating</legend>
            {CHART_RATINGS.map((r) => (
              <label key={r} className="flex items-start gap-2 text-sm">
                <input
                  type="radio"
                  name="rating"
                  value={r}
                  checked={rating === r}
                  onChange={() => setRating(r)}
                  className="mt-1"
                />
                <span>{RATING_LABELS[r]}</span>
              </label>
            ))}
          </fieldset>
        ) : null}
        <label className="block text-sm">
          Like-for-like group
          <select name="group" value={group} onChange={(e) => setGroup(e.target.value)} className={input}>
            {groups.map((g) => (
              <option key={g.key} value={g.key}>
                {g.label} ({g.packCount} packs, {g.resultCount} results)
              </option>
            ))}
          </select>
        </label>
        <div className="grid grid-cols-2 gap-3">
          <label className="block text-sm">
            Maker
            <select name="maker" value={maker} onChange={(e) => setMaker(e.target.value)} className={input}>
              <option value="">Any maker</option>
              {makers.map((m) => (
                <option key={m.slug} value={m.slug}>
                  {m.name}
                </option>
              ))}
            </select>
          </label>
          <label className="block text-sm">
            Cells (S)
            <select name="cells" value={cells} onChange={(e) => setCells(e.target.value)} className={input}>
              <option value="">Any</option>
              {[1, 2, 3, 4, 5, 6, 8, 10, 12].map((c) => (
                <option key={c} value={c}>
                  {c}S
                </option>
              ))}
            </select>
          </label>
        </div>
        <label className="block text-sm">
          Title
          <input
            name="title"
            value={title}
            onChange={(e) => setTitle(e.target.value)}
            placeholder={defaultTitle[kind]}
            maxLength={120}
            className={input}
          />
        </label>
        <label className="block text-sm">
          Note (shown under the title)
          <textarea
            name="note"
            value={note}
            onChange={(e) => setNote(e.target.value)}
            maxLength={400}
            rows={3}
            className={input}
          />
        </label>
        {errors.length ? (
          <ul role="alert" className="text-sm text-warn">
            {errors.map((e) => (
              <li key={e}>{e}</li>
            ))}
          </ul>
        ) : null}
        <button
          type="submit"
          disabled={!encoded}
          className="w-full rounded bg-cell-600 px-4 py-2 font-medium text-white hover:bg-cell-700 disabled:opacity-50"
        >
          Publish and get the permalink
        </button>
        <p className="muted text-xs">Publishing needs no account: the permalink holds the whole chart.</p>
      </form>
      <section aria-label="Preview" className="card p-2">
        {preview ? (
          // eslint-disable-next-line @next/next/no-img-element -- server-drawn SVG preview
          <img
            src={`/charts/image/${preview}/chart.svg`}
            alt="Preview of the chart"
            width={800}
            height={500}
            className="h-auto w-full"
            data-testid="chart-preview"
          />
        ) : (
          <p className="muted p-4">Choose a group to see a preview.</p>
        )}
      </section>
    </div>
  );
}
