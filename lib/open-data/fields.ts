// The published fields of each table: one list drives the CSV columns, the Table Schema in the Data
// Package and the OpenAPI schemas, so names, types and units never drift apart.
import type { CsvCell } from "./csv";
import type { MakerRow, PackRecord, ResultRow } from "./records";

type FieldType = "integer" | "number" | "string" | "date" | "datetime";
type Constraints = {
  required?: boolean;
  unique?: boolean;
  minimum?: number;
  maximum?: number;
  enum?: string[];
  pattern?: string;
};
export type Field<R> = {
  name: string;
  type: FieldType;
  description: string;
  constraints?: Constraints;
  freeText?: boolean;
  value: (r: R) => CsvCell;
};

const slugPattern = "^[a-z0-9-]+$";

export const makerFields: Field<MakerRow>[] = [
  {
    name: "id",
    type: "integer",
    description: "Maker id (stable).",
    constraints: { required: true, unique: true, minimum: 1 },
    value: (r) => r.id,
  },
  {
    name: "slug",
    type: "string",
    description: "URL name of the maker.",
    constraints: { required: true, unique: true, pattern: slugPattern },
    value: (r) => r.slug,
  },
  {
    name: "name",
    type: "string",
    description: "The brand on the label.",
    constraints: { required: true },
    freeText: true,
    value: (r) => r.name,
  },
  {
    name: "packCount",
    type: "integer",
    description: "Active packs of this maker (count).",
    constraints: { required: true, minimum: 0 },
    value: (r) => r.packCount,
  },
];

export const packFields: Field<PackRecord>[] = [
  {
    name: "id",
    type: "integer",
    description: "Pack id (stable).",
    constraints: { required: true, unique: true, minimum: 1 },
    value: (r) => r.id,
  },
  {
    name: "slug",
    type: "string",
    description: "URL name of the pack.",
    constraints: { required: true, unique: true, pattern: slugPattern },
    value: (r) => r.slug,
  },
  {
    name: "makerId",
    type: "integer",
    description: "The maker (makers.id).",
    constraints: { required: true },
    value: (r) => r.makerId,
  },
  {
    name: "model",
    type: "string",
    description: "Model name as printed on the label.",
    constraints: { required: true },
    freeText: true,
    value: (r) => r.model,
  },
  {
    name: "cellsInSeries",
    type: "integer",
    description: "Cells in series (S), count.",
    constraints: { required: true, minimum: 1, maximum: 14 },
    value: (r) => r.cellsInSeries,
  },
  {
    name: "ratedCapacityMah",
    type: "integer",
    description: "Rated capacity on the label, in mAh.",
    constraints: { required: true, minimum: 1 },
    value: (r) => r.ratedCapacityMah,
  },
  {
    name: "labelledContinuousC",
    type: "number",
    description: "Continuous discharge rating on the label, in C (multiples of rated capacity per hour).",
    constraints: { required: true, minimum: 0 },
    value: (r) => r.labelledContinuousC,
  },
  {
    name: "labelledBurstC",
    type: "number",
    description: "Burst rating on the label, in C; empty when none is printed.",
    constraints: { minimum: 0 },
    value: (r) => r.labelledBurstC,
  },
  {
    name: "weightG",
    type: "number",
    description: "Weight in grams; empty when unknown.",
    constraints: { minimum: 0 },
    value: (r) => r.weightG,
  },
  {
    name: "connector",
    type: "string",
    description: "Discharge connector.",
    constraints: { required: true },
    freeText: true,
    value: (r) => r.connector,
  },
  {
    name: "approvedResultCount",
    type: "integer",
    description: "Approved results for this pack (count).",
    constraints: { required: true, minimum: 0 },
    value: (r) => r.approvedResultCount,
  },
];

const f = (name: keyof ResultRow["figures"], type: FieldType, description: string): Field<ResultRow> => ({
  name,
  type,
  description,
  value: (r) => {
    const v = r.figures[name];
    return typeof v === "number" || typeof v === "string" ? v : null;
  },
});
const m = (
  name: keyof ResultRow["methodCard"],
  type: FieldType,
  description: string,
  constraints?: Constraints,
  freeText?: boolean,
): Field<ResultRow> => ({
  name,
  type,
  description,
  constraints,
  freeText,
  value: (r) => r.methodCard[name],
});

export const resultFields: Field<ResultRow>[] = [
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
  m("ambientTemperatureC", "number", "Method card: ambient temperature, in °C.", {
    required: true,
    minimum: -20,
    maximum: 60,
  }),
  m("packStartTemperatureC", "number", "Method card: pack temperature at the start, in °C."),
  m("loadMode", "string", "Method card: load mode.", {
    required: true,
    enum: ["constant-current", "constant-power", "constant-resistance"],
  }),
  m("loadCurrentA", "number", "Method card: load current, in A.", { required: true, minimum: 0 }),
  m("loadRateC", "number", "Method card: load current as a rate, in C (A ÷ rated Ah).", { required: true, minimum: 0 }),
  m("cutoffVPerCell", "number", "Method card: cut-off voltage per cell, in V.", {
    required: true,
    minimum: 2.5,
    maximum: 4.2,
  }),
  m("stopTemperatureC", "number", "Method card: stop temperature, in °C.", { required: true, maximum: 80 }),
  m("resistanceMethod", "string", "Method card: how resistance was measured.", {
    required: true,
    enum: ["iec-61960-two-level", "dc-step", "ac-1khz", "charger-readout"],
  }),
  m(
    "equipment",
    "string",
    "Method card: load and logging equipment, as the tester described it.",
    { required: true },
    true,
  ),
  m("sampleRateHz", "number", "Method card: log sample rate, in Hz."),
  m("cyclesBeforeTest", "integer", "Method card: charge/discharge cycles before this test (count).", {
    required: true,
    minimum: 0,
  }),
  f("capacityMah", "number", "Delivered capacity, in mAh (trapezoid integral of current over time)."),
  f("energyWh", "number", "Delivered energy, in Wh."),
  f("meanVoltagePerCellV", "number", "Mean voltage under load per cell, in V (energy ÷ charge ÷ S)."),
  f("minVoltagePerCellV", "number", "Minimum voltage per cell under load, in V."),
  f("holdVoltagePerCellV", "number", "Hold voltage per cell, in V, a fixed time after the main load step starts."),
  f("dcResistanceMohm", "number", "DC resistance of the pack, in mΩ (method in dcResistanceMethod)."),
  f("dcResistanceMethod", "string", "How the DC resistance was computed from the log: iec-61960-two-level or step."),
  f("resistanceAt25CMohm", "number", "DC resistance corrected to 25 °C with an Arrhenius factor, in mΩ (an estimate)."),
  f("temperatureRiseC", "number", "Temperature rise (peak − start), in °C."),
  f("timeToCutoffS", "number", "Time to cut-off, in s."),
  f(
    "sagLimitedC",
    "number",
    "Sag-limited C, an ESTIMATE from a resistance (not a tested rate): the rate at which the pack would sag from 3.7 V nominal to a 3.3 V floor per cell through the resistance read 10 s after the load edge, in C.",
  ),
  f("labelRatio", "number", "Label ratio: sag-limited C estimate ÷ labelled continuous C (dimensionless)."),
  f("capacityRatio", "number", "Capacity ratio: delivered ÷ rated capacity (dimensionless)."),
  f("specificEnergyWhKg", "number", "Specific energy, in Wh/kg."),
  f("specificPowerWKg", "number", "Specific power, in W/kg."),
  { name: "notes", type: "string", description: "Tester's notes (free text).", freeText: true, value: (r) => r.notes },
];
