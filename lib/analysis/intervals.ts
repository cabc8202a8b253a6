/**
 * The sampling of a log in fixed memory: a systematic sample of the intervals between samples (for
 * their median), and the longest intervals next to a load sample (holes in the log).
 */

/** Intervals shorter than this are never holes in the log, whatever the sampling (s). */
export const GAP_MIN_S = 2;
/**
 * A hole: an interval beside a load sample more than this many times longer than the intervals on
 * either side of it (Sagline's rule; local, so a logger that writes rest rows less often than load
 * rows, or changes its rate between steps, does not count as having holes).
 */
export const GAP_FACTOR = 5;

/** Intervals kept for the median; when full, every other one is dropped and the stride doubles. */
const CAPACITY = 4096;
/** Longest load intervals remembered. */
const GAPS_KEPT = 16;

export class IntervalSample {
  private store = new Float64Array(CAPACITY);
  private size = 0;
  /** Keep one interval in every `stride`; the accumulator counts down to the next one itself. */
  stride = 1;

  keep(dtS: number): void {
    if (this.size === CAPACITY) {
      for (let k = 0; k < CAPACITY / 2; k++) this.store[k] = this.store[2 * k + 1] as number;
      this.size = CAPACITY / 2;
      this.stride *= 2;
    }
    this.store[this.size++] = dtS;
  }

  /** Median of the kept intervals (exact for up to 4,096 intervals, a systematic sample beyond); NaN if none. */
  median(): number {
    if (this.size === 0) return Number.NaN;
    const sorted = this.store.slice(0, this.size).sort();
    const mid = this.size >> 1;
    return this.size % 2 === 1 ? (sorted[mid] as number) : ((sorted[mid - 1] as number) + (sorted[mid] as number)) / 2;
  }
}

export type Gap = { startS: number; lengthS: number };

/** The longest intervals with a load sample at one end or both, longest first. */
export class GapWatch {
  private readonly gaps: Gap[] = [];
  /** Intervals up to this long cannot enter the list (it is full and they are shorter than its shortest). */
  floorS: number;

  constructor(minimumS: number) {
    this.floorS = minimumS;
  }

  offer(startS: number, lengthS: number): void {
    this.gaps.push({ startS, lengthS });
    this.gaps.sort((a, b) => b.lengthS - a.lengthS);
    if (this.gaps.length > GAPS_KEPT) this.gaps.length = GAPS_KEPT;
    if (this.gaps.length === GAPS_KEPT) this.floorS = Math.max(this.floorS, (this.gaps[GAPS_KEPT - 1] as Gap).lengthS);
  }

  /** Kept intervals longer than `thresholdS`, in log order; `more` when the list may have dropped some. */
  longerThan(thresholdS: number): { gaps: Gap[]; more: boolean } {
    const gaps = this.gaps.filter((g) => g.lengthS > thresholdS).sort((a, b) => a.startS - b.startS);
    return { gaps, more: this.gaps.length === GAPS_KEPT && gaps.length === GAPS_KEPT };
  }
}
