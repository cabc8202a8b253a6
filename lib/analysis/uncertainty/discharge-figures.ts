/**
 * Uncertainty of the figures read from a constant-current discharge: delivered capacity and energy, mean
 * voltage under load, hold voltage, sustained C and the ratios. JCGM 100:2008 (GUM) 5.1.2, k = 2; see gum.ts.
 *
 * Reading model for one channel (the same for every sample of one test):
 *   x_read = x_true · (1 + g) + o + e,
 * g the gain error (± p % of reading), o the offset (± offset): systematic, rectangular (GUM 4.3.7);
 * e the read-out's resolution: random from sample to sample, rectangular of half-width δ/2 (GUM F.2.2.1).
 * Timing: the load's start and end fall somewhere between two samples. The trapezoid of lib/analysis counts
 * each edge's interval as half a sample of load current, while the load really ran for a time anywhere in
 * [0, Δt): each edge is off by up to ±I·Δt/2, rectangular, u = I·Δt/√12, two edges → I·Δt/√6 (random).
 * The logger's clock rate error (tens of ppm, from memory) is far below these and is left out.
 */
import type { ChannelU } from "./accuracy";
import { allFinite, combine, scaleUncertainty, type Contribution, type FigureUncertainty } from "./gum";

const SECONDS_PER_HOUR = 3600;

export type DischargeSummary = {
  /** Mean current of the discharge (A), positive. */
  meanCurrentA: number;
  /** Time under load (s). */
  durationS: number;
  /** Samples under load. */
  samples: number;
  /** Time between samples (s). */
  samplingIntervalS: number;
};

function validSummary(d: DischargeSummary): boolean {
  return (
    allFinite(d.meanCurrentA, d.durationS, d.samples, d.samplingIntervalS) &&
    d.meanCurrentA > 0 &&
    d.durationS > 0 &&
    d.samples >= 1 &&
    d.samplingIntervalS > 0
  );
}

function gainLabel(what: string, c: ChannelU): string {
  return `${what} reading, gain error (±${c.percentOfReading} % of reading)`;
}
function offsetLabel(what: string, c: ChannelU, unit: string): string {
  return `${what} reading, offset (±${c.offset} ${unit})`;
}
function resolutionLabel(what: string, c: ChannelU, unit: string, averaged: boolean): string {
  return `${what} read-out resolution (${c.resolution} ${unit}${averaged ? ", averaged over the samples" : ""})`;
}
const EDGES_LABEL = "Where the load's start and end fall between two samples";

/**
 * Delivered capacity Q = ∫ I dt (mAh). Q_read = (1 + g)·Q + o·T + Σ eᵢ·Δt, so
 *   u(Q)² = (Q·u_g)² + (T·u_o)² + (T·u_e/√N)² + (I·Δt/√6)²   (then ÷ 3.6 for mAh).
 */
export function capacityUncertainty(
  capacityMah: number,
  d: DischargeSummary,
  current: ChannelU,
): FigureUncertainty | null {
  if (!Number.isFinite(capacityMah) || !validSummary(d)) return null;
  const toMah = 1 / 3.6;
  const contributions: Contribution[] = [
    {
      source: "current-gain",
      label: gainLabel("Current", current),
      kind: "systematic",
      u: capacityMah * current.gainRelU,
    },
    {
      source: "current-offset",
      label: offsetLabel("Current", current, "A"),
      kind: "systematic",
      u: d.durationS * current.offsetU * toMah,
    },
    {
      source: "current-resolution",
      label: resolutionLabel("Current", current, "A", true),
      kind: "random",
      u: (d.durationS * current.resolutionU * toMah) / Math.sqrt(d.samples),
    },
    {
      source: "sampling-edges",
      label: EDGES_LABEL,
      kind: "random",
      u: (d.meanCurrentA * d.samplingIntervalS * toMah) / Math.sqrt(6),
    },
  ];
  return combine(capacityMah, contributions);
}

/**
 * Delivered energy E = ∫ V·I dt (Wh). With V̄ the mean voltage under load, Q the charge and T the duration:
 *   E_read ≈ (1 + g_V + g_I)·E + o_V·Q + o_I·V̄·T + (resolution terms) + (edge terms),
 * the edges valued at the mean voltage (the start sits above it and the end below, so this is an average).
 */
export function energyUncertainty(
  energyWh: number,
  meanVoltageV: number,
  d: DischargeSummary,
  voltage: ChannelU,
  current: ChannelU,
): FigureUncertainty | null {
  if (!allFinite(energyWh, meanVoltageV) || !validSummary(d)) return null;
  const toWh = 1 / SECONDS_PER_HOUR;
  const chargeAh = d.meanCurrentA * d.durationS * toWh;
  const rootN = Math.sqrt(d.samples);
  const contributions: Contribution[] = [
    {
      source: "voltage-gain",
      label: gainLabel("Voltage", voltage),
      kind: "systematic",
      u: energyWh * voltage.gainRelU,
    },
    {
      source: "voltage-offset",
      label: offsetLabel("Voltage", voltage, "V"),
      kind: "systematic",
      u: chargeAh * voltage.offsetU,
    },
    {
      source: "current-gain",
      label: gainLabel("Current", current),
      kind: "systematic",
      u: energyWh * current.gainRelU,
    },
    {
      source: "current-offset",
      label: offsetLabel("Current", current, "A"),
      kind: "systematic",
      u: meanVoltageV * d.durationS * current.offsetU * toWh,
    },
    {
      source: "voltage-resolution",
      label: resolutionLabel("Voltage", voltage, "V", true),
      kind: "random",
      u: (d.meanCurrentA * d.durationS * voltage.resolutionU * toWh) / rootN,
    },
    {
      source: "current-resolution",
      label: resolutionLabel("Current", current, "A", true),
      kind: "random",
      u: (meanVoltageV * d.durationS * current.resolutionU * toWh) / rootN,
    },
    {
      source: "sampling-edges",
      label: EDGES_LABEL,
      kind: "random",
      u: (meanVoltageV * d.meanCurrentA * d.samplingIntervalS * toWh) / Math.sqrt(6),
    },
  ];
  return combine(energyWh, contributions);
}

export type LoadEdges = {
  samplingIntervalS: number;
  durationS: number;
  /** Pack voltage at the first and the last sample under load (V). */
  startVoltageV: number;
  endVoltageV: number;
};

/**
 * Mean voltage under load V̄ = E / Q (V, pack). The current's gain error cancels exactly in the ratio
 * ((1 + g_I) multiplies both), and under constant current its offset cancels too (E/Q is then the time
 * average of V). Left: the voltage channel, V̄_read = (1 + g_V)·V̄ + o_V + mean of the resolution errors, and the
 * edges: each edge's half interval is off by ε ∈ ±Δt/2 (rectangular, the two independent when the duration is
 * not tied to the sampling grid), weighting the start and end voltages against the mean:
 *   V̄ error ≈ [ε_s·(V_start − V̄) + ε_e·(V_end − V̄)] / T,  u = (Δt/√12)·√((V_start − V̄)² + (V_end − V̄)²) / T.
 * It matters for short discharges sampled coarsely; without `edges` it is left out and the note says so.
 */
export function meanVoltageUncertainty(
  meanVoltageV: number,
  samples: number,
  voltage: ChannelU,
  edges?: LoadEdges | null,
): FigureUncertainty | null {
  if (!allFinite(meanVoltageV, samples) || samples < 1) return null;
  if (
    edges &&
    (!allFinite(edges.samplingIntervalS, edges.durationS, edges.startVoltageV, edges.endVoltageV) ||
      edges.samplingIntervalS <= 0 ||
      edges.durationS <= 0)
  )
    return null;
  const contributions: Contribution[] = [
    {
      source: "voltage-gain",
      label: gainLabel("Voltage", voltage),
      kind: "systematic",
      u: meanVoltageV * voltage.gainRelU,
    },
    { source: "voltage-offset", label: offsetLabel("Voltage", voltage, "V"), kind: "systematic", u: voltage.offsetU },
    {
      source: "voltage-resolution",
      label: resolutionLabel("Voltage", voltage, "V", true),
      kind: "random",
      u: voltage.resolutionU / Math.sqrt(samples),
    },
  ];
  if (edges) {
    const spread = Math.hypot(edges.startVoltageV - meanVoltageV, edges.endVoltageV - meanVoltageV);
    contributions.push({
      source: "sampling-edges",
      label: EDGES_LABEL,
      kind: "random",
      u: (edges.samplingIntervalS * spread) / Math.sqrt(12) / edges.durationS,
    });
  }
  const cancels =
    "The current reading's gain error cancels in energy ÷ charge, and so does its offset under constant current.";
  return combine(
    meanVoltageV,
    contributions,
    edges ? cancels : `${cancels} Where the load's start and end fall between samples is not included.`,
  );
}

/**
 * Hold voltage: one voltage reading (pack, V) a set time after the load starts. The start is known only to the
 * sampling interval (the first load sample lags the real step by 0…Δt), so where the voltage is still falling
 * at `slopeVPerS` the reading carries |slope|·Δt/√12 (random). Without a slope that part is left out, and the
 * note says so.
 */
export function holdVoltageUncertainty(
  holdVoltageV: number,
  voltage: ChannelU,
  timing?: { samplingIntervalS: number; slopeVPerS: number } | null,
): FigureUncertainty | null {
  if (!Number.isFinite(holdVoltageV)) return null;
  if (timing && (!allFinite(timing.samplingIntervalS, timing.slopeVPerS) || timing.samplingIntervalS <= 0)) return null;
  const contributions: Contribution[] = [
    {
      source: "voltage-gain",
      label: gainLabel("Voltage", voltage),
      kind: "systematic",
      u: holdVoltageV * voltage.gainRelU,
    },
    { source: "voltage-offset", label: offsetLabel("Voltage", voltage, "V"), kind: "systematic", u: voltage.offsetU },
    {
      source: "voltage-resolution",
      label: resolutionLabel("Voltage", voltage, "V", false),
      kind: "random",
      u: voltage.resolutionU,
    },
  ];
  if (timing) {
    contributions.push({
      source: "read-timing",
      label: "When the load started, known only to one sampling interval",
      kind: "random",
      u: (Math.abs(timing.slopeVPerS) * timing.samplingIntervalS) / Math.sqrt(12),
    });
  }
  return combine(
    holdVoltageV,
    contributions,
    timing ? undefined : "The voltage's fall at the reading time is not included.",
  );
}

/**
 * Sustained C (measured) = mean current ÷ rated capacity in Ah. The rated capacity is exact by definition
 * (it is the label's number), so only the current channel counts: gain, offset and the averaged resolution.
 */
export function sustainedCUncertainty(
  meanCurrentA: number,
  samples: number,
  ratedMah: number,
  current: ChannelU,
): FigureUncertainty | null {
  if (!allFinite(meanCurrentA, samples, ratedMah) || ratedMah <= 0 || samples < 1) return null;
  const ratedAh = ratedMah / 1000;
  const contributions: Contribution[] = [
    {
      source: "current-gain",
      label: gainLabel("Current", current),
      kind: "systematic",
      u: (meanCurrentA * current.gainRelU) / ratedAh,
    },
    {
      source: "current-offset",
      label: offsetLabel("Current", current, "A"),
      kind: "systematic",
      u: current.offsetU / ratedAh,
    },
    {
      source: "current-resolution",
      label: resolutionLabel("Current", current, "A", true),
      kind: "random",
      u: current.resolutionU / Math.sqrt(samples) / ratedAh,
    },
  ];
  return combine(
    meanCurrentA / ratedAh,
    contributions,
    "The rated capacity is the label's number, exact by definition.",
  );
}

/** Capacity ratio = delivered ÷ rated mAh; the rated value is exact by definition. */
export function capacityRatioUncertainty(capacity: FigureUncertainty, ratedMah: number): FigureUncertainty | null {
  if (!(ratedMah > 0)) return null;
  return scaleUncertainty(capacity, 1 / ratedMah, "The rated capacity is the label's number, exact by definition.");
}

/** Label ratio = a C rating (sag-limited or sustained: name which) ÷ the labelled continuous C, exact by definition. */
export function labelRatioUncertainty(cRating: FigureUncertainty, labelledC: number): FigureUncertainty | null {
  if (!(labelledC > 0)) return null;
  return scaleUncertainty(cRating, 1 / labelledC, "The labelled C is the label's number, exact by definition.");
}

/** Per-cell value of a pack figure: ÷ cells in series (an exact count). */
export function perCellUncertainty(pack: FigureUncertainty, cells: number): FigureUncertainty | null {
  if (!(Number.isInteger(cells) && cells > 0)) return null;
  return scaleUncertainty(pack, 1 / cells);
}
