/**
 * Default accuracy when a tester does not know their instrument's: generic classes of instrument, named by us
 * (no product names). EVERY number below is from memory of what instruments of the class commonly state
 * (common practice), not a maker's specification and not a measurement; the `source` field says so in words
 * and travels with every value `resolveAccuracy` fills in, so pages can show the assumption.
 *
 * When in doubt the widest class applies (`DEFAULT_ACCURACY_CLASS`): an assumed uncertainty should be too
 * large rather than too small.
 */
import {
  describeChannel,
  instrumentAccuracySchema,
  type AccuracyResistanceMethod,
  type InstrumentAccuracy,
  type StatedAccuracy,
} from "./accuracy";

export const ACCURACY_CLASS_KEYS = ["hobby-charger-readout", "electronic-load-logger", "bench-meter-logger"] as const;
export type AccuracyClassKey = (typeof ACCURACY_CLASS_KEYS)[number];

export type AccuracyClass = {
  key: AccuracyClassKey;
  /** Shown on pages: "typical hobby charger or analyser read-out". */
  name: string;
  accuracy: InstrumentAccuracy;
  source: string;
};

const FROM_MEMORY =
  "Sagline's assumption, from memory of what instruments of this class commonly state (common practice); not a maker's specification";

export const ACCURACY_CLASSES: Record<AccuracyClassKey, AccuracyClass> = {
  "hobby-charger-readout": {
    key: "hobby-charger-readout",
    name: "typical hobby charger or analyser read-out",
    accuracy: {
      // From memory, common practice: 10 mV display steps, about ±0.5 % + 20 mV on the pack voltage.
      voltage: { percentOfReading: 0.5, offsetV: 0.02, resolutionV: 0.01 },
      // From memory, common practice: an internal shunt good to about ±2 % + 50 mA, 10 mA display steps.
      current: { percentOfReading: 2, offsetA: 0.05, resolutionA: 0.01 },
      // From memory, common practice: a clip-on sensor good to about ±2 °C, whole-degree display.
      temperature: { percentOfReading: 0, offsetC: 2, resolutionC: 1 },
      // From memory, common practice: one logged row a second.
      samplingIntervalS: 1,
      resistanceMethod: "charger-readout",
    },
    source: FROM_MEMORY,
  },
  "electronic-load-logger": {
    key: "electronic-load-logger",
    name: "programmable electronic load with its own logging",
    accuracy: {
      // From memory, common practice: about ±0.1 % + 10 mV, 1 mV steps.
      voltage: { percentOfReading: 0.1, offsetV: 0.01, resolutionV: 0.001 },
      // From memory, common practice: about ±0.5 % + 20 mA, 1 mA steps.
      current: { percentOfReading: 0.5, offsetA: 0.02, resolutionA: 0.001 },
      // From memory, common practice: a thermocouple or thermistor input good to about ±1.5 °C, 0.1 °C steps.
      temperature: { percentOfReading: 0, offsetC: 1.5, resolutionC: 0.1 },
      // From memory, common practice: one row a second.
      samplingIntervalS: 1,
      resistanceMethod: "dc-step",
    },
    source: FROM_MEMORY,
  },
  "bench-meter-logger": {
    key: "bench-meter-logger",
    name: "bench multimeter-class logger with a calibrated shunt",
    accuracy: {
      // From memory, common practice: a 5½-digit-class voltmeter, about ±0.02 % + 2 mV, 0.1 mV steps.
      voltage: { percentOfReading: 0.02, offsetV: 0.002, resolutionV: 0.0001 },
      // From memory, common practice: a 0.1 % shunt read by the same class of meter, about ±0.2 % + 5 mA.
      current: { percentOfReading: 0.2, offsetA: 0.005, resolutionA: 0.001 },
      // From memory, common practice: a special-limits thermocouple or a calibrated thermistor, about ±1 °C.
      temperature: { percentOfReading: 0, offsetC: 1, resolutionC: 0.1 },
      // From memory, common practice: two rows a second.
      samplingIntervalS: 0.5,
      resistanceMethod: "iec-61960-two-level",
    },
    source: FROM_MEMORY,
  },
};

/** The widest class: used when nothing is known about the bench. */
export const DEFAULT_ACCURACY_CLASS: AccuracyClassKey = "hobby-charger-readout";

export type AccuracyField =
  | "voltage.percentOfReading"
  | "voltage.offsetV"
  | "voltage.resolutionV"
  | "current.percentOfReading"
  | "current.offsetA"
  | "current.resolutionA"
  | "temperature.percentOfReading"
  | "temperature.offsetC"
  | "temperature.resolutionC"
  | "samplingIntervalS"
  | "resistanceMethod";

export type AccuracyAssumption = {
  field: AccuracyField;
  value: number | AccuracyResistanceMethod;
  /** "Current offset 0.05 A assumed for a typical hobby charger or analyser read-out." */
  words: string;
  source: string;
};

export type ResolvedAccuracy = {
  accuracy: InstrumentAccuracy;
  /** Every value taken from the class instead of the tester's statement; empty when all was stated. */
  assumptions: AccuracyAssumption[];
  classKey: AccuracyClassKey;
  /** One line per channel for the method card: "Current ±(2 % of reading + 0.05 A), resolution 0.01 A (assumed: …)". */
  summary: string[];
};

const FIELD_WORDS: Record<AccuracyField, { what: string; unit: string }> = {
  "voltage.percentOfReading": { what: "Voltage accuracy", unit: "% of reading" },
  "voltage.offsetV": { what: "Voltage offset", unit: "V" },
  "voltage.resolutionV": { what: "Voltage resolution", unit: "V" },
  "current.percentOfReading": { what: "Current accuracy", unit: "% of reading" },
  "current.offsetA": { what: "Current offset", unit: "A" },
  "current.resolutionA": { what: "Current resolution", unit: "A" },
  "temperature.percentOfReading": { what: "Temperature accuracy", unit: "% of reading" },
  "temperature.offsetC": { what: "Temperature offset", unit: "°C" },
  "temperature.resolutionC": { what: "Temperature resolution", unit: "°C" },
  samplingIntervalS: { what: "Sampling interval", unit: "s" },
  resistanceMethod: { what: "Resistance method", unit: "" },
};

/**
 * Fill what the tester did not state from a class (the widest by default) and list each value assumed.
 * The result passes `instrumentAccuracySchema` (checked here, so a bad class table fails loudly in tests).
 */
export function resolveAccuracy(
  stated: StatedAccuracy | null | undefined,
  classKey: AccuracyClassKey = DEFAULT_ACCURACY_CLASS,
): ResolvedAccuracy {
  const cls = ACCURACY_CLASSES[classKey];
  const d = cls.accuracy;
  const s = stated ?? {};
  const assumptions: AccuracyAssumption[] = [];
  function pick<T extends number | AccuracyResistanceMethod>(
    field: AccuracyField,
    given: T | null | undefined,
    fallback: T,
  ): T {
    if (given !== null && given !== undefined) return given;
    const w = FIELD_WORDS[field];
    const shown = typeof fallback === "number" ? `${fallback}${w.unit ? ` ${w.unit}` : ""}` : fallback;
    assumptions.push({
      field,
      value: fallback,
      words: `${w.what} ${shown} assumed for a ${cls.name}.`,
      source: cls.source,
    });
    return fallback;
  }
  const accuracy = instrumentAccuracySchema.parse({
    voltage: {
      percentOfReading: pick("voltage.percentOfReading", s.voltage?.percentOfReading, d.voltage.percentOfReading),
      offsetV: pick("voltage.offsetV", s.voltage?.offsetV, d.voltage.offsetV),
      resolutionV: pick("voltage.resolutionV", s.voltage?.resolutionV, d.voltage.resolutionV),
    },
    current: {
      percentOfReading: pick("current.percentOfReading", s.current?.percentOfReading, d.current.percentOfReading),
      offsetA: pick("current.offsetA", s.current?.offsetA, d.current.offsetA),
      resolutionA: pick("current.resolutionA", s.current?.resolutionA, d.current.resolutionA),
    },
    temperature: {
      percentOfReading: pick(
        "temperature.percentOfReading",
        s.temperature?.percentOfReading,
        d.temperature.percentOfReading,
      ),
      offsetC: pick("temperature.offsetC", s.temperature?.offsetC, d.temperature.offsetC),
      resolutionC: pick("temperature.resolutionC", s.temperature?.resolutionC, d.temperature.resolutionC),
    },
    samplingIntervalS: pick("samplingIntervalS", s.samplingIntervalS, d.samplingIntervalS),
    resistanceMethod: pick("resistanceMethod", s.resistanceMethod, d.resistanceMethod),
  });
  const assumed = (prefix: string, fields: number) => {
    const n = assumptions.filter((a) => a.field.startsWith(prefix)).length;
    return n === 0 ? "" : n === fields ? ` (assumed: ${cls.name})` : ` (partly assumed: ${cls.name})`;
  };
  const summary = [
    `Voltage ${describeChannel(accuracy.voltage.percentOfReading, accuracy.voltage.offsetV, accuracy.voltage.resolutionV, "V")}${assumed("voltage.", 3)}`,
    `Current ${describeChannel(accuracy.current.percentOfReading, accuracy.current.offsetA, accuracy.current.resolutionA, "A")}${assumed("current.", 3)}`,
    `Temperature ${describeChannel(accuracy.temperature.percentOfReading, accuracy.temperature.offsetC, accuracy.temperature.resolutionC, "°C")}${assumed("temperature.", 3)}`,
    `Sampling interval ${accuracy.samplingIntervalS} s${assumed("samplingIntervalS", 1)}`,
  ];
  return { accuracy, assumptions, classKey, summary };
}
