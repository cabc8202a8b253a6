/** Public shapes of the measurement core. Units are in every name. */
import type { ColumnMapping } from "./columns";
import type { RetentionSeries } from "./cycles";
import type { WarningCode } from "./warnings";

export type { WarningCode } from "./warnings";

export type AnalyseOptions = {
  cells?: number;
  ratedMah?: number;
  labelledC?: number;
  weightG?: number;
  cutoffVPerCell?: number;
  /** The tester's stop temperature; the measured rating uses 60 °C (common practice) when none is given. */
  stopTemperatureC?: number;
  /** Seconds into the main discharge at which the hold voltage is read (default 10). */
  holdDelayS?: number;
  /** Refuse logs larger than this many bytes (default 50 MB). Text input counts characters. */
  maxBytes?: number;
  mapping?: ColumnMapping;
  /** Points in the returned chart curve (default 400, at most 500). */
  curvePoints?: number;
  /** Pack temperature from the method card, used for the 25 °C estimate when the log has none. */
  packStartTemperatureC?: number;
  /** Current below this (A, either sign) counts as rest (default 0.02 A). */
  loadThresholdA?: number;
  /** Activation energy for the 25 °C resistance estimate (default 17.1 kJ/mol, see arrhenius.ts). */
  activationEnergyKJPerMol?: number;
  /** Sag-limited C parameters (defaults 3.7 V and 3.3 V per cell, common practice). */
  nominalVPerCell?: number;
  floorVPerCell?: number;
};

export type ResolvedOptions = Omit<
  AnalyseOptions,
  | "holdDelayS"
  | "maxBytes"
  | "curvePoints"
  | "loadThresholdA"
  | "activationEnergyKJPerMol"
  | "nominalVPerCell"
  | "floorVPerCell"
> & {
  holdDelayS: number;
  /** stopTemperatureC, or 60 °C for the measured rating. */
  ratingStopTemperatureC: number;
  maxBytes: number;
  curvePoints: number;
  loadThresholdA: number;
  activationEnergyKJPerMol: number;
  nominalVPerCell: number;
  floorVPerCell: number;
};

/** One discharge of the log: discharge stretches that no charge phase interrupts (pauses stay within it). */
export type Discharge = {
  /** 1 for the log's first discharge. */
  index: number;
  /** From the log's first sample to the discharge's onset (its last sample before the load). */
  startS: number;
  /** From onset to its last load sample. */
  durationS: number;
  capacityMah: number;
  energyWh: number;
  /** Charge ÷ time under load (pauses within the discharge not counted). */
  meanCurrentA: number;
  /** Energy ÷ charge. */
  meanVoltageV: number;
  minVoltageV: number;
  reachedCutoff: boolean;
  peakTemperatureC: number | null;
};

/** Where the sag-limited estimate comes from: every assumption beside the number. */
export type SagLimitedAssumptions = {
  nominalVPerCell: number;
  floorVPerCell: number;
  /** "hold": read at the hold point (hold delay after the current edge); "step-1s": 1 s after it (no hold reading). */
  resistancePoint: "hold" | "step-1s";
  /** Seconds after the current edge at which the voltage was read. */
  resistanceAtS: number;
  /** The pack resistance used (rest voltage − loaded voltage) ÷ current, mΩ. */
  resistanceMohm: number;
  /** The current at that point, A, and the pack temperature there (null when the log has none). */
  currentA: number;
  temperatureC: number | null;
  /** The reading rests on coarse sampling or on one sample of a rippling current (see warnings). */
  indicative: boolean;
};

export type SustainedCRule = {
  floorVPerCell: number;
  stopTemperatureC: number;
  /** Share of the discharge's charge delivered before the voltage first fell to the floor (the knee may dip below it). */
  floorHeldShare: number;
  /** Highest spread of the current (standard deviation ÷ mean) for a steady load. */
  maxCurrentSpread: number;
  /** Least share of the rated capacity the discharge must deliver. */
  minDeliveredShare: number;
};

export type SustainedCReason =
  | "no-rated-capacity"
  | "cells-unknown"
  | "cutoff-not-reached"
  | "no-temperature"
  | "stop-temperature-reached"
  | "fell-below-floor"
  | "cell-below-cutoff"
  | "current-not-steady"
  | "partial-discharge";

export type Figures = {
  samples: number;
  skippedLines: number;
  durationS: number;
  cells: number | null;
  capacityMah: number | null;
  energyWh: number | null;
  meanVoltageV: number | null;
  meanVoltagePerCellV: number | null;
  minVoltageV: number | null;
  minVoltagePerCellV: number | null;
  peakCurrentA: number | null;
  startTemperatureC: number | null;
  peakTemperatureC: number | null;
  temperatureRiseC: number | null;
  /** Null when the discharge did not reach its cut-off. */
  timeToCutoffS: number | null;
  /** Whether the headline discharge reached its cut-off (stated, or judged from where the log ends). */
  reachedCutoff: boolean;
  /** "stated": the tester's cut-off; "log-end": none stated, the discharge ended at or below 3.5 V per cell. */
  cutoffSource: "stated" | "log-end" | null;
  timeToStopTemperatureS: number | null;
  holdVoltagePerCellV: number | null;
  dcResistanceMohm: number | null;
  dcResistancePerCellMohm: number | null;
  dcResistanceMethod: "iec-61960-two-level" | "step" | null;
  resistanceAt25CMohm: number | null;
  resistanceTemperatureC: number | null;
  /** The resistance reading is indicative only (coarse sampling, or a rippling current read from one sample). */
  dcResistanceIndicative: boolean;
  /** Sag-limited C, an ESTIMATE from a resistance (see sagLimitedCAssumptions); never a measured rating. */
  sagLimitedCEstimate: number | null;
  sagLimitedCAssumptions: SagLimitedAssumptions | null;
  /** @deprecated Same value as sagLimitedCEstimate; kept for stored results and pages until they move over. */
  sagLimitedC: number | null;
  /** The rating MEASURED by the run: mean current of the discharge ÷ rated Ah, when the run qualifies (sustainedCRule). */
  sustainedCMeasured: number | null;
  /** Why the run does not qualify for a measured rating; null when it does. */
  sustainedCReason: SustainedCReason | null;
  sustainedCRule: SustainedCRule;
  capacityRatio: number | null;
  /** Sag-limited C estimate ÷ labelled C. */
  labelRatio: number | null;
  /** Measured sustained C ÷ labelled C. */
  sustainedLabelRatio: number | null;
  specificEnergyWhKg: number | null;
  specificPowerWKg: number | null;
  mainDischargeCurrentA: number | null;
  /** Extras beyond the agreed shape. */
  mainDischargeDurationS: number | null;
  mainDischargeCapacityMah: number | null;
  mainDischargeEnergyWh: number | null;
  /** Highest voltage seen at rest (the first voltage when the log never rests). */
  restVoltageV: number | null;
  /** Lowest single-cell reading under discharge, when per-cell columns are logged. */
  minCellVoltageV: number | null;
  /** Largest difference between the highest and lowest cell of one sample under load (per-cell columns only). */
  cellSpreadV: number | null;
  /** Median interval between samples. */
  sampleIntervalS: number | null;
  /** Every discharge in log order; the headline figures describe the one numbered headlineDischarge. */
  discharges: Discharge[];
  headlineDischarge: number | null;
  /** Capacity of each discharge that reached its cut-off against its cycle, with a fitted line (two or more). */
  retention: RetentionSeries | null;
  dischargeCurrentSign: "positive" | "negative";
  cellsSource: "given" | "cell-columns" | "rest-voltage" | null;
  /** Words for people. */
  warnings: string[];
  /** Stable codes for programs (warnings.ts); each also has words in `warnings`. */
  warningCodes: WarningCode[];
};

export type CurvePoint = {
  timeS: number;
  voltageV: number;
  currentA: number;
  temperatureC: number | null;
  capacityMah: number;
};

export type AnalysisParameters = {
  holdDelayS: number;
  /** The stop temperature the measured rating used. */
  stopTemperatureC: number;
  activationEnergyKJPerMol: number;
  nominalVPerCell: number;
  floorVPerCell: number;
  loadThresholdA: number;
};

export type Analysis = { figures: Figures; curve: CurvePoint[]; parameters: AnalysisParameters };
