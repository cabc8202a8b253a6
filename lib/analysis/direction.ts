/**
 * Which sign of current is discharge. Testers log it either way, so the data decides:
 * a pack's voltage falls when discharge current rises (V = OCV − I·R), whatever the sign
 * convention. Clues, strongest first:
 *  1. current steps: Σ ΔV·ΔI over samples where the current jumps; negative ⇒ positive current
 *     is discharge (rest→load and load→rest both count, charges too).
 *  2. drift under load: Σ sign(I)·ΔV inside load stretches; negative ⇒ positive is discharge
 *     (voltage sags through a discharge and climbs through a charge).
 *  3. otherwise the direction that moved more charge, which is positive in most hobby logs.
 */
import type { Accumulator } from "./accumulator";

export type DirectionVerdict = { sign: 1 | -1; clue: "steps" | "drift" | "charge" };

/** A clue counts when it is at least this share of its own absolute sum. */
const STEP_CLARITY = 0.2;
/** Volts of net drift needed before drift is trusted. */
const DRIFT_MIN_V = 0.005;

export function dischargeDirection(acc: Accumulator): DirectionVerdict {
  if (acc.stepScoreAbs > 0 && Math.abs(acc.stepScore) >= STEP_CLARITY * acc.stepScoreAbs) {
    return { sign: acc.stepScore < 0 ? 1 : -1, clue: "steps" };
  }
  if (Math.abs(acc.trendScore) >= DRIFT_MIN_V) return { sign: acc.trendScore < 0 ? 1 : -1, clue: "drift" };
  return { sign: acc.positive.chargeAs >= acc.negative.chargeAs ? 1 : -1, clue: "charge" };
}
