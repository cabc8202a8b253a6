// Query parameters of the public API and the downloads. Everything arrives as strings; zod coerces.
import { z } from "zod";
import { recordId } from "./ids";

const slug = z
  .string()
  .trim()
  .regex(/^[a-z0-9-]{1,80}$/, "Use a slug: lower-case letters, digits and hyphens.");
const groupKeyParam = z
  .string()
  .trim()
  .regex(/^[a-z0-9._-]{1,160}$/, "Not a like-for-like group key.");
const intParam = (min: number, max: number) => z.coerce.number().int().min(min).max(max);

export const pageQuery = z.object({
  page: intParam(1, 100_000).default(1),
  size: intParam(1, 200).default(50),
});

const num = (min: number, max: number) => z.coerce.number().min(min).max(max).optional();

/** The filters of the packs table (same names as GET /api/v1/packs and the /packs page). */
export const packFilters = z.object({
  q: z.string().trim().min(1).max(100).optional(),
  maker: slug.optional(),
  cells: intParam(1, 14).optional(),
  connector: z.string().trim().min(1).max(30).optional(),
  minMah: num(0, 100_000),
  maxMah: num(0, 100_000),
  minC: num(0, 1000),
  maxC: num(0, 1000),
  minG: num(0, 100_000),
  maxG: num(0, 100_000),
});
export type PackFilters = z.infer<typeof packFilters>;

export const resultFilters = packFilters.extend({
  pack: slug.optional(),
  group: groupKeyParam.optional(),
});
export type ResultFilters = z.infer<typeof resultFilters>;

export const resultListQuery = pageQuery.extend(resultFilters.shape);
export const groupListQuery = pageQuery.extend({ minResults: intParam(1, 1000).default(1) });

export const slugParam = z.object({ slug });
export const idParam = z.object({ id: recordId });
export const groupKeyRouteParam = z.object({ key: groupKeyParam });
export const chartIdParam = z.object({ id: z.string().regex(/^[a-z0-9-]{1,64}$/) });

/** Search params → plain object (first value of each key), for zod. */
export function searchParamsObject(params: URLSearchParams): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of params) if (!(k in out) && v !== "") out[k] = v;
  return out;
}
