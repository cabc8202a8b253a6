/**
 * Two ratings, each saying what it is (definitions and sources: content/methods/figures.md).
 *
 * Sag-limited C — an ESTIMATE. The current at which the pack, at its nominal voltage, would sag to the
 * floor voltage through the resistance read at the hold point: I = S · (V nominal − V floor) ÷ R, ÷ rated Ah,
 * with R = (rest voltage − voltage at the hold point) ÷ current, the hold point being 10 s after the
 * current edge. This is the form of the pulse power capability of the HPPC test (U.S. DOE FreedomCAR
 * Battery Test Manual for Power-Assist Hybrid Electric Vehicles, DOE/ID-11069, 2003: a 10 s discharge
 * pulse resistance, I max = (OCV − V min) ÷ R; from memory), with nominal and floor voltages that are
 * common practice in hobby use. A 10 s resistance includes the first seconds of polarisation (and the
 * small open-circuit-voltage fall over them), which a 1 s reading leaves out, so it is closer to what
 * a sustained load sees; it is still an estimate, never a tested rate.
 *
 * Sustained C — MEASURED. The current the run actually drew over its discharge ÷ rated Ah, when the run
 * qualifies (SUSTAINED_RULE, every constant named below); otherwise null with the reason.
 */
import type { Read } from "./dc-resistance";
import { readAt } from "./dc-resistance";
import type { LoadPhase } from "./phases";
import { sagLimitedC } from "./resistance";
import type { Discharge, SagLimitedAssumptions, SustainedCReason, SustainedCRule } from "./types";

/** Stop temperature when the tester states none (common practice for LiPo: stop at 60 °C). */
export const DEFAULT_RATING_STOP_TEMPERATURE_C = 60;
/** The voltage may fall to the floor only in the knee near the end: after 90 % of the discharge's charge (Sagline's rule). */
export const FLOOR_HELD_SHARE = 0.9;
/** A steady load: current standard deviation at most 25 % of its mean (±20 % PWM ripple is about 12 %) (Sagline's rule). */
export const MAX_CURRENT_SPREAD = 0.25;
/** A full discharge: at least half the rated capacity delivered (Sagline's rule). */
export const MIN_DELIVERED_SHARE = 0.5;

export function sustainedRule(floorVPerCell: number, stopTemperatureC: number): SustainedCRule {
  return {
    floorVPerCell,
    stopTemperatureC,
    floorHeldShare: FLOOR_HELD_SHARE,
    maxCurrentSpread: MAX_CURRENT_SPREAD,
    minDeliveredShare: MIN_DELIVERED_SHARE,
  };
}

export type SagEstimate = { value: number | null; assumptions: SagLimitedAssumptions | null; read: Read | null };

/**
 * The estimate from the hold-point reading of the discharge's main load; when there is none (a load
 * shorter than the hold delay), from the 1 s DC resistance, and the assumptions say which.
 */
export function sagLimitedEstimate(
  phase: LoadPhase,
  cells: number | null,
  ratedMah: number | undefined,
  nominalVPerCell: number,
  floorVPerCell: number,
  holdDelayS: number,
  fallback: { ohm: number; temperatureC: number; indicative: boolean } | null,
): SagEstimate {
  const main = phase.main;
  if (!main || !cells || ratedMah === undefined) return { value: null, assumptions: null, read: null };
  const base = { nominalVPerCell, floorVPerCell };
  const temp = (x: number) => (Number.isFinite(x) ? x : null);
  if (main.restValid && main.hold.valid) {
    const read = readAt(main.hold, main.restVoltageV, main.edgeIntervalS, main.currentRipple);
    const ohm = (main.restVoltageV - read.u2V) / (read.i2A - main.restCurrentA);
    if (ohm > 0 && Number.isFinite(ohm)) {
      const value = sagLimitedC(ohm, cells, ratedMah, nominalVPerCell, floorVPerCell);
      const assumptions: SagLimitedAssumptions = {
        ...base,
        resistancePoint: "hold",
        resistanceAtS: holdDelayS,
        resistanceMohm: ohm * 1000,
        currentA: read.i2A,
        temperatureC: temp(main.hold.temperatureC),
        indicative: read.coarse || (read.noisy && !read.windowed),
      };
      return { value: Number.isFinite(value) ? value : null, assumptions, read };
    }
  }
  if (!fallback) return { value: null, assumptions: null, read: null };
  const value = sagLimitedC(fallback.ohm, cells, ratedMah, nominalVPerCell, floorVPerCell);
  const currentA = main.step?.currentA ?? Number.NaN;
  const assumptions: SagLimitedAssumptions = {
    ...base,
    resistancePoint: "step-1s",
    resistanceAtS: 1,
    resistanceMohm: fallback.ohm * 1000,
    currentA: Number.isFinite(currentA) ? currentA : main.meanCurrentA,
    temperatureC: temp(fallback.temperatureC),
    indicative: fallback.indicative,
  };
  return { value: Number.isFinite(value) ? value : null, assumptions, read: null };
}

export type SustainedInput = {
  phase: LoadPhase;
  discharge: Discharge;
  cells: number | null;
  ratedMah: number | undefined;
  rule: SustainedCRule;
  cellBelowCutoff: boolean;
};

/** Null plus the first rule the run fails, in the order below; else the measured rate. */
export function sustainedRating(input: SustainedInput): { value: number | null; reason: SustainedCReason | null } {
  const { phase, discharge: d, cells, ratedMah, rule } = input;
  const fail = (reason: SustainedCReason) => ({ value: null, reason });
  if (ratedMah === undefined || !(ratedMah > 0)) return fail("no-rated-capacity");
  if (!cells) return fail("cells-unknown");
  if (!d.reachedCutoff) return fail("cutoff-not-reached");
  if (d.capacityMah < rule.minDeliveredShare * ratedMah) return fail("partial-discharge");
  if (d.peakTemperatureC === null) return fail("no-temperature");
  if (d.peakTemperatureC >= rule.stopTemperatureC) return fail("stop-temperature-reached");
  const main = phase.main;
  if (!main) return fail("cutoff-not-reached");
  const atFloorAs = main.chargeAtVoltageAs(rule.floorVPerCell * cells);
  if (Number.isFinite(atFloorAs) && atFloorAs < rule.floorHeldShare * main.chargeAs) return fail("fell-below-floor");
  if (input.cellBelowCutoff) return fail("cell-below-cutoff");
  if (phase.currentSpread > rule.maxCurrentSpread) return fail("current-not-steady");
  return { value: d.meanCurrentA / (ratedMah / 1000), reason: null };
}
