// Query parameters of POST /api/v1/analyse: the pack's label figures that some figures need, and the column
// mapping for a log whose columns cannot be named by detection (a log without a header row).
import { z } from "zod";
import { MAPPING_JSON_MAX, parseMappingJson } from "@/lib/analysis";

/**
 * `mapping`: the column mapping as JSON text, the shape the core takes, e.g.
 * {"time":1,"voltage":9,"current":8,"hasHeader":false}; bad JSON or an unusable mapping is a 422 on `mapping`.
 */
export const mappingParamSchema = z
  .string()
  .max(MAPPING_JSON_MAX, `mapping can be at most ${MAPPING_JSON_MAX} characters.`)
  .transform((text, ctx) => {
    const parsed = parseMappingJson(text);
    if (parsed.ok) return parsed.mapping;
    ctx.addIssue({ code: "custom", message: parsed.message });
    return z.NEVER;
  })
  .describe(
    'Column mapping as JSON: columns by number from 0 (or by header name), units, hasHeader, dischargeSign — e.g. {"time":1,"voltage":9,"current":8,"hasHeader":false}.',
  );

const positive = (what: string, unit: string) =>
  z.coerce
    .number({ error: `${what} must be a number (${unit}).` })
    .positive(`${what} must be above 0 ${unit}.`)
    .finite();

export const analyseQuerySchema = z
  .object({
    cells: z.coerce
      .number({ error: "cells must be a whole number of cells in series." })
      .int("cells must be a whole number of cells in series.")
      .min(1, "cells must be at least 1.")
      .max(24, "cells must be at most 24."),
    ratedMah: positive("ratedMah", "mAh").max(1_000_000, "ratedMah must be at most 1,000,000 mAh."),
    labelledC: positive("labelledC", "C").max(1000, "labelledC must be at most 1000C."),
    weightG: positive("weightG", "g").max(100_000, "weightG must be at most 100 kg."),
    mapping: mappingParamSchema,
    /** Extra: also answer with the chart curve (used by the /analyse page). */
    include: z.enum(["curve"], { error: "include may only be 'curve'." }),
  })
  .partial();

/** Search params → plain object (empty values dropped, so `?cells=` means "not given"). */
export function searchParamsObject(url: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of new URL(url).searchParams) if (v.trim() !== "") out[k] = v;
  return out;
}
