"use client";
// The chart builder: choose, preview (the server-drawn SVG), then go to the permalink that carries the state.
// It offers only what has data — makers and pack sizes with approved results in the chosen group — and will
// not publish a chart that would come out empty.
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
/** Approved results per group, maker and pack size; `rated` have a label ratio by the estimate, `measured` by the
 * measured rating (label check, ranking). */
type Coverage = { group: string; maker: string; cells: number; results: number; rated: number; measured: number };

const input = "input mt-1 block w-full";
const defaultTitle: Record<ChartKind, string> = {
  "label-check": "Labelled C against the rating",
  curves: "Discharge curves compared",
  "maker-ranking": "How close makers come to their labels",
};

/** What a chart of this kind, group, maker and size would draw. */
function countFor(
  coverage: Coverage[],
  kind: ChartKind,
  rating: ChartRating,
  group: string,
  maker: string,
  cells: string,
): number {
  return coverage
    .filter((c) => c.group === group && (!maker || c.maker === maker) && (!cells || c.cells === Number(cells)))
    .reduce((n, c) => n + (kind === "curves" ? c.results : rating === "measured" ? c.measured : c.rated), 0);
}

export function ChartBuilder({ groups, makers, coverage }: { groups: Group[]; makers: Maker[]; coverage: Coverage[] }) {
  const router = useRouter();
  const from = decodeChartState(useSearchParams().get("from") ?? "");
  const [kind, setKind] = useState<ChartKind>(from?.kind ?? "label-check");
  const [group, setGroup] = useState(from?.group ?? groups[0]?.key ?? "");
  const [maker, setMaker] = useState(from?.maker ?? "");
  const [cells, setCells] = useState(from?.cells ? String(from.cells) : "");
  const [title, setTitle] = useState(from?.title ?? "");
  const [note, setNote] = useState(from?.note ?? "");
  const [perPack, setPerPack] = useState(from?.units === "pack");
  // A chart copied from an older permalink keeps the estimate it drew (a state without a rating means it).
  const [rating, setRating] = useState<ChartRating>(from?.rating ?? "estimate");
  const rated = kind === "label-check" || kind === "maker-ranking";

  const inGroup = coverage.filter((c) => c.group === group);
  const makerOptions = makers.filter((m) =>
    inGroup.some((c) => c.maker === m.slug && (!cells || c.cells === Number(cells))),
  );
  const cellOptions = [...new Set(inGroup.filter((c) => !maker || c.maker === maker).map((c) => c.cells))].sort(
    (a, b) => a - b,
  );
  const count = countFor(coverage, kind, rating, group, maker, cells);

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
        // Per pack only for curves of one pack size (the reader's units, lib/units.ts).
        units: kind === "curves" && cells && perPack ? "pack" : undefined,
      }),
    [kind, group, maker, cells, rated, rating, title, note, perPack],
  );
  const encoded = parsed.success ? encodeChartState(parsed.data) : null;
  const preview = useDeferredValue(encoded);
  const errors = parsed.success ? [] : parsed.error.issues.map((i) => i.message);
  const empty = count === 0;

  // A group with other makers and sizes keeps only the choices it has data for.
  const chooseGroup = (key: string) => {
    const next = coverage.filter((c) => c.group === key);
    setGroup(key);
    if (maker && !next.some((c) => c.maker === maker)) setMaker("");
    if (cells && !next.some((c) => c.cells === Number(cells))) setCells("");
  };

  return (
    <div className="grid gap-6 lg:grid-cols-[22rem_1fr]">
      <form
        className="card space-y-3"
        onSubmit={(e) => {
          e.preventDefault();
          if (encoded && !empty) router.push(`/charts/view/${statePath(encoded)}`);
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
          <select name="group" value={group} onChange={(e) => chooseGroup(e.target.value)} className={input}>
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
              {makerOptions.map((m) => (
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
              {cellOptions.map((c) => (
                <option key={c} value={c}>
                  {c}S
                </option>
              ))}
            </select>
          </label>
        </div>
        {kind === "curves" && cells ? (
          <label className="flex items-center gap-2 text-sm">
            <input type="checkbox" name="units" checked={perPack} onChange={(e) => setPerPack(e.target.checked)} />
            Pack voltage ({cells}S) instead of voltage per cell
          </label>
        ) : null}
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
        <p className="muted text-sm" data-testid="chart-count" aria-live="polite">
          {empty
            ? kind === "curves"
              ? "No approved results match these choices."
              : "No approved result with a label ratio matches these choices."
            : `${count} approved result${count === 1 ? "" : "s"} match.`}
        </p>
        {errors.length || empty ? (
          <ul role="alert" className="text-sm text-warn dark:text-[#ffb4ab]">
            {errors.map((e) => (
              <li key={e}>{e}</li>
            ))}
            {empty ? <li>An empty chart cannot be published: choose another group, maker or pack size.</li> : null}
          </ul>
        ) : null}
        <button
          type="submit"
          disabled={!encoded || empty}
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
