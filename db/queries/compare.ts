// Everything /compare shows for 2–6 packs in one like-for-like group: summaries, exclusions with reasons,
// and one prepared curve per pack. Results of other groups are counted and explained, never mixed in.
import "server-only";
import { comparePacks, groupOptions, type Comparison } from "@/lib/compare";
import { COMPARE_CURVE_POINTS, prepareCurve } from "@/lib/curves";
import { describeResultGroup } from "@/lib/pack-summary";
import { getPacksBySlugs } from "./packs";
import { getPublicCurves, listPublicResultsForPacks } from "./results";

export async function getComparison(slugs: string[], wantedGroup: string | null): Promise<Comparison> {
  const packList = await getPacksBySlugs(slugs);
  const known = new Set(packList.map((p) => p.slug));
  const unknownSlugs = slugs.filter((s) => !known.has(s));
  const rows = await listPublicResultsForPacks(packList.map((p) => p.id));
  const groups = groupOptions(rows);
  const chosenKey = groups.find((g) => g.key === wantedGroup)?.key ?? groups[0]?.key ?? null;
  const representative = rows.find((r) => r.groupKey === chosenKey);
  if (!representative || chosenKey === null)
    return { packs: packList, unknownSlugs, groups, group: null, compared: [], curves: [] };
  const group = { ...describeResultGroup(representative), key: chosenKey };
  const compared = comparePacks(
    rows,
    packList.map((p) => p.id),
    group,
  );
  const ids = compared.map((c) => c.curveResultId).filter((id): id is number => id !== null);
  const stored = await getPublicCurves(ids);
  const curves = compared.flatMap((c, i) => {
    const pack = packList[i];
    const curve = c.curveResultId === null ? undefined : stored.get(c.curveResultId);
    if (!pack || !curve || c.curveResultId === null) return [];
    return [
      {
        packSlug: pack.slug,
        resultId: c.curveResultId,
        points: prepareCurve(curve, pack.cellsInSeries, COMPARE_CURVE_POINTS),
      },
    ];
  });
  return { packs: packList, unknownSlugs, groups, group, compared, curves };
}
