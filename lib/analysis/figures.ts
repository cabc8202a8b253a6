/**
 * From the running state of a whole log to the published figures. Definitions are in
 * content/methods/figures.md; each number here is null when the log cannot support it. The headline
 * figures describe ONE discharge (discharges.ts), never a sum of several.
 */
import type { Accumulator } from "./accumulator";
import { resistanceAtTemperature } from "./arrhenius";
import { retentionSeries } from "./cycles";
import { dcResistance, readAt } from "./dc-resistance";
import { dischargeDirection } from "./direction";
import {
  LOG_END_CUTOFF_MAX_V_PER_CELL,
  describeDischarge,
  headlineIndex,
  judgeCutoff,
  timeToCutoff,
} from "./discharges";
import { LogError } from "./errors";
import { cellCount, checkSamples, gapCheck, skippedLines } from "./log-checks";
import type { LoadPhase } from "./phases";
import { sagLimitedEstimate, sustainedRating, sustainedRule } from "./ratings";
import type { SampleSink } from "./sample-sink";
import type { Figures, ResolvedOptions } from "./types";
import { Warnings } from "./warnings";

/** Without a stated cut-off, a cell this far below where the pack ended counts as below the cut-off (common practice: balance within 50 mV). */
export const CELL_BELOW_LOG_END_V = 0.05;

function num(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}

function div(a: number | null, b: number | null | undefined): number | null {
  if (a === null || b === null || b === undefined || !(b !== 0)) return null;
  return num(a / b);
}

export function computeFigures(
  acc: Accumulator,
  sink: SampleSink,
  opts: ResolvedOptions,
): { figures: Figures; sign: 1 | -1 } {
  acc.finish();
  checkSamples(acc, sink);
  const w = new Warnings(sink.warnings);
  skippedLines(sink, acc, w);
  const stated = opts.mapping?.dischargeSign;
  const sign: 1 | -1 = stated ? (stated === "positive" ? 1 : -1) : dischargeDirection(acc).sign;
  const side = sign === 1 ? acc.positive : acc.negative;
  const other = sign === 1 ? acc.negative : acc.positive;
  const phases = side.phases.filter((p) => p.main !== null);
  if (phases.length === 0) {
    const charging = other.best
      ? " The current only ever flows the charging way (voltage rises with it)."
      : " The current never rises above the load threshold.";
    throw new LogError(
      "no-discharge",
      `No discharge found in the log.${charging} Check the current column and its unit.`,
    );
  }
  if (sign === -1) w.add("Discharge current is logged as negative; figures use it as positive.");

  const { cells, source: cellsSource, restVoltageV } = cellCount(acc, sink, opts, side.minVoltageV, w);
  const sampleIntervalS = acc.intervals.median(); // under load: loggers often write rest rows less often
  gapCheck(acc, w);
  const judged = phases.map((p) => judgeCutoff(p, cells, opts.cutoffVPerCell, sampleIntervalS));
  const discharges = phases.map((p, k) => describeDischarge(p, k + 1, acc.firstTimeS, judged[k]?.reached ?? false));
  const h = headlineIndex(
    phases,
    judged.map((j) => j.reached),
  );
  const phase = phases[h] as LoadPhase;
  const main = phase.main as NonNullable<LoadPhase["main"]>;
  const judgement = judged[h] as ReturnType<typeof judgeCutoff>;
  const headline = discharges[h] as Figures["discharges"][number];
  if (phases.length > 1) {
    const why = judgement.reached ? "the first that reached the cut-off" : "none reached the cut-off; the longest";
    w.code(
      "several-discharges",
      `The log holds ${phases.length} discharges separated by charging; the figures describe discharge ${h + 1} (${why}), never their sum. Each is listed under discharges.`,
    );
  }
  const perCell = (x: number | null) => (cells ? div(x, cells) : null);

  const startTemperatureC = num(main.startTemperatureC);
  const peakTemperatureC = num(phase.peakTemperatureC);
  const plan = sink.plan;
  if (acc.temperatureSamples === 0 && plan !== null && plan.temperature !== null)
    w.add("The temperature column holds no usable value.");

  const cut = timeToCutoff(phase, judgement, sampleIntervalS);
  if (!judgement.reached && cells) {
    const where =
      opts.cutoffVPerCell !== undefined
        ? `the cut-off of ${opts.cutoffVPerCell} V per cell`
        : `a cut-off: it ended at ${(phase.minVoltageV / cells).toFixed(2)} V per cell, above the ${LOG_END_CUTOFF_MAX_V_PER_CELL} V per cell below which a log's end is taken as its cut-off`;
    w.code("cutoff-not-reached", `The main discharge never reached ${where}, so it has no time to cut-off.`);
  } else if (!cells)
    w.code("cutoff-not-reached", "Without the cell count, whether the discharge reached its cut-off cannot be judged.");
  else if (cut.extrapolated && opts.cutoffVPerCell !== undefined) {
    w.add(
      `The main discharge stopped ${(((main.minVoltageV - (judgement.cutoffV ?? 0)) / cells) * 1000).toFixed(0)} mV per cell above the ${opts.cutoffVPerCell} V cut-off, within what one sample interval can show (${((judgement.toleranceV / cells) * 1000).toFixed(0)} mV per cell at the final fall); the time to cut-off is extrapolated along that fall.`,
    );
  }
  const timeToStopTemperatureS =
    opts.stopTemperatureC !== undefined ? num(Math.max(0, phase.stopTemperatureTimeS - main.onsetTimeS)) : null;

  const holdRead = main.hold.valid
    ? readAt(main.hold, main.restValid ? main.restVoltageV : main.hold.voltageV, main.edgeIntervalS, main.currentRipple)
    : null;
  let holdVoltagePerCellV = holdRead ? perCell(num(holdRead.u2V)) : null;
  if (holdVoltagePerCellV === null && main.durationS < opts.holdDelayS)
    w.add(`The main discharge is shorter than the hold delay of ${opts.holdDelayS} s, so there is no hold voltage.`);
  if (main.hold.lateByS > 0 && holdVoltagePerCellV !== null)
    w.add(
      `No sample fell exactly ${opts.holdDelayS} s into the main discharge; the next one was used for the hold voltage.`,
    );
  if (!cells) holdVoltagePerCellV = null;

  const r = dcResistance(phase, opts.ratedMah, w);
  const dcResistanceMohm = r ? r.ohm * 1000 : null;
  let resistanceTemperatureC = r ? (num(r.temperatureC) ?? startTemperatureC) : null;
  if (r && resistanceTemperatureC === null && opts.packStartTemperatureC !== undefined) {
    resistanceTemperatureC = opts.packStartTemperatureC;
    w.add(
      "The log has no temperature at the resistance step; the pack start temperature from the method card is used for the 25 °C estimate.",
    );
  }
  const resistanceAt25CMohm =
    dcResistanceMohm !== null && resistanceTemperatureC !== null
      ? num(resistanceAtTemperature(dcResistanceMohm, resistanceTemperatureC, 25, opts.activationEnergyKJPerMol))
      : null;

  const minCell = num(phase.minCellVoltageV);
  const cellSpreadV = minCell !== null ? phase.maxCellSpreadV : null;
  let cellBelowCutoff = false;
  if (minCell !== null && cells && judgement.cutoffV !== null) {
    const stated = opts.cutoffVPerCell !== undefined;
    const limit = stated ? (opts.cutoffVPerCell as number) - 0.01 : judgement.cutoffV / cells - CELL_BELOW_LOG_END_V;
    if (minCell < limit) {
      cellBelowCutoff = true;
      const against = stated
        ? `the ${opts.cutoffVPerCell} V cut-off`
        : `where the pack ended (${(judgement.cutoffV / cells).toFixed(2)} V per cell)`;
      w.code(
        "cell-below-cutoff",
        `A single cell went down to ${minCell.toFixed(3)} V, below ${against}, while the pack average did not; the cells differed by up to ${(cellSpreadV ?? 0).toFixed(3)} V under load. A cell pushed below its cut-off may be damaged: follow the maker's instructions.`,
      );
    }
  }

  const sag = sagLimitedEstimate(
    phase,
    cells,
    opts.ratedMah,
    opts.nominalVPerCell,
    opts.floorVPerCell,
    opts.holdDelayS,
    r,
  );
  const rule = sustainedRule(opts.floorVPerCell, opts.ratingStopTemperatureC);
  const sustained = sustainedRating({
    phase,
    discharge: headline,
    cells,
    ratedMah: opts.ratedMah,
    rule,
    cellBelowCutoff,
  });
  const reached = discharges
    .filter((d) => d.reachedCutoff)
    .map((d) => ({ cycle: d.index, capacityMah: d.capacityMah }));
  const retention = reached.length >= 2 ? retentionSeries(reached, opts.ratedMah) : null;

  const kg = opts.weightG !== undefined ? opts.weightG / 1000 : null;
  const mainDurationS = main.durationS;
  const mainMeanPowerW = mainDurationS > 0 ? main.energyWs / mainDurationS : Number.NaN;
  const capacityMah = phase.chargeAs / 3.6;
  const energyWh = phase.energyWs / 3600;
  const meanVoltageV = phase.chargeAs > 0 ? phase.energyWs / phase.chargeAs : Number.NaN;
  const figures: Figures = {
    samples: acc.samples,
    skippedLines: sink.blankLines + sink.brokenLines + sink.preambleLines + sink.skippedBackwards,
    durationS: num(acc.lastTimeS - acc.firstTimeS) ?? 0,
    cells,
    capacityMah: num(capacityMah),
    energyWh: num(energyWh),
    meanVoltageV: num(meanVoltageV),
    meanVoltagePerCellV: perCell(num(meanVoltageV)),
    minVoltageV: num(phase.minVoltageV),
    minVoltagePerCellV: perCell(num(phase.minVoltageV)),
    peakCurrentA: num(phase.peakCurrentA),
    startTemperatureC,
    peakTemperatureC,
    temperatureRiseC:
      startTemperatureC !== null && peakTemperatureC !== null ? num(peakTemperatureC - startTemperatureC) : null,
    timeToCutoffS: cut.timeS === null ? null : num(cut.timeS),
    reachedCutoff: judgement.reached,
    cutoffSource: cells ? (opts.cutoffVPerCell !== undefined ? "stated" : "log-end") : null,
    timeToStopTemperatureS,
    holdVoltagePerCellV,
    dcResistanceMohm: dcResistanceMohm === null ? null : num(dcResistanceMohm),
    dcResistancePerCellMohm: perCell(dcResistanceMohm),
    dcResistanceMethod: r ? r.method : null,
    dcResistanceIndicative: r ? r.indicative : false,
    resistanceAt25CMohm,
    resistanceTemperatureC,
    sagLimitedCEstimate: sag.value,
    sagLimitedCAssumptions: sag.assumptions,
    sagLimitedC: sag.value,
    sustainedCMeasured: num(sustained.value ?? Number.NaN),
    sustainedCReason: sustained.reason,
    sustainedCRule: rule,
    capacityRatio: opts.ratedMah !== undefined ? div(capacityMah, opts.ratedMah) : null,
    labelRatio: sag.value !== null && opts.labelledC !== undefined ? div(sag.value, opts.labelledC) : null,
    sustainedLabelRatio:
      sustained.value !== null && opts.labelledC !== undefined ? div(sustained.value, opts.labelledC) : null,
    specificEnergyWhKg: kg !== null ? div(energyWh, kg) : null,
    specificPowerWKg: kg !== null ? div(num(mainMeanPowerW), kg) : null,
    mainDischargeCurrentA: mainDurationS > 0 ? num(main.chargeAs / mainDurationS) : null,
    mainDischargeDurationS: num(mainDurationS),
    mainDischargeCapacityMah: num(main.chargeAs / 3.6),
    mainDischargeEnergyWh: num(main.energyWs / 3600),
    restVoltageV: num(restVoltageV),
    minCellVoltageV: minCell,
    cellSpreadV,
    sampleIntervalS: num(sampleIntervalS),
    discharges,
    headlineDischarge: h + 1,
    retention,
    dischargeCurrentSign: sign === 1 ? "positive" : "negative",
    cellsSource,
    warnings: w.words,
    warningCodes: w.codes,
  };
  return { figures, sign };
}
