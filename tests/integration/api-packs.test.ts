// GET /api/v1/packs: filters, fuzzy search, sorting, pages ({ data, meta, links }), 422 on bad params and pages past
// the end, 404 for an unknown group, ETag/304, CORS.
import { beforeAll, describe, expect, it, vi } from "vitest";
import { groupKey } from "@/lib/analysis";
import { emptyCatalogue, makeMaker, makePack, makeResult, makeUser } from "../helpers/fixtures";

// unstable_cache needs a running Next.js server; here the handler reads through to the queries.
vi.mock("next/cache", () => ({ unstable_cache: <T>(fn: T) => fn }));
const { GET, OPTIONS } = await import("@/app/api/v1/packs/route");

const G = groupKey({
  resistanceMethod: "dc-step",
  ambientC: 22,
  cutoffVPerCell: 3.3,
  loadCurrentA: 12,
  ratedMah: 1500,
  cyclesBeforeTest: 0,
}).key;
const call = (qs: string, headers: Record<string, string> = {}) =>
  GET(new Request(`http://localhost/api/v1/packs${qs}`, { headers: { "x-forwarded-for": "10.9.9.9", ...headers } }), {
    params: Promise.resolve({}),
  });

beforeAll(async () => {
  await emptyCatalogue();
  const tester = await makeUser();
  const brack = await makeMaker("Brackwater Test Power");
  const fell = await makeMaker("Fellrunner Test");
  const torrent = await makePack(brack.id, {
    model: "Torrent 1500 4S 50C",
    cellsInSeries: 4,
    ratedCapacityMah: 1500,
    weightG: 170,
  });
  await makePack(brack.id, {
    model: "Surge 2200 3S 60C",
    cellsInSeries: 3,
    ratedCapacityMah: 2200,
    labelledContinuousC: 60,
    connector: "EC5",
    weightG: 190,
  });
  await makePack(fell.id, {
    model: "Trail 1300 4S 95C",
    cellsInSeries: 4,
    ratedCapacityMah: 1300,
    labelledContinuousC: 95,
    weightG: 160,
  });
  await makePack(fell.id, {
    model: "Endure 5000 6S 45C",
    cellsInSeries: 6,
    ratedCapacityMah: 5000,
    labelledContinuousC: 45,
    connector: "XT90",
    weightG: 800,
  });
  await makeResult(torrent, tester.id, { sagLimitedC: 40 });
});

describe("GET /api/v1/packs", () => {
  it("filters, sorts and pages, with cache, ETag and CORS headers", async () => {
    const res = await call("?cells=4&sort=capacity&dir=desc&size=10");
    expect(res.status).toBe(200);
    expect(res.headers.get("access-control-allow-origin")).toBe("*");
    expect(res.headers.get("cache-control")).toMatch(/public, max-age=\d+/);
    expect(res.headers.get("etag")).toMatch(/^"[\w-]+"$/);
    const body = await res.json();
    expect(body.meta).toMatchObject({ page: 1, size: 10, total: 2, pageCount: 1, sort: "capacity", dir: "desc" });
    expect(body.links).toMatchObject({ next: null, prev: null });
    expect(body.data.map((p: { model: string }) => p.model)).toEqual(["Torrent 1500 4S 50C", "Trail 1300 4S 95C"]);
    expect(body.meta.licence).toMatchObject({ identifier: "CC-BY-4.0", name: "CC BY 4.0" });
    expect(body.data[0]).toMatchObject({ resultCount: 1, makerSlug: expect.any(String), makerId: expect.any(Number) });
  });

  it("answers 304 when the client holds the same ETag", async () => {
    const first = await call("?connector=EC5");
    const etag = first.headers.get("etag") ?? "";
    const again = await call("?connector=EC5", { "if-none-match": etag });
    expect(again.status).toBe(304);
    expect(await again.text()).toBe("");
  });

  it("finds packs by a misspelt maker and model (fuzzy)", async () => {
    const body = await (await call("?q=brakwater%20torent")).json();
    expect(body.meta.filters).toEqual({ q: "brakwater torent" });
    expect(body.data[0]?.model).toBe("Torrent 1500 4S 50C");
  });

  it("applies ranges, maker and group filters; a group adds the pack's medians in it", async () => {
    expect(
      (await (await call("?minMah=1400&maxMah=2500&minG=180")).json()).data.map((p: { model: string }) => p.model),
    ).toEqual(["Surge 2200 3S 60C"]);
    expect((await (await call("?minC=90")).json()).meta.total).toBe(1);
    const fell = await (await call("?maker=fellrunner-test")).json();
    expect(fell.meta.total).toBe(0); // fixture maker slugs are generated; unknown slug → empty, not an error
    const grouped = await (await call(`?group=${G}`)).json();
    expect(grouped.meta.total).toBe(1);
    expect(grouped.data[0]).toMatchObject({ model: "Torrent 1500 4S 50C", measuredC: 40, groupN: 1 });
  });

  it("refuses bad search params with 422 and field errors, keeping CORS", async () => {
    const bad = await call("?cells=abc&size=700&sort=colour");
    expect(bad.status).toBe(422);
    expect(bad.headers.get("access-control-allow-origin")).toBe("*");
    const body = await bad.json();
    expect(Object.keys(body.error.fieldErrors).sort()).toEqual(["cells", "size", "sort"]);
    expect((await call("?minMah=3000&maxMah=1000")).status).toBe(422);
  });

  it("answers 422 for a page past the last (never silently the last page) and 404 for an unknown group", async () => {
    const last = await (await call("?size=1&page=4")).json();
    expect(last.data).toHaveLength(1);
    expect(last.links.next).toBeNull();
    expect(last.links.prev).toContain("page=3");
    const past = await call("?size=1&page=5");
    expect(past.status).toBe(422);
    expect((await past.json()).error.fieldErrors).toEqual({ page: ["page must be at most 4."] });
    const unknown = await call("?group=dc-step_no_such_group");
    expect(unknown.status).toBe(404);
    expect(unknown.headers.get("access-control-allow-origin")).toBe("*");
  });

  it("answers the CORS preflight", () => {
    const res = OPTIONS();
    expect(res.status).toBe(204);
    expect(res.headers.get("access-control-allow-methods")).toContain("GET");
  });
});
