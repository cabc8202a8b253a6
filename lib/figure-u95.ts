/**
 * The expanded uncertainty (U95: k = 2, about 95 %) of every published figure of one result, computed on read
 * from what is stored — the figures the analysis wrote and the bench's instrument accuracy (stated, or assumed
 * from a stated default: resolveAccuracy) — so there is one source and nothing to back-fill: a result stored
 * before this existed gets its ± the moment it is read. The models are lib/analysis/uncertainty's (JCGM
 * 100:2008, the law of propagation, checked against JCGM 101:2008 Monte Carlo in its tests).
 *
 * Inputs the stored figures do not keep are taken as follows (each stated in content/methods/uncertainty.md):
 * - the sampling interval: the log's own median interval when known, else the bench's stated (or assumed) one;
 * - samples under load: the headline discharge's duration ÷ that interval;
 * - the current step of the DC resistance: the current at the resistance reading when the analysis kept it, else
 *   the headline discharge's mean current (a step from rest);
 * - where the load's start and end fall for the mean voltage, and the voltage's fall at the hold reading: not
 *   included (the model's note says so).
 */
import type { Figures } from "@/lib/analysis";
import { DEFAULT_ACTIVATION_ENERGY_KJ_PER_MOL } from "@/lib/analysis/arrhenius";
import {
  capacityRatioUncertainty,
  capacityUncertainty,
  currentChannel,
  dcResistanceUncertainty,
  energyUncertainty,
  holdVoltageUncertainty,
  labelRatioUncertainty,
  meanVoltageUncertainty,
  perCellUncertainty,
  resistanceAt25CUncertainty,
  sagLimitedCUncertainty,
  sustainedCUncertainty,
  temperatureChannel,
  voltageChannel,
  type DischargeSummary,
  type FigureUncertainty,
  type InstrumentAccuracy,
} from "@/lib/analysis/uncertainty";

/** The published figures that carry a `<figure>U95` beside them. */
export const U95_FIGURES = [
  "capacityMah",
  "energyWh",
  "meanVoltagePerCellV",
  "holdVoltagePerCellV",
  "dcResistanceMohm",
  "resistanceAt25CMohm",
  "sagLimitedC",
  "labelRatio",
  "sustainedCMeasured",
  "sustainedLabelRatio",
  "capacityRatio",
] as const;
export type U95Figure = (typeof U95_FIGURES)[number];
export type FigureU95 = Record<U95Figure, number | null>;

export type U95Pack = { cells: number; ratedMah: number; labelledC: number };

const finite = (x: number | null | undefined): x is number => typeof x === "number" && Number.isFinite(x);

/** U95 in the stored value's own scale: the model's relative U95 × the stored figure (they agree to rounding). */
function on(stored: number | null | undefined, m: FigureUncertainty | null): number | null {
  if (!finite(stored) || m === null || !Number.isFinite(m.U95)) return null;
  if (m.value === 0) return m.U95;
  return (m.U95 / Math.abs(m.value)) * Math.abs(stored);
}

function dischargeSummary(f: Figures, intervalS: number): DischargeSummary | null {
  const headline = f.discharges?.find((d) => d.index === f.headlineDischarge);
  const meanCurrentA = headline?.meanCurrentA ?? f.mainDischargeCurrentA;
  const durationS = headline?.durationS ?? f.mainDischargeDurationS;
  if (!finite(meanCurrentA) || !finite(durationS) || meanCurrentA <= 0 || durationS <= 0) return null;
  return {
    meanCurrentA,
    durationS,
    samples: Math.max(1, Math.round(durationS / intervalS)),
    samplingIntervalS: intervalS,
  };
}

/** Every figure's U95 (null where the figure is missing or its inputs are). */
export function figureU95(f: Figures, accuracy: InstrumentAccuracy, pack: U95Pack): FigureU95 {
  const V = voltageChannel(accuracy.voltage);
  const I = currentChannel(accuracy.current);
  const T = temperatureChannel(accuracy.temperature);
  const intervalS = finite(f.sampleIntervalS) && f.sampleIntervalS > 0 ? f.sampleIntervalS : accuracy.samplingIntervalS;
  const cells = finite(f.cells) && f.cells > 0 ? f.cells : pack.cells;
  const d = dischargeSummary(f, intervalS);

  const capacity = d && finite(f.capacityMah) ? capacityUncertainty(f.capacityMah, d, I) : null;
  const energy =
    d && finite(f.energyWh) && finite(f.meanVoltageV) ? energyUncertainty(f.energyWh, f.meanVoltageV, d, V, I) : null;
  const meanV = d && finite(f.meanVoltageV) ? meanVoltageUncertainty(f.meanVoltageV, d.samples, V, null) : null;
  const hold = finite(f.holdVoltagePerCellV) ? holdVoltageUncertainty(f.holdVoltagePerCellV * cells, V, null) : null;

  const stepA = f.sagLimitedCAssumptions?.currentA ?? d?.meanCurrentA ?? null;
  const dcr =
    finite(f.dcResistanceMohm) && finite(stepA)
      ? dcResistanceUncertainty(
          { resistanceMohm: f.dcResistanceMohm, currentStepA: stepA, samplingIntervalS: intervalS },
          V,
          I,
        )
      : null;
  const r25 =
    dcr && finite(f.resistanceAt25CMohm) && finite(f.resistanceTemperatureC)
      ? resistanceAt25CUncertainty({
          resistance: dcr,
          temperatureC: f.resistanceTemperatureC,
          temperature: T,
          activationEnergyKJPerMol: DEFAULT_ACTIVATION_ENERGY_KJ_PER_MOL,
        })
      : null;

  const sagA = f.sagLimitedCAssumptions;
  const sagR =
    sagA && finite(sagA.resistanceMohm) && finite(sagA.currentA)
      ? dcResistanceUncertainty(
          { resistanceMohm: sagA.resistanceMohm, currentStepA: Math.abs(sagA.currentA), samplingIntervalS: intervalS },
          V,
          I,
        )
      : null;
  const sag =
    sagA && sagR
      ? sagLimitedCUncertainty({
          resistance: sagR,
          cells,
          ratedMah: pack.ratedMah,
          nominalVPerCell: sagA.nominalVPerCell,
          floorVPerCell: sagA.floorVPerCell,
        })
      : null;
  const sagC = f.sagLimitedCEstimate ?? f.sagLimitedC;
  const sustained =
    d && finite(f.sustainedCMeasured) ? sustainedCUncertainty(d.meanCurrentA, d.samples, pack.ratedMah, I) : null;

  return {
    capacityMah: on(f.capacityMah, capacity),
    energyWh: on(f.energyWh, energy),
    meanVoltagePerCellV: on(f.meanVoltagePerCellV, meanV && perCellUncertainty(meanV, cells)),
    holdVoltagePerCellV: on(f.holdVoltagePerCellV, hold && perCellUncertainty(hold, cells)),
    dcResistanceMohm: on(f.dcResistanceMohm, dcr),
    resistanceAt25CMohm: on(f.resistanceAt25CMohm, r25),
    sagLimitedC: on(sagC, sag),
    labelRatio: on(f.labelRatio, sag && labelRatioUncertainty(sag, pack.labelledC)),
    sustainedCMeasured: on(f.sustainedCMeasured, sustained),
    sustainedLabelRatio: on(f.sustainedLabelRatio, sustained && labelRatioUncertainty(sustained, pack.labelledC)),
    capacityRatio: on(f.capacityRatio, capacity && capacityRatioUncertainty(capacity, pack.ratedMah)),
  };
}
