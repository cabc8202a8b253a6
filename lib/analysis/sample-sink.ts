/**
 * Turns papaparse rows into samples: waits for the first rows to find the header and
 * columns, then reads numbers on a fast path into column batches for the accumulator.
 * Blank and broken lines are skipped and counted, never fatal on their own; time that runs
 * backwards for a stretch is.
 */
import { type Accumulator, SampleBatch } from "./accumulator";
import { type ColumnMapping, type ColumnPlan, type SampleRow, planColumns } from "./columns";
import type { Dialect } from "./dialect";
import { LogError } from "./errors";
import type { RowHandler } from "./reader";
import { VOLTAGE_UNITS, parseField } from "./units";

/** Module-local binding: a direct call on the hot path, whatever the module format. */
const readNumber = parseField;

/** Rows gathered before the columns are decided. */
const PLAN_ROWS = 40;
/** Values outside these are read as a broken line, not a measurement. */
const MAX_ABS_TIME_S = 1e9;
const MAX_PACK_V = 1000;
const MAX_ABS_CURRENT_A = 10000;
const MIN_TEMP_C = -100;
const MAX_TEMP_C = 300;
/** Unlabelled voltages above this are millivolts: no hobby pack reaches 150 V (24S full is 100.8 V). */
const MILLIVOLT_GUESS_V = 150;
/** Samples in a row with time earlier than the last good one before the log is refused. */
export const BACKWARDS_RUN_LIMIT = 3;
const DAY_S = 86400;
/** A clock that jumps back by more than this (and lands within an hour after midnight's worth) passed midnight. */
const MIDNIGHT_JUMP_MIN_S = DAY_S / 2;

export class SampleSink implements RowHandler {
  plan: ColumnPlan | null = null;
  blankLines = 0;
  brokenLines = 0;
  preambleLines = 0;
  firstBroken: { line: number; reason: string } | null = null;
  brokenLineNumbers: number[] = [];
  skippedBackwards = 0;
  firstBackwardsLine = 0;
  readonly warnings: string[] = [];
  private decimalComma = false;
  private buffered: SampleRow[] = [];
  private voltageScale = 1;
  private readonly batch = new SampleBatch();
  private lastTimeS = Number.NEGATIVE_INFINITY;
  private lastGoodLine = 0;
  private backwardsRun = 0;
  /** Added to every time read after a clock-time log passed midnight (one day per passing). */
  private dayOffsetS = 0;
  midnights = 0;

  constructor(
    private readonly accumulator: Accumulator,
    private readonly mapping: ColumnMapping | undefined,
  ) {}

  begin(dialect: Dialect): void {
    this.decimalComma = dialect.decimalComma;
  }

  rows(rows: string[][], count: number, firstLine: number): void {
    if (this.plan) {
      this.read(rows, 0, count, firstLine);
      return;
    }
    for (let k = 0; k < count; k++) {
      const fields = rows[k] as string[];
      if (this.plan) {
        this.read(rows, k, count, firstLine + k);
        return;
      }
      if (fields.length === 1 && (fields[0] as string).trim().length === 0) this.blankLines++;
      else this.buffered.push({ fields, line: firstLine + k });
      if (this.buffered.length >= PLAN_ROWS) this.decide();
    }
  }

  end(): void {
    if (!this.plan) this.decide();
  }

  private decide(): void {
    const plan = planColumns(this.buffered, this.decimalComma, this.mapping);
    this.plan = plan;
    this.voltageScale = plan.voltageUnit.scale;
    if (!plan.voltageUnitStated) this.guessMillivolts(plan);
    const kept = this.buffered;
    this.buffered = [];
    const data: string[][] = [];
    let firstLine = 0;
    for (const r of kept) {
      if (r.line < plan.headerLine) this.preambleLines++;
      else if (r.line > plan.headerLine) {
        // Replay the buffered rows line by line so line numbers stay exact around blanks.
        if (data.length > 0 && r.line !== firstLine + data.length) {
          this.read(data, 0, data.length, firstLine);
          data.length = 0;
        }
        if (data.length === 0) firstLine = r.line;
        data.push(r.fields);
      }
    }
    if (data.length > 0) this.read(data, 0, data.length, firstLine);
    if (this.preambleLines > 0)
      this.warnings.push(
        `${this.preambleLines} line${this.preambleLines > 1 ? "s" : ""} before the header row skipped.`,
      );
  }

  private guessMillivolts(plan: ColumnPlan): void {
    const values: number[] = [];
    const column = plan.voltage ?? plan.cells[0] ?? -1;
    for (const r of this.buffered) {
      if (r.line <= plan.headerLine) continue;
      const x = readNumber(r.fields[column], this.decimalComma);
      if (x === x) values.push(x);
    }
    values.sort((a, b) => a - b);
    const middle = values[Math.floor(values.length / 2)];
    if (middle !== undefined && middle > MILLIVOLT_GUESS_V) {
      this.voltageScale = VOLTAGE_UNITS.mV.scale;
      this.warnings.push(
        "The voltage column states no unit and its values are too large for volts: read as millivolts.",
      );
    }
  }

  private broken(line: number, reason: string): void {
    this.brokenLines++;
    if (this.brokenLineNumbers.length < 10) this.brokenLineNumbers.push(line);
    if (!this.firstBroken) this.firstBroken = { line, reason };
  }

  /** The hot loop: rows[from..to) are lines firstLine + (k − from). */
  private read(rows: string[][], from: number, to: number, firstLine: number): void {
    const plan = this.plan as ColumnPlan;
    const batch = this.batch;
    batch.reserve(to - from);
    const T = batch.timeS;
    const V = batch.voltageV;
    const I = batch.currentA;
    const TEMP = batch.temperatureC;
    const CELL = batch.minCellVoltageV;
    const SPREAD = batch.cellSpreadV;
    const dc = this.decimalComma;
    const width = plan.width;
    const ti = plan.time;
    const ii = plan.current;
    const vi = plan.voltage ?? -1;
    const tempi = plan.temperature ?? -1;
    const cells = plan.cells;
    const tScale = plan.timeUnit.scale;
    const iScale = plan.currentUnit.scale;
    const vScale = this.voltageScale;
    const tempScale = plan.temperatureUnit.scale;
    const tempOffset = plan.temperatureUnit.offset;
    let lastT = this.lastTimeS;
    let dayOffsetS = this.dayOffsetS;
    let lastGood = -1;
    let n = 0;
    for (let k = from; k < to; k++) {
      const fields = rows[k] as string[];
      if (fields.length < width) {
        if (fields.length === 1 && (fields[0] as string).trim().length === 0) this.blankLines++;
        else
          this.broken(
            firstLine + k - from,
            `it has ${fields.length} field${fields.length === 1 ? "" : "s"}, ${width} needed`,
          );
        continue;
      }
      let t = readNumber(fields[ti], dc) * tScale + dayOffsetS;
      const i = readNumber(fields[ii], dc) * iScale;
      let v: number;
      let minCell = Number.POSITIVE_INFINITY;
      let spread = 0;
      if (cells.length > 0) {
        v = 0;
        let maxCell = Number.NEGATIVE_INFINITY;
        for (let c = 0; c < cells.length; c++) {
          const x = readNumber(fields[cells[c] as number], dc) * vScale;
          v += x;
          if (x < minCell) minCell = x;
          if (x > maxCell) maxCell = x;
        }
        if (!(minCell >= 0 && minCell <= MAX_PACK_V)) minCell = Number.POSITIVE_INFINITY;
        else spread = maxCell - minCell;
        if (vi >= 0) v = readNumber(fields[vi], dc) * vScale;
      } else v = readNumber(fields[vi], dc) * vScale;
      if (!(t >= -MAX_ABS_TIME_S && t <= MAX_ABS_TIME_S)) {
        this.broken(firstLine + k - from, `time "${fields[ti]}" is not a usable number`);
        continue;
      }
      if (!(v >= 0 && v <= MAX_PACK_V)) {
        this.broken(
          firstLine + k - from,
          `voltage "${vi >= 0 ? fields[vi] : "(sum of cells)"}" is not a usable number`,
        );
        continue;
      }
      if (!(i >= -MAX_ABS_CURRENT_A && i <= MAX_ABS_CURRENT_A)) {
        this.broken(firstLine + k - from, `current "${fields[ii]}" is not a usable number`);
        continue;
      }
      if (
        t < lastT &&
        lastT - t > MIDNIGHT_JUMP_MIN_S &&
        t + DAY_S - lastT < 3600 &&
        (fields[ti] as string).includes(":")
      ) {
        // Clock time ("hh:mm:ss") that passed midnight: the clock runs on, a day later.
        dayOffsetS += DAY_S;
        this.dayOffsetS = dayOffsetS;
        this.midnights++;
        t += DAY_S;
      }
      if (t < lastT) {
        if (lastGood >= 0) {
          this.lastGoodLine = firstLine + lastGood - from;
          this.backwardsRun = 0;
          lastGood = -1;
        }
        this.backwards(firstLine + k - from, t, lastT);
        continue;
      }
      lastGood = k;
      lastT = t;
      let temp = Number.NaN;
      if (tempi >= 0) {
        temp = readNumber(fields[tempi], dc) * tempScale + tempOffset;
        if (!(temp >= MIN_TEMP_C && temp <= MAX_TEMP_C)) temp = Number.NaN;
      }
      T[n] = t;
      V[n] = v;
      I[n] = i;
      TEMP[n] = temp;
      CELL[n] = minCell;
      SPREAD[n] = spread;
      n++;
    }
    this.lastTimeS = lastT;
    if (lastGood >= 0) {
      this.lastGoodLine = firstLine + lastGood - from;
      this.backwardsRun = 0;
    }
    if (n > 0) this.accumulator.pushBatch(batch, n);
  }

  private backwards(line: number, t: number, lastT: number): void {
    this.backwardsRun++;
    this.skippedBackwards++;
    if (this.firstBackwardsLine === 0) this.firstBackwardsLine = line;
    if (this.backwardsRun >= BACKWARDS_RUN_LIMIT) {
      const startLine = line - BACKWARDS_RUN_LIMIT + 1;
      throw new LogError(
        "time-backwards",
        `Time goes backwards from line ${startLine} (to ${round(t)} s, after ${round(lastT)} s on line ${this.lastGoodLine}) and stays behind: a log needs one running clock; split logs whose clock restarts.`,
        startLine,
      );
    }
  }

  /** Throws when so much of the log is unreadable that figures from the rest would mislead. */
  checkBrokenShare(samples: number): void {
    if (this.brokenLines > 5 && this.brokenLines > samples && this.firstBroken) {
      throw new LogError(
        "too-many-broken-lines",
        `${this.brokenLines} of ${this.brokenLines + samples} data lines could not be read; the first is line ${this.firstBroken.line}: ${this.firstBroken.reason}.`,
        this.firstBroken.line,
      );
    }
  }
}

function round(x: number): string {
  return String(Math.round(x * 1000) / 1000);
}
