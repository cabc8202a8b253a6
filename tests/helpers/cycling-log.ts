// A log of several discharge → charge cycles with no header row, from the equivalent-circuit generator
// (invented pack): what a cycler's own logger writes. Columns: time (s), current (A), pack voltage (V),
// temperature (°C) — an order detection could not guess even with a header.
import type { ColumnMapping } from "@/lib/analysis";
import { generateLog, toCsv } from "@/lib/synthetic/equivalent-circuit";

export const CYCLING_MAPPING: ColumnMapping = { time: 0, current: 1, voltage: 2, temperature: 3, hasHeader: false };

export function cyclingLog(cycles = 4, seed = 77) {
  const { rows, truth } = generateLog({
    seed,
    cells: 4,
    capacityMah: 1300,
    r0PerCellMohm: 3,
    r1PerCellMohm: 1,
    loadCurrentA: 13,
    cutoffVPerCell: 3.3,
    ambientC: 22,
    sampleIntervalS: 1,
    initialRestS: 5,
    finalRestS: 5,
    cycles,
    chargeCurrentA: 2.6,
    chargeRestS: 30,
    fadePerCycle: 0.01,
    noise: { voltageV: 0.004, currentA: 0.004, temperatureC: 0.05 },
  });
  return { csv: toCsv(rows, { header: false, columns: ["time", "current", "voltage", "temperature"] }), truth };
}
