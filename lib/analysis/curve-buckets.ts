/**
 * Bounded, streaming reduction of a log for charts. Time is cut into at most `bucketCount`
 * equal buckets; each keeps three samples (its first, its lowest voltage, its highest voltage).
 * When the log outgrows the buckets, neighbours merge and the bucket width doubles, so memory
 * stays fixed however long the log. The result is then thinned with LTTB (see downsample.ts).
 */
export type RawCurvePoint = {
  timeS: number;
  voltageV: number;
  currentA: number;
  temperatureC: number;
  /** Running charge moved with positive and with negative current (A·s); which one is discharge is known only at the end. */
  positiveChargeAs: number;
  negativeChargeAs: number;
};

/** The columns pushAt reads: a sample batch with its running charges. */
export type CurveColumns = {
  timeS: Float64Array;
  voltageV: Float64Array;
  currentA: Float64Array;
  temperatureC: Float64Array;
  positiveChargeAs: Float64Array;
  negativeChargeAs: Float64Array;
};

const FIELDS = 6;
const SLOTS = 3; // first, min voltage, max voltage

export class CurveBuckets {
  private readonly bucketCount: number;
  private readonly data: Float64Array;
  private readonly filled: Uint8Array;
  private originS = Number.NaN;
  private widthS = 1e-3;
  private current = 0;
  private currentEndS = Number.NEGATIVE_INFINITY;

  constructor(bucketCount = 512) {
    this.bucketCount = bucketCount;
    this.data = new Float64Array(bucketCount * SLOTS * FIELDS);
    this.filled = new Uint8Array(bucketCount);
  }

  push(t: number, v: number, i: number, temp: number, qPos: number, qNeg: number): void {
    const b = scratch;
    b.timeS[0] = t;
    b.voltageV[0] = v;
    b.currentA[0] = i;
    b.temperatureC[0] = temp;
    b.positiveChargeAs[0] = qPos;
    b.negativeChargeAs[0] = qNeg;
    this.pushAt(b, 0);
  }

  /**
   * Sample k of the columns. Runs once per sample: takes the columns, not numbers, so no double is
   * boxed for the call; the rarely needed fields are read only when a slot is written.
   */
  pushAt(cols: CurveColumns, k: number): void {
    const t = cols.timeS[k] as number;
    const v = cols.voltageV[k] as number;
    let index = this.current;
    if (!(t < this.currentEndS)) {
      // Time only moves forward, so the bucket index changes rarely: divide only then.
      if (this.originS !== this.originS) this.originS = t;
      index = Math.floor((t - this.originS) / this.widthS);
      while (index >= this.bucketCount) {
        this.mergePairs();
        index = Math.floor((t - this.originS) / this.widthS);
      }
      this.current = index;
      this.currentEndS = this.originS + (index + 1) * this.widthS;
    }
    const d = this.data;
    const base = index * SLOTS * FIELDS;
    if (this.filled[index] === 0) {
      this.filled[index] = 1;
      for (let s = 0; s < SLOTS; s++) write(d, base + s * FIELDS, cols, k);
    } else {
      if (v < (d[base + FIELDS + 1] as number)) write(d, base + FIELDS, cols, k);
      if (v > (d[base + 2 * FIELDS + 1] as number)) write(d, base + 2 * FIELDS, cols, k);
    }
  }

  private mergePairs(): void {
    const d = this.data;
    const size = SLOTS * FIELDS;
    const half = this.bucketCount / 2;
    for (let k = 0; k < half; k++) {
      const a = 2 * k;
      const b = 2 * k + 1;
      const target = k * size;
      const fa = this.filled[a] === 1;
      const fb = this.filled[b] === 1;
      if (fa && fb) {
        const aBase = a * size;
        const bBase = b * size;
        const first = aBase;
        const min =
          (d[aBase + FIELDS + 1] as number) <= (d[bBase + FIELDS + 1] as number) ? aBase + FIELDS : bBase + FIELDS;
        const max =
          (d[aBase + 2 * FIELDS + 1] as number) >= (d[bBase + 2 * FIELDS + 1] as number)
            ? aBase + 2 * FIELDS
            : bBase + 2 * FIELDS;
        const tmp = new Float64Array(size);
        tmp.set(d.subarray(first, first + FIELDS), 0);
        tmp.set(d.subarray(min, min + FIELDS), FIELDS);
        tmp.set(d.subarray(max, max + FIELDS), 2 * FIELDS);
        d.set(tmp, target);
      } else if (fa || fb) {
        const src = (fa ? a : b) * size;
        d.copyWithin(target, src, src + size);
      }
      this.filled[k] = fa || fb ? 1 : 0;
    }
    this.filled.fill(0, half);
    this.widthS *= 2;
    this.currentEndS = Number.NEGATIVE_INFINITY;
  }

  /** Kept samples in time order, without repeats, ending with `last` (the log's final sample). */
  points(last: RawCurvePoint | null): RawCurvePoint[] {
    const out: RawCurvePoint[] = [];
    const d = this.data;
    for (let k = 0; k < this.bucketCount; k++) {
      if (this.filled[k] !== 1) continue;
      const base = k * SLOTS * FIELDS;
      const slots = [base, base + FIELDS, base + 2 * FIELDS].sort((x, y) => (d[x] as number) - (d[y] as number));
      for (const s of slots) {
        const prev = out[out.length - 1];
        if (prev && prev.timeS === d[s] && prev.voltageV === d[s + 1]) continue;
        out.push(read(d, s));
      }
    }
    if (last) {
      const prev = out[out.length - 1];
      if (!prev || prev.timeS !== last.timeS || prev.voltageV !== last.voltageV) out.push(last);
    }
    return out;
  }
}

function write(d: Float64Array, at: number, cols: CurveColumns, k: number): void {
  d[at] = cols.timeS[k] as number;
  d[at + 1] = cols.voltageV[k] as number;
  d[at + 2] = cols.currentA[k] as number;
  d[at + 3] = cols.temperatureC[k] as number;
  d[at + 4] = cols.positiveChargeAs[k] as number;
  d[at + 5] = cols.negativeChargeAs[k] as number;
}

/** One-sample columns for push(), the entry point outside the batch loop. */
const scratch: CurveColumns = {
  timeS: new Float64Array(1),
  voltageV: new Float64Array(1),
  currentA: new Float64Array(1),
  temperatureC: new Float64Array(1),
  positiveChargeAs: new Float64Array(1),
  negativeChargeAs: new Float64Array(1),
};

function read(d: Float64Array, at: number): RawCurvePoint {
  return {
    timeS: d[at] as number,
    voltageV: d[at + 1] as number,
    currentA: d[at + 2] as number,
    temperatureC: d[at + 3] as number,
    positiveChargeAs: d[at + 4] as number,
    negativeChargeAs: d[at + 5] as number,
  };
}
