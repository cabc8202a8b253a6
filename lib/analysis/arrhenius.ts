/**
 * Temperature correction of resistance by the Arrhenius law. Resistance of a thermally
 * activated process falls as temperature rises: R(T) = A · exp(Ea / (R·T)), so
 * R(T2) = R(T1) · exp((Ea / R) · (1/T2 − 1/T1)) with T in kelvin.
 *
 * Activation energy used by default: 17.1 kJ/mol, the value Ecker et al. give for the ionic
 * conductivity of the electrolyte (M. Ecker et al., "Parameterization of a physico-chemical
 * model of a lithium-ion battery I. Determination of parameters", J. Electrochem. Soc. 162 (9)
 * (2015) A1836–A1848). Why this one and not the ≈50 kJ/mol of interfacial lithium-ion transfer
 * (Y. Yamada, F. Sagane, Y. Iriyama, T. Abe, Z. Ogumi, J. Phys. Chem. C 113 (2009)
 * 14528–14532): a 1-second DC resistance of a high-rate pouch cell is mostly the ohmic part
 * (electrolyte, current collectors, tabs), and the lower value corrects less, so the estimate
 * can only be too cautious, never inflate a cold pack into a good one. It is an estimate and is
 * always shown beside the measured value; comparisons stay inside one ambient band anyway.
 */

/** Molar gas constant, J/(mol·K) (CODATA 2018, exact in the 2019 SI). */
export const GAS_CONSTANT_J_PER_MOL_K = 8.314462618;
export const ZERO_CELSIUS_K = 273.15;
export const REFERENCE_TEMPERATURE_C = 25;

/** Ecker et al., J. Electrochem. Soc. 162 (2015) A1836: electrolyte conductivity. Our default. */
const ACTIVATION_ENERGY_ELECTROLYTE_KJ_PER_MOL = 17.1;
/** Yamada et al., J. Phys. Chem. C 113 (2009) 14528: interfacial Li-ion transfer in EC-based electrolytes, about 50 kJ/mol. */
export const ACTIVATION_ENERGY_INTERFACE_KJ_PER_MOL = 50;
export const DEFAULT_ACTIVATION_ENERGY_KJ_PER_MOL = ACTIVATION_ENERGY_ELECTROLYTE_KJ_PER_MOL;

/** Factor f with R(toC) = f · R(fromC). Greater than 1 when cooling. */
export function arrheniusFactor(
  fromC: number,
  toC: number,
  activationEnergyKJPerMol = DEFAULT_ACTIVATION_ENERGY_KJ_PER_MOL,
): number {
  const fromK = fromC + ZERO_CELSIUS_K;
  const toK = toC + ZERO_CELSIUS_K;
  if (!(fromK > 0) || !(toK > 0)) return Number.NaN;
  const eaJ = activationEnergyKJPerMol * 1000;
  return Math.exp((eaJ / GAS_CONSTANT_J_PER_MOL_K) * (1 / toK - 1 / fromK));
}

/** Resistance measured at `measuredAtC`, estimated at 25 °C (or `targetC`). */
export function resistanceAtTemperature(
  resistance: number,
  measuredAtC: number,
  targetC = REFERENCE_TEMPERATURE_C,
  activationEnergyKJPerMol = DEFAULT_ACTIVATION_ENERGY_KJ_PER_MOL,
): number {
  return resistance * arrheniusFactor(measuredAtC, targetC, activationEnergyKJPerMol);
}
