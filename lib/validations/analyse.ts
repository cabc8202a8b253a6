// Query parameters of POST /api/v1/analyse: the pack's label figures that some figures need.
import { z } from "zod";

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
