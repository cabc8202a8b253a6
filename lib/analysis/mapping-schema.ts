/**
 * One zod schema for a column mapping given from outside (the API's `mapping` query parameter, a
 * picker on a page, the CLI's --map-json): the JSON the core already takes, e.g.
 * {"time":1,"voltage":9,"current":8,"hasHeader":false}. Browser-safe: zod and types only.
 */
import { z } from "zod";
import type { ColumnMapping } from "./columns";

/** A column by its header name, or by its number counted from 0. */
export const columnRefSchema = z.union([
  z.number().int("a column number is a whole number").min(0, "column numbers count from 0").max(999),
  z.string().trim().min(1, "a column name cannot be empty").max(200),
]);

export const columnMappingSchema = z
  .object({
    time: columnRefSchema.optional(),
    voltage: columnRefSchema.optional(),
    current: columnRefSchema.optional(),
    temperature: columnRefSchema.optional(),
    /** Per-cell voltage columns, cell 1 first. */
    cellVoltages: z.array(columnRefSchema).min(1).max(24).optional(),
    timeUnit: z.enum(["s", "ms", "min", "h"]).optional(),
    voltageUnit: z.enum(["V", "mV"]).optional(),
    currentUnit: z.enum(["A", "mA"]).optional(),
    temperatureUnit: z.enum(["C", "F", "K"]).optional(),
    hasHeader: z.boolean().optional(),
    dischargeSign: z.enum(["positive", "negative"]).optional(),
  })
  .strict()
  .superRefine((m, ctx) => {
    if (m.hasHeader !== false) return;
    for (const key of ["time", "voltage", "current", "temperature"] as const) {
      if (typeof m[key] === "string")
        ctx.addIssue({
          code: "custom",
          path: [key],
          message: `without a header row, ${key} must be a column number (from 0)`,
        });
    }
    if (m.cellVoltages?.some((c) => typeof c === "string"))
      ctx.addIssue({
        code: "custom",
        path: ["cellVoltages"],
        message: "without a header row, cell columns must be numbers (from 0)",
      });
    const missing = (["time", "current"] as const).filter((k) => m[k] === undefined);
    if (m.voltage === undefined && !m.cellVoltages) missing.push("voltage" as never);
    if (missing.length > 0)
      ctx.addIssue({
        code: "custom",
        path: [],
        message: `without a header row, the mapping must give ${missing.join(", ")}`,
      });
  });

export type ParsedColumnMapping = z.infer<typeof columnMappingSchema>;
// Compile-time check that what the schema accepts is what the core takes.
const asCoreMapping = (m: ParsedColumnMapping): ColumnMapping => m;

/** Longest mapping JSON accepted (characters). */
export const MAPPING_JSON_MAX = 2000;

export type MappingParse = { ok: true; mapping: ColumnMapping } | { ok: false; message: string };

/** Reads a mapping from JSON text (a query parameter, a form field); a message for people when it is wrong. */
export function parseMappingJson(text: string): MappingParse {
  if (text.length > MAPPING_JSON_MAX)
    return { ok: false, message: `The column mapping is longer than ${MAPPING_JSON_MAX} characters.` };
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    return {
      ok: false,
      message:
        'The column mapping is not valid JSON; for example {"time":1,"voltage":9,"current":8,"hasHeader":false}.',
    };
  }
  const parsed = columnMappingSchema.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const where = issue && issue.path.length > 0 ? `${issue.path.join(".")}: ` : "";
    return { ok: false, message: `The column mapping is not usable: ${where}${issue?.message ?? "invalid"}.` };
  }
  return { ok: true, mapping: asCoreMapping(parsed.data) };
}
