/**
 * The public JSON shape of an analysis: every figure at the top level (the agreed fields among
 * them: samples, durationS, cells, capacityMah, energyWh, meanVoltageV, minVoltageV, peakCurrentA,
 * peakTemperatureC, temperatureRiseC, holdVoltagePerCellV, dcResistanceMohm, dcResistanceMethod,
 * resistanceAt25CMohm, sagLimitedC, capacityRatio, labelRatio, specificEnergyWhKg, warnings), then
 * the parameters used. The command-line tool and POST /api/v1/analyse both answer with it.
 */
import type { Analysis, AnalysisParameters, Figures } from "./types";

export type PublicFigures = Figures & { parameters: AnalysisParameters };

export function toPublicFigures(analysis: Analysis): PublicFigures {
  return { ...analysis.figures, warnings: [...analysis.figures.warnings], parameters: { ...analysis.parameters } };
}
