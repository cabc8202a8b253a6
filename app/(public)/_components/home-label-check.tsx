// The home page's label check for one like-for-like group, with that group's maker ranking: one piece of
// markup that the page carries for its first group and /fragments/label-check/{group} serves for the others
// (the group switcher swaps it in). Hook-free, so components/charts/draw/markup.ts writes it out.
import { LabelCheckFigure } from "@/components/charts/label-check-figure";
import type { LabelCheckPoint } from "@/components/charts/draw/label-check-plot";
import { toMarkup } from "@/components/charts/draw/markup";
import { MEETS_STYLE, SHORT_STYLE } from "@/components/charts/palette";
import { cachedMakerRanking, cachedPacksInGroup } from "@/server/public-data";

type Ranking = { makerSlug: string; makerName: string; medianLabelRatio: number; packs: number; results: number };

function MakerRanking({ ranking }: { ranking: Ranking[] }) {
  return (
    <section aria-labelledby="ranking-h" className="card space-y-2">
      <h3 id="ranking-h">Makers by median label ratio</h3>
      <p className="muted text-xs">
        Median of each maker&apos;s packs (each pack&apos;s own median counts once), in this group only. 1.00 means
        packs deliver their label.
      </p>
      {ranking.length === 0 ? <p className="muted text-sm">No label ratios in this group yet.</p> : null}
      <ol className="rank" data-testid="maker-ranking">
        {ranking.map((m, i) => (
          <li key={m.makerSlug}>
            <span className="num muted">{i + 1}</span>
            <span>
              {m.makerName}{" "}
              <span className="muted text-xs">
                ({m.packs} pack{m.packs === 1 ? "" : "s"}, {m.results} result{m.results === 1 ? "" : "s"})
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
        ))}
      </ol>
    </section>
  );
}

/** The label check and maker ranking of one group, as plain markup (a static island on the page, a fragment). */
export async function HomeLabelCheck({ group }: { group: { key: string; label: string } }) {
  const [packs, ranking] = await Promise.all([cachedPacksInGroup(group.key), cachedMakerRanking(group.key)]);
  const points: LabelCheckPoint[] = packs.flatMap((p) =>
    p.measuredC
      ? [
          {
            id: p.packSlug,
            label: `${p.makerName} ${p.model}`,
            labelledC: p.labelledC,
            ratingC: Math.round(p.measuredC.median * 10) / 10,
            n: p.measuredC.n,
          },
        ]
      : [],
  );
  return (
    <div className="grid gap-4 lg:grid-cols-[2fr_1fr]">
      <LabelCheckFigure
        id="lc"
        title="Label check: labelled C against sag-limited C"
        points={points}
        groupLabel={group.label}
      />
      <MakerRanking ranking={ranking} />
    </div>
  );
}

/** The markup for one group, for /fragments/label-check/{group}. */
export async function homeLabelCheckMarkup(group: { key: string; label: string }): Promise<string> {
  return toMarkup(await HomeLabelCheck({ group }));
}
