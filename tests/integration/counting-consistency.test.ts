// One counting rule (issue 13): published = approved, with its pack and maker in the catalogue; a result with an
// open reader case still counts. On one seeded catalogue, the published results per like-for-like group and per
// maker are counted through every reader — home page data, /packs data, pack pages, /compare, chart data, the
// API, every download, the sitemap and the result pages — and each must equal the count the rule gives.
import Papa from "papaparse";
import { beforeAll, describe, expect, it, vi } from "vitest";
import sitemap from "@/app/sitemap";
import { groupKey } from "@/lib/analysis";
import type { ChartState } from "@/lib/open-data/chart-state";
import { DEFAULT_PACK_PARAMS } from "@/lib/pack-query-params";
import { loadChartData } from "@/server/open-data/load-chart-data";
import { findPackPage } from "@/server/pack-search";
import {
  cachedComparison,
  cachedGroups,
  cachedMakerRanking,
  cachedPackDetail,
  cachedPacksInGroup,
  cachedResult,
} from "@/server/public-data";
import { emptyCatalogue, makeMaker, makePack, makeResult, makeUser, openReaderCase } from "../helpers/fixtures";

vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

type Status = "approved" | "pending" | "rejected" | "withdrawn" | "awaiting_answer";
type Spec = { pack: string; ambientC: number; status: Status; openCase?: boolean };
const WARM = 22;
const COLD = 8;
// Makers: alder and birch are in the catalogue; cedar is only proposed. Pack "ap" is proposed under alder.
const PACKS = { a1: "alder", a2: "alder", a3: "alder", b1: "birch", b2: "birch", c1: "cedar", ap: "alder" } as const;
const SPECS: Spec[] = [
  { pack: "a1", ambientC: WARM, status: "approved" },
  { pack: "a1", ambientC: WARM, status: "approved" },
  { pack: "a1", ambientC: WARM, status: "approved", openCase: true },
  { pack: "a1", ambientC: COLD, status: "approved" },
  { pack: "a1", ambientC: WARM, status: "pending" },
  { pack: "a1", ambientC: WARM, status: "rejected" },
  { pack: "a2", ambientC: WARM, status: "approved" },
  { pack: "a2", ambientC: WARM, status: "approved" },
  { pack: "a2", ambientC: WARM, status: "withdrawn" },
  { pack: "a3", ambientC: COLD, status: "approved" },
  { pack: "a3", ambientC: COLD, status: "approved" },
  { pack: "a3", ambientC: COLD, status: "awaiting_answer" },
  { pack: "b1", ambientC: WARM, status: "approved" },
  { pack: "b1", ambientC: WARM, status: "approved" },
  { pack: "b1", ambientC: COLD, status: "approved" },
  { pack: "b2", ambientC: WARM, status: "approved", openCase: true },
  { pack: "c1", ambientC: WARM, status: "approved" }, // maker only proposed: not published
  { pack: "c1", ambientC: WARM, status: "approved" },
  { pack: "ap", ambientC: WARM, status: "approved" }, // pack only proposed: not published
];
const key = (ambientC: number) =>
  groupKey({
    resistanceMethod: "dc-step",
    ambientC,
    cutoffVPerCell: 3.3,
    loadCurrentA: 12,
    ratedMah: 1500,
    cyclesBeforeTest: 0,
  }).key;
const G = { warm: key(WARM), cold: key(COLD) };

type Tally = { groups: Record<string, number>; makers: Record<string, number> };
const slugs = { makers: {} as Record<string, string>, packs: {} as Record<string, string> };
let expected: Tally;
let publishedIds: number[] = [];
const hiddenIds: number[] = [];

function tally(rows: { group?: string; maker?: string; n?: number }[]): Tally {
  const t: Tally = { groups: {}, makers: {} };
  for (const r of rows) {
    if (r.group) t.groups[r.group] = (t.groups[r.group] ?? 0) + (r.n ?? 1);
    if (r.maker) t.makers[r.maker] = (t.makers[r.maker] ?? 0) + (r.n ?? 1);
  }
  return t;
}

beforeAll(async () => {
  await emptyCatalogue();
  const tester = await makeUser();
  const makers = {
    alder: await makeMaker("Alder Count Cells"),
    birch: await makeMaker("Birch Count Power"),
    cedar: await makeMaker("Cedar Count Packs"),
  };
  const { db } = await import("@/db");
  const { makers: makersTable } = await import("@/db/schema");
  const { eq } = await import("drizzle-orm");
  await db.update(makersTable).set({ status: "proposed" }).where(eq(makersTable.id, makers.cedar.id));
  for (const [name, m] of Object.entries(makers)) slugs.makers[name] = m.slug;
  const packRows: Record<string, Awaited<ReturnType<typeof makePack>>> = {};
  for (const [name, maker] of Object.entries(PACKS)) {
    packRows[name] = await makePack(makers[maker].id, { status: name === "ap" ? "proposed" : "active" });
    slugs.packs[name] = packRows[name].slug;
  }
  for (const s of SPECS) {
    const pack = packRows[s.pack];
    if (!pack) throw new Error(s.pack);
    const r = await makeResult(pack, tester.id, { ambientC: s.ambientC, status: s.status, rateC: 8 });
    if (s.openCase) await openReaderCase(r.id, tester.id);
    // The rule, applied to the fixture's own description of itself.
    const maker = PACKS[s.pack as keyof typeof PACKS];
    if (s.status === "approved" && s.pack !== "ap" && maker !== "cedar") publishedIds.push(r.id);
    else hiddenIds.push(r.id);
  }
  publishedIds = publishedIds.sort((a, b) => a - b);
  expected = tally(
    SPECS.filter(
      (s) => s.status === "approved" && s.pack !== "ap" && PACKS[s.pack as keyof typeof PACKS] !== "cedar",
    ).map((s) => ({ group: key(s.ambientC), maker: slugs.makers[PACKS[s.pack as keyof typeof PACKS]] })),
  );
});

let ip = 0;
const req = (url: string) =>
  new Request(`http://localhost:3000${url}`, { headers: { "x-forwarded-for": `10.55.0.${++ip % 250}` } });
const noParams = { params: Promise.resolve({}) };
async function api<T>(url: string): Promise<T> {
  const { GET } = (await import(`@/app${url.split("?")[0] ?? ""}/route`)) as {
    GET: (r: Request, c: unknown) => Promise<Response>;
  };
  const res = await GET(req(url), noParams);
  expect(res.status, url).toBe(200);
  return (await res.json()) as T;
}
const groupsAndMakers = (f: (group: string | null, maker: string | null) => Promise<number>) =>
  (async () => {
    const rows: { group?: string; maker?: string; n: number }[] = [];
    for (const g of Object.values(G)) rows.push({ group: g, n: await f(g, null) });
    for (const m of [slugs.makers.alder, slugs.makers.birch]) rows.push({ maker: m, n: await f(null, m ?? null) });
    return tally(rows);
  })();

describe("every reader counts the same published results", () => {
  it("the rule itself: 8 in the warm group and 4 in the cold; alder 8, birch 4; cedar and proposed packs none", () => {
    expect(expected.groups).toEqual({ [G.warm]: 8, [G.cold]: 4 });
    expect(expected.makers).toEqual({ [slugs.makers.alder ?? ""]: 8, [slugs.makers.birch ?? ""]: 4 });
  });

  it("home page data: groups, the label check's packs and the maker ranking", async () => {
    const groups = await cachedGroups();
    expect(tally(groups.map((g) => ({ group: g.key, n: g.resultCount })))).toEqual({
      ...tally([]),
      groups: expected.groups,
    });
    expect(groups.find((g) => g.key === G.warm)?.packCount).toBe(4);
    const inGroups = (
      await Promise.all(Object.values(G).map(async (g) => ({ g, packs: await cachedPacksInGroup(g) })))
    ).flatMap(({ g, packs }) => packs.map((p) => ({ group: g, maker: p.makerSlug, n: p.n })));
    expect(tally(inGroups)).toEqual(expected);
    const ranking = (
      await Promise.all(Object.values(G).map(async (g) => ({ g, rows: await cachedMakerRanking(g) })))
    ).flatMap(({ g, rows }) => rows.map((r) => ({ group: g, maker: r.makerSlug, n: r.results })));
    expect(tally(ranking)).toEqual(expected);
  });

  it("/packs data, pack pages, /compare and the result pages", async () => {
    // The rows /packs and GET /api/v1/packs page through (SQL over the catalogue and its summaries).
    const table = async (group: string | null) =>
      (await findPackPage({ ...DEFAULT_PACK_PARAMS, group, size: 200 })).rows;
    const rows = await table(null);
    expect(tally(rows.map((p) => ({ maker: p.makerSlug, n: p.resultCount }))).makers).toEqual(expected.makers);
    const inGroup = await Promise.all(Object.values(G).map(async (g) => ({ g, rows: await table(g) })));
    expect(tally(inGroup.flatMap(({ g, rows: r }) => r.map((p) => ({ group: g, n: p.groupN })))).groups).toEqual(
      expected.groups,
    );
    const details = await Promise.all(rows.map((p) => cachedPackDetail(p.slug)));
    expect(
      tally(
        details.flatMap((d) => d?.groups.map((g) => ({ group: g.group.key, maker: d.pack.makerSlug, n: g.n })) ?? []),
      ),
    ).toEqual(expected);
    for (const g of Object.values(G)) {
      const c = await cachedComparison(
        rows.slice(0, 6).map((p) => p.slug),
        g,
      );
      expect(c.group?.key).toBe(g);
      expect(c.compared.reduce((n, p) => n + p.n, 0)).toBe(expected.groups[g]);
    }
    const visible = (await Promise.all(publishedIds.map((id) => cachedResult(id)))).filter(Boolean);
    expect(visible).toHaveLength(publishedIds.length);
    expect((await Promise.all(hiddenIds.map((id) => cachedResult(id)))).filter(Boolean)).toEqual([]);
  });

  it("chart data: the label check by group and maker, and the maker ranking", async () => {
    const chart = (group: string, maker: string | null, kind: ChartState["kind"] = "label-check") =>
      loadChartData({ v: 1, kind, group, title: "count", ...(maker ? { maker } : {}) });
    const byFilter = await groupsAndMakers(async (g, m) => {
      if (g) return (await chart(g, null)).counts.results;
      let n = 0;
      for (const group of Object.values(G)) n += (await chart(group, m)).counts.results;
      return n;
    });
    expect(byFilter).toEqual(expected);
    const ranking = await Promise.all(
      Object.values(G).map(async (g) => ({ g, data: await chart(g, null, "maker-ranking") })),
    );
    expect(
      tally(ranking.flatMap(({ g, data }) => (data.ranking ?? []).map((r) => ({ group: g, n: r.resultCount })))),
    ).toEqual({ ...tally([]), groups: expected.groups });
  });

  it("the API: groups, one group, results by group and maker, makers, packs", async () => {
    type List<T> = { data: T[]; meta: { total: number } };
    const groups = await api<List<{ key: string; resultCount: number }>>("/api/v1/groups");
    expect(tally(groups.data.map((g) => ({ group: g.key, n: g.resultCount }))).groups).toEqual(expected.groups);
    const results = await groupsAndMakers(async (g, m) =>
      g
        ? (await api<List<unknown>>(`/api/v1/results?group=${g}`)).meta.total
        : (await api<List<unknown>>(`/api/v1/results?maker=${m}`)).meta.total,
    );
    expect(results).toEqual(expected);
    for (const g of Object.values(G)) {
      const { GET } = await import("@/app/api/v1/groups/[key]/route");
      const one = (await (await GET(req(`/api/v1/groups/${g}`), { params: Promise.resolve({ key: g }) })).json()) as {
        data: { resultCount: number; packs: { makerSlug: string; resultCount: number }[] };
      };
      expect(one.data.resultCount).toBe(expected.groups[g]);
    }
    const makers = await api<List<{ slug: string; resultCount: number }>>("/api/v1/makers");
    expect(tally(makers.data.map((m) => ({ maker: m.slug, n: m.resultCount }))).makers).toEqual(expected.makers);
    const packs = await api<List<{ makerSlug: string; resultCount: number }>>("/api/v1/packs?size=200");
    expect(tally(packs.data.map((p) => ({ maker: p.makerSlug, n: p.resultCount }))).makers).toEqual(expected.makers);
    const packsInGroups = await Promise.all(
      Object.values(G).map(async (g) => ({ g, list: await api<List<{ groupN: number }>>(`/api/v1/packs?group=${g}`) })),
    );
    expect(
      tally(packsInGroups.flatMap(({ g, list }) => list.data.map((p) => ({ group: g, n: p.groupN })))).groups,
    ).toEqual(expected.groups);
  });

  it("every download: results (CSV and JSON), makers and packs", async () => {
    const { GET } = await import("@/app/(public)/data/download/[file]/route");
    const file = async (name: string, q = "") => {
      const res = await GET(req(`/data/download/${name}${q}`), { params: Promise.resolve({ file: name }) });
      expect(res.status).toBe(200);
      return res.text();
    };
    const csv = (text: string) => Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true }).data;
    const results = csv(await file("results.csv"));
    expect(tally(results.map((r) => ({ group: r.groupKey, maker: r.makerSlug })))).toEqual(expected);
    const json = JSON.parse(await file("results.json")) as { data: { groupKey: string; makerSlug: string }[] };
    expect(tally(json.data.map((r) => ({ group: r.groupKey, maker: r.makerSlug })))).toEqual(expected);
    const filtered = await groupsAndMakers(
      async (g, m) => csv(await file("results.csv", g ? `?group=${g}` : `?maker=${m}`)).length,
    );
    expect(filtered).toEqual(expected);
    const makers = csv(await file("makers.csv"));
    expect(tally(makers.map((m) => ({ maker: m.slug, n: Number(m.resultCount) }))).makers).toEqual(expected.makers);
    const packs = csv(await file("packs.csv"));
    expect(tally(packs.map((p) => ({ maker: p.makerSlug, n: Number(p.resultCount) }))).makers).toEqual(expected.makers);
  });

  it("the sitemap lists exactly the published results", async () => {
    const ids = (await sitemap())
      .map((e) => /\/results\/(\d+)$/.exec(e.url)?.[1])
      .filter((id): id is string => id !== undefined)
      .map(Number)
      .sort((a, b) => a - b);
    expect(ids).toEqual(publishedIds);
  });
});
