// The pieces every public query is built from, written once: slugs, the like-for-like group key, ids, paging and
// the pack filters (the packs table's, shared by the packs, results and group lists and the downloads). Search
// params arrive as strings; zod coerces. Empty values (`?cells=`) count as absent, as HTML forms send them.
import { z } from "zod";

export const SLUG_PATTERN = /^[a-z0-9-]{1,80}$/;
/** Like-for-like group keys: lib/analysis/group-key.ts joins lower-case band keys with "_" (about 30–60 characters). */
export const GROUP_KEY_PATTERN = /^[a-z0-9._-]{1,120}$/;

export const slug = z.string().trim().regex(SLUG_PATTERN, "Use a slug: lower-case letters, digits and hyphens.");
export const groupKey = z.string().trim().regex(GROUP_KEY_PATTERN, "Not a like-for-like group key.");
/**
 * Row ids in paths are PostgreSQL integers written in digits: positive and at most 2³¹ − 1. Digits only, so "1e3",
 * " 7" or "0x10" never quietly mean another row (the same rule as lib/validations/ids.ts for forms and JSON).
 */
export const rowId = z
  .string()
  .regex(/^[1-9][0-9]{0,9}$/, "Not an id.")
  .describe("A positive whole number in digits, at most 2147483647.")
  .transform(Number)
  .pipe(z.number().max(2_147_483_647, "Not an id."));

export const MAX_PAGE_SIZE = 200;
export const DEFAULT_PAGE_SIZE = 25;
/** The page sizes the packs table offers (any size from 1 to MAX_PAGE_SIZE is accepted). */
export const PAGE_SIZES = [10, 25, 50, 100] as const;

export const pageShape = {
  page: z.coerce
    .number()
    .int("page must be a whole number.")
    .min(1, "page starts at 1.")
    .max(100_000)
    .default(1)
    .describe("Page number, from 1. A page past the last answers 422."),
  size: z.coerce
    .number()
    .int("size must be a whole number.")
    .min(1, "size must be at least 1.")
    .max(MAX_PAGE_SIZE, `size must be at most ${MAX_PAGE_SIZE}.`)
    .default(DEFAULT_PAGE_SIZE)
    .describe(`Items per page, 1–${MAX_PAGE_SIZE}.`),
};

const optNumber = (min: number, max: number, description: string) =>
  z.coerce.number().min(min).max(max).optional().describe(description);

/** The packs table's filters: the same names and meanings on /packs, every API list and the downloads. */
export const packFilterShape = {
  q: z
    .string()
    .trim()
    .min(1)
    .max(100)
    .optional()
    .describe(
      "Fuzzy search over maker and model: every word must match (a typo or two is forgiven), best match first on the packs list.",
    ),
  maker: slug.optional().describe("Maker slug."),
  cells: z.coerce.number().int().min(1).max(14).optional().describe("Cells in series (S)."),
  connector: z.string().trim().min(1).max(30).optional().describe("Discharge connector (any case)."),
  minMah: optNumber(0, 100_000, "Rated capacity from, in mAh."),
  maxMah: optNumber(0, 100_000, "Rated capacity up to, in mAh."),
  minC: optNumber(0, 1000, "Labelled continuous C from."),
  maxC: optNumber(0, 1000, "Labelled continuous C up to."),
  minG: optNumber(0, 100_000, "Weight from, in g."),
  maxG: optNumber(0, 100_000, "Weight up to, in g."),
};

type Ranged = { minMah?: number; maxMah?: number; minC?: number; maxC?: number; minG?: number; maxG?: number };
const RANGES = [
  ["minMah", "maxMah"],
  ["minC", "maxC"],
  ["minG", "maxG"],
] as const;

/** Adds the "from ≤ up to" checks of the range filters to a query schema. */
export function withRanges<S extends z.ZodType<Ranged>>(schema: S) {
  return schema.superRefine((v, ctx) => {
    for (const [min, max] of RANGES) {
      const lo = v[min];
      const hi = v[max];
      if (lo !== undefined && hi !== undefined && lo > hi)
        ctx.addIssue({ code: "custom", path: [max], message: `${max} must be at least ${min}.` });
    }
  });
}

/** Search params → plain object for zod: the first value of each key; empty values count as absent. */
export function searchParamsObject(params: URLSearchParams): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of params) if (!(k in out) && v.trim() !== "") out[k] = v;
  return out;
}
