/**
 * Units as testers write them in header rows, and how to turn a value into SI-ish base units
 * (s, V, A, °C). Also the fast number reader used on every field of a log.
 */
export type Dimension = "time" | "voltage" | "current" | "temperature";
export type TimeUnit = "s" | "ms" | "min" | "h";
export type VoltageUnit = "V" | "mV";
export type CurrentUnit = "A" | "mA";
export type TemperatureUnit = "C" | "F" | "K";

export type UnitInfo = { dimension: Dimension; symbol: string; scale: number; offset: number };

const C: UnitInfo = { dimension: "temperature", symbol: "°C", scale: 1, offset: 0 };
const F: UnitInfo = { dimension: "temperature", symbol: "°F", scale: 5 / 9, offset: (-32 * 5) / 9 };
const K: UnitInfo = { dimension: "temperature", symbol: "K", scale: 1, offset: -273.15 };
const SEC: UnitInfo = { dimension: "time", symbol: "s", scale: 1, offset: 0 };
const MS: UnitInfo = { dimension: "time", symbol: "ms", scale: 0.001, offset: 0 };
const MIN: UnitInfo = { dimension: "time", symbol: "min", scale: 60, offset: 0 };
const HOUR: UnitInfo = { dimension: "time", symbol: "h", scale: 3600, offset: 0 };
const VOLT: UnitInfo = { dimension: "voltage", symbol: "V", scale: 1, offset: 0 };
const MV: UnitInfo = { dimension: "voltage", symbol: "mV", scale: 0.001, offset: 0 };
const AMP: UnitInfo = { dimension: "current", symbol: "A", scale: 1, offset: 0 };
const MA: UnitInfo = { dimension: "current", symbol: "mA", scale: 0.001, offset: 0 };

/** Lower-case unit spellings seen in header rows. "c" alone is temperature only next to a temperature name. */
const UNITS: Record<string, UnitInfo> = {
  s: SEC,
  sec: SEC,
  secs: SEC,
  second: SEC,
  seconds: SEC,
  ms: MS,
  msec: MS,
  millisecond: MS,
  milliseconds: MS,
  millis: MS,
  min: MIN,
  mins: MIN,
  minute: MIN,
  minutes: MIN,
  h: HOUR,
  hr: HOUR,
  hrs: HOUR,
  hour: HOUR,
  hours: HOUR,
  v: VOLT,
  volt: VOLT,
  volts: VOLT,
  mv: MV,
  millivolt: MV,
  millivolts: MV,
  a: AMP,
  amp: AMP,
  amps: AMP,
  ampere: AMP,
  amperes: AMP,
  ma: MA,
  milliamp: MA,
  milliamps: MA,
  milliampere: MA,
  milliamperes: MA,
  "°c": C,
  degc: C,
  celsius: C,
  c: C,
  "°f": F,
  degf: F,
  fahrenheit: F,
  f: F,
  k: K,
  kelvin: K,
};

/** Units that identify a column on their own, with no name beside them ("mV", "°C"). */
const STANDALONE = new Set(["s", "ms", "min", "v", "mv", "a", "ma", "°c", "degc", "°f", "degf"]);

export function lookUpUnit(text: string): UnitInfo | null {
  return UNITS[text.trim().toLowerCase()] ?? null;
}

export function isStandaloneUnit(text: string): boolean {
  return STANDALONE.has(text.trim().toLowerCase());
}

export const TIME_UNITS: Record<TimeUnit, UnitInfo> = { s: SEC, ms: MS, min: MIN, h: HOUR };
export const VOLTAGE_UNITS: Record<VoltageUnit, UnitInfo> = { V: VOLT, mV: MV };
export const CURRENT_UNITS: Record<CurrentUnit, UnitInfo> = { A: AMP, mA: MA };
export const TEMPERATURE_UNITS: Record<TemperatureUnit, UnitInfo> = { C, F, K };

const POW10 = [1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15];

/**
 * Reads one field as a number: the hot path of the whole analysis, run four times per sample.
 * Fast path for plain decimals ("-12.345", "12,345" with a decimal comma): digits are summed into
 * an integer below 2^53 and divided once by an exact power of ten, and IEEE division rounds
 * correctly, so the result is the same double as Number(text) (checked in units.test.ts).
 * Anything else (exponents, spaces, quotes, clock times) takes the slow path. NaN when not a
 * finite number.
 */
export function parseField(text: string | undefined, decimalComma: boolean): number {
  if (text === undefined) return NaN;
  const n = text.length;
  const sep = decimalComma ? 44 : 46;
  let i = 0;
  let c = text.charCodeAt(0);
  const negative = c === 45;
  if (negative || c === 43) i = 1;
  const start = i;
  let m = 0;
  let point = -1;
  // One loop for both sides of the separator: fewer branches and a smaller body, so V8 can
  // inline it at the sample sink's call sites.
  for (; i < n; i++) {
    c = text.charCodeAt(i);
    const d = c - 48;
    if (d >= 0 && d <= 9) m = m * 10 + d;
    else if (c === sep && point < 0) point = i;
    else return parseSlow(text, decimalComma);
  }
  const decimals = point < 0 ? 0 : n - point - 1;
  const digits = point < 0 ? n - start : n - start - 1;
  if (digits === 0 || digits > 15) return parseSlow(text, decimalComma);
  const value = decimals === 0 ? m : m / (POW10[decimals] as number);
  return negative ? -value : value;
}

function parseSlow(text: string, decimalComma: boolean): number {
  let s = text.trim();
  if (s.length === 0) return NaN;
  if (s.length >= 2 && s.charCodeAt(0) === 34 && s.charCodeAt(s.length - 1) === 34) s = s.slice(1, -1).trim();
  if (!decimalComma && /^[+-]?\d*,\d+$/.test(s)) return NaN; // a decimal comma in a point file is a broken line
  if (decimalComma) s = s.replace(",", ".");
  const n = +s;
  if (s.length > 0 && Number.isFinite(n)) return n;
  return s.includes(":") ? parseClock(s) : NaN;
}

/** "hh:mm:ss(.s)" or "mm:ss(.s)" as seconds; NaN otherwise. */
export function parseClock(text: string): number {
  const parts = text.split(":");
  if (parts.length < 2 || parts.length > 3) return NaN;
  let total = 0;
  for (const part of parts) {
    if (!/^\d+(\.\d+)?$/.test(part)) return NaN;
    total = total * 60 + Number(part);
  }
  return total;
}
