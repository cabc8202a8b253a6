/**
 * From the running state of a whole log to the published figures. Definitions are in
 * content/methods-figures.md; each number here is null when the log cannot support it.
 */
import type { Accumulator, DirectionTotals } from "./accumulator";
import { resistanceAtTemperature } from "./arrhenius";
import { inferCells } from "./cells";
import { dischargeDirection } from "./direction";
import { LogError } from "./errors";
import { matchesTwoLevelCurrents, sagLimitedC, twoLevelResistanceOhm } from "./resistance";
import type { SampleSink } from "./sample-sink";
import type { Stretch } from "./stretch";
import type { Figures, ResolvedOptions } from "./types";

export const MIN_SAMPLES = 10;
/** How far above the stated cut-off (per cell) a discharge may stop and still count as reaching it. */
export const CUTOFF_TOLERANCE_V_PER_CELL = 0.01;

function num(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}

function div(a: number | null, b: number | null | undefined): number | null {
  if (a === null || b === null || b === undefined || !(b !== 0)) return null;
  return num(a / b);
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? "" : "s"}`;
}

function checkSamples(acc: Accumulator, sink: SampleSink): void {
  if (acc.samples < MIN_SAMPLES) {
    const broken = sink.firstBroken ? ` (${plural(sink.brokenLines, "line")} could not be read; the first is line ${sink.firstBroken.line}: ${sink.firstBroken.reason})` : "";
    throw new LogError("too-few-samples", `The log has ${plural(acc.samples, "readable sample")}; at least ${MIN_SAMPLES} are needed${broken}.`, sink.firstBroken?.line);
  }
  sink.checkBrokenShare(acc.samples);
}

function skippedWarning(sink: SampleSink, acc: Accumulator): string[] {
  const out: string[] = [];
  if (sink.brokenLines > 0 && sink.firstBroken) {
    out.push(`${plural(sink.brokenLines, "unreadable line")} skipped (line${sink.brokenLines > 1 ? "s" : ""} ${sink.brokenLineNumbers.join(", ")}${sink.brokenLines > sink.brokenLineNumbers.length ? ", …" : ""}); first: ${sink.firstBroken.reason}.`);
  }
  if (sink.blankLines > 0) out.push(`${plural(sink.blankLines, "blank line")} skipped.`);
  if (sink.skippedBackwards > 0) out.push(`${plural(sink.skippedBackwards, "sample")} with time earlier than the sample before skipped (first on line ${sink.firstBackwardsLine}).`);
  if (acc.duplicateTimes > 0) out.push(`${plural(acc.duplicateTimes, "sample")} repeat the timestamp before them; they add nothing to capacity or energy.`);
  return out;
}

type Resistance = { ohm: number; method: "iec-61960-two-level" | "step"; temperatureC: number };

function dcResistance(side: DirectionTotals, main: Stretch, sign: number, opts: ResolvedOptions, warnings: string[]): Resistance | null {
  const reading = side.twoLevel?.twoLevel ?? null;
  if (reading) {
    const ohm = twoLevelResistanceOhm(reading.u1V, reading.i1A, reading.u2V, reading.i2A);
    const fitsRating = opts.ratedMah === undefined || matchesTwoLevelCurrents(reading.i1A, reading.i2A, opts.ratedMah);
    if (!fitsRating) {
      warnings.push(`A two-level step was found (${reading.i1A.toFixed(2)} A then ${reading.i2A.toFixed(2)} A) but its currents are not ≈0.2 It and ≈1 It for ${opts.ratedMah} mAh; the rest→load step is used instead.`);
    } else if (ohm > 0) {
      if (reading.late) warnings.push("No sample fell exactly 1 s into the high step of the two-level test; the nearest one was used.");
      return { ohm, method: "iec-61960-two-level", temperatureC: reading.temperatureC };
    } else warnings.push("The two-level step gave a resistance of zero or less (noise or a logging fault); it is not reported.");
  }
  if (!main.restValid) {
    warnings.push("The main discharge does not start from rest, so no DC resistance can be read from its first second.");
    return null;
  }
  if (!Number.isFinite(main.stepVoltageV)) {
    warnings.push("No sample within 2 s of the start of the main discharge: sampling is too coarse for a DC resistance.");
    return null;
  }
  const ohm = twoLevelResistanceOhm(main.restVoltageV, main.restCurrentA, main.stepVoltageV, main.stepCurrentA);
  if (!(ohm > 0)) {
    warnings.push("The rest→load step gave a resistance of zero or less (noise or a logging fault); it is not reported.");
    return null;
  }
  if (main.stepSampledLate) warnings.push("The first load sample came later than 1 s after the step; the step resistance uses it and reads a little high.");
  return { ohm, method: "step", temperatureC: main.stepTemperatureC };
}

export function computeFigures(acc: Accumulator, sink: SampleSink, opts: ResolvedOptions): { figures: Figures; sign: 1 | -1 } {
  acc.finish();
  checkSamples(acc, sink);
  const warnings: string[] = [...sink.warnings, ...skippedWarning(sink, acc)];
  const direction = dischargeDirection(acc);
  const sign = direction.sign;
  const side = sign === 1 ? acc.positive : acc.negative;
  const other = sign === 1 ? acc.negative : acc.positive;
  const main = side.best;
  if (!main) {
    const charging = other.best ? " The current only ever flows the charging way (voltage rises with it)." : " The current never rises above the load threshold.";
    throw new LogError("no-discharge", `No discharge found in the log.${charging} Check the current column and its unit.`);
  }
  if (sign === -1) warnings.push("Discharge current is logged as negative; figures use it as positive.");

  const plan = sink.plan;
  const restVoltageV = acc.restSamples > 0 ? acc.maxRestVoltageV : acc.firstVoltageV;
  let cells: number | null = opts.cells ?? null;
  let cellsSource: Figures["cellsSource"] = cells !== null ? "given" : null;
  if (cells === null && plan && plan.cells.length > 0) {
    cells = plan.cells.length;
    cellsSource = "cell-columns";
  }
  if (cells === null) {
    const guess = inferCells(restVoltageV, side.minVoltageV);
    cells = guess.cells;
    cellsSource = cells !== null ? "rest-voltage" : null;
    if (cells === null) warnings.push(`Cells in series could not be inferred from the rest voltage ${restVoltageV.toFixed(2)} V: give the cell count.`);
    else {
      if (acc.restSamples === 0) warnings.push("The log never rests, so the cell count was inferred from its first voltage.");
      if (guess.wide && guess.alternatives.length === 0) warnings.push(`The rest voltage ${restVoltageV.toFixed(2)} V is low for a charged pack; cells in series taken as ${cells} (${(restVoltageV / cells).toFixed(2)} V per cell): give the cell count to be sure.`);
      if (guess.alternatives.length > 0) {
        warnings.push(`Cells in series inferred as ${cells} from the rest voltage ${restVoltageV.toFixed(2)} V (${(restVoltageV / cells).toFixed(2)} V per cell); ${guess.alternatives.map((n) => `${n} (${(restVoltageV / n).toFixed(2)} V)`).join(", ")} would also fit: give the cell count to be sure.`);
      }
    }
  } else if (acc.restSamples > 0 && (restVoltageV / cells > 4.45 || restVoltageV / cells < 2.5)) {
    warnings.push(`The rest voltage ${restVoltageV.toFixed(2)} V is ${(restVoltageV / cells).toFixed(2)} V per cell for ${cells} cells, outside the LiPo range: check the cell count.`);
  }

  const capacityMah = side.chargeAs / 3.6;
  const energyWh = side.energyWs / 3600;
  const meanVoltageV = side.chargeAs > 0 ? side.energyWs / side.chargeAs : Number.NaN;
  const minVoltageV = side.minVoltageV;
  const perCell = (x: number | null) => (cells ? div(x, cells) : null);

  const startTemperatureC = num(main.startTemperatureC);
  const peakTemperatureC = num(main.peakTemperatureC);
  const temperatureRiseC = startTemperatureC !== null && peakTemperatureC !== null ? peakTemperatureC - startTemperatureC : null;
  if (acc.temperatureSamples === 0 && plan?.temperature !== null && plan !== null) warnings.push("The temperature column holds no usable value.");

  let timeToCutoffS: number | null = main.durationS;
  if (opts.cutoffVPerCell !== undefined) {
    timeToCutoffS = cells ? num(main.timeToVoltageS(opts.cutoffVPerCell * cells)) : null;
    // Equipment stops at the cut-off by its own meter; a log that ends a few mV short counts as reaching it.
    if (cells && timeToCutoffS === null && main.minVoltageV <= (opts.cutoffVPerCell + CUTOFF_TOLERANCE_V_PER_CELL) * cells) {
      timeToCutoffS = num(main.timeToVoltageS(main.minVoltageV));
      warnings.push(`The main discharge stopped within ${CUTOFF_TOLERANCE_V_PER_CELL * 1000} mV per cell of the ${opts.cutoffVPerCell} V cut-off; its lowest voltage is taken as the cut-off.`);
    } else if (cells && timeToCutoffS === null) warnings.push(`The main discharge never reached the cut-off of ${opts.cutoffVPerCell} V per cell.`);
  }
  const timeToStopTemperatureS = opts.stopTemperatureC !== undefined ? num(main.stopTemperatureTimeS - main.onsetTimeS) : null;

  let holdVoltagePerCellV = perCell(num(main.holdVoltageV));
  if (holdVoltagePerCellV === null && main.durationS < opts.holdDelayS) warnings.push(`The main discharge is shorter than the hold delay of ${opts.holdDelayS} s, so there is no hold voltage.`);
  if (main.holdSampledLate && holdVoltagePerCellV !== null) warnings.push(`No sample fell exactly ${opts.holdDelayS} s into the main discharge; the next one was used for the hold voltage.`);
  if (holdVoltagePerCellV !== null && !cells) holdVoltagePerCellV = null;

  const r = dcResistance(side, main, sign, opts, warnings);
  const dcResistanceMohm = r ? r.ohm * 1000 : null;
  let resistanceTemperatureC = r ? (num(r.temperatureC) ?? startTemperatureC) : null;
  if (r && resistanceTemperatureC === null && opts.packStartTemperatureC !== undefined) {
    resistanceTemperatureC = opts.packStartTemperatureC;
    warnings.push("The log has no temperature at the resistance step; the pack start temperature from the method card is used for the 25 °C estimate.");
  }
  const resistanceAt25CMohm =
    dcResistanceMohm !== null && resistanceTemperatureC !== null ? num(resistanceAtTemperature(dcResistanceMohm, resistanceTemperatureC, 25, opts.activationEnergyKJPerMol)) : null;
  const sag = r && cells && opts.ratedMah !== undefined ? num(sagLimitedC(r.ohm, cells, opts.ratedMah, opts.nominalVPerCell, opts.floorVPerCell)) : null;
  const kg = opts.weightG !== undefined ? opts.weightG / 1000 : null;
  const mainDurationS = main.durationS;
  const mainMeanPowerW = mainDurationS > 0 ? main.energyWs / mainDurationS : Number.NaN;

  const figures: Figures = {
    samples: acc.samples,
    skippedLines: sink.blankLines + sink.brokenLines + sink.preambleLines + sink.skippedBackwards,
    durationS: num(acc.lastTimeS - acc.firstTimeS) ?? 0,
    cells,
    capacityMah: num(capacityMah),
    energyWh: num(energyWh),
    meanVoltageV: num(meanVoltageV),
    meanVoltagePerCellV: perCell(num(meanVoltageV)),
    minVoltageV: num(minVoltageV),
    minVoltagePerCellV: perCell(num(minVoltageV)),
    peakCurrentA: num(side.peakCurrentA),
    startTemperatureC,
    peakTemperatureC,
    temperatureRiseC: temperatureRiseC === null ? null : num(temperatureRiseC),
    timeToCutoffS: timeToCutoffS === null ? null : num(timeToCutoffS),
    timeToStopTemperatureS,
    holdVoltagePerCellV,
    dcResistanceMohm: dcResistanceMohm === null ? null : num(dcResistanceMohm),
    dcResistancePerCellMohm: perCell(dcResistanceMohm),
    dcResistanceMethod: r ? r.method : null,
    resistanceAt25CMohm,
    resistanceTemperatureC,
    sagLimitedC: sag,
    capacityRatio: opts.ratedMah !== undefined ? div(capacityMah, opts.ratedMah) : null,
    labelRatio: sag !== null && opts.labelledC !== undefined ? div(sag, opts.labelledC) : null,
    specificEnergyWhKg: kg !== null ? div(energyWh, kg) : null,
    specificPowerWKg: kg !== null ? div(num(mainMeanPowerW), kg) : null,
    mainDischargeCurrentA: mainDurationS > 0 ? num(main.chargeAs / mainDurationS) : null,
    mainDischargeDurationS: num(mainDurationS),
    mainDischargeCapacityMah: num(main.chargeAs / 3.6),
    mainDischargeEnergyWh: num(main.energyWs / 3600),
    restVoltageV: num(restVoltageV),
    minCellVoltageV: num(side.minCellVoltageV),
    dischargeCurrentSign: sign === 1 ? "positive" : "negative",
    cellsSource,
    warnings,
  };
  return { figures, sign };
}
