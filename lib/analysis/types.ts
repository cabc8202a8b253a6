/** Public shapes of the measurement core. Units are in every name. */
import type { ColumnMapping } from "./columns";

export type AnalyseOptions = {
  cells?: number;
  ratedMah?: number;
  labelledC?: number;
  weightG?: number;
  cutoffVPerCell?: number;
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

export type ResolvedOptions = Omit<AnalyseOptions, "holdDelayS" | "maxBytes" | "curvePoints" | "loadThresholdA" | "activationEnergyKJPerMol" | "nominalVPerCell" | "floorVPerCell"> & {
  holdDelayS: number;
  maxBytes: number;
  curvePoints: number;
  loadThresholdA: number;
  activationEnergyKJPerMol: number;
  nominalVPerCell: number;
  floorVPerCell: number;
};

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
  timeToCutoffS: number | null;
  timeToStopTemperatureS: number | null;
  holdVoltagePerCellV: number | null;
  dcResistanceMohm: number | null;
  dcResistancePerCellMohm: number | null;
  dcResistanceMethod: "iec-61960-two-level" | "step" | null;
  resistanceAt25CMohm: number | null;
  resistanceTemperatureC: number | null;
  sagLimitedC: number | null;
  capacityRatio: number | null;
  labelRatio: number | null;
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
  dischargeCurrentSign: "positive" | "negative";
  cellsSource: "given" | "cell-columns" | "rest-voltage" | null;
  warnings: string[];
};

export type CurvePoint = { timeS: number; voltageV: number; currentA: number; temperatureC: number | null; capacityMah: number };

export type AnalysisParameters = {
  holdDelayS: number;
  activationEnergyKJPerMol: number;
  nominalVPerCell: number;
  floorVPerCell: number;
  loadThresholdA: number;
};

export type Analysis = { figures: Figures; curve: CurvePoint[]; parameters: AnalysisParameters };
