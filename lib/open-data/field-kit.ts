// What a published field is: name, type, description with unit, constraints and the digits it is rounded to.
// The field lists (fields.ts, result-fields.ts) are built from this; API, CSV, Data Package and OpenAPI read them.
export type FieldType = "integer" | "number" | "string" | "date" | "datetime";
export type FieldValue = string | number | null;
export type Constraints = {
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
  /** Free text from contributors: guarded against spreadsheet formulas in CSV. */
  freeText?: boolean;
  /** Decimal places published ("number" fields). */
  digits?: number;
  /** Results only: where the API record nests the field (top level when absent). */
  section?: "methodCard" | "figures";
  value: (r: R) => FieldValue | undefined;
};

/** Rounds half away from zero to `digits` decimal places (no float noise: 89.32431030273438 → 89.324). */
export function roundTo(value: number, digits: number): number {
  const f = 10 ** digits;
  const r = Math.sign(value) * Math.round(Math.abs(value) * f);
  return r / f === 0 ? 0 : r / f;
}

/** A field's published value: rounded to its digits; missing and non-finite numbers are null. */
export function fieldValue<R>(field: Field<R>, row: R): FieldValue {
  const v = field.value(row);
  if (v === undefined || v === null) return null;
  if (typeof v !== "number") return v;
  if (!Number.isFinite(v)) return null;
  return field.digits === undefined ? v : roundTo(v, field.digits);
}

/** The description as published: with the rounding stated. */
export function describeField<R>(field: Field<R>): string {
  return field.digits === undefined
    ? field.description
    : `${field.description} Rounded to ${field.digits} decimal place${field.digits === 1 ? "" : "s"}.`;
}

export const slugPattern = "^[a-z0-9-]+$";
export const id = <R extends { id: number }>(what: string): Field<R> => ({
  name: "id",
  type: "integer",
  description: `${what} id (stable).`,
  constraints: { required: true, unique: true, minimum: 1 },
  value: (r) => r.id,
});
export const count = <R>(name: string, description: string, value: (r: R) => number): Field<R> => ({
  name,
  type: "integer",
  description,
  constraints: { required: true, minimum: 0 },
  value,
});
export const RESULT_COUNT = "Published results (count), by the counting rule of /methods#which-results-count.";

export const num = <R>(
  name: string,
  description: string,
  digits: number,
  value: (r: R) => number | null,
  constraints?: Constraints,
): Field<R> => ({ name, type: "number", description, digits, constraints, value });
