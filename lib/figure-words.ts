// Words for the figures a log gives, shared by every page that shows them: the two ratings (which is an
// estimate, which is measured, and on what assumptions or rule), why a run has no measured rating, and
// the anchors of their definitions on /methods (content/methods/figures.md gives each one its id).
import type { Figures, SagLimitedAssumptions, SustainedCReason, SustainedCRule } from "@/lib/analysis";
import { fmt } from "@/lib/format";

export const RATING_LABELS = {
  estimate: "Sag-limited C (estimate)",
  measured: "Sustained C (measured)",
} as const;
export type RatingKind = keyof typeof RATING_LABELS;

/** What each label ratio divides, so a ratio never appears without naming its rating. */
export const LABEL_RATIO_LABELS = {
  estimate: "Label ratio (sag-limited C estimate ÷ labelled C)",
  measured: "Label ratio (sustained C measured ÷ labelled C)",
} as const;

/** The label check's title and vertical axis for each rating. */
export const LABEL_CHECK_WORDS = {
  estimate: {
    title: "Label check: labelled C against sag-limited C (estimate)",
    axis: "Sag-limited C, an estimate from resistance (C)",
    column: "Sag-limited C (estimate, median)",
    short: "sag-limited (estimate)",
    meets: "meets or beats its label",
    below: "falls short (below the line)",
    belowCount: "fall short of their label by this estimate",
    pointBelow: "falls short of its label by this estimate",
  },
  measured: {
    title: "Label check: labelled C against sustained C (measured)",
    axis: "Sustained C, measured from the run (C)",
    column: "Sustained C (measured, highest)",
    short: "sustained (measured)",
    meets: "held its label or more",
    below: "label not shown (held less, or tested lower)",
    belowCount:
      "were not shown to hold their label: a run holds only the rate it was tested at, and a group is one band of rates",
    pointBelow: "not shown to hold its label",
  },
} as const;

/** Ids on /methods; tests/integration/methods-anchors.test.ts checks that every one exists. */
export const METHODS_ANCHORS = {
  figures: "figures",
  readingTheLog: "reading-the-log",
  columnMapping: "column-mapping",
  discharges: "discharges",
  cutoff: "cut-off",
  readings: "readings",
  sagLimitedC: "sag-limited-c",
  sustainedC: "sustained-c",
  labelRatio: "label-ratio",
  statistics: "statistics",
  uncertainty: "uncertainty",
  uncertaintyIntervals: "uncertainty-intervals",
  uncertaintyAgreement: "uncertainty-agreement",
  likeForLike: "like-for-like",
  safety: "safety",
  deliveredCapacity: "delivered-capacity",
  deliveredEnergy: "delivered-energy",
  meanVoltage: "mean-voltage",
  minimumVoltage: "minimum-voltage",
  holdVoltage: "hold-voltage",
  dcResistance: "dc-resistance",
  resistanceAt25C: "resistance-at-25c",
  peakCurrent: "peak-current",
  temperatureRise: "temperature-rise",
  capacityRatio: "capacity-ratio",
  specificEnergy: "specific-energy",
  timeToCutoff: "time-to-cutoff",
  sampleInterval: "sample-interval",
} as const;
export type MethodsAnchor = (typeof METHODS_ANCHORS)[keyof typeof METHODS_ANCHORS];

export function methodsHref(anchor: MethodsAnchor): string {
  return `/methods#${anchor}`;
}

/** "3.7 V nominal → 3.3 V floor per cell; 18.2 mΩ read 10 s after the load edge at 52.0 A, 24.1 °C". */
export function sagAssumptionWords(a: SagLimitedAssumptions): string {
  const point =
    a.resistancePoint === "hold"
      ? `read ${fmt(a.resistanceAtS, 0)} s after the load edge`
      : `read ${fmt(a.resistanceAtS, 0)} s after the load edge (no hold-point reading: the load was shorter)`;
  const temperature = a.temperatureC === null ? "pack temperature not logged" : fmt(a.temperatureC, 1, "°C");
  return `${fmt(a.nominalVPerCell, 2)} V nominal → ${fmt(a.floorVPerCell, 2)} V floor per cell; resistance ${fmt(a.resistanceMohm, 1, "mΩ")} ${point}, at ${fmt(a.currentA, 1, "A")}, ${temperature}${a.indicative ? "; the resistance reading is indicative only" : ""}`;
}

/** The assumptions of a stored estimate, or the defaults said plainly for results analysed before they were kept. */
export function estimateAssumptions(f: Partial<Pick<Figures, "sagLimitedCAssumptions">>): string {
  const a = f.sagLimitedCAssumptions;
  return a ? sagAssumptionWords(a) : "3.7 V nominal → 3.3 V floor per cell; resistance read 1 s after the load edge";
}

/** The rule a run must meet for a measured rating, in one sentence. */
export function sustainedRuleWords(rule: SustainedCRule): string {
  return `mean current actually drawn ÷ rated Ah, when the discharge reached its cut-off, delivered at least ${fmt(rule.minDeliveredShare * 100, 0)} % of the rated capacity, stayed under ${fmt(rule.stopTemperatureC, 0, "°C")}, held ${fmt(rule.floorVPerCell, 2)} V per cell until ${fmt(rule.floorHeldShare * 100, 0)} % of its charge, no cell went below the cut-off, and the current varied by at most ${fmt(rule.maxCurrentSpread * 100, 0)} %`;
}

export const SUSTAINED_REASON_WORDS: Record<SustainedCReason, string> = {
  "no-rated-capacity": "the rated capacity is not known",
  "cells-unknown": "the number of cells is not known",
  "cutoff-not-reached": "the discharge did not reach its cut-off",
  "no-temperature": "the log has no pack temperature",
  "stop-temperature-reached": "the pack reached the stop temperature",
  "fell-below-floor": "the voltage fell below the floor before the end of the discharge",
  "cell-below-cutoff": "a cell went below the cut-off",
  "current-not-steady": "the load current was not steady",
  "partial-discharge": "less than half the rated capacity was delivered",
};

/** Why there is no measured rating (null when there is one, or the figures predate it). */
export function sustainedReasonWords(f: Partial<Pick<Figures, "sustainedCReason">>): string | null {
  return f.sustainedCReason ? `No measured rating: ${SUSTAINED_REASON_WORDS[f.sustainedCReason]}.` : null;
}
