// The published fields of each table: one list drives the API records, the CSV columns, the Table Schemas of the
// Data Package and the OpenAPI schemas, so names, types, units and digits never drift apart. Every number leaves
// rounded to its field's `digits` (decimal places: what the measurement supports, the same the open CLI prints).
import { count, id, num, RESULT_COUNT, slugPattern, type Field } from "./field-kit";
import type { MakerRow, PackRecordRow } from "./records";

export const makerFields: Field<MakerRow>[] = [
  id("Maker"),
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
  count("packCount", "Packs of this maker in the catalogue (count).", (r) => r.packCount),
  count("resultCount", `${RESULT_COUNT} Of all this maker's packs.`, (r) => r.resultCount),
];

export const packFields: Field<PackRecordRow>[] = [
  id("Pack"),
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
    name: "makerSlug",
    type: "string",
    description: "The maker's URL name (makers.slug).",
    constraints: { required: true, pattern: slugPattern },
    value: (r) => r.makerSlug,
  },
  {
    name: "makerName",
    type: "string",
    description: "The maker's name (makers.name).",
    constraints: { required: true },
    freeText: true,
    value: (r) => r.makerName,
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
  num(
    "labelledContinuousC",
    "Continuous discharge rating on the label, in C (multiples of rated capacity per hour).",
    1,
    (r) => r.labelledContinuousC,
    { required: true, minimum: 0 },
  ),
  num("labelledBurstC", "Burst rating on the label, in C; empty when none is printed.", 1, (r) => r.labelledBurstC, {
    minimum: 0,
  }),
  num("weightG", "Weight in grams; empty when unknown.", 1, (r) => r.weightG, { minimum: 0 }),
  {
    name: "connector",
    type: "string",
    description: "Discharge connector.",
    constraints: { required: true },
    freeText: true,
    value: (r) => r.connector,
  },
  count("resultCount", RESULT_COUNT, (r) => r.resultCount),
];
