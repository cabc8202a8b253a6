/**
 * The discharges of a log, whether each reached its cut-off, and which one the headline figures
 * describe: the first that reached the cut-off, else the longest — never a sum of several.
 */
import type { LoadPhase } from "./phases";
import type { Discharge } from "./types";

/** How far above the cut-off (per cell) a discharge may stop and still count as reaching it, before the sampling's own share. */
export const CUTOFF_TOLERANCE_V_PER_CELL = 0.01;
/**
 * Without a stated cut-off, a discharge that ends at or below this voltage per cell counts as run to
 * its cut-off, taken where the log ends (common practice: hobby LiPo cut-offs are 3.0–3.5 V per cell).
 */
export const LOG_END_CUTOFF_MAX_V_PER_CELL = 3.5;

export type CutoffJudgement = {
  reached: boolean;
  /** The pack cut-off used (V): the stated one × cells, or where the discharge ended; null when cells are unknown. */
  cutoffV: number | null;
  /** Pack volts above the cut-off still counted as reaching it. */
  toleranceV: number;
};

/**
 * A logger writes its last load sample up to one interval before the tester's own meter stops the
 * load, and the voltage falls fastest just there. So the tolerance is 10 mV per cell plus the fall
 * over one (median) sample interval at the end of the discharge, from its last two samples.
 */
export function judgeCutoff(
  phase: LoadPhase,
  cells: number | null,
  cutoffVPerCell: number | undefined,
  sampleIntervalS: number,
): CutoffJudgement {
  const main = phase.main;
  if (!cells || !main) return { reached: false, cutoffV: null, toleranceV: 0 };
  const interval = Number.isFinite(sampleIntervalS) ? sampleIntervalS : main.lastTimeS - main.endPrevTimeS;
  const toleranceV =
    CUTOFF_TOLERANCE_V_PER_CELL * cells + Math.max(0, main.endFallVPerS) * (Number.isFinite(interval) ? interval : 0);
  if (cutoffVPerCell !== undefined) {
    const cutoffV = cutoffVPerCell * cells;
    return { reached: phase.minVoltageV <= cutoffV + toleranceV, cutoffV, toleranceV };
  }
  return {
    reached: phase.minVoltageV / cells <= LOG_END_CUTOFF_MAX_V_PER_CELL,
    cutoffV: phase.minVoltageV,
    toleranceV: 0,
  };
}

export function describeDischarge(phase: LoadPhase, index: number, logStartS: number, reached: boolean): Discharge {
  const num = (x: number) => (Number.isFinite(x) ? x : 0);
  return {
    index,
    startS: num(phase.onsetTimeS - logStartS),
    durationS: num(phase.endTimeS - phase.onsetTimeS),
    capacityMah: num(phase.chargeAs / 3.6),
    energyWh: num(phase.energyWs / 3600),
    meanCurrentA: phase.loadTimeS > 0 ? num(phase.chargeAs / phase.loadTimeS) : num(phase.peakCurrentA),
    meanVoltageV: phase.chargeAs > 0 ? num(phase.energyWs / phase.chargeAs) : num(phase.minVoltageV),
    minVoltageV: num(phase.minVoltageV),
    reachedCutoff: reached,
    peakTemperatureC: Number.isFinite(phase.peakTemperatureC) ? phase.peakTemperatureC : null,
  };
}

/** Index (into `phases`) of the headline discharge: the first that reached its cut-off, else the longest under load. */
export function headlineIndex(phases: LoadPhase[], reached: boolean[]): number {
  const first = reached.indexOf(true);
  if (first >= 0) return first;
  let best = 0;
  phases.forEach((p, k) => {
    if (p.loadTimeS > (phases[best] as LoadPhase).loadTimeS) best = k;
  });
  return best;
}

/**
 * Time from the main stretch's onset to the cut-off: interpolated where the log crosses it; when the
 * log stops within the tolerance, extrapolated along the final fall by at most one sample interval.
 */
export function timeToCutoff(
  phase: LoadPhase,
  judgement: CutoffJudgement,
  sampleIntervalS: number,
): { timeS: number | null; extrapolated: boolean } {
  const main = phase.main;
  if (!main || !judgement.reached || judgement.cutoffV === null) return { timeS: null, extrapolated: false };
  const crossed = main.timeToVoltageS(judgement.cutoffV);
  if (Number.isFinite(crossed)) return { timeS: crossed, extrapolated: false };
  if (main.minVoltageV > judgement.cutoffV + judgement.toleranceV) return { timeS: null, extrapolated: false };
  const fall = main.endFallVPerS;
  const reach = Number.isFinite(sampleIntervalS) ? sampleIntervalS : 0;
  const more = fall > 0 ? Math.min(reach, Math.max(0, (main.lastVoltageV - judgement.cutoffV) / fall)) : 0;
  return { timeS: main.durationS + more, extrapolated: true };
}
