// The series /compare hands to its charts: exactly what crosses to the browser (scripts/bench-pages.ts
// measures this payload for six packs).
import type { Comparison } from "@/lib/compare";
import { packTitle } from "@/lib/format";

type XY = { x: number; y: number };
type CompareSeries = { id: string; label: string; href: string; points: XY[]; styleIndex: number };
export type CompareCharts = { byCapacity: CompareSeries[]; byShare: CompareSeries[]; temperature: CompareSeries[] };

export function compareChartData(c: Comparison): CompareCharts {
  const out: CompareCharts = { byCapacity: [], byShare: [], temperature: [] };
  c.packs.forEach((pack, index) => {
    const curve = c.curves.find((k) => k.packSlug === pack.slug);
    if (!curve) return;
    const base = { id: pack.slug, label: packTitle(pack), href: `/results/${curve.resultId}`, styleIndex: index };
    out.byCapacity.push({ ...base, points: curve.points.map((p) => ({ x: p.mah, y: p.vpc })) });
    out.byShare.push({
      ...base,
      points: curve.points.map((p) => ({ x: Math.round((p.mah / pack.ratedCapacityMah) * 1000) / 10, y: p.vpc })),
    });
    const temps = curve.points
      .filter((p): p is typeof p & { tc: number } => p.tc !== null)
      .map((p) => ({ x: p.s, y: p.tc }));
    if (temps.length) out.temperature.push({ ...base, points: temps });
  });
  return out;
}
