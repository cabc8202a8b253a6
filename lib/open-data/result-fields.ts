// The published fields of a result: the API nests them by `section` (method card, figures), the CSV and the
// Data Package list them flat in this order. Digits follow what the measurement supports and match what the open
// CLI (npm run analyse) prints, so a recomputed figure reads the same.
import type { Figures } from "@/lib/analysis";
import { U95_FIGURES, type U95Figure } from "@/lib/figure-u95";
import { num, type Constraints, type Field, type FieldType } from "./field-kit";
import type { ResultFlatRow } from "./records";

type FigureName = keyof Figures & string;
const figure = (name: FigureName, type: FieldType, description: string, digits?: number): Field<ResultFlatRow> => ({
  name,
  type,
  description,
  digits,
  section: "figures",
  value: (r) => {
    const v = r.figures[name];
    return typeof v === "number" || typeof v === "string" ? v : null;
  },
});
type CardName = keyof ResultFlatRow["methodCard"] & string;
const card = (
  name: CardName,
  type: FieldType,
  description: string,
  constraints?: Constraints,
  extra: Partial<Field<ResultFlatRow>> = {},
): Field<ResultFlatRow> => ({
  name,
  type,
  description,
  constraints,
  section: "methodCard",
  value: (r) => r.methodCard[name],
  ...extra,
});
const cardNumber = (name: CardName, description: string, digits: number, constraints?: Constraints) => ({
  ...num<ResultFlatRow>(name, description, digits, (r) => r.methodCard[name] as number | null, constraints),
  section: "methodCard" as const,
});

const baseFields: Field<ResultFlatRow>[] = [
  {
    name: "id",
    type: "integer",
    description: "Result id (stable).",
    constraints: { required: true, unique: true, minimum: 1 },
    value: (r) => r.id,
  },
  {
    name: "packId",
    type: "integer",
    description: "The pack tested (packs.id).",
    constraints: { required: true },
    value: (r) => r.packId,
  },
  {
    name: "packSlug",
    type: "string",
    description: "The pack's URL name (packs.slug).",
    constraints: { required: true },
    value: (r) => r.packSlug,
  },
  {
    name: "makerSlug",
    type: "string",
    description: "The pack's maker's URL name (makers.slug).",
    constraints: { required: true },
    value: (r) => r.makerSlug,
  },
  {
    name: "groupKey",
    type: "string",
    description:
      "Like-for-like group key: resistance method, ambient band, cut-off per cell, load-rate band, pack age band.",
    constraints: { required: true },
    value: (r) => r.groupKey,
  },
  {
    name: "testedOn",
    type: "date",
    description: "Date of the test (ISO 8601); empty when not stated.",
    value: (r) => r.testedOn,
  },
  {
    name: "publishedAt",
    type: "datetime",
    description: "When the result was approved and published (ISO 8601, UTC).",
    value: (r) => r.publishedAt,
  },
  cardNumber("ambientTemperatureC", "Method card: ambient temperature, in °C.", 1, {
    required: true,
    minimum: -20,
    maximum: 60,
  }),
  cardNumber("packStartTemperatureC", "Method card: pack temperature at the start, in °C.", 1),
  card("loadMode", "string", "Method card: load mode.", {
    required: true,
    enum: ["constant-current", "constant-power", "constant-resistance"],
  }),
  cardNumber("loadCurrentA", "Method card: load current, in A.", 2, { required: true, minimum: 0 }),
  cardNumber("loadRateC", "Method card: load current as a rate, in C (A ÷ rated Ah).", 2, {
    required: true,
    minimum: 0,
  }),
  cardNumber("cutoffVPerCell", "Method card: cut-off voltage per cell, in V.", 2, {
    required: true,
    minimum: 2.5,
    maximum: 4.2,
  }),
  cardNumber("stopTemperatureC", "Method card: stop temperature, in °C.", 1, { required: true, maximum: 80 }),
  card("resistanceMethod", "string", "Method card: how resistance was measured.", {
    required: true,
    enum: ["iec-61960-two-level", "dc-step", "ac-1khz", "charger-readout"],
  }),
  card(
    "equipment",
    "string",
    "Method card: load and logging equipment, as the tester described it.",
    { required: true },
    { freeText: true },
  ),
  cardNumber("sampleRateHz", "Method card: log sample rate, in Hz.", 2),
  card("cyclesBeforeTest", "integer", "Method card: charge/discharge cycles before this test (count).", {
    required: true,
    minimum: 0,
  }),
  figure("capacityMah", "number", "Delivered capacity, in mAh (trapezoid integral of current over time).", 0),
  figure("energyWh", "number", "Delivered energy, in Wh.", 2),
  figure("meanVoltagePerCellV", "number", "Mean voltage under load per cell, in V (energy ÷ charge ÷ S).", 3),
  figure("minVoltagePerCellV", "number", "Minimum voltage per cell under load, in V.", 3),
  figure(
    "holdVoltagePerCellV",
    "number",
    "Hold voltage per cell, in V, a fixed time after the main load step starts.",
    3,
  ),
  figure("dcResistanceMohm", "number", "DC resistance of the pack, in mΩ (method in dcResistanceMethod).", 2),
  figure(
    "dcResistanceMethod",
    "string",
    "How the DC resistance was computed from the log: iec-61960-two-level or step.",
  ),
  figure(
    "resistanceAt25CMohm",
    "number",
    "DC resistance corrected to 25 °C with an Arrhenius factor, in mΩ (an estimate).",
    2,
  ),
  figure("temperatureRiseC", "number", "Temperature rise (peak − start), in °C.", 1),
  figure("timeToCutoffS", "number", "Time to cut-off, in s.", 1),
  figure(
    "sagLimitedC",
    "number",
    "Sag-limited C, an ESTIMATE from a resistance (never a tested rate): the rate at which the pack would sag from 3.7 V nominal to a 3.3 V floor per cell through the resistance read 10 s after the load edge, in C (/methods#sag-limited-c).",
    1,
  ),
  figure("labelRatio", "number", "Label ratio: sag-limited C estimate ÷ labelled continuous C (dimensionless).", 3),
  figure(
    "sustainedCMeasured",
    "number",
    "Sustained C, MEASURED from the run: the mean current actually drawn ÷ rated Ah, when the run held the floor to its cut-off under the stop temperature; empty when it did not qualify (/methods#sustained-c).",
    2,
  ),
  figure("sustainedLabelRatio", "number", "Measured sustained C ÷ labelled continuous C (dimensionless).", 3),
  figure("capacityRatio", "number", "Capacity ratio: delivered ÷ rated capacity (dimensionless).", 3),
  figure("specificEnergyWhKg", "number", "Specific energy, in Wh/kg.", 1),
  figure("specificPowerWKg", "number", "Specific power, in W/kg.", 0),
  { name: "notes", type: "string", description: "Tester's notes (free text).", freeText: true, value: (r) => r.notes },
];

const isU95Figure = (name: string): name is U95Figure => (U95_FIGURES as readonly string[]).includes(name);

/**
 * `<figure>U95` right after each figure that has one: the expanded uncertainty (k = 2, about 95 %) by the GUM
 * (JCGM 100:2008) from the bench's stated or assumed instrument accuracy (lib/figure-u95.ts), one digit finer.
 */
function u95Field(f: Field<ResultFlatRow>, name: U95Figure): Field<ResultFlatRow> {
  return {
    name: `${name}U95`,
    type: "number",
    description: `Expanded uncertainty of ${name} (k = 2, about 95 %), same unit, from the bench's stated instrument accuracy or Sagline's stated default where none is stated (JCGM 100:2008; /methods#uncertainty). An estimate of how sure the figure is, not a measurement.`,
    digits: (f.digits ?? 2) + 1,
    section: "figures",
    value: (r) => r.u95[name],
  };
}

export const resultFields: Field<ResultFlatRow>[] = baseFields.flatMap((f) =>
  f.section === "figures" && isU95Figure(f.name) ? [f, u95Field(f, f.name)] : [f],
);

/** The digits of a figure as published (for medians and other numbers derived from it). */
export function figureDigits(name: FigureName): number | undefined {
  return resultFields.find((f) => f.name === name)?.digits;
}
