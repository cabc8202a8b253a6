// The pack search in PostgreSQL (pg_trgm): every word of the text must match the maker or the model of the same
// pack; a typo is forgiven within a word, never across words; numbers match as typed. The same answer on
// GET /api/v1/packs, the /packs page's query (server/pack-search.ts) and the packs download. All names here are
// invented look-alikes: two makers one letter apart, models one digit apart.
import { beforeAll, describe, expect, it, vi } from "vitest";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { searchPackIds } from "@/db/queries/pack-search";
import { DEFAULT_PACK_PARAMS } from "@/lib/pack-query-params";
import { findPackPage } from "@/server/pack-search";
import { emptyCatalogue, makeMaker, makePack } from "../helpers/fixtures";

vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);
const { GET: listPacks } = await import("@/app/api/v1/packs/route");
const { GET: download } = await import("@/app/(public)/data/download/[file]/route");

const headers = { "x-forwarded-for": "203.0.113.15" };
type Listed = { data: { makerName: string; model: string }[]; meta: { total: number } };

/** "Maker Model" of each pack GET /api/v1/packs answers for `q`, in its order. */
async function api(q: string): Promise<string[]> {
  const res = await listPacks(
    new Request(`http://localhost/api/v1/packs?q=${encodeURIComponent(q)}&size=100`, { headers }),
    { params: Promise.resolve({}) },
  );
  expect(res.status).toBe(200);
  return ((await res.json()) as Listed).data.map((p) => `${p.makerName} ${p.model}`);
}

/** The same for the /packs page's query (the page renders these rows into its first HTML). */
async function page(q: string): Promise<string[]> {
  const found = await findPackPage({ ...DEFAULT_PACK_PARAMS, q, size: 100 });
  return found.rows.map((p) => `${p.makerName} ${p.model}`);
}

/** The same for the packs download (JSON). */
async function downloaded(q: string): Promise<string[]> {
  const res = await download(
    new Request(`http://localhost/data/download/packs.json?q=${encodeURIComponent(q)}`, { headers }),
    { params: Promise.resolve({ file: "packs.json" }) },
  );
  expect(res.status).toBe(200);
  return ((await res.json()) as Listed).data.map((p) => `${p.makerName} ${p.model}`);
}

const QM = "Quillmere Skylark 1300 4S 75C";
const QM15 = "Quillmere Skylark 1500 4S 75C";
const QO = "Quillmore Skylark 1300 4S 60C";
const QOT = "Quillmore Thornback 2200 3S 50C";
const RW = "Ravelwick Dunlin 5000 6S 45C";

beforeAll(async () => {
  await emptyCatalogue();
  const quillmere = await makeMaker("Quillmere");
  const quillmore = await makeMaker("Quillmore");
  const ravelwick = await makeMaker("Ravelwick");
  await makePack(quillmere.id, { model: "Skylark 1300 4S 75C", ratedCapacityMah: 1300, labelledContinuousC: 75 });
  await makePack(quillmere.id, { model: "Skylark 1500 4S 75C", ratedCapacityMah: 1500, labelledContinuousC: 75 });
  await makePack(quillmore.id, { model: "Skylark 1300 4S 60C", ratedCapacityMah: 1300, labelledContinuousC: 60 });
  await makePack(quillmore.id, {
    model: "Thornback 2200 3S 50C",
    cellsInSeries: 3,
    ratedCapacityMah: 2200,
    labelledContinuousC: 50,
  });
  await makePack(ravelwick.id, { model: "Dunlin 5000 6S 45C", cellsInSeries: 6, ratedCapacityMah: 5000 });
});

describe("pack search (pg_trgm, every word must match)", () => {
  it("finds a number only as typed: 'skylark 1300' never finds the 1500 or another maker's model", async () => {
    const found = await api("skylark 1300");
    expect([...found].sort()).toEqual([QM, QO]);
    expect(await api("1500")).toEqual([QM15]);
    // "130" is not 1300: a number never matches inside a longer one.
    expect(await api("130")).toEqual([]);
  });

  it("tells two makers one letter apart by ranking the exact spelling first (Fuse.js orders the matches)", async () => {
    // A one-letter difference within a word is a typo the search forgives, so both makers' 1300s match…
    expect(await api("quillmere skylark 1300")).toEqual([QM, QO]);
    expect(await api("quillmore skylark 1300")).toEqual([QO, QM]);
    // …but a word the other maker's packs do not have decides.
    expect(await api("quillmore thornback")).toEqual([QOT]);
  });

  it("forgives a typo within a word", async () => {
    expect(await api("thornbak")).toEqual([QOT]);
    expect(await api("ravelwik dunlin")).toEqual([RW]);
    // A letter left out of a 6-letter word: strict word similarity 4/9 ≥ 0.4 (lib/pack-search.ts).
    expect(await api("dunln")).toEqual([RW]);
    // Too far off to be a typo of any word here.
    expect(await api("dnlx")).toEqual([]);
  });

  it("finds a query whose words are split across maker and model", async () => {
    expect(await api("quillmore 2200")).toEqual([QOT]);
    expect(await api("dunlin ravelwick 6s")).toEqual([RW]);
  });

  it("does not find words that match only across two different packs, nor words run together", async () => {
    // Dunlin is Ravelwick's 5000; 1300 is only on the Skylarks.
    expect(await api("dunlin 1300")).toEqual([]);
    expect(await api("ravelwick skylark")).toEqual([]);
    expect(await api("thornback 1500")).toEqual([]);
    // A typo may not cross a word boundary: "skylark1300" is not "Skylark 1300".
    expect(await api("skylark1300")).toEqual([]);
  });

  it("answers the same on /api/v1/packs, the /packs page's query and the packs download", async () => {
    for (const q of ["skylark 1300", "quillmere skylark 1300", "thornbak", "dunlin 1300", "quillmore 2200"]) {
      const fromApi = await api(q);
      expect(await page(q), q).toEqual(fromApi);
      expect((await downloaded(q)).sort(), q).toEqual([...fromApi].sort());
    }
  });

  it("treats a text without words as no search, and LIKE or regex characters as plain separators", async () => {
    expect(await searchPackIds(" -- ")).toBeNull();
    expect(await api("%")).toHaveLength(5);
    expect(await api("skylark_1300")).toEqual(await api("skylark 1300"));
    expect(await api("(1300")).toHaveLength(2);
  });

  it("has the pg_trgm extension and a trigram index on each half of maker + model", async () => {
    const ext = await db.execute<{ n: number }>(
      sql`select count(*)::int as n from pg_extension where extname = 'pg_trgm'`,
    );
    expect(ext.rows[0]?.n).toBe(1);
    const idx = await db.execute<{ indexname: string; indexdef: string }>(
      sql`select indexname, indexdef from pg_indexes where indexname in ('makers_name_trgm_idx', 'packs_model_trgm_idx')
          order by indexname`,
    );
    expect(idx.rows.map((r) => r.indexname)).toEqual(["makers_name_trgm_idx", "packs_model_trgm_idx"]);
    for (const r of idx.rows) expect(r.indexdef).toMatch(/USING gin \(lower\(\w+\) gin_trgm_ops\)/);
  });
});
