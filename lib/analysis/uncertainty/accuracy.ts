/**
 * A bench's stated instrument accuracy, as testers read it off a specification sheet: each channel
 * "± (p % of reading + offset)", plus the read-out's resolution, the sampling interval and the resistance
 * method. One zod schema, browser-safe (no I/O, no database import), for forms, the server and the API.
 *
 * What a tester does not know is filled from a class of instrument (accuracy-classes.ts) by `resolveAccuracy`,
 * which lists every value it assumed, in words, so pages can show the assumption beside the ±.
 */
import { z } from "zod";
import { rectangularU, resolutionU } from "./gum";

/** The resistance methods a method card can state (the same keys as group-key.ts's RESISTANCE_METHODS). */
export const ACCURACY_RESISTANCE_METHODS = ["iec-61960-two-level", "dc-step", "ac-1khz", "charger-readout"] as const;
export type AccuracyResistanceMethod = (typeof ACCURACY_RESISTANCE_METHODS)[number];

const percentOfReading = (what: string) =>
  z
    .number({ error: `${what} accuracy must be a number (% of reading).` })
    .min(0, `${what} accuracy cannot be negative.`)
    .max(10, `${what} accuracy must be at most 10 % of reading.`);

const bounded = (what: string, unit: string, max: number) =>
  z
    .number({ error: `${what} must be a number (${unit}).` })
    .min(0, `${what} cannot be negative.`)
    .max(max, `${what} must be at most ${max} ${unit}.`);

export const voltageAccuracySchema = z.object({
  percentOfReading: percentOfReading("Voltage"),
  offsetV: bounded("Voltage offset", "V", 1),
  resolutionV: bounded("Voltage resolution", "V", 1),
});
export const currentAccuracySchema = z.object({
  percentOfReading: percentOfReading("Current"),
  offsetA: bounded("Current offset", "A", 10),
  resolutionA: bounded("Current resolution", "A", 10),
});
export const temperatureAccuracySchema = z.object({
  percentOfReading: percentOfReading("Temperature"),
  offsetC: bounded("Temperature offset", "°C", 20),
  resolutionC: bounded("Temperature resolution", "°C", 10),
});

export const samplingIntervalSchema = z
  .number({ error: "Sampling interval must be a number (s)." })
  .gt(0, "Sampling interval must be above 0 s.")
  .max(600, "Sampling interval must be at most 600 s.");

export const resistanceMethodSchema = z.enum(ACCURACY_RESISTANCE_METHODS, {
  error: "Choose how resistance is measured.",
});

/** A complete statement of a bench's accuracy: what the propagation functions use. */
export const instrumentAccuracySchema = z.object({
  voltage: voltageAccuracySchema,
  current: currentAccuracySchema,
  temperature: temperatureAccuracySchema,
  samplingIntervalS: samplingIntervalSchema,
  resistanceMethod: resistanceMethodSchema,
});

export type VoltageAccuracy = z.infer<typeof voltageAccuracySchema>;
export type CurrentAccuracy = z.infer<typeof currentAccuracySchema>;
export type TemperatureAccuracy = z.infer<typeof temperatureAccuracySchema>;
export type InstrumentAccuracy = z.infer<typeof instrumentAccuracySchema>;

/** What a tester states: any part may be missing (null or absent) and is then assumed from a class. */
export const statedAccuracySchema = z.object({
  voltage: voltageAccuracySchema.partial().nullable().optional(),
  current: currentAccuracySchema.partial().nullable().optional(),
  temperature: temperatureAccuracySchema.partial().nullable().optional(),
  samplingIntervalS: samplingIntervalSchema.nullable().optional(),
  resistanceMethod: resistanceMethodSchema.nullable().optional(),
});
export type StatedAccuracy = z.infer<typeof statedAccuracySchema>;

/**
 * One channel in unit-free form for the propagation: standard uncertainties (GUM 4.3.7 for the ± limits,
 * F.2.2.1 for the resolution). gain is relative (0.01 = 1 %); offset and resolution are in the channel's unit.
 */
export type ChannelU = {
  gainRelU: number;
  offsetU: number;
  resolutionU: number;
  percentOfReading: number;
  offset: number;
  resolution: number;
};

function channel(percent: number, offset: number, resolution: number): ChannelU {
  return {
    gainRelU: rectangularU(percent / 100),
    offsetU: rectangularU(offset),
    resolutionU: resolutionU(resolution),
    percentOfReading: percent,
    offset,
    resolution,
  };
}

export function voltageChannel(a: VoltageAccuracy): ChannelU {
  return channel(a.percentOfReading, a.offsetV, a.resolutionV);
}
export function currentChannel(a: CurrentAccuracy): ChannelU {
  return channel(a.percentOfReading, a.offsetA, a.resolutionA);
}
export function temperatureChannel(a: TemperatureAccuracy): ChannelU {
  return channel(a.percentOfReading, a.offsetC, a.resolutionC);
}

/** "±(0.5 % of reading + 0.02 V), resolution 0.01 V" */
export function describeChannel(percent: number, offset: number, resolution: number, unit: string): string {
  return `±(${trim(percent)} % of reading + ${trim(offset)} ${unit}), resolution ${trim(resolution)} ${unit}`;
}

function trim(x: number): string {
  return String(Number(x.toPrecision(6)));
}
