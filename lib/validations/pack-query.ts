// Strict search params of GET /api/v1/packs: anything present must be valid, or the API answers 422 with
// field errors (the /packs page reads the same names leniently via lib/pack-query-params.ts).
import { z } from "zod";
import { DEFAULT_PAGE_SIZE, PACK_SORT_KEYS, PAGE_SIZES, type PackParams } from "@/lib/pack-query-params";

const optNumber = (min: number, max: number, int = false) => {
  const base = int ? z.coerce.number().int() : z.coerce.number();
  return base.min(min).max(max).optional();
};

export const packQuerySchema = z
  .object({
    q: z.string().trim().max(100).optional(),
    cells: optNumber(1, 14, true),
    minMah: optNumber(0, 100_000),
    maxMah: optNumber(0, 100_000),
    minC: optNumber(0, 1000),
    maxC: optNumber(0, 1000),
    minG: optNumber(0, 100_000),
    maxG: optNumber(0, 100_000),
    connector: z.string().trim().min(1).max(30).optional(),
    maker: z
      .string()
      .regex(/^[a-z0-9-]{1,80}$/, "maker must be a maker slug")
      .optional(),
    group: z
      .string()
      .regex(/^[a-z0-9._-]{3,120}$/, "group must be a like-for-like group key")
      .optional(),
    sort: z.enum(PACK_SORT_KEYS).default("maker"),
    dir: z.enum(["asc", "desc"]).default("asc"),
    page: z.coerce.number().int().min(1).max(100_000).default(1),
    size: z.coerce
      .number()
      .int()
      .refine((n) => (PAGE_SIZES as readonly number[]).includes(n), `size must be one of ${PAGE_SIZES.join(", ")}`)
      .default(DEFAULT_PAGE_SIZE),
  })
  .refine((v) => v.minMah === undefined || v.maxMah === undefined || v.minMah <= v.maxMah, {
    path: ["maxMah"],
    message: "maxMah must be at least minMah",
  })
  .refine((v) => v.minC === undefined || v.maxC === undefined || v.minC <= v.maxC, {
    path: ["maxC"],
    message: "maxC must be at least minC",
  })
  .refine((v) => v.minG === undefined || v.maxG === undefined || v.minG <= v.maxG, {
    path: ["maxG"],
    message: "maxG must be at least minG",
  });

/** Empty values (`?cells=`) count as absent, as HTML forms send them. */
export function parsePackQuery(sp: URLSearchParams) {
  const raw: Record<string, string> = {};
  for (const [k, v] of sp) if (v !== "") raw[k] = v;
  return packQuerySchema.safeParse(raw);
}

export function toPackParams(v: z.infer<typeof packQuerySchema>): PackParams {
  return {
    q: v.q ?? "",
    cells: v.cells ?? null,
    minMah: v.minMah ?? null,
    maxMah: v.maxMah ?? null,
    minC: v.minC ?? null,
    maxC: v.maxC ?? null,
    minG: v.minG ?? null,
    maxG: v.maxG ?? null,
    connector: v.connector ?? null,
    maker: v.maker ?? null,
    group: v.group ?? null,
    sort: v.sort,
    dir: v.dir,
    page: v.page,
    size: v.size,
  };
}
