/**
 * How one bench agrees with the others, for its public bench page, the review queue and the contributor: how
 * many of its values were compared, the median |z|, the share with |z| > 3, and, where one figure runs the same
 * way across several packs, a suggestion of what to check, in our own words.
 *
 * The rules for suggestions are Sagline's own (not from a standard): a figure "runs high" (or low) when at least
 * SUGGEST_MIN_PACKS packs were compared, the median z is at least +1 (or at most −1) and at least three in four of
 * its z lie on that side; it "scatters" when its median |z| exceeds 2 without a side.
 */
import { Z_FLAG_THRESHOLD } from "./scores";

export const AGREEMENT_FIGURES = [
  "capacityMah",
  "energyWh",
  "meanVoltageV",
  "holdVoltagePerCellV",
  "dcResistanceMohm",
  "resistanceAt25CMohm",
] as const;
export type AgreementFigure = (typeof AGREEMENT_FIGURES)[number];

export const AGREEMENT_FIGURE_LABELS: Record<AgreementFigure, string> = {
  capacityMah: "Capacity",
  energyWh: "Energy",
  meanVoltageV: "Mean voltage under load",
  holdVoltagePerCellV: "Hold voltage",
  dcResistanceMohm: "DC resistance",
  resistanceAt25CMohm: "Resistance at 25 °C",
};

export const SUGGEST_MIN_PACKS = 3;
export const SUGGEST_MEDIAN_Z = 1;
export const SUGGEST_SAME_SIDE_SHARE = 0.75;
export const SUGGEST_SCATTER_MEDIAN_ABS_Z = 2;

export type BenchComparison = {
  figure: AgreementFigure;
  packId: string;
  /** The bench's z for this pack and figure; null when it could not be scored (then it is not counted). */
  z: number | null;
};

export type Tendency = "runs-high" | "runs-low" | "scatters";

export type FigureAgreement = {
  figure: AgreementFigure;
  compared: number;
  medianZ: number;
  medianAbsZ: number;
  tendency: Tendency | null;
};

export type Suggestion = { figure: AgreementFigure; tendency: Tendency; words: string };

export type BenchAgreementSummary = {
  /** Values scored against other benches (all figures). */
  resultsCompared: number;
  /** Distinct packs among them. */
  packsCompared: number;
  medianAbsZ: number | null;
  /** Share of scored values with |z| > 3 (0…1). */
  shareAbsZOver3: number | null;
  figures: FigureAgreement[];
  suggestions: Suggestion[];
  /** One line for the bench page. */
  words: string;
};

const ADVICE: Record<AgreementFigure, Partial<Record<Tendency, string>>> = {
  capacityMah: {
    "runs-high":
      "Capacity reads high across several packs. Check the current shunt or sensor against a reference meter in series at a steady load, and that the logger's clock keeps time.",
    "runs-low":
      "Capacity reads low across several packs. Check the current calibration, that the cut-off voltage is sensed at the pack's connector rather than at the load, and that packs are charged and rested as the method card says.",
  },
  energyWh: {
    "runs-high":
      "Energy reads high across several packs. Check both the voltage and the current calibration against reference meters.",
    "runs-low":
      "Energy reads low across several packs. Check the voltage is sensed at the pack's connector, not through the load leads, and check the current calibration.",
  },
  meanVoltageV: {
    "runs-high":
      "Voltage under load reads high across several packs. Check the voltmeter against a reference, and that the load current matches the method card.",
    "runs-low":
      "Voltage under load reads low across several packs. The voltage may be sensed through the load leads and connectors: sense it at the pack's connector, and check the voltmeter against a reference.",
  },
  holdVoltagePerCellV: {
    "runs-high":
      "Hold voltage reads high across several packs. Check the voltmeter against a reference and that the reading is taken the stated time after the load starts.",
    "runs-low":
      "Hold voltage reads low across several packs. Sense the voltage at the pack's connector rather than through the load leads, and check the load current against the method card.",
  },
  dcResistanceMohm: {
    "runs-high":
      "Resistance reads high across several packs. Check the resistance of leads and connectors (sense the voltage at the pack's connector with separate leads if you can), that connectors are clean and tight, and that the step reading is taken 1 s after the step, not later.",
    "runs-low":
      "Resistance reads low across several packs. Check that the step reading is taken 1 s after the step and not sooner, and the current calibration (a current that reads high makes resistance read low).",
  },
  resistanceAt25CMohm: {
    "runs-high":
      "Resistance at 25 °C reads high across several packs. Check leads and connectors as for DC resistance, and that the temperature sensor touches the pack and reads true.",
    "runs-low":
      "Resistance at 25 °C reads low across several packs. Check the step timing and the temperature sensor: a sensor that reads cold corrects the resistance too far down.",
  },
};

const SCATTER_ADVICE =
  "readings scatter both ways from other benches. Check that connectors are tight, that packs start at the stated temperature after the stated rest, and that the sampling interval is short enough for the step.";

function medianOf(values: readonly number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const mid = (s.length - 1) / 2;
  return ((s[Math.floor(mid)] as number) + (s[Math.ceil(mid)] as number)) / 2;
}

function tendencyOf(
  zs: readonly number[],
  packs: number,
): { medianZ: number; medianAbsZ: number; tendency: Tendency | null } {
  const medianZ = medianOf(zs);
  const medianAbsZ = medianOf(zs.map(Math.abs));
  let tendency: Tendency | null = null;
  if (packs >= SUGGEST_MIN_PACKS) {
    const above = zs.filter((z) => z > 0).length / zs.length;
    const below = zs.filter((z) => z < 0).length / zs.length;
    if (medianZ >= SUGGEST_MEDIAN_Z && above >= SUGGEST_SAME_SIDE_SHARE) tendency = "runs-high";
    else if (medianZ <= -SUGGEST_MEDIAN_Z && below >= SUGGEST_SAME_SIDE_SHARE) tendency = "runs-low";
    else if (medianAbsZ > SUGGEST_SCATTER_MEDIAN_ABS_Z) tendency = "scatters";
  }
  return { medianZ, medianAbsZ, tendency };
}

/** Summarise one bench's scored comparisons (all packs, all figures). */
export function benchAgreementSummary(comparisons: readonly BenchComparison[]): BenchAgreementSummary {
  const scored = comparisons.filter((c): c is BenchComparison & { z: number } => c.z !== null && Number.isFinite(c.z));
  const n = scored.length;
  const packsCompared = new Set(scored.map((c) => c.packId)).size;
  const figures: FigureAgreement[] = [];
  const suggestions: Suggestion[] = [];
  for (const figure of AGREEMENT_FIGURES) {
    const own = scored.filter((c) => c.figure === figure);
    if (own.length === 0) continue;
    const t = tendencyOf(
      own.map((c) => c.z),
      new Set(own.map((c) => c.packId)).size,
    );
    figures.push({ figure, compared: own.length, ...t });
    if (t.tendency === "scatters")
      suggestions.push({
        figure,
        tendency: t.tendency,
        words: `${AGREEMENT_FIGURE_LABELS[figure]}: ${SCATTER_ADVICE}`,
      });
    else if (t.tendency !== null) {
      const words = ADVICE[figure][t.tendency];
      if (words) suggestions.push({ figure, tendency: t.tendency, words });
    }
  }
  if (n === 0) {
    return {
      resultsCompared: 0,
      packsCompared: 0,
      medianAbsZ: null,
      shareAbsZOver3: null,
      figures,
      suggestions,
      words: "Not compared yet: no pack this bench tested has been tested by enough other benches in the same group.",
    };
  }
  const medianAbsZ = medianOf(scored.map((c) => Math.abs(c.z)));
  const over = scored.filter((c) => Math.abs(c.z) > Z_FLAG_THRESHOLD).length;
  const share = over / n;
  const words =
    suggestions.length === 0 && over === 0
      ? `Agrees with other benches: ${n} value${n === 1 ? "" : "s"} on ${packsCompared} pack${packsCompared === 1 ? "" : "s"} compared, typical distance ${medianAbsZ.toFixed(1)} standard deviations.`
      : `${n} value${n === 1 ? "" : "s"} on ${packsCompared} pack${packsCompared === 1 ? "" : "s"} compared, typical distance ${medianAbsZ.toFixed(1)} standard deviations; ${over} far from the other benches (|z| > 3)${suggestions.length > 0 ? "; see the suggestions" : ""}.`;
  return { resultsCompared: n, packsCompared, medianAbsZ, shareAbsZOver3: share, figures, suggestions, words };
}
