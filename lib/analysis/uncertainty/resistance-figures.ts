/**
 * Uncertainty of the resistance figures: DC resistance from a current step, its 25 °C estimate and the
 * sag-limited C. JCGM 100:2008 (GUM) 5.1.2, k = 2; rectangular "± limits" (GUM 4.3.7); see gum.ts.
 *
 * DC resistance R = (U₁ − U₂) / (I₂ − I₁), all four readings by the same two instruments a second apart:
 *   ΔU_read = (1 + g_V)·ΔU + (e_U1 − e_U2),  ΔI_read = (1 + g_I)·ΔI + (e_I2 − e_I1)
 * so the offsets cancel in each difference and the gains leave R·(1 + g_V)/(1 + g_I):
 *   u(R)² = (R·u_gV)² + (R·u_gI)² + 2·(u_eV/ΔI)² + 2·(R·u_eI/ΔI)² + (timing)².
 * Timing: the step happened somewhere between the last low sample and the first high one, so "1 s after the
 * step" is known to one sampling interval, rectangular, u_t = Δt/√12; the voltage is still sagging then, and
 * R grows by a fraction ρ per second, giving R·ρ·Δt/√12 (random).
 */
import { GAS_CONSTANT_J_PER_MOL_K, ZERO_CELSIUS_K } from "../arrhenius";
import type { ChannelU } from "./accuracy";
import { allFinite, combine, rectangularU, type Contribution, type FigureUncertainty } from "./gum";

/**
 * How fast a LiPo pack's DC resistance still grows about one second after a load step, as a fraction of R per
 * second. From memory (common practice: the 1 s and 2 s readings of a pack differ by a few per cent); our
 * assumption, used only when the log's own slope is not given.
 */
export const DEFAULT_RESISTANCE_RISE_PER_S = 0.05;
export const RESISTANCE_RISE_SOURCE =
  "assumed: resistance still rises about 5 % per second one second after the step (from memory, common practice)";

/**
 * Half-width of the activation energy's range around the value used (kJ/mol), rectangular. Our stated
 * assumption, from memory: published values for the electrolyte's conductivity in carbonate electrolytes
 * spread over roughly 12–22 kJ/mol around Ecker et al.'s 17.1 kJ/mol (J. Electrochem. Soc. 162 (2015) A1836).
 */
export const DEFAULT_ACTIVATION_ENERGY_HALF_WIDTH_KJ_PER_MOL = 5;

export type ResistanceStep = {
  /** Pack DC resistance (mΩ). */
  resistanceMohm: number;
  /** I₂ − I₁ (A), the size of the current step. */
  currentStepA: number;
  samplingIntervalS: number;
  /** Fraction of R gained per second at the reading (default DEFAULT_RESISTANCE_RISE_PER_S). */
  risePerS?: number;
};

export function dcResistanceUncertainty(
  step: ResistanceStep,
  voltage: ChannelU,
  current: ChannelU,
): FigureUncertainty | null {
  const rho = step.risePerS ?? DEFAULT_RESISTANCE_RISE_PER_S;
  const { resistanceMohm: r, currentStepA: di, samplingIntervalS: dt } = step;
  if (!allFinite(r, di, dt, rho) || r <= 0 || di <= 0 || dt <= 0) return null;
  const contributions: Contribution[] = [
    {
      source: "voltage-gain",
      label: `Voltage reading, gain error (±${voltage.percentOfReading} % of reading)`,
      kind: "systematic",
      u: r * voltage.gainRelU,
    },
    {
      source: "current-gain",
      label: `Current reading, gain error (±${current.percentOfReading} % of reading)`,
      kind: "systematic",
      u: r * current.gainRelU,
    },
    {
      source: "voltage-resolution",
      label: `Voltage read-out resolution (${voltage.resolution} V), two readings`,
      kind: "random",
      u: (Math.SQRT2 * voltage.resolutionU * 1000) / di,
    },
    {
      source: "current-resolution",
      label: `Current read-out resolution (${current.resolution} A), two readings`,
      kind: "random",
      u: (Math.SQRT2 * r * current.resolutionU) / di,
    },
    {
      source: "read-timing",
      label: `When the step happened, known only to one sampling interval (${dt} s)${step.risePerS === undefined ? `; ${RESISTANCE_RISE_SOURCE}` : ""}`,
      kind: "random",
      u: (r * Math.abs(rho) * dt) / Math.sqrt(12),
    },
  ];
  return combine(
    r,
    contributions,
    "Offsets cancel: both readings of each channel come from the same instrument a second apart. Lead and connector resistance is not an instrument error and is not included.",
  );
}

export type Resistance25CInput = {
  /** The measured DC resistance and its uncertainty (mΩ). */
  resistance: FigureUncertainty;
  /** Pack temperature at the measurement (°C). */
  temperatureC: number;
  temperature: ChannelU;
  activationEnergyKJPerMol: number;
  /** Rectangular half-width of the activation energy (default DEFAULT_ACTIVATION_ENERGY_HALF_WIDTH_KJ_PER_MOL). */
  activationEnergyHalfWidthKJPerMol?: number;
  targetC?: number;
};

/**
 * R₂₅ = R·exp((Eₐ/R_g)(1/T₂₅ − 1/T)), T in kelvin. Sensitivities (GUM 5.1.3):
 *   ∂R₂₅/∂R = f,  ∂R₂₅/∂T = R₂₅·Eₐ/(R_g·T²),  ∂R₂₅/∂Eₐ = R₂₅·(1/T₂₅ − 1/T)/R_g.
 * The measured R's own contributions carry over multiplied by f. At 25 °C the Eₐ term vanishes.
 */
export function resistanceAt25CUncertainty(input: Resistance25CInput): FigureUncertainty | null {
  const targetC = input.targetC ?? 25;
  const halfWidth = input.activationEnergyHalfWidthKJPerMol ?? DEFAULT_ACTIVATION_ENERGY_HALF_WIDTH_KJ_PER_MOL;
  const { resistance, temperatureC, temperature: tc, activationEnergyKJPerMol } = input;
  if (!allFinite(temperatureC, targetC, activationEnergyKJPerMol, halfWidth)) return null;
  const tK = temperatureC + ZERO_CELSIUS_K;
  const targetK = targetC + ZERO_CELSIUS_K;
  if (!(tK > 0) || !(targetK > 0)) return null;
  const eaJ = activationEnergyKJPerMol * 1000;
  const inverseGap = 1 / targetK - 1 / tK;
  const f = Math.exp((eaJ / GAS_CONSTANT_J_PER_MOL_K) * inverseGap);
  const r25 = resistance.value * f;
  const dT = (r25 * eaJ) / (GAS_CONSTANT_J_PER_MOL_K * tK * tK);
  const dEaPerJ = (r25 * inverseGap) / GAS_CONSTANT_J_PER_MOL_K;
  const contributions: Contribution[] = [
    ...resistance.contributions.map((c) => ({ ...c, u: c.u * f })),
    {
      source: "temperature-gain",
      label: `Temperature reading, gain error (±${tc.percentOfReading} % of reading)`,
      kind: "systematic",
      u: dT * Math.abs(temperatureC) * tc.gainRelU,
    },
    {
      source: "temperature-offset",
      label: `Temperature reading, offset (±${tc.offset} °C)`,
      kind: "systematic",
      u: dT * tc.offsetU,
    },
    {
      source: "temperature-resolution",
      label: `Temperature read-out resolution (${tc.resolution} °C)`,
      kind: "random",
      u: dT * tc.resolutionU,
    },
    {
      source: "activation-energy",
      label: `Activation energy ${activationEnergyKJPerMol} ± ${halfWidth} kJ/mol (our stated assumption)`,
      kind: "assumption",
      u: Math.abs(dEaPerJ) * rectangularU(halfWidth * 1000),
    },
  ];
  return combine(
    r25,
    contributions,
    "An estimate: the Arrhenius correction with a stated activation energy, whose range is part of the ±.",
  );
}

export type SagLimitedInput = {
  /** Pack DC resistance and its uncertainty (mΩ). */
  resistance: FigureUncertainty;
  cells: number;
  ratedMah: number;
  nominalVPerCell: number;
  floorVPerCell: number;
};

/**
 * Sag-limited C (an estimate) = S·(V_nominal − V_floor) / R ÷ rated Ah. The nominal and floor voltages are part
 * of the figure's definition and the rated capacity is the label's number: all exact. So u(C)/C = u(R)/R, each
 * of R's contributions scaled by C/R (GUM 5.1.6, a quotient's relative uncertainty).
 */
export function sagLimitedCUncertainty(input: SagLimitedInput): FigureUncertainty | null {
  const { resistance, cells, ratedMah, nominalVPerCell, floorVPerCell } = input;
  if (
    !allFinite(cells, ratedMah, nominalVPerCell, floorVPerCell) ||
    !(resistance.value > 0) ||
    !(ratedMah > 0) ||
    !(cells > 0)
  )
    return null;
  const c = (cells * (nominalVPerCell - floorVPerCell)) / (resistance.value / 1000) / (ratedMah / 1000);
  const relative = c / resistance.value;
  return combine(
    c,
    resistance.contributions.map((x) => ({ ...x, u: x.u * relative })),
    "Covers the measurement of resistance only: the nominal and floor voltages are the estimate's stated definition, not measured.",
  );
}
