/**
 * The public JSON shape of an analysis: every figure at the top level (the agreed fields among
 * them: samples, durationS, cells, capacityMah, energyWh, meanVoltageV, minVoltageV, peakCurrentA,
 * peakTemperatureC, temperatureRiseC, holdVoltagePerCellV, dcResistanceMohm, dcResistanceMethod,
 * resistanceAt25CMohm, sagLimitedC, capacityRatio, labelRatio, specificEnergyWhKg, warnings; since
 * issue 12 also discharges, headlineDischarge, retention, sampleIntervalS, reachedCutoff, warningCodes,
 * sagLimitedCEstimate with sagLimitedCAssumptions, sustainedCMeasured with sustainedCReason and
 * sustainedCRule), then the parameters used. The command-line tool and POST /api/v1/analyse both answer with it.
 */
import type { CardCheck } from "./card-checks";
import type { Analysis, AnalysisParameters, CurvePoint, Figures } from "./types";

export type PublicFigures = Figures & { parameters: AnalysisParameters };

export function toPublicFigures(analysis: Analysis): PublicFigures {
  return { ...analysis.figures, warnings: [...analysis.figures.warnings], parameters: { ...analysis.parameters } };
}

/** What a contributor sees before confirming: figures, the chart curve and the checks against their card. */
export type LogPreview = { figures: PublicFigures; curve: CurvePoint[]; checks: CardCheck[] };
