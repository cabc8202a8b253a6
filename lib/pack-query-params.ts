// The packs table's state as URL search params, shared by the /packs page, its client and the public API.
// No zod here on purpose: this file reaches the browser, and the page must turn bad params into sensible
// defaults (the API validates strictly with lib/validations/pack-query.ts and answers 422).
export const PACK_SORT_KEYS = [
  "maker",
  "model",
  "cells",
  "capacity",
  "labelledC",
  "weight",
  "connector",
  "results",
  "measuredC",
  "labelRatio",
  "capacityRatio",
] as const;
export type PackSortKey = (typeof PACK_SORT_KEYS)[number];
export const PAGE_SIZES = [10, 25, 50, 100] as const;
export const DEFAULT_PAGE_SIZE = 25;

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

const SLUG = /^[a-z0-9-]{1,80}$/;
const GROUP = /^[a-z0-9._-]{3,120}$/;

function num(v: string | null, min: number, max: number, integer: boolean): number | null {
  if (v === null || v.trim() === "") return null;
  const n = Number(v);
  if (!Number.isFinite(n) || n < min || n > max || (integer && !Number.isInteger(n))) return null;
  return n;
}

/** Lenient: anything unreadable falls back to its default. */
export function readPackParams(sp: URLSearchParams): PackParams {
  const sort = sp.get("sort");
  const size = Number(sp.get("size"));
  const connector = sp.get("connector");
  const maker = sp.get("maker");
  const group = sp.get("group");
  return {
    q: (sp.get("q") ?? "").slice(0, 100),
    cells: num(sp.get("cells"), 1, 14, true),
    minMah: num(sp.get("minMah"), 0, 100_000, false),
    maxMah: num(sp.get("maxMah"), 0, 100_000, false),
    minC: num(sp.get("minC"), 0, 1000, false),
    maxC: num(sp.get("maxC"), 0, 1000, false),
    minG: num(sp.get("minG"), 0, 100_000, false),
    maxG: num(sp.get("maxG"), 0, 100_000, false),
    connector: connector && connector.length <= 30 ? connector : null,
    maker: maker && SLUG.test(maker) ? maker : null,
    group: group && GROUP.test(group) ? group : null,
    sort: (PACK_SORT_KEYS as readonly string[]).includes(sort ?? "") ? (sort as PackSortKey) : "maker",
    dir: sp.get("dir") === "desc" ? "desc" : "asc",
    page: num(sp.get("page"), 1, 100_000, true) ?? 1,
    size: (PAGE_SIZES as readonly number[]).includes(size) ? size : DEFAULT_PAGE_SIZE,
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
  if (p.connector) sp.set("connector", p.connector);
  if (p.maker) sp.set("maker", p.maker);
  if (p.group) sp.set("group", p.group);
  if (p.sort !== DEFAULT_PACK_PARAMS.sort || p.dir !== DEFAULT_PACK_PARAMS.dir) {
    sp.set("sort", p.sort);
    sp.set("dir", p.dir);
  }
  if (p.page !== 1) sp.set("page", String(p.page));
  if (p.size !== DEFAULT_PAGE_SIZE) sp.set("size", String(p.size));
  return sp;
}

export function isDefaultPackParams(p: PackParams): boolean {
  return writePackParams(p).toString() === "";
}
