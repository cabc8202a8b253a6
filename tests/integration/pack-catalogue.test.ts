// The packs table in SQL (db/queries/pack-catalogue.ts): filters, sorting, paging and the group's medians, read from
// the catalogue and its summary tables. Checked against the JavaScript filter and sort the table used before the
// work moved into PostgreSQL (kept here as the reference, over rows aggregated from the raw results), for every
// sort key in both directions, with and without a group, across filters and page sizes.
import { beforeAll, describe, expect, it } from "vitest";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { getPackRow, listMatchingPackIds, listMatchingPacks, queryPackPage } from "@/db/queries/pack-catalogue";
import type { PackRow } from "@/lib/catalogue";
import { DEFAULT_PACK_PARAMS, PACK_SORT_KEYS, type PackParams, type PackSortKey } from "@/lib/pack-query-params";
import { emptyCatalogue, makeMaker, makePack, makeResult, makeUser } from "../helpers/fixtures";

let G = "";

/** The median as lib/analysis summarise() takes it (type 7: the mean of the two middle values for an even n). */
function median(values: number[]): number | null {
  if (values.length === 0) return null;
  const s = [...values].sort((a, b) => a - b);
  const mid = (s.length - 1) / 2;
  return ((s[Math.floor(mid)] ?? 0) + (s[Math.ceil(mid)] ?? 0)) / 2;
}

/** The reference rows: the catalogue with counts and medians computed here from the raw approved results. */
async function referenceRows(group: string | null): Promise<PackRow[]> {
  const packs = await db.execute<
    Omit<PackRow, "resultCount" | "groupCount" | "measuredC" | "labelRatio" | "capacityRatio" | "groupN">
  >(sql`
    select p.id, p.slug, p.maker_id as "makerId", p.model, m.name as "makerName", m.slug as "makerSlug",
      p.cells_in_series as "cellsInSeries", p.rated_capacity_mah as "ratedCapacityMah",
      p.labelled_continuous_c as "labelledContinuousC", p.labelled_burst_c as "labelledBurstC", p.weight_g as "weightG",
      p.connector
    from packs p join makers m on m.id = p.maker_id where p.status = 'active' and m.status = 'active'`);
  const res = await db.execute<{
    pack_id: number;
    group_key: string;
    s: number | null;
    l: number | null;
    c: number | null;
  }>(
    sql`select pack_id, group_key, sag_limited_c as s, label_ratio as l, capacity_ratio as c from results where status = 'approved'`,
  );
  return packs.rows.map((p) => {
    const mine = res.rows.filter((r) => r.pack_id === p.id);
    const inG = mine.filter((r) => r.group_key === group);
    const vals = (k: "s" | "l" | "c") =>
      inG
        .map((r) => r[k])
        .filter((v): v is number => v !== null)
        .map(Number);
    return {
      ...p,
      resultCount: mine.length,
      groupCount: new Set(mine.map((r) => r.group_key)).size,
      measuredC: median(vals("s")),
      labelRatio: median(vals("l")),
      capacityRatio: median(vals("c")),
      groupN: inG.length,
    };
  });
}

// The table's JavaScript filter and sort before issue 18 (lib/pack-query.ts of 2026-12-05), the reference.
const sortValue: Record<PackSortKey, (r: PackRow) => string | number | null> = {
  maker: (r) => r.makerName.toLowerCase(),
  model: (r) => r.model.toLowerCase(),
  cells: (r) => r.cellsInSeries,
  capacity: (r) => r.ratedCapacityMah,
  labelledC: (r) => r.labelledContinuousC,
  weight: (r) => r.weightG,
  connector: (r) => r.connector.toLowerCase(),
  results: (r) => r.resultCount,
  measuredC: (r) => r.measuredC,
  labelRatio: (r) => r.labelRatio,
  capacityRatio: (r) => r.capacityRatio,
};
const within = (v: number | null, min: number | null, max: number | null) =>
  (min === null || (v !== null && v >= min)) && (max === null || (v !== null && v <= max));
function reference(rows: PackRow[], p: PackParams): PackRow[] {
  const kept = rows.filter(
    (r) =>
      (p.cells === null || r.cellsInSeries === p.cells) &&
      within(r.ratedCapacityMah, p.minMah, p.maxMah) &&
      within(r.labelledContinuousC, p.minC, p.maxC) &&
      within(r.weightG, p.minG, p.maxG) &&
      (p.connector === null || r.connector.toLowerCase() === p.connector.toLowerCase()) &&
      (p.maker === null || r.makerSlug === p.maker) &&
      (p.group === null || r.groupN > 0),
  );
  const get = sortValue[p.sort];
  const sign = p.dir === "asc" ? 1 : -1;
  return kept.sort((a, b) => {
    const va = get(a);
    const vb = get(b);
    if (va === null && vb === null) return a.slug.localeCompare(b.slug);
    if (va === null) return 1;
    if (vb === null) return -1;
    const c = typeof va === "number" && typeof vb === "number" ? va - vb : String(va).localeCompare(String(vb));
    return c !== 0 ? sign * c : a.slug.localeCompare(b.slug);
  });
}

let makerSlug = "";

beforeAll(async () => {
  await emptyCatalogue();
  const tester = await makeUser();
  const [a, b, c] = [await makeMaker("Alderquay"), await makeMaker("Brindlecote"), await makeMaker("Cobbleford")];
  makerSlug = b.slug;
  const specs = [
    { m: a.id, model: "Kestrel 1300 4S 75C", cells: 4, mah: 1300, c: 75, g: 160, conn: "XT60", sags: [30, 34, 38] },
    { m: a.id, model: "Kestrel 1500 4S 75C", cells: 4, mah: 1500, c: 75, g: null, conn: "xt60", sags: [33] },
    { m: a.id, model: "Osprey 2200 3S 50C", cells: 3, mah: 2200, c: 50, g: 180, conn: "XT60", sags: [] },
    { m: b.id, model: "Heron 1300 4S 100C", cells: 4, mah: 1300, c: 100, g: 170, conn: "XT30", sags: [41, 45] },
    { m: b.id, model: "Heron 5000 6S 45C", cells: 6, mah: 5000, c: 45, g: 760, conn: "XT90", sags: [null, 28] },
    { m: b.id, model: "Egret 850 3S 45C", cells: 3, mah: 850, c: 45, g: 80, conn: "XT30", sags: [] },
    { m: c.id, model: "Plover 1300 4S 95C", cells: 4, mah: 1300, c: 95, g: 165, conn: "XT60", sags: [36, 36] },
    { m: c.id, model: "plover 1550 4S 95C", cells: 4, mah: 1550, c: 95, g: 190, conn: "XT60", sags: [null] },
  ];
  for (const s of specs) {
    const pack = await makePack(s.m, {
      model: s.model,
      cellsInSeries: s.cells,
      ratedCapacityMah: s.mah,
      labelledContinuousC: s.c,
      weightG: s.g,
      connector: s.conn,
    });
    for (const sag of s.sags) {
      const r = await makeResult(pack, tester.id, { sagLimitedC: sag, capacityRatio: 0.9 + (sag ?? 0) / 1000 });
      G = r.groupKey;
    }
    // A result in another group (a cold room) and a pending one: neither is in G; the pending one counts nowhere.
    if (s.sags.length > 0) await makeResult(pack, tester.id, { ambientC: 5, sagLimitedC: 20 });
    await makeResult(pack, tester.id, { status: "pending", sagLimitedC: 99 });
  }
});

const ids = (rows: PackRow[]) => rows.map((r) => r.slug);
/** Medians to 6 decimals: the columns are float4, read as text here and as float8 by percentile_cont there. */
const round = (v: number | null) => (v === null ? null : Math.round(v * 1e6) / 1e6);
const comparable = (rows: PackRow[]) =>
  rows.map((r) => ({
    ...r,
    measuredC: round(r.measuredC),
    labelRatio: round(r.labelRatio),
    capacityRatio: round(r.capacityRatio),
  }));

describe("the packs table in SQL agrees with the JavaScript filter it replaced", () => {
  it("for every sort key in both directions, with and without a group, page by page", async () => {
    for (const group of [null, G]) {
      const rows = await referenceRows(group);
      for (const sort of PACK_SORT_KEYS) {
        for (const dir of ["asc", "desc"] as const) {
          const p = { ...DEFAULT_PACK_PARAMS, group, sort, dir, size: 3 };
          const want = reference(rows, p);
          for (let page = 1; page <= Math.ceil(want.length / 3); page++) {
            const got = await queryPackPage({ ...p, page });
            expect(ids(got.rows), `${sort} ${dir} group=${group !== null} page ${page}`).toEqual(
              ids(want.slice((page - 1) * 3, page * 3)),
            );
            expect(got.total).toBe(want.length);
          }
        }
      }
    }
  });

  it("for each filter alone and combined, with the same counts and medians", async () => {
    const cases: Partial<PackParams>[] = [
      { cells: 4 },
      { minMah: 1300, maxMah: 1500 },
      { minC: 75 },
      { maxC: 50 },
      { minG: 100 }, // a pack without a weight is outside any weight range
      { connector: "XT60" }, // matched without regard to case: "xt60" too
      { maker: makerSlug },
      { cells: 4, minC: 90, connector: "xt60" },
      { group: G, cells: 4 },
      { group: G, maxC: 80, sort: "measuredC", dir: "desc" },
    ];
    for (const c of cases) {
      const p = { ...DEFAULT_PACK_PARAMS, size: 50, ...c };
      const want = reference(await referenceRows(p.group), p);
      const got = await queryPackPage(p);
      expect(comparable(got.rows), JSON.stringify(c)).toEqual(comparable(want));
      expect(ids(await listMatchingPacks(p))).toEqual(ids(want));
      expect((await listMatchingPackIds(p)).sort((x, y) => x - y)).toEqual(want.map((r) => r.id).sort((x, y) => x - y));
    }
  });

  it("sorts missing measured values last in both directions, and a page past the last is empty", async () => {
    const desc = await queryPackPage({ ...DEFAULT_PACK_PARAMS, group: G, sort: "measuredC", dir: "desc", size: 50 });
    const asc = await queryPackPage({ ...DEFAULT_PACK_PARAMS, group: G, sort: "measuredC", dir: "asc", size: 50 });
    expect(desc.rows.at(-1)?.measuredC).toBeNull();
    expect(asc.rows.at(-1)?.measuredC).toBeNull();
    expect(asc.rows[0]?.measuredC).toBeLessThan(Number(asc.rows[1]?.measuredC));
    const past = await queryPackPage({ ...DEFAULT_PACK_PARAMS, size: 3, page: 9 });
    expect(past).toMatchObject({ total: 8, page: 9, pageCount: 3, rows: [] });
  });

  it("ranks a search by relevance on the default order, and by the chosen column otherwise", async () => {
    const found = await queryPackPage({ ...DEFAULT_PACK_PARAMS, q: "plover 1300" });
    expect(found.rows.map((r) => r.model)).toEqual(["Plover 1300 4S 95C"]);
    const byC = await queryPackPage({ ...DEFAULT_PACK_PARAMS, q: "1300", sort: "labelledC", dir: "desc" });
    expect(byC.rows.map((r) => r.labelledContinuousC)).toEqual([100, 95, 75]);
    expect((await queryPackPage({ ...DEFAULT_PACK_PARAMS, q: "1300", cells: 6 })).total).toBe(0);
  });

  it("finds one pack by its slug with its counts, and nothing for an unknown one", async () => {
    const [first] = await referenceRows(null);
    expect(first).toBeDefined();
    expect(await getPackRow(first?.slug ?? "")).toMatchObject({ slug: first?.slug, resultCount: first?.resultCount });
    expect(await getPackRow("no-such-pack")).toBeNull();
  });
});
