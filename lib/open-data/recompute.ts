// Recomputing a published figure from its raw log with the open CLI: the options the server analyses a stored
// log with, the CLI's flags for them, and the command a result's page shows. One table, so the page's command,
// the CLI and the server can never drift apart.
import type { AnalyseOptions, ColumnMapping } from "@/lib/analysis";

export type RecomputeFacts = {
  cells: number;
  ratedMah: number;
  labelledC: number;
  weightG: number | null;
  cutoffVPerCell: number;
  stopTemperatureC: number;
  packStartTemperatureC: number | null;
  /** The column mapping the log was read with (absent or null: the columns were detected). */
  mapping?: ColumnMapping | null;
};

/** The options a stored log is analysed with (server/submissions/prepare.ts): the pack's label and the card. */
export function analyseOptionsFor(f: RecomputeFacts): AnalyseOptions {
  return {
    cells: f.cells,
    ratedMah: f.ratedMah,
    labelledC: f.labelledC,
    ...(f.weightG !== null ? { weightG: f.weightG } : {}),
    cutoffVPerCell: f.cutoffVPerCell,
    stopTemperatureC: f.stopTemperatureC,
    ...(f.packStartTemperatureC !== null ? { packStartTemperatureC: f.packStartTemperatureC } : {}),
    ...(f.mapping ? { mapping: f.mapping } : {}),
  };
}

/** The CLI's number flags (scripts/analyse.ts) and the option each sets, in the order the command lists them. */
export const CLI_NUMBER_FLAGS = {
  "--cells": "cells",
  "--rated-mah": "ratedMah",
  "--labelled-c": "labelledC",
  "--weight-g": "weightG",
  "--cutoff-v": "cutoffVPerCell",
  "--stop-temp-c": "stopTemperatureC",
  "--pack-start-temp-c": "packStartTemperatureC",
  "--hold-s": "holdDelayS",
} as const satisfies Record<string, keyof AnalyseOptions>;

/** The CLI's arguments for these options (numbers as JavaScript writes them, so they read back exactly). */
function cliArgs(options: AnalyseOptions): string[] {
  const numbers = Object.entries(CLI_NUMBER_FLAGS).flatMap(([flag, key]) => {
    const v = options[key];
    return typeof v === "number" ? [flag, String(v)] : [];
  });
  // A mapping goes as the JSON the core takes, single-quoted for a POSIX shell (a quote inside a column name
  // closes the quotes, is escaped, and opens them again).
  if (!options.mapping) return numbers;
  return [...numbers, "--map-json", `'${JSON.stringify(options.mapping).replaceAll("'", "'\\''")}'`];
}

/** The file name a published result's log downloads as (GET /api/v1/results/{id}/log). */
export function logDownloadName(resultId: number, uploadedName: string): string {
  const ext = /\.(csv|tsv|txt|log|dat)$/i.exec(uploadedName)?.[1]?.toLowerCase() ?? "txt";
  return `sagline-result-${resultId}-log.${ext}`;
}

/** The command that recomputes a published result's figures from its downloaded log (the CLI prints a table with
 * the figures at the digits they are published with; add --json for every digit). */
export function recomputeCommand(logFile: string, facts: RecomputeFacts): string {
  return ["npm run analyse --", logFile, ...cliArgs(analyseOptionsFor(facts))].join(" ");
}
