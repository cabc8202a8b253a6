// The home page's label check for one like-for-like group and one rating (the sag-limited C estimate, or
// the sustained C measured), with that group's maker list: one piece of markup that the page carries for its
// first group and the estimate, and /fragments/label-check/{group}[/{rating}] serves for the others (the
// switcher swaps it in). The maker list names a leader only where the median intervals say one maker is
// ahead; otherwise it says the makers are not distinguishable. Hook-free, so draw/markup.ts writes it out.
import { LabelCheckFigure } from "@/components/charts/label-check-figure";
import type { LabelCheckPoint } from "@/components/charts/draw/label-check-plot";
import { toMarkup } from "@/components/charts/draw/markup";
import { MEETS_STYLE, SHORT_STYLE } from "@/components/charts/palette";
import { LABEL_CHECK_WORDS, LABEL_RATIO_LABELS, type RatingKind } from "@/lib/figure-words";
import {
  groupTableHref,
  HOME_LABEL_CHECK_MAX_PACKS,
  HOME_RANKING_MAX_MAKERS,
  shownOf,
  TOP_PACKS_RULE,
} from "@/lib/bounded-lists";
import { rankingVerdict } from "@/lib/maker-ranking";
import { cachedMakerRanking, cachedTopPacksInGroup } from "@/server/public-data";

type RankRow = Awaited<ReturnType<typeof cachedMakerRanking>>[number];
type PackRow = Awaited<ReturnType<typeof cachedTopPacksInGroup>>[number];

/** "Showing N of M …" and the link to the full table, where a list or chart was cut. */
function CutNote({ words, href, testId }: { words: string | null; href: string; testId: string }) {
  if (words === null) return null;
  return (
    <p className="muted text-xs" data-testid={testId}>
      {words} — <a href={href}>full table →</a>
    </p>
  );
}

function MakerRanking({ rows, rating, groupKey }: { rows: RankRow[]; rating: RatingKind; groupKey: string }) {
  // The verdict weighs every maker of the group; the list shows the highest medians only.
  const verdict = rankingVerdict(rows);
  const shown = rows.slice(0, HOME_RANKING_MAX_MAKERS);
  return (
    <section aria-labelledby="ranking-h" className="card space-y-2">
      <h3 id="ranking-h">Makers by median label ratio</h3>
      <p className="muted text-xs">
        {LABEL_RATIO_LABELS[rating]}. Median over each maker&apos;s packs (each pack counts once), in this group only;
        1.00 means packs deliver their label.
      </p>
      <p className="text-xs" data-testid="ranking-verdict">
        {verdict.words}
      </p>
      {rows.length === 0 ? <p className="muted text-sm">No label ratios in this group yet.</p> : null}
      <ul className="rank" data-testid="maker-ranking">
        {shown.map((m, i) => {
          const interval = verdict.intervals[i];
          return (
            <li key={m.makerSlug}>
              <span>
                {m.makerName}
                {verdict.leader === i ? (
                  <span className="ml-1 rounded bg-cell-100 px-1 text-xs font-medium text-cell-700 dark:bg-cell-700/40 dark:text-cell-100">
                    ahead
                  </span>
                ) : null}{" "}
                <span className="muted text-xs">
                  ({m.packs} pack{m.packs === 1 ? "" : "s"}, {m.results} result{m.results === 1 ? "" : "s"}
                  {interval?.meets ? `; 95 % interval ${interval.lower.toFixed(2)}–${interval.upper.toFixed(2)}` : ""})
                </span>
              </span>
              <span className="num">{m.medianLabelRatio.toFixed(2)}</span>
              <svg aria-hidden="true" className="bar" viewBox="0 0 100 6" preserveAspectRatio="none">
                <rect width={100} height={6} rx={2} className="bar-bg" />
                <rect
                  width={Math.round(Math.min(100, m.medianLabelRatio * 50))}
                  height={6}
                  rx={2}
                  fill={m.medianLabelRatio < 1 ? SHORT_STYLE.color : MEETS_STYLE.color}
                />
              </svg>
            </li>
          );
        })}
      </ul>
      <CutNote
        words={(() => {
          const cut = shownOf(shown.length, rows.length, "maker");
          return cut && `${cut}: the highest medians`;
        })()}
        href={groupTableHref(groupKey, "labelRatio")}
        testId="ranking-cut"
      />
    </section>
  );
}

/** The estimate: each pack's median sag-limited C; measured: each pack's sustained C (the highest measured). */
function points(packs: PackRow[], rating: RatingKind): LabelCheckPoint[] {
  return packs.flatMap((p) => {
    const v =
      rating === "measured"
        ? p.sustainedC && { value: p.sustainedC.value, n: p.sustainedC.n, low: null, high: null }
        : p.measuredC && { value: p.measuredC.median, n: p.measuredC.n, low: p.measuredC.low, high: p.measuredC.high };
    return v
      ? [
          {
            id: p.packSlug,
            label: `${p.makerName} ${p.model}`,
            labelledC: p.labelledC,
            ratingC: Math.round(v.value * 10) / 10,
            n: v.n,
            ...(v.low !== null && v.high !== null ? { lowC: v.low, highC: v.high } : {}),
          },
        ]
      : [];
  });
}

/** The label check and maker list of one group and rating, as plain markup (a static island, a fragment). */
export async function HomeLabelCheck({
  group,
  rating = "estimate",
}: {
  group: { key: string; label: string; packCount: number };
  rating?: RatingKind;
}) {
  // At most HOME_LABEL_CHECK_MAX_PACKS packs, picked in SQL by TOP_PACKS_RULE; packCount is the group's whole.
  const [packs, ranking] = await Promise.all([
    cachedTopPacksInGroup(group.key, HOME_LABEL_CHECK_MAX_PACKS),
    cachedMakerRanking(group.key, rating),
  ]);
  const cut = shownOf(packs.length, group.packCount, "pack");
  return (
    <div className="grid gap-4 lg:grid-cols-[2fr_1fr]">
      <div className="space-y-1">
        <LabelCheckFigure
          id="lc"
          title={LABEL_CHECK_WORDS[rating].title}
          points={points(packs, rating)}
          groupLabel={group.label}
          rating={rating}
        />
        <CutNote words={cut && `${cut}: ${TOP_PACKS_RULE}`} href={groupTableHref(group.key)} testId="label-check-cut" />
      </div>
      <MakerRanking rows={ranking} rating={rating} groupKey={group.key} />
    </div>
  );
}

/** The markup for one group and rating, for /fragments/label-check/{group}[/{rating}]. */
export async function homeLabelCheckMarkup(
  group: { key: string; label: string; packCount: number },
  rating: RatingKind,
): Promise<string> {
  return toMarkup(await HomeLabelCheck({ group, rating }));
}
