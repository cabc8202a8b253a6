/**
 * Warnings come twice: in words for people (`warnings`) and, for the conditions programs act on, as
 * stable codes (`warningCodes`). A code never changes meaning; new conditions get new codes.
 */
export const WARNING_CODES = [
  /** The sampling is too coarse for a reading at 1 s after the current edge: the resistance is indicative. */
  "coarse-sampling",
  /** The current ripples from sample to sample, so a single-sample reading is unreliable. */
  "noisy-current",
  /** The log has holes: intervals next to a load sample much longer than its usual interval. */
  "gap",
  /** A per-cell column went below the cut-off (see minCellVoltageV and cellSpreadV). */
  "cell-below-cutoff",
  /** The headline discharge did not reach its cut-off, so there is no time to cut-off. */
  "cutoff-not-reached",
  /** Many data lines could not be read. */
  "many-skipped-lines",
  /** The log holds more than one discharge; the figures describe one of them, never their sum. */
  "several-discharges",
] as const;

export type WarningCode = (typeof WARNING_CODES)[number];

export class Warnings {
  readonly words: string[] = [];
  readonly codes: WarningCode[] = [];

  constructor(words: string[] = []) {
    this.words.push(...words);
  }

  add(words: string): void {
    this.words.push(words);
  }

  /** A coded condition, with its words (a code is listed once however often it is raised). */
  code(code: WarningCode, words: string): void {
    if (!this.codes.includes(code)) this.codes.push(code);
    this.words.push(words);
  }
}
