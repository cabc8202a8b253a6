// The reader's units (pure, browser-safe): °C or °F, g or oz, figures per cell or per pack. Pages are rendered
// in the defaults and marked up (data-u), the browser converts them (components/units/), charts take the units
// in their state, CSV downloads in a parameter; the API stays SI. Conversion factors from NIST Special
// Publication 811 (2008 edition), "Guide for the Use of the International System of Units (SI)", Appendix B.8:
// ounce (avoirdupois) = 2.834 952 E+01 g (exactly 28.349 523 125 g); degree Fahrenheit:
// t/°C = (t/°F − 32)/1.8, and a temperature difference of 1 °F = 1/1.8 K = 1/1.8 °C.

type TemperatureUnit = "C" | "F";
type MassUnit = "g" | "oz";
/** Voltages and resistances of a pack in series: per cell (pack ÷ cells) or for the whole pack. */
type Basis = "cell" | "pack";
export type UnitPrefs = { temperature: TemperatureUnit; mass: MassUnit; basis: Basis };

/** What pages are rendered in. */
export const DEFAULT_UNITS: UnitPrefs = { temperature: "C", mass: "g", basis: "cell" };

/** NIST SP 811, B.8: grams in one avoirdupois ounce (exact). */
export const GRAMS_PER_OUNCE = 28.349523125;

export const celsiusToFahrenheit = (c: number) => c * 1.8 + 32;
export const fahrenheitToCelsius = (f: number) => (f - 32) / 1.8;
export const gramsToOunces = (g: number) => g / GRAMS_PER_OUNCE;
export const ouncesToGrams = (oz: number) => oz * GRAMS_PER_OUNCE;

/**
 * Quantities pages mark for conversion, each with the unit it is rendered in:
 * temp — a temperature, °C; dtemp — a temperature difference (rise), °C; mass — grams;
 * v — a voltage per cell, V; r — a resistance per cell, mΩ. (v and r need the pack's cells in series.)
 */
const QUANTITIES = ["temp", "dtemp", "mass", "v", "r"] as const;
export type Quantity = (typeof QUANTITIES)[number];
export const isQuantity = (q: string | undefined): q is Quantity => (QUANTITIES as readonly string[]).includes(q ?? "");

/** The value in the reader's unit, from the value in the rendered (default) unit. */
export function convert(q: Quantity, value: number, prefs: UnitPrefs, cells?: number): number {
  switch (q) {
    case "temp":
      return prefs.temperature === "F" ? celsiusToFahrenheit(value) : value;
    case "dtemp":
      return prefs.temperature === "F" ? value * 1.8 : value;
    case "mass":
      return prefs.mass === "oz" ? gramsToOunces(value) : value;
    case "v":
    case "r":
      return prefs.basis === "pack" && cells ? value * cells : value;
  }
}

/** The unit symbol a quantity is written with for the reader (per cell only when the basis applies). */
export function symbol(q: Quantity, prefs: UnitPrefs, cells?: number): string {
  const perPack = prefs.basis === "pack" && cells !== undefined;
  switch (q) {
    case "temp":
    case "dtemp":
      return prefs.temperature === "F" ? "°F" : "°C";
    case "mass":
      return prefs.mass;
    case "v":
      return perPack ? "V" : "V/cell";
    case "r":
      return perPack ? "mΩ" : "mΩ/cell";
  }
}

/** Decimals in the reader's unit, from the decimals of the rendered value: an ounce is 28 g, so oz gets one
 * more; a pack's volts and milliohms are several cells' worth, so they get one fewer. */
export function digitsFor(q: Quantity, digits: number, prefs: UnitPrefs, cells?: number): number {
  if (q === "mass" && prefs.mass === "oz") return Math.min(2, digits + 1);
  if ((q === "v" || q === "r") && prefs.basis === "pack" && cells) return Math.max(0, digits - 1);
  return digits;
}

const TOKENS: Record<string, Partial<UnitPrefs>> = {
  C: { temperature: "C" },
  F: { temperature: "F" },
  g: { mass: "g" },
  oz: { mass: "oz" },
  cell: { basis: "cell" },
  pack: { basis: "pack" },
};

/** Reads `units=F,oz,pack` (any order, any subset; unknown words ignored) over the defaults. */
export function parseUnitsParam(value: string | null | undefined): UnitPrefs {
  const prefs = { ...DEFAULT_UNITS };
  for (const token of (value ?? "").split(",")) Object.assign(prefs, TOKENS[token.trim()] ?? {});
  return prefs;
}

/** The parameter for these units: only what differs from the defaults, in a fixed order ("" for the defaults). */
export function writeUnitsParam(prefs: UnitPrefs): string {
  return [
    prefs.temperature !== DEFAULT_UNITS.temperature ? prefs.temperature : "",
    prefs.mass !== DEFAULT_UNITS.mass ? prefs.mass : "",
    prefs.basis !== DEFAULT_UNITS.basis ? prefs.basis : "",
  ]
    .filter(Boolean)
    .join(",");
}

export const isDefaultUnits = (prefs: UnitPrefs) => writeUnitsParam(prefs) === "";

/** A CSV column of the SI download, in the reader's units: the column keeps its unit in its name. */
export type UnitColumn<R> = {
  name: string;
  digits?: number;
  value: (row: R) => string | number | boolean | null | undefined;
};

/**
 * The download's columns in the reader's units. Columns are recognised by the unit their name ends in
 * (…TemperatureC, temperatureRiseC, …G for grams, …PerCellV / …PerCellMohm), converted, and renamed so the
 * unit stays explicit (…TemperatureF, weightOz, …PackV). Per-pack values need the row's cells in series.
 */
export function convertColumns<R, C extends UnitColumn<R>>(
  columns: C[],
  prefs: UnitPrefs,
  cellsOf?: (row: R) => number | null | undefined,
): C[] {
  const num = (v: unknown) => (typeof v === "number" && Number.isFinite(v) ? v : null);
  // Each converted column keeps everything else of the SI one (type, description, …) and states its rounding.
  return columns.map((c): C => {
    const rise = /RiseC$/.test(c.name);
    if (prefs.temperature === "F" && /(Temperature|Rise)C$/.test(c.name))
      return {
        ...c,
        name: c.name.replace(/C$/, "F"),
        digits: 2,
        value: (r: R) => {
          const v = num(c.value(r));
          return v === null ? c.value(r) : round(convert(rise ? "dtemp" : "temp", v, prefs), 2);
        },
      };
    if (prefs.mass === "oz" && /[a-z]G$/.test(c.name))
      return {
        ...c,
        name: c.name.replace(/G$/, "Oz"),
        digits: 3,
        value: (r: R) => {
          const v = num(c.value(r));
          return v === null ? c.value(r) : round(gramsToOunces(v), 3);
        },
      };
    if (prefs.basis === "pack" && cellsOf && /PerCell(V|Mohm)$/.test(c.name))
      return {
        ...c,
        name: c.name.replace(/PerCell(V|Mohm)$/, "Pack$1"),
        digits: 4,
        value: (r: R) => {
          const v = num(c.value(r));
          const cells = cellsOf(r);
          return v === null || !cells ? null : round(v * cells, 4);
        },
      };
    return c;
  });
}

const round = (v: number, digits: number) => Math.round(v * 10 ** digits) / 10 ** digits;
