/**
 * A bench profile's stated instrument accuracy (its nullable columns) as the uncertainty core's statement:
 * what the tester left blank stays missing, so `resolveAccuracy` fills it from a stated default and lists it
 * as an assumption. A result without a bench profile states nothing: every value is then assumed.
 */
import type { StatedAccuracy } from "@/lib/analysis/uncertainty";
import type { ResistanceMethod } from "@/lib/enums";

export type BenchAccuracyColumns = {
  voltageAccuracyPct: number | null;
  voltageOffsetV: number | null;
  voltageResolutionV: number | null;
  currentAccuracyPct: number | null;
  currentOffsetA: number | null;
  currentResolutionA: number | null;
  temperatureAccuracyPct: number | null;
  temperatureOffsetC: number | null;
  temperatureResolutionC: number | null;
  samplingIntervalS: number | null;
};

/** Blank accuracy: what a result without a bench profile (or one that states nothing) carries. */
export const NO_BENCH_ACCURACY: BenchAccuracyColumns = {
  voltageAccuracyPct: null,
  voltageOffsetV: null,
  voltageResolutionV: null,
  currentAccuracyPct: null,
  currentOffsetA: null,
  currentResolutionA: null,
  temperatureAccuracyPct: null,
  temperatureOffsetC: null,
  temperatureResolutionC: null,
  samplingIntervalS: null,
};

/** Just the accuracy columns of a wider row (a query that selected them beside others). */
export function pickBenchAccuracy(r: BenchAccuracyColumns): BenchAccuracyColumns {
  return {
    voltageAccuracyPct: r.voltageAccuracyPct,
    voltageOffsetV: r.voltageOffsetV,
    voltageResolutionV: r.voltageResolutionV,
    currentAccuracyPct: r.currentAccuracyPct,
    currentOffsetA: r.currentOffsetA,
    currentResolutionA: r.currentResolutionA,
    temperatureAccuracyPct: r.temperatureAccuracyPct,
    temperatureOffsetC: r.temperatureOffsetC,
    temperatureResolutionC: r.temperatureResolutionC,
    samplingIntervalS: r.samplingIntervalS,
  };
}

/** The statement; `resistanceMethod` is the result's method card (or the bench's), always stated. */
export function statedAccuracyOf(
  c: BenchAccuracyColumns | null,
  resistanceMethod: ResistanceMethod | null = null,
): StatedAccuracy {
  const b = c ?? NO_BENCH_ACCURACY;
  const v = (x: number | null) => x ?? undefined;
  return {
    voltage: {
      percentOfReading: v(b.voltageAccuracyPct),
      offsetV: v(b.voltageOffsetV),
      resolutionV: v(b.voltageResolutionV),
    },
    current: {
      percentOfReading: v(b.currentAccuracyPct),
      offsetA: v(b.currentOffsetA),
      resolutionA: v(b.currentResolutionA),
    },
    temperature: {
      percentOfReading: v(b.temperatureAccuracyPct),
      offsetC: v(b.temperatureOffsetC),
      resolutionC: v(b.temperatureResolutionC),
    },
    samplingIntervalS: b.samplingIntervalS,
    resistanceMethod,
  };
}
