// A row of the packs table (GET /api/v1/packs, /packs) beyond the pack's published fields: how many groups it
// has results in, and its medians in the chosen like-for-like group, rounded like the figures they summarise.
import type { PackRow } from "@/lib/catalogue";
import { roundTo } from "./field-kit";
import { figureDigits } from "./result-fields";

const rounded = (v: number | null, figure: "sagLimitedC" | "labelRatio" | "capacityRatio") => {
  const digits = figureDigits(figure);
  return v === null || digits === undefined ? v : roundTo(v, digits);
};

export function packListRecord(r: PackRow) {
  return {
    groupCount: r.groupCount,
    groupN: r.groupN,
    measuredC: rounded(r.measuredC, "sagLimitedC"),
    labelRatio: rounded(r.labelRatio, "labelRatio"),
    capacityRatio: rounded(r.capacityRatio, "capacityRatio"),
  };
}
