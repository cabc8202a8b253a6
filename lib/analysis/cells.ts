/**
 * Cells in series from the rest voltage, when the tester did not say. A test starts from a
 * charged pack, so a rested cell is taken to sit between 3.65 V (about storage charge or a little
 * under) and 4.45 V (a full high-voltage cell is 4.35 V, plus meter error) — common practice.
 * Among counts that fit, the one nearest 4.2 V per cell (full) wins, with the others reported so
 * the caller can warn. When none fits, a wider window (3.0–4.45 V) is tried and flagged.
 */
export const REST_V_PER_CELL_MIN = 3.65;
export const REST_V_PER_CELL_MAX = 4.45;
export const REST_V_PER_CELL_WIDE_MIN = 3.0;
export const FULL_V_PER_CELL = 4.2;
/** No cell is pushed below this under load in a valid test (common practice: cut-offs are 2.8–3.5 V). */
export const LOADED_V_PER_CELL_MIN = 2.0;
export const MAX_CELLS = 24;

export type CellsGuess = { cells: number | null; alternatives: number[]; wide: boolean };

function fitting(restVoltageV: number, minLoadedVoltageV: number, minPerCell: number): number[] {
  const fits: number[] = [];
  for (let n = 1; n <= MAX_CELLS; n++) {
    const perCell = restVoltageV / n;
    if (perCell < minPerCell || perCell > REST_V_PER_CELL_MAX) continue;
    if (minLoadedVoltageV > 0 && minLoadedVoltageV / n < LOADED_V_PER_CELL_MIN) continue;
    fits.push(n);
  }
  return fits;
}

export function inferCells(restVoltageV: number, minLoadedVoltageV: number): CellsGuess {
  if (!(restVoltageV > 0)) return { cells: null, alternatives: [], wide: false };
  let wide = false;
  let fits = fitting(restVoltageV, minLoadedVoltageV, REST_V_PER_CELL_MIN);
  if (fits.length === 0) {
    fits = fitting(restVoltageV, minLoadedVoltageV, REST_V_PER_CELL_WIDE_MIN);
    wide = true;
  }
  if (fits.length === 0) return { cells: null, alternatives: [], wide };
  const nearest = fits.reduce((best, n) =>
    Math.abs(restVoltageV / n - FULL_V_PER_CELL) < Math.abs(restVoltageV / best - FULL_V_PER_CELL) ? n : best,
  );
  return { cells: nearest, alternatives: fits.filter((n) => n !== nearest), wide };
}
