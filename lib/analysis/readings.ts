/**
 * Readings at a stated time after a current edge (IEC 61960-3 reads U2 "1 s" into the high step; the
 * hold voltage is read 10 s into the load). A logger samples at its own instants, so the edge itself
 * lies somewhere between the last sample of the old level and the first of the new one: it is taken
 * at the midpoint (unbiased when the sampling phase is random), and its uncertainty is half that
 * interval. The reading is then interpolated between the load samples on either side of the stated
 * time — never across the edge — and two more instants half a second either side give the local
 * slope, so the analysis can say how much the edge's uncertainty moves the reading. Samples within
 * ±0.5 s are also summed, so a rippling current can be averaged over that window instead of read
 * from one sample.
 */

/** Half-width of the averaging window and the slope's half-span (s). */
export const READING_HALF_WINDOW_S = 0.5;
/** The first load sample may come this long after the stated time and still be used (flagged late). */
export const READING_LATE_LIMIT_S = 1;

export class PointReading {
  /** Absolute time of the reading (edge + stated delay). */
  readonly atS: number;
  done = false;
  voltageV = Number.NaN;
  currentA = Number.NaN;
  temperatureC = Number.NaN;
  /** No load sample fell before the stated time: the first one after it was used, this many seconds late. */
  lateByS = 0;
  /** Load-only points either side of the stated time, for the slope. */
  leftT = Number.NaN;
  leftV = Number.NaN;
  rightT = Number.NaN;
  rightV = Number.NaN;
  /** Samples in [atS − 0.5 s, atS + 0.5 s] and their sums. */
  windowSamples = 0;
  windowSumV = 0;
  windowSumA = 0;
  /** The level ended before the stated time and its last sample (this much earlier) was used. */
  earlyByS = 0;
  private seenT = Number.NaN;
  private seenV = Number.NaN;
  private seenI = Number.NaN;
  private seenTemp = Number.NaN;

  constructor(atS: number) {
    this.atS = atS;
  }

  /** When the next sample matters (earlier ones only become the previous sample). */
  get fromS(): number {
    return this.atS - READING_HALF_WINDOW_S;
  }

  /**
   * One load sample of the new level, in time order; `hasPrev` is false for the level's first sample
   * (its predecessor belongs to the old level and must not be interpolated with).
   */
  add(
    hasPrev: boolean,
    pt: number,
    pv: number,
    pi: number,
    ptemp: number,
    t: number,
    v: number,
    i: number,
    temp: number,
  ): void {
    if (this.done) return;
    this.seenT = t;
    this.seenV = v;
    this.seenI = i;
    this.seenTemp = temp;
    const h = READING_HALF_WINDOW_S;
    const at = this.atS;
    if (t >= at - h && t <= at + h) {
      this.windowSamples++;
      this.windowSumV += v;
      this.windowSumA += i;
    }
    const usePrev = hasPrev && pt < t;
    if (this.leftT !== this.leftT && t >= at - h) {
      if (usePrev && pt < at - h) {
        this.leftT = at - h;
        this.leftV = lerp(pt, pv, t, v, at - h);
      } else {
        this.leftT = t;
        this.leftV = v;
      }
    }
    if (this.voltageV !== this.voltageV && t >= at) {
      if (usePrev && pt < at) {
        this.voltageV = lerp(pt, pv, t, v, at);
        this.currentA = lerp(pt, pi, t, i, at);
        this.temperatureC = ptemp === ptemp && temp === temp ? lerp(pt, ptemp, t, temp, at) : temp;
      } else if (t - at <= READING_LATE_LIMIT_S) {
        this.voltageV = v;
        this.currentA = i;
        this.temperatureC = temp;
        this.lateByS = t - at;
      } else {
        this.done = true; // no sample near enough: no reading
        return;
      }
    }
    if (t >= at + h) {
      if (usePrev && pt < at + h) {
        this.rightT = at + h;
        this.rightV = lerp(pt, pv, t, v, at + h);
      } else {
        this.rightT = t;
        this.rightV = v;
      }
      this.done = true;
    }
  }

  /**
   * The level ended before the reading was complete: keep what is there. A level that ended at most
   * `maxEarlyS` before the stated time (a 1 s pulse whose edge is known only to ±half an interval)
   * is read at its last sample.
   */
  close(maxEarlyS = 0): void {
    if (this.done) return;
    this.done = true;
    const early = this.atS - this.seenT;
    if (this.voltageV !== this.voltageV && early >= 0 && early <= maxEarlyS) {
      this.voltageV = this.seenV;
      this.currentA = this.seenI;
      this.temperatureC = this.seenTemp;
      this.earlyByS = early;
    }
    if (this.rightT !== this.rightT && this.seenT > this.leftT) {
      this.rightT = this.seenT;
      this.rightV = this.seenV;
    }
  }

  get valid(): boolean {
    return this.voltageV === this.voltageV;
  }

  /** Volts per second around the reading, from load samples only; NaN when there is no span. */
  get slopeVPerS(): number {
    const span = this.rightT - this.leftT;
    return span > 0 ? (this.rightV - this.leftV) / span : Number.NaN;
  }
}

export function lerp(t0: number, y0: number, t1: number, y1: number, t: number): number {
  if (t1 === t0) return y1;
  return y0 + ((y1 - y0) * (t - t0)) / (t1 - t0);
}
