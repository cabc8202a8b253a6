// The packs table's state as URL search params, read with the one packs-list contract
// (lib/api-contract/queries.ts: GET /api/v1/packs validates strictly and answers 422). The /packs page reads the
// same schema leniently: each parameter is checked on its own with its own schema, and an unreadable one falls
// back to its default, so a hand-edited URL still shows a table.
import type { z } from "zod";
import { PACK_SORT_KEYS, packListShape, type PackSortKey } from "@/lib/api-contract/queries";
import { DEFAULT_PAGE_SIZE, PAGE_SIZES } from "@/lib/api-contract/params";

export { PACK_SORT_KEYS, PAGE_SIZES, type PackSortKey };

export type PackParams = {
  q: string;
  cells: number | null;
  minMah: number | null;
  maxMah: number | null;
  minC: number | null;
  maxC: number | null;
  minG: number | null;
  maxG: number | null;
  connector: string | null;
  maker: string | null;
  group: string | null;
  sort: PackSortKey;
  dir: "asc" | "desc";
  page: number;
  size: number;
};

export const DEFAULT_PACK_PARAMS: PackParams = {
  q: "",
  cells: null,
  minMah: null,
  maxMah: null,
  minC: null,
  maxC: null,
  minG: null,
  maxG: null,
  connector: null,
  maker: null,
  group: null,
  sort: "maker",
  dir: "asc",
  page: 1,
  size: DEFAULT_PAGE_SIZE,
};

const NUMBER_PARAMS = ["cells", "minMah", "maxMah", "minC", "maxC", "minG", "maxG"] as const;
const TEXT_PARAMS = ["connector", "maker", "group"] as const;

/** One parameter through its own schema; undefined when absent or unreadable. */
function field<T>(sp: URLSearchParams, key: keyof typeof packListShape, schema: z.ZodType<T | undefined>) {
  const raw = sp.get(key);
  if (raw === null || raw.trim() === "") return undefined;
  const parsed = schema.safeParse(raw);
  return parsed.success ? parsed.data : undefined;
}

/** Lenient: anything unreadable falls back to its default. */
export function readPackParams(sp: URLSearchParams): PackParams {
  const p: PackParams = { ...DEFAULT_PACK_PARAMS, q: (sp.get("q") ?? "").slice(0, 100) };
  for (const k of NUMBER_PARAMS) p[k] = field(sp, k, packListShape[k]) ?? null;
  for (const k of TEXT_PARAMS) p[k] = field(sp, k, packListShape[k]) ?? null;
  p.sort = field(sp, "sort", packListShape.sort) ?? DEFAULT_PACK_PARAMS.sort;
  p.dir = field(sp, "dir", packListShape.dir) ?? DEFAULT_PACK_PARAMS.dir;
  p.page = field(sp, "page", packListShape.page) ?? 1;
  p.size = field(sp, "size", packListShape.size) ?? DEFAULT_PAGE_SIZE;
  return p;
}

/** The strict query's output as the table's state (absent filters are null). */
export function toPackParams(v: {
  [K in keyof PackParams]?: PackParams[K] extends infer T ? Exclude<T, null> : never;
}): PackParams {
  const p: PackParams = { ...DEFAULT_PACK_PARAMS };
  for (const k of NUMBER_PARAMS) p[k] = v[k] ?? null;
  for (const k of TEXT_PARAMS) p[k] = v[k] ?? null;
  return {
    ...p,
    q: v.q ?? "",
    sort: v.sort ?? DEFAULT_PACK_PARAMS.sort,
    dir: v.dir ?? DEFAULT_PACK_PARAMS.dir,
    page: v.page ?? 1,
    size: v.size ?? DEFAULT_PAGE_SIZE,
  };
}

/** Only what differs from the defaults, in a stable order (so equal states give equal URLs). */
export function writePackParams(p: PackParams): URLSearchParams {
  const sp = new URLSearchParams();
  if (p.q.trim()) sp.set("q", p.q.trim());
  for (const k of NUMBER_PARAMS) {
    const v = p[k];
    if (v !== null) sp.set(k, String(v));
  }
  for (const k of TEXT_PARAMS) {
    const v = p[k];
    if (v) sp.set(k, v);
  }
  if (p.sort !== DEFAULT_PACK_PARAMS.sort || p.dir !== DEFAULT_PACK_PARAMS.dir) {
    sp.set("sort", p.sort);
    sp.set("dir", p.dir);
  }
  if (p.page !== 1) sp.set("page", String(p.page));
  if (p.size !== DEFAULT_PAGE_SIZE) sp.set("size", String(p.size));
  return sp;
}
