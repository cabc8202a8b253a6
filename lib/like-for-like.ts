// Names and compares like-for-like groups part by part, so pages can say what they left out and why
// ("4 results hidden: ambient below 15 °C"). The bands themselves come from lib/analysis.
import {
  ageBand,
  ambientBand,
  cutoffBand,
  groupKey,
  labelForGroupKey,
  rateBand,
  resistanceBandFromKey,
  type MethodCardForKey,
} from "@/lib/analysis";
import { resistanceBand } from "@/lib/analysis/group-key";

const GROUP_PARTS = ["resistance", "ambient", "cutoff", "rate", "age"] as const;
type GroupPart = (typeof GROUP_PARTS)[number];
type Band = { key: string; label: string };

export type DescribedGroup = { key: string; label: string; parts: Record<GroupPart, Band> };

export function describeGroup(card: MethodCardForKey): DescribedGroup {
  const g = groupKey(card);
  return {
    key: g.key,
    label: g.label,
    parts: {
      resistance: resistanceBand(card.resistanceMethod),
      ambient: ambientBand(card.ambientC),
      cutoff: cutoffBand(card.cutoffVPerCell),
      rate: rateBand(card.loadCurrentA, card.ratedMah),
      age: ageBand(card.cyclesBeforeTest),
    },
  };
}

/**
 * A stored result's group: the key as stored (its resistance part is what the log showed — see
 * groupKeyForAnalysis), the other parts' bands from the method card that made them.
 */
export function describeStoredGroup(key: string, card: MethodCardForKey): DescribedGroup {
  const fromCard = describeGroup(card);
  const resistance = resistanceBandFromKey(key) ?? fromCard.parts.resistance;
  const parts = { ...fromCard.parts, resistance };
  return {
    key,
    label: labelForGroupKey(key) ?? GROUP_PARTS.map((p) => parts[p].label).join(" · "),
    parts,
  };
}

/** How a reader should read one part of a group that differs from the one shown. */
function partReason(part: GroupPart, band: Band): string {
  switch (part) {
    case "resistance":
      return `resistance by ${band.label}`;
    case "ambient":
      return `ambient ${band.label}`;
    case "cutoff":
      return band.label;
    case "rate":
      return `load rate ${band.label}`;
    case "age":
      return band.key === "new" ? "pack age: new" : `pack age ${band.label}`;
  }
}

/** The parts in which `other` differs from `target`, in reading words. Empty when they are the same group. */
export function groupDifferences(target: DescribedGroup, other: DescribedGroup): string[] {
  return GROUP_PARTS.filter((p) => target.parts[p].key !== other.parts[p].key).map((p) =>
    partReason(p, other.parts[p]),
  );
}

export type Exclusion = { count: number; reason: string };

/** Results outside the shown group, counted by the reason they were left out (most first). */
export function summariseExclusions(target: DescribedGroup, others: DescribedGroup[]): Exclusion[] {
  const counts = new Map<string, number>();
  for (const g of others) {
    if (g.key === target.key) continue;
    const reason = groupDifferences(target, g).join(", ") || "different group";
    counts.set(reason, (counts.get(reason) ?? 0) + 1);
  }
  return [...counts.entries()]
    .map(([reason, count]) => ({ reason, count }))
    .sort((a, b) => b.count - a.count || a.reason.localeCompare(b.reason));
}

export function exclusionText(e: Exclusion): string {
  return `${e.count} result${e.count === 1 ? "" : "s"} hidden: ${e.reason}`;
}

/** The key with its age part removed: results that differ only by pack age form a cycling series. */
export function keyWithoutAge(g: DescribedGroup): string {
  return GROUP_PARTS.filter((p) => p !== "age")
    .map((p) => g.parts[p].key)
    .join("_");
}
