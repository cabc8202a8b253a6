/**
 * Automatic plausibility flags for a result that has just arrived. Pure: the caller gathers the pack's
 * label, the like-for-like group's approved values and the duplicate/proposed facts from the database.
 * A flag never decides anything; it points a moderator at something to check, in plain words.
 */
import type { CurvePoint, Figures } from "./types";
import { median, modifiedZScores, MODIFIED_Z_THRESHOLD } from "./statistics";
import { compareFingerprints, curveFingerprint, type CurveFingerprint } from "./curve-fingerprint";
import { noiseCheck } from "./log-noise";

/** `resultIds`: the other results a flag points at (a copied log), so the review page can link them. */
export type PlausibilityFlag = { code: PlausibilityCode; message: string; resultIds?: number[] };

export const plausibilityCodes = [
  "capacity-above-rated",
  "label-ratio-outside-group",
  "sag-c-outside-group",
  "group-outlier",
  "cutoff-mismatch",
  "temperature-mismatch",
  "cells-mismatch",
  "duplicate-log",
  "copied-curve",
  "no-noise",
  "proposed-catalogue",
] as const;
export type PlausibilityCode = (typeof plausibilityCodes)[number];

export const plausibilityLabels: Record<PlausibilityCode, string> = {
  "capacity-above-rated": "Capacity above 110 % of rated",
  "label-ratio-outside-group": "Label ratio far from group",
  "sag-c-outside-group": "Sag-limited C far from group",
  "group-outlier": "Outlier in its group",
  "cutoff-mismatch": "Cut-off does not match log",
  "temperature-mismatch": "Ambient vs start temperature",
  "cells-mismatch": "Cells in series disagree",
  "duplicate-log": "Log already submitted",
  "copied-curve": "Same curve as another log",
  "no-noise": "No measurement noise",
  "proposed-catalogue": "New maker or pack",
};

/** Delivered above this share of rated capacity is flagged (common practice: labels are rarely exceeded by 10 %). */
export const CAPACITY_ABOVE_RATED_RATIO = 1.1;
/** "Far outside the group": more than this factor above or below the group median (common practice). */
export const FAR_FROM_GROUP_FACTOR = 2;
/** Fewest approved values in a group before "far outside the group" is judged (common practice). */
export const MIN_GROUP_FOR_RANGE = 3;
/** Fewest approved values before a modified z-score means anything (common practice for MAD-based scores). */
export const MIN_GROUP_FOR_Z = 5;
/** Log minimum per cell this far below the stated cut-off: the test ran past it (common practice, 0.1 V). */
export const CUTOFF_UNDERSHOOT_V = 0.1;
/** Log minimum per cell this far above the stated cut-off without a temperature stop: it never got there (common practice). */
export const CUTOFF_OVERSHOOT_V = 0.15;
/** Ambient and logged start temperature further apart than this (°C): the pack was not at ambient (issue 5). */
export const START_TEMPERATURE_GAP_C = 5;

export type PlausibilityInput = {
  figures: Pick<
    Figures,
    | "capacityMah"
    | "capacityRatio"
    | "labelRatio"
    | "sagLimitedC"
    | "minVoltagePerCellV"
    | "startTemperatureC"
    | "cells"
    | "timeToStopTemperatureS"
  >;
  method: { ambientTemperatureC: number; cutoffVPerCell: number };
  pack: { cellsInSeries: number; ratedCapacityMah: number };
  /** Approved results of the same like-for-like group (the new result excluded). */
  group: { labelRatios: number[]; sagLimitedCs: number[]; capacityRatios: number[] };
  /** Another result already carries a log with the same SHA-256. */
  duplicateLogResultIds: number[];
  /** The result's stored chart curve (for the copy and noise checks; left out, neither is judged). */
  curve?: CurvePoint[];
  /** Other results whose curve key is near this one's, with their fingerprints (db/queries gathers them). */
  curveCandidates?: { resultId: number; fingerprint: CurveFingerprint }[];
  makerProposed: boolean;
  packProposed: boolean;
};

const pct = (x: number) => `${Math.round(x * 100)} %`;
const n2 = (x: number) => (Math.round(x * 100) / 100).toString();
const finite = (xs: number[]) => xs.filter((x) => Number.isFinite(x));

function farFromGroup(value: number | null, groupValues: number[]): { median: number; factor: number } | null {
  const g = finite(groupValues);
  if (value === null || !Number.isFinite(value) || value <= 0 || g.length < MIN_GROUP_FOR_RANGE) return null;
  const m = median(g);
  if (!(m > 0)) return null;
  const factor = value / m;
  return factor > FAR_FROM_GROUP_FACTOR || factor < 1 / FAR_FROM_GROUP_FACTOR ? { median: m, factor } : null;
}

/** Modified z-score (Iglewicz & Hoaglin 1993) of the new value among the group's approved values plus itself. */
export function groupModifiedZ(value: number | null, groupValues: number[]): number | null {
  const g = finite(groupValues);
  if (value === null || !Number.isFinite(value) || g.length < MIN_GROUP_FOR_Z) return null;
  const scores = modifiedZScores([...g, value]);
  return scores[scores.length - 1] ?? null;
}

export function plausibilityFlags(input: PlausibilityInput): PlausibilityFlag[] {
  const { figures: f, method, pack, group } = input;
  const flags: PlausibilityFlag[] = [];

  const capacityRatio = f.capacityRatio ?? (f.capacityMah !== null ? f.capacityMah / pack.ratedCapacityMah : null);
  if (capacityRatio !== null && capacityRatio > CAPACITY_ABOVE_RATED_RATIO) {
    flags.push({
      code: "capacity-above-rated",
      message: `Delivered ${Math.round(f.capacityMah ?? capacityRatio * pack.ratedCapacityMah)} mAh is ${pct(capacityRatio)} of the rated ${pack.ratedCapacityMah} mAh; packs rarely deliver more than 110 % of their label. Check the pack and the current channel's calibration.`,
    });
  }

  const lr = farFromGroup(f.labelRatio, group.labelRatios);
  if (lr) {
    flags.push({
      code: "label-ratio-outside-group",
      message: `Label ratio ${n2(f.labelRatio ?? 0)} is ${n2(lr.factor)}× the group median of ${n2(lr.median)} (${group.labelRatios.length} approved results).`,
    });
  }
  const sc = farFromGroup(f.sagLimitedC, group.sagLimitedCs);
  if (sc) {
    flags.push({
      code: "sag-c-outside-group",
      message: `Sag-limited C ${n2(f.sagLimitedC ?? 0)} is ${n2(sc.factor)}× the group median of ${n2(sc.median)}C (${group.sagLimitedCs.length} approved results).`,
    });
  }

  const outliers: string[] = [];
  const zCap = groupModifiedZ(capacityRatio, group.capacityRatios);
  if (zCap !== null && Math.abs(zCap) > MODIFIED_Z_THRESHOLD) outliers.push(`capacity ratio (modified z ${n2(zCap)})`);
  const zLabel = groupModifiedZ(f.labelRatio, group.labelRatios);
  if (zLabel !== null && Math.abs(zLabel) > MODIFIED_Z_THRESHOLD)
    outliers.push(`label ratio (modified z ${n2(zLabel)})`);
  if (outliers.length) {
    flags.push({
      code: "group-outlier",
      message: `Robust outlier in its like-for-like group: ${outliers.join(", ")}; scores above ${MODIFIED_Z_THRESHOLD} are flagged (modified z-score, Iglewicz & Hoaglin 1993).`,
    });
  }

  const minV = f.minVoltagePerCellV;
  if (minV !== null && Number.isFinite(minV)) {
    if (minV < method.cutoffVPerCell - CUTOFF_UNDERSHOOT_V) {
      flags.push({
        code: "cutoff-mismatch",
        message: `The log goes down to ${n2(minV)} V per cell, below the stated cut-off of ${n2(method.cutoffVPerCell)} V: the cut-off on the method card may be wrong.`,
      });
    } else if (minV > method.cutoffVPerCell + CUTOFF_OVERSHOOT_V && f.timeToStopTemperatureS === null) {
      flags.push({
        code: "cutoff-mismatch",
        message: `The log never gets below ${n2(minV)} V per cell, well above the stated cut-off of ${n2(method.cutoffVPerCell)} V, and no stop temperature was reached: the test may have ended early.`,
      });
    }
  }

  if (
    f.startTemperatureC !== null &&
    Math.abs(f.startTemperatureC - method.ambientTemperatureC) > START_TEMPERATURE_GAP_C
  ) {
    flags.push({
      code: "temperature-mismatch",
      message: `The stated ambient is ${n2(method.ambientTemperatureC)} °C but the log starts at ${n2(f.startTemperatureC)} °C, more than ${START_TEMPERATURE_GAP_C} °C apart: the pack was not at room temperature, or a probe was misplaced.`,
    });
  }

  if (f.cells !== null && f.cells !== pack.cellsInSeries) {
    flags.push({
      code: "cells-mismatch",
      message: `The log looks like ${f.cells} cells in series but the pack is ${pack.cellsInSeries}S: wrong pack chosen, or a wrong voltage column.`,
    });
  }

  if (input.duplicateLogResultIds.length) {
    flags.push({
      code: "duplicate-log",
      message: `The same log file (identical content hash) was already submitted as result ${input.duplicateLogResultIds.map((id) => `#${id}`).join(", ")}.`,
      resultIds: input.duplicateLogResultIds,
    });
  }

  flags.push(...curveFlags(input));

  if (input.makerProposed || input.packProposed) {
    const what = [input.makerProposed ? "a new maker" : null, input.packProposed ? "a new pack" : null]
      .filter(Boolean)
      .join(" and ");
    flags.push({
      code: "proposed-catalogue",
      message: `This result proposes ${what}; check the label details before approving.`,
    });
  }

  return flags;
}

/**
 * The log's curve is another result's samples scaled or shifted (a byte-identical file is already
 * "duplicate-log"), or it has no measurement noise at all. See curve-fingerprint.ts and log-noise.ts.
 */
function curveFlags(input: PlausibilityInput): PlausibilityFlag[] {
  if (!input.curve) return [];
  const flags: PlausibilityFlag[] = [];
  const own = curveFingerprint(input.curve);
  if (own) {
    const sameFile = new Set(input.duplicateLogResultIds);
    const copies = (input.curveCandidates ?? [])
      .filter((c) => !sameFile.has(c.resultId) && compareFingerprints(own, c.fingerprint).same)
      .map((c) => c.resultId)
      .sort((a, b) => a - b);
    if (copies.length) {
      flags.push({
        code: "copied-curve",
        message: `The discharge curve is the same as the log of result ${copies.map((id) => `#${id}`).join(", ")}, only scaled or shifted: the same samples, not a new measurement. Compare the two before approving.`,
        resultIds: copies,
      });
    }
  }
  const noise = noiseCheck(input.curve);
  if (noise.judged && noise.noiseless) {
    const mv = (v: number) => `${Math.round(v * 1e6) / 1000} mV`;
    flags.push({
      code: "no-noise",
      message: `The voltage under load is smooth down to the log's last digit (${mv(noise.medianResidualV)} typical wobble at a resolution of ${mv(noise.resolutionV)}): real readings always carry some noise, so this log may have been computed rather than measured.`,
    });
  }
  return flags;
}
