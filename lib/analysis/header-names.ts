/**
 * Reads one header cell ("Voltage (mV)", "time_ms", "U/V", "Cell 3 [V]", "Temp °C") into a
 * quantity, a unit and a score saying how sure we are. Pure string work, no I/O.
 */
import { type Dimension, type UnitInfo, isStandaloneUnit, lookUpUnit } from "./units";

export type HeaderGuess = {
  index: number;
  raw: string;
  dimension: Dimension | null;
  /** 0 = not this quantity; higher = surer. Ties go to the leftmost column. */
  score: number;
  unit: UnitInfo | null;
  /** Set for per-cell voltage columns ("Cell 1 (V)", "V3", "vcell2"). */
  cellNumber: number | null;
};

const TIME_WORDS = new Set(["time", "elapsed", "runtime", "seconds", "sec", "secs", "t", "timestamp", "duration"]);
const TIME_DEMOTE = new Set(["step", "cycle", "loop", "charge", "rest", "date", "real", "clock", "segment", "phase"]);
const VOLT_WORDS = new Set(["voltage", "volt", "volts", "vbat", "vpack", "ubat", "upack", "vbatt", "v", "u"]);
const CURRENT_WORDS = new Set(["current", "curr", "amps", "ibat", "ipack", "ibatt", "i", "amp"]);
const TEMP_WORDS = new Set(["temperature", "temp", "tbat", "tpack", "ntc", "thermistor", "thermocouple", "tc"]);
const TEMP_PREFER = new Set(["pack", "cell", "batt", "battery", "probe", "external", "ext", "surface"]);
/** Columns that name a limit, a setting or a part other than the pack: never a measured pack value. */
const EXCLUDE = new Set([
  "limit",
  "set",
  "setpoint",
  "target",
  "max",
  "min",
  "input",
  "supply",
  "cutoff",
  "cut",
  "stop",
  "ambient",
  "amb",
  "room",
  "air",
  "internal",
  "int",
  "charger",
  "board",
  "fet",
  "mosfet",
  "cpu",
  "capacity",
  "energy",
  "power",
  "resistance",
  "ir",
  "soc",
  "mah",
  "wh",
  "ah",
]);
const NAME_PREFIXES = ["temperature", "voltage", "current", "time", "temp"];

/** Splits "StepTime" into "Step Time" without breaking unit spellings like "mV" or "mA". */
function splitCamel(text: string): string {
  return text.replace(/([a-z]{2,})([A-Z][a-z])/g, "$1 $2");
}

function extractUnit(text: string): { name: string; unit: string | null } {
  const bracket = /[([{<]\s*([^)\]}>]*?)\s*[)\]}>]/.exec(text);
  if (bracket) {
    const name = `${text.slice(0, bracket.index)} ${text.slice(bracket.index + bracket[0].length)}`;
    return { name, unit: (bracket[1] ?? "").trim() };
  }
  const slash = text.lastIndexOf("/");
  if (slash > 0 && lookUpUnit(text.slice(slash + 1)))
    return { name: text.slice(0, slash), unit: text.slice(slash + 1).trim() };
  const inUnit = /^(.*)\s+in\s+(\S+)$/.exec(text);
  if (inUnit && lookUpUnit(inUnit[2] ?? "")) return { name: inUnit[1] ?? "", unit: (inUnit[2] ?? "").trim() };
  return { name: text, unit: null };
}

function normalise(raw: string): string {
  return splitCamel(
    raw
      .replace(/^\uFEFF/, "")
      .trim()
      .replace(/^"|"$/g, ""),
  )
    .toLowerCase()
    .replace(/µ/g, "u")
    .replace(/℃/g, "°c")
    .replace(/º/g, "°")
    .replace(/\bdeg\.?\s*([cf])\b/g, "°$1")
    .replace(/°\s*/g, " °");
}

function cellNumberOf(words: string[], joined: string): number | null {
  const cell =
    /(?:^|\s)(?:cell|vcell|zelle)\s*[-_#]?\s*(\d{1,2})(?:\s|$)/.exec(joined) ??
    /^(?:v|u|vc|c)\s*[-_]?\s*(\d{1,2})$/.exec(joined);
  if (!cell) return null;
  const n = Number(cell[1]);
  if (!(n >= 1 && n <= 24)) return null;
  return words.some((w) => EXCLUDE.has(w) || TEMP_WORDS.has(w)) ? null : n;
}

export function guessHeader(raw: string, index: number): HeaderGuess {
  const text = normalise(raw);
  const { name, unit: unitText } = extractUnit(text);
  let words = name.split(/[^a-z0-9°]+/).filter((w) => w.length > 0);
  let unitWord = unitText;
  if (unitWord === null && words.length > 1 && lookUpUnit(words[words.length - 1] ?? "")) {
    unitWord = words[words.length - 1] ?? null;
    words = words.slice(0, -1);
  }
  if (unitWord === null && words.length === 1) {
    const only = words[0] ?? "";
    for (const prefix of NAME_PREFIXES) {
      if (only.startsWith(prefix) && only.length > prefix.length && lookUpUnit(only.slice(prefix.length))) {
        unitWord = only.slice(prefix.length);
        words = [prefix];
        break;
      }
    }
  }
  if (unitWord === null && words.length === 1 && isStandaloneUnit(words[0] ?? "")) {
    unitWord = words[0] ?? null;
    words = [];
  }
  const unit = unitWord === null ? null : lookUpUnit(unitWord);
  const guess: HeaderGuess = { index, raw, dimension: null, score: 0, unit, cellNumber: null };
  if (words.some((w) => EXCLUDE.has(w))) return guess;

  const cellNumber = cellNumberOf(words, words.join(" "));
  if (cellNumber !== null && (unit === null || unit.dimension === "voltage")) {
    return { ...guess, dimension: "voltage", score: 1, cellNumber };
  }
  const named = classifyByName(words);
  if (named && (unit === null || unit.dimension === named.dimension)) {
    return { ...guess, dimension: named.dimension, score: named.score };
  }
  if (named && unit) {
    // Name and unit disagree. A one- or two-letter name ("T (°C)", "U (mA)") is a symbol that
    // could mean several things, so the unit decides; a real word ("Voltage (A)") wins over the unit.
    const shortName = words.length === 1 && (words[0] ?? "").length <= 2;
    if (shortName) return { ...guess, dimension: unit.dimension, score: 5 };
    return { ...guess, dimension: named.dimension, score: named.score - 1, unit: null };
  }
  // No known name: a clear unit alone still identifies the quantity ("Ch1 (V)", "mA", "Probe (°C)").
  const bareLetter = unitWord === "c" || unitWord === "f" || unitWord === "k";
  if (unit && !bareLetter) return { ...guess, dimension: unit.dimension, score: words.length === 0 ? 3 : 2 };
  return { ...guess, unit: null };
}

function classifyByName(words: string[]): { dimension: Dimension; score: number } | null {
  if (words.length === 0) return null;
  const has = (set: Set<string>) => words.some((w) => set.has(w));
  if (has(TEMP_WORDS)) return { dimension: "temperature", score: has(TEMP_PREFER) ? 10 : 8 };
  if (words.includes("time") || has(TIME_WORDS)) {
    if (has(TIME_DEMOTE)) return { dimension: "time", score: 3 };
    if (words.length === 1 && words[0] === "time") return { dimension: "time", score: 10 };
    return { dimension: "time", score: words.includes("t") ? 7 : 9 };
  }
  if (has(VOLT_WORDS)) {
    if (words.includes("cell")) return { dimension: "voltage", score: 4 };
    const single = words.length === 1 && (words[0] === "v" || words[0] === "u");
    return { dimension: "voltage", score: single ? 8 : 10 };
  }
  if (has(CURRENT_WORDS)) return { dimension: "current", score: words.length === 1 && words[0] === "i" ? 8 : 10 };
  return null;
}
