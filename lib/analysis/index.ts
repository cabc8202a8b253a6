/**
 * Sagline's measurement core: pure TypeScript, no I/O, no framework. Parse a log, compute
 * figures, like-for-like keys and group statistics. Used by the server, the CLI and tests.
 */
export {
  analyseLog,
  analyseText,
  resolveOptions,
  DEFAULT_CURVE_POINTS,
  DEFAULT_FLOOR_V_PER_CELL,
  DEFAULT_HOLD_DELAY_S,
  DEFAULT_LOAD_THRESHOLD_A,
  DEFAULT_NOMINAL_V_PER_CELL,
} from "./analyse";
export type {
  AnalyseOptions,
  Analysis,
  AnalysisParameters,
  CurvePoint,
  Discharge,
  Figures,
  SagLimitedAssumptions,
  SustainedCReason,
  SustainedCRule,
} from "./types";
export { WARNING_CODES, type WarningCode } from "./warnings";
export { CUTOFF_TOLERANCE_V_PER_CELL, LOG_END_CUTOFF_MAX_V_PER_CELL } from "./discharges";
export {
  DEFAULT_RATING_STOP_TEMPERATURE_C,
  FLOOR_HELD_SHARE,
  MAX_CURRENT_SPREAD,
  MIN_DELIVERED_SHARE,
  sustainedRule,
} from "./ratings";
export type { ColumnMapping, ColumnRef } from "./columns";
export {
  columnMappingSchema,
  columnRefSchema,
  parseMappingJson,
  MAPPING_JSON_MAX,
  type MappingParse,
  type ParsedColumnMapping,
} from "./mapping-schema";
export { previewLog, PREVIEW_CHARS, PREVIEW_ROWS, type LogTablePreview } from "./preview";
export { LogError, isLogError, type LogErrorCode } from "./errors";
export { DEFAULT_MAX_BYTES, readRows, textChunks, type ChunkSource, type RowHandler } from "./reader";
export type { Dialect } from "./dialect";
export {
  ACTIVATION_ENERGY_INTERFACE_KJ_PER_MOL,
  DEFAULT_ACTIVATION_ENERGY_KJ_PER_MOL,
  arrheniusFactor,
  resistanceAtTemperature,
} from "./arrhenius";
export { sagLimitedC, sagLimitedCurrentA, twoLevelResistanceOhm } from "./resistance";
export {
  groupKey,
  groupKeyForAnalysis,
  analysedResistanceBand,
  labelForGroupKey,
  resistanceBandFromKey,
  ambientBand,
  ageBand,
  cutoffBand,
  rateBand,
  NO_DC_RESISTANCE_KEY,
  RESISTANCE_METHODS,
  type AnalysedResistanceMethod,
  type GroupKey,
  type MethodCardForKey,
  type ResistanceMethod,
} from "./group-key";
export {
  median,
  medianAbsoluteDeviation,
  modifiedZScores,
  outlierIndexes,
  summarise,
  MODIFIED_Z_THRESHOLD,
} from "./statistics";
export {
  retentionTrend,
  retentionSeries,
  projectTo80,
  END_OF_LIFE_RETAINED,
  MAX_PROJECTION_BEYOND_SPAN,
  MIN_POINTS_FOR_PROJECTION,
  type Projection,
  type RetentionPoint,
  type RetentionSeries,
  type RetentionTrend,
} from "./cycles";
export { lttb } from "./downsample";
export { inferCells } from "./cells";
export {
  plausibilityFlags,
  groupModifiedZ,
  plausibilityCodes,
  plausibilityLabels,
  type PlausibilityCode,
  type PlausibilityInput,
} from "./plausibility";
export { toPublicFigures, type LogPreview, type PublicFigures } from "./public-figures";
export { checkAgainstCard, warningsBesideChecks, type CardCheck, type StatedCard } from "./card-checks";
