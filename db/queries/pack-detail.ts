// Everything a pack's page shows, from its published results: figures per like-for-like group, sustained
// C (measured), the ageing figures (one physical pack's cycles where a log holds them, results across cycle
// counts beside them), and prepared discharge curves.
import "server-only";
import { PACK_PAGE_CURVE_POINTS, prepareCurve, type ChartPoint } from "@/lib/curves";
import {
  describeResultGroup,
  figuresByGroup,
  packAgeing,
  sustainedC,
  type GroupFigures,
  type PackAgeing,
  type PublicResultRow,
} from "@/lib/pack-summary";
import type { PackSummary } from "@/lib/catalogue";
import { getPackBySlug } from "./packs";
import { getPublicCurves, listPublicResultsForPacks } from "./results";

/** Curves drawn on a pack page (the newest results); the rest are listed. */
const PACK_PAGE_MAX_CURVES = 6;

export type PackDetail = {
  pack: PackSummary;
  results: (PublicResultRow & { groupLabel: string })[];
  groups: GroupFigures[];
  sustained: { rateC: number; resultId: number; groupLabel: string } | null;
  ageing: PackAgeing;
  curves: { resultId: number; groupKey: string; label: string; points: ChartPoint[] }[];
};

export async function getPackDetail(slug: string): Promise<PackDetail | null> {
  const pack = await getPackBySlug(slug);
  if (!pack) return null;
  const rows = await listPublicResultsForPacks([pack.id]);
  const withLabels = rows.map((r) => ({ ...r, groupLabel: describeResultGroup(r).label }));
  const best = sustainedC(rows);
  const drawn = [...rows].sort((a, b) => b.id - a.id).slice(0, PACK_PAGE_MAX_CURVES);
  const stored = await getPublicCurves(drawn.map((r) => r.id));
  const curves = drawn.flatMap((r) => {
    const curve = stored.get(r.id);
    if (!curve) return [];
    const g = describeResultGroup(r);
    return [
      {
        resultId: r.id,
        groupKey: r.groupKey,
        label: `#${r.id} · ${g.parts.resistance.label}, ${g.parts.ambient.label}, ${g.parts.rate.label}, ${g.parts.age.label}`,
        points: prepareCurve(curve, pack.cellsInSeries, PACK_PAGE_CURVE_POINTS),
      },
    ];
  });
  return {
    pack,
    results: withLabels,
    groups: figuresByGroup(rows),
    sustained: best ? { ...best, groupLabel: withLabels.find((r) => r.id === best.resultId)?.groupLabel ?? "" } : null,
    ageing: packAgeing(rows),
    curves,
  };
}
