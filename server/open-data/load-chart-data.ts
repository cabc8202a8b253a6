// Prepares the data of one chart from its state through the tagged cached reads: one like-for-like group
// at a time, saying what was left out and why.
import "server-only";
import { aggregateByMaker, aggregateByPack, groupLabel } from "@/lib/open-data/aggregate";
import { CHART_RATING_WORDS, MAX_CURVES, type ChartData, type CurveLine } from "@/lib/open-data/chart-data";
import { byTopPacksRule, CHART_MAX_PACKS, TOP_PACKS_RULE } from "@/lib/bounded-lists";
import { rankingVerdict } from "@/lib/maker-ranking";
import { plural } from "@/lib/open-data/chart-svg-kit";
import type { ChartState } from "@/lib/open-data/chart-state";
import { parseUnitsParam } from "@/lib/units";
import { packWhere } from "@/server/open-data/catalogue";
import { cachedGroupCurves, cachedGroupSamples } from "@/server/public-data";

export async function loadChartData(state: ChartState): Promise<ChartData> {
  const filters = { maker: state.maker, cells: state.cells };
  const where = await packWhere(filters);
  // Tagged cached reads: a moderation decision in this group refreshes embeds, views and images at once.
  const samples = await cachedGroupSamples(state.group, filters, where);
  const packs = aggregateByPack(samples);
  // States published before the rating was chosen drew the estimate, and still do.
  const rating = state.rating ?? "estimate";
  const words = CHART_RATING_WORDS[rating];
  const base: ChartData = {
    state,
    rating,
    groupLabel: groupLabel(state.group, samples[0]) ?? "an unnamed like-for-like group",
    counts: { packs: packs.length, results: samples.length },
    leftOut: [],
  };
  if (state.maker || state.cells)
    base.leftOut.push(
      `Filtered to ${[state.maker ? `maker ${state.maker}` : "", state.cells ? `${state.cells}S packs` : ""].filter(Boolean).join(", ")}.`,
    );
  if (state.kind === "label-check") {
    // Measured: the pack's sustained C, the highest among its approved results; estimate: the median.
    // At most CHART_MAX_PACKS points, by TOP_PACKS_RULE.
    const all = [...packs].sort(byTopPacksRule).flatMap((p) => {
      const m = rating === "measured" ? p.figures.sustainedCMeasured : p.figures.sagLimitedC;
      const y = m ? (rating === "measured" ? m.max : m.median) : null;
      return m && y !== null
        ? [
            {
              id: p.packSlug,
              label: `${p.makerName} ${p.model}`,
              labelledC: p.labelledContinuousC,
              ratingC: Math.round(y * 10) / 10,
              n: m.n,
            },
          ]
        : [];
    });
    if (all.length < packs.length)
      base.leftOut.push(`${plural(packs.length - all.length, "pack")} without a ${words.point} left out.`);
    const points = all.slice(0, CHART_MAX_PACKS);
    if (points.length < all.length)
      base.leftOut.push(
        `${plural(all.length - points.length, "more pack")} not drawn: at most ${CHART_MAX_PACKS} points, for ${TOP_PACKS_RULE}.`,
      );
    if (rating === "measured")
      base.leftOut.push(
        "A run holds only the rate it was tested at, and a group is one band of rates: a pack below the line has not shown its label, which is not failing it.",
      );
    return { ...base, labelCheck: points };
  }
  if (state.kind === "maker-ranking") {
    const makers = aggregateByMaker(packs, rating);
    const ranking = makers.flatMap((m) =>
      m.labelRatio
        ? [{ label: m.makerName, labelRatio: m.labelRatio.median, packCount: m.packCount, resultCount: m.resultCount }]
        : [],
    );
    // The order is drawn; whether any maker is really ahead is said in words (95 % median intervals).
    base.leftOut.push(rankingVerdict(makers).words);
    return { ...base, ranking };
  }
  // At most MAX_CURVES curves, picked in SQL (TOP_PACKS_RULE), one per pack: its first published result here.
  const { series, packTotal } = await cachedGroupCurves(state.group, filters, where, MAX_CURVES);
  const curves: CurveLine[] = series.map((s) => {
    // Only samples under the main load: rest and recovery at the ends would draw spikes.
    const peakA = Math.max(0, ...s.curve.map((p) => p.currentA));
    return {
      label: `${s.makerName} ${s.model}`,
      points: s.curve
        .filter((p) => p.currentA >= peakA * 0.5)
        .map((p) => ({
          capacityPercent: (p.capacityMah / s.ratedCapacityMah) * 100,
          voltagePerCellV: p.voltageV / s.cellsInSeries,
        })),
    };
  });
  if (packTotal > curves.length)
    base.leftOut.push(
      `${plural(packTotal - curves.length, "more pack")} not drawn: at most ${MAX_CURVES} curves, for ${TOP_PACKS_RULE}; one curve per pack, its first approved result in the group.`,
    );
  else base.leftOut.push("One curve per pack: its first approved result in the group.");
  // Per pack only where every curve is one pack size; across sizes the pack voltages would not compare.
  if (parseUnitsParam(state.units).basis === "pack") {
    if (state.cells) {
      const cells = state.cells;
      const perPack = curves.map((c) => ({
        ...c,
        points: c.points.map((p) => ({ ...p, voltagePerCellV: Math.round(p.voltagePerCellV * cells * 1000) / 1000 })),
      }));
      return { ...base, curves: perPack, curvesPerPack: { cells } };
    }
    base.leftOut.push("Voltages per cell: packs of different sizes are compared (choose one pack size for per pack).");
  }
  return { ...base, curves };
}
