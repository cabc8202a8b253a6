/**
 * What the log as a whole allows: enough samples, how many lines were skipped, holes in it, and the
 * cell count (stated, from per-cell columns, or from the rest voltage).
 */
import type { Accumulator } from "./accumulator";
import { GAP_FACTOR, GAP_MIN_S } from "./intervals";
import { inferCells } from "./cells";
import { LogError } from "./errors";
import type { SampleSink } from "./sample-sink";
import type { Figures, ResolvedOptions } from "./types";
import type { Warnings } from "./warnings";

export const MIN_SAMPLES = 10;
/** Broken or out-of-order lines at or above this share of the data lines (and at least 5) are "many" (Sagline's rule). */
export const MANY_SKIPPED_SHARE = 0.01;

export function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? "" : "s"}`;
}

export function checkSamples(acc: Accumulator, sink: SampleSink): void {
  if (acc.samples < MIN_SAMPLES) {
    const broken = sink.firstBroken
      ? ` (${plural(sink.brokenLines, "line")} could not be read; the first is line ${sink.firstBroken.line}: ${sink.firstBroken.reason})`
      : "";
    throw new LogError(
      "too-few-samples",
      `The log has ${plural(acc.samples, "readable sample")}; at least ${MIN_SAMPLES} are needed${broken}.`,
      sink.firstBroken?.line,
    );
  }
  sink.checkBrokenShare(acc.samples);
}

export function skippedLines(sink: SampleSink, acc: Accumulator, w: Warnings): void {
  if (sink.brokenLines > 0 && sink.firstBroken) {
    w.add(
      `${plural(sink.brokenLines, "unreadable line")} skipped (line${sink.brokenLines > 1 ? "s" : ""} ${sink.brokenLineNumbers.join(", ")}${sink.brokenLines > sink.brokenLineNumbers.length ? ", …" : ""}); first: ${sink.firstBroken.reason}.`,
    );
  }
  if (sink.blankLines > 0) w.add(`${plural(sink.blankLines, "blank line")} skipped.`);
  if (sink.skippedBackwards > 0)
    w.add(
      `${plural(sink.skippedBackwards, "sample")} with time earlier than the sample before skipped (first on line ${sink.firstBackwardsLine}).`,
    );
  if (acc.duplicateTimes > 0)
    w.add(
      `${plural(acc.duplicateTimes, "sample")} repeat the timestamp before them; they add nothing to capacity or energy.`,
    );
  if (sink.midnights > 0)
    w.add(`The clock passed midnight ${plural(sink.midnights, "time")}; the time runs on into the next day.`);
  const bad = sink.brokenLines + sink.skippedBackwards;
  if (bad >= 5 && bad >= MANY_SKIPPED_SHARE * (acc.samples + bad)) {
    w.code(
      "many-skipped-lines",
      `${bad} of ${acc.samples + bad} data lines (${((bad / (acc.samples + bad)) * 100).toFixed(1)} %) were skipped as unreadable or out of order: check the export before trusting the figures.`,
    );
  }
}

export function gapCheck(acc: Accumulator, w: Warnings): void {
  const { gaps, more } = acc.gaps.longerThan(GAP_MIN_S);
  if (gaps.length === 0) return;
  const t0 = acc.firstTimeS;
  const listed = gaps
    .slice(0, 3)
    .map((g) => `${g.lengthS.toFixed(1)} s from ${(g.startS - t0).toFixed(1)} s`)
    .join(", ");
  w.code(
    "gap",
    `The log has ${more ? "at least " : ""}${plural(gaps.length, "hole")} beside load samples, each more than ${GAP_FACTOR} times the intervals either side and over ${GAP_MIN_S} s (${listed}${gaps.length > 3 ? ", …" : ""}); figures across a hole are interpolated.`,
  );
}

export function cellCount(
  acc: Accumulator,
  sink: SampleSink,
  opts: ResolvedOptions,
  minLoadedVoltageV: number,
  w: Warnings,
): { cells: number | null; source: Figures["cellsSource"]; restVoltageV: number } {
  const restVoltageV = acc.restSamples > 0 ? acc.maxRestVoltageV : acc.firstVoltageV;
  const plan = sink.plan;
  if (opts.cells !== undefined) {
    const perCell = restVoltageV / opts.cells;
    if (acc.restSamples > 0 && (perCell > 4.45 || perCell < 2.5)) {
      w.add(
        `The rest voltage ${restVoltageV.toFixed(2)} V is ${perCell.toFixed(2)} V per cell for ${opts.cells} cells, outside the LiPo range: check the cell count.`,
      );
    }
    return { cells: opts.cells, source: "given", restVoltageV };
  }
  if (plan && plan.cells.length > 0) return { cells: plan.cells.length, source: "cell-columns", restVoltageV };
  const guess = inferCells(restVoltageV, minLoadedVoltageV);
  const cells = guess.cells;
  if (cells === null) {
    w.add(
      `Cells in series could not be inferred from the rest voltage ${restVoltageV.toFixed(2)} V: give the cell count.`,
    );
    return { cells: null, source: null, restVoltageV };
  }
  if (acc.restSamples === 0) w.add("The log never rests, so the cell count was inferred from its first voltage.");
  if (guess.wide && guess.alternatives.length === 0)
    w.add(
      `The rest voltage ${restVoltageV.toFixed(2)} V is low for a charged pack; cells in series taken as ${cells} (${(restVoltageV / cells).toFixed(2)} V per cell): give the cell count to be sure.`,
    );
  if (guess.alternatives.length > 0) {
    w.add(
      `Cells in series inferred as ${cells} from the rest voltage ${restVoltageV.toFixed(2)} V (${(restVoltageV / cells).toFixed(2)} V per cell); ${guess.alternatives.map((n) => `${n} (${(restVoltageV / n).toFixed(2)} V)`).join(", ")} would also fit: give the cell count to be sure.`,
    );
  }
  return { cells, source: "rest-voltage", restVoltageV };
}
