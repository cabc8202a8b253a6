/**
 * The one entry point: a log as chunks of text in, figures and a chart curve out.
 * Callers do the I/O (a file stream, an upload, a string); nothing here touches disk or network.
 */
import { Accumulator } from "./accumulator";
import { DEFAULT_ACTIVATION_ENERGY_KJ_PER_MOL } from "./arrhenius";
import { lttb } from "./downsample";
import { LogError } from "./errors";
import { computeFigures } from "./figures";
import { DEFAULT_RATING_STOP_TEMPERATURE_C } from "./ratings";
import { type ChunkSource, DEFAULT_MAX_BYTES, readRows, textChunks } from "./reader";
import { SampleSink } from "./sample-sink";
import type { AnalyseOptions, Analysis, CurvePoint, ResolvedOptions } from "./types";

export const DEFAULT_HOLD_DELAY_S = 10;
export const DEFAULT_CURVE_POINTS = 400;
/** The chart curve never ships more than this many points, whatever the caller asks. */
export const MAX_CURVE_POINTS = 500;
export const DEFAULT_LOAD_THRESHOLD_A = 0.02;
/** Nominal LiPo cell voltage (common practice: the figure printed on packs, 3.7 V). */
export const DEFAULT_NOMINAL_V_PER_CELL = 3.7;
/** Floor a pack should not sag below under load (common practice: 3.3 V per cell in hobby use). */
export const DEFAULT_FLOOR_V_PER_CELL = 3.3;

function positive(name: string, value: number | undefined, integer = false): void {
  if (value === undefined) return;
  if (typeof value !== "number" || !Number.isFinite(value) || value <= 0 || (integer && !Number.isInteger(value))) {
    throw new LogError(
      "bad-option",
      `${name} must be a positive ${integer ? "whole " : ""}number, got ${String(value)}.`,
    );
  }
}

export function resolveOptions(options: AnalyseOptions = {}): ResolvedOptions {
  positive("cells", options.cells, true);
  if (options.cells !== undefined && options.cells > 24)
    throw new LogError("bad-option", `cells must be at most 24, got ${options.cells}.`);
  positive("ratedMah", options.ratedMah);
  positive("labelledC", options.labelledC);
  positive("weightG", options.weightG);
  positive("cutoffVPerCell", options.cutoffVPerCell);
  positive("holdDelayS", options.holdDelayS);
  positive("maxBytes", options.maxBytes);
  positive("curvePoints", options.curvePoints, true);
  positive("loadThresholdA", options.loadThresholdA);
  positive("activationEnergyKJPerMol", options.activationEnergyKJPerMol);
  positive("nominalVPerCell", options.nominalVPerCell);
  positive("floorVPerCell", options.floorVPerCell);
  for (const key of ["stopTemperatureC", "packStartTemperatureC"] as const) {
    const v = options[key];
    if (v !== undefined && (typeof v !== "number" || !Number.isFinite(v)))
      throw new LogError("bad-option", `${key} must be a number, got ${String(v)}.`);
  }
  const resolved: ResolvedOptions = {
    ...options,
    holdDelayS: options.holdDelayS ?? DEFAULT_HOLD_DELAY_S,
    ratingStopTemperatureC: options.stopTemperatureC ?? DEFAULT_RATING_STOP_TEMPERATURE_C,
    maxBytes: options.maxBytes ?? DEFAULT_MAX_BYTES,
    curvePoints: Math.min(options.curvePoints ?? DEFAULT_CURVE_POINTS, MAX_CURVE_POINTS),
    loadThresholdA: options.loadThresholdA ?? DEFAULT_LOAD_THRESHOLD_A,
    activationEnergyKJPerMol: options.activationEnergyKJPerMol ?? DEFAULT_ACTIVATION_ENERGY_KJ_PER_MOL,
    nominalVPerCell: options.nominalVPerCell ?? DEFAULT_NOMINAL_V_PER_CELL,
    floorVPerCell: options.floorVPerCell ?? DEFAULT_FLOOR_V_PER_CELL,
  };
  if (!(resolved.nominalVPerCell > resolved.floorVPerCell)) {
    throw new LogError(
      "bad-option",
      `nominalVPerCell (${resolved.nominalVPerCell} V) must be above floorVPerCell (${resolved.floorVPerCell} V).`,
    );
  }
  return resolved;
}

/** Reads a log streamed as chunks. Throws LogError (and only LogError) on bad input. */
export async function analyseLog(chunks: ChunkSource, options?: AnalyseOptions): Promise<Analysis> {
  const opts = resolveOptions(options);
  const acc = new Accumulator({
    holdDelayS: opts.holdDelayS,
    stopTemperatureC: opts.ratingStopTemperatureC,
    loadThresholdA: opts.loadThresholdA,
  });
  const sink = new SampleSink(acc, opts.mapping);
  let computed: ReturnType<typeof computeFigures>;
  try {
    await readRows(chunks, sink, opts.maxBytes);
    computed = computeFigures(acc, sink, opts);
  } catch (error) {
    if (error instanceof LogError) throw error;
    // A fault in our own code still reaches callers as one plain message, never a stack.
    throw new LogError(
      "internal",
      `The log could not be analysed (internal error: ${error instanceof Error ? error.message : String(error)}).`,
    );
  }
  const { figures, sign } = computed;
  const raw = acc.curvePoints();
  const points: CurvePoint[] = raw.map((p) => ({
    timeS: p.timeS,
    voltageV: p.voltageV,
    currentA: p.currentA === 0 ? 0 : sign * p.currentA,
    temperatureC: Number.isFinite(p.temperatureC) ? p.temperatureC : null,
    capacityMah: (sign === 1 ? p.positiveChargeAs : p.negativeChargeAs) / 3.6,
  }));
  const curve = lttb(
    points,
    opts.curvePoints,
    (p) => p.timeS,
    (p) => p.voltageV,
  );
  return {
    figures,
    curve,
    parameters: {
      holdDelayS: opts.holdDelayS,
      stopTemperatureC: opts.ratingStopTemperatureC,
      activationEnergyKJPerMol: opts.activationEnergyKJPerMol,
      nominalVPerCell: opts.nominalVPerCell,
      floorVPerCell: opts.floorVPerCell,
      loadThresholdA: opts.loadThresholdA,
    },
  };
}

/** The same for a log already in memory. */
export function analyseText(text: string, options?: AnalyseOptions): Promise<Analysis> {
  return analyseLog(textChunks(text), options);
}
