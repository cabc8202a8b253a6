/**
 * Checks of a log's figures against what the contributor stated (the pack and the method card).
 * They do not change any figure: they are shown before confirming and kept on the result as
 * plausibility flags for moderators.
 */
import { inferCells } from "./cells";
import type { Figures } from "./types";

export type CardCheck = {
  code: "cutoff-not-reached" | "cells-mismatch" | "load-mismatch" | "stop-temperature-passed";
  message: string;
};

export type StatedCard = {
  packCells: number;
  cutoffVPerCell: number;
  loadCurrentA?: number;
  loadMode?: string;
  stopTemperatureC?: number;
};

/** Below this many volts per cell of headroom, "above the cut-off" is meter noise, not a short log (common practice). */
export const CUTOFF_TOLERANCE_V_PER_CELL = 0.05;
/** A constant-current test whose mean main current is this far from the stated one is suspect (common practice). */
export const LOAD_TOLERANCE = 0.1;

const NEVER_REACHED = "The main discharge never reached the cut-off";

export function checkAgainstCard(figures: Figures, card: StatedCard): CardCheck[] {
  const out: CardCheck[] = [];
  const minPerCell = figures.minVoltageV !== null ? figures.minVoltageV / card.packCells : null;
  if (minPerCell !== null && minPerCell > card.cutoffVPerCell + CUTOFF_TOLERANCE_V_PER_CELL) {
    out.push({
      code: "cutoff-not-reached",
      message: `The log's lowest voltage (${minPerCell.toFixed(2)} V per cell) is above your stated cut-off of ${card.cutoffVPerCell.toFixed(2)} V per cell: check the cut-off, or upload the whole discharge.`,
    });
  }
  if (figures.restVoltageV !== null && figures.minVoltageV !== null) {
    const guess = inferCells(figures.restVoltageV, figures.minVoltageV);
    if (guess.cells !== null && guess.cells !== card.packCells && !guess.alternatives.includes(card.packCells)) {
      out.push({
        code: "cells-mismatch",
        message: `Cells inferred as ${guess.cells}S from the rest voltage ${figures.restVoltageV.toFixed(2)} V, but the pack is ${card.packCells}S: check the pack or the log.`,
      });
    }
  }
  const mainA = figures.mainDischargeCurrentA;
  if (
    card.loadCurrentA !== undefined &&
    (card.loadMode ?? "constant-current") === "constant-current" &&
    mainA !== null &&
    card.loadCurrentA > 0
  ) {
    if (Math.abs(mainA - card.loadCurrentA) / card.loadCurrentA > LOAD_TOLERANCE) {
      out.push({
        code: "load-mismatch",
        message: `The log's main discharge averages ${mainA.toFixed(1)} A, but the method card states ${card.loadCurrentA.toFixed(1)} A.`,
      });
    }
  }
  if (
    card.stopTemperatureC !== undefined &&
    figures.peakTemperatureC !== null &&
    figures.peakTemperatureC > card.stopTemperatureC
  ) {
    out.push({
      code: "stop-temperature-passed",
      message: `The pack reached ${figures.peakTemperatureC.toFixed(1)} °C, above your stated stop temperature of ${card.stopTemperatureC.toFixed(0)} °C. A pack that overheated may be damaged: follow the maker's instructions.`,
    });
  }
  return out;
}

/** The core's own warnings, less the one a card check already says with numbers. */
export function warningsBesideChecks(warnings: string[], checks: CardCheck[]): string[] {
  if (!checks.some((c) => c.code === "cutoff-not-reached")) return warnings;
  return warnings.filter((w) => !w.startsWith(NEVER_REACHED));
}
