import { describe, expect, it } from "vitest";
import type { PackRow } from "@/lib/catalogue";
import { pageCountOf, rankBySearch } from "@/lib/pack-query";
import { DEFAULT_PACK_PARAMS, readPackParams, writePackParams, type PackParams } from "@/lib/pack-query-params";
import { packListQuery } from "@/lib/api-contract/queries";
import { searchParamsObject } from "@/lib/api-contract/params";

let id = 0;
const row = (o: Partial<PackRow>): PackRow => ({
  id: ++id,
  slug: `p${id}`,
  makerId: 1,
  model: "Model",
  makerName: "Maker",
  makerSlug: "maker",
  cellsInSeries: 4,
  ratedCapacityMah: 1500,
  labelledContinuousC: 50,
  labelledBurstC: null,
  weightG: 180,
  connector: "XT60",
  resultCount: 0,
  groupCount: 0,
  measuredC: null,
  labelRatio: null,
  capacityRatio: null,
  groupN: 0,
  ...o,
});

describe("pack table state in the URL", () => {
  it("round-trips and leaves defaults out of the URL", () => {
    const p = {
      ...DEFAULT_PACK_PARAMS,
      cells: 4,
      minMah: 1000,
      connector: "XT60",
      sort: "capacity" as const,
      dir: "desc" as const,
      page: 2,
    };
    const sp = writePackParams(p);
    expect(sp.toString()).toBe("cells=4&minMah=1000&connector=XT60&sort=capacity&dir=desc&page=2");
    expect(readPackParams(sp)).toEqual(p);
    expect(writePackParams(DEFAULT_PACK_PARAMS).toString()).toBe("");
  });

  it("turns bad params into defaults on the page, and into field errors in the API (one schema for both)", () => {
    const sp = new URLSearchParams("cells=abc&size=500&sort=colour&page=-1&minMah=12.5&group=Not%20a%20key");
    expect(readPackParams(sp)).toEqual({ ...DEFAULT_PACK_PARAMS, minMah: 12.5 });
    const parsed = packListQuery.safeParse(searchParamsObject(sp));
    expect(parsed.success).toBe(false);
    const fields = new Set(parsed.error?.issues.map((i) => String(i.path[0])));
    expect([...fields].sort()).toEqual(["cells", "group", "page", "size", "sort"]);
  });

  it("reads what the API accepts the same way: any size from 1 to 200, a group key of up to 120 characters", () => {
    const sp = new URLSearchParams("size=7&group=dc-step_a15-25_co3.3_r5-10_new&maxMah=900&minMah=1000");
    const strict = packListQuery.safeParse(searchParamsObject(sp));
    // The API refuses an empty range; the page keeps both numbers and shows no packs.
    expect(strict.error?.issues.map((i) => i.path.join("."))).toEqual(["maxMah"]);
    expect(readPackParams(sp)).toMatchObject({ size: 7, group: "dc-step_a15-25_co3.3_r5-10_new", minMah: 1000 });
  });
});

describe("the search's ranking", () => {
  it("puts the closest spelling first among the packs PostgreSQL found (Fuse.js orders, never drops)", () => {
    const found = [
      row({ id: 3, makerName: "Kiteborok", model: "Gust 1300 4S 60C" }),
      row({ id: 1, makerName: "Kitebrook", model: "Gust 1300 4S 75C" }),
    ];
    // In the catalogue's order the look-alike maker comes first; ranking puts the spelling asked for first.
    expect(rankBySearch(found, "kitebrook gust").map((r) => r.id)).toEqual([1, 3]);
    expect(rankBySearch(found, "kiteborok gust").map((r) => r.id)).toEqual([3, 1]);
    // No word: the order given stays.
    expect(rankBySearch(found, "  ").map((r) => r.id)).toEqual([3, 1]);
  });

  it("counts pages, at least one", () => {
    expect([pageCountOf(0, 50), pageCountOf(50, 50), pageCountOf(51, 50)]).toEqual([1, 1, 2]);
  });
});

describe("the /packs rewrite", () => {
  it("sends /packs with any parameter the table writes to its per-request render (next.config.mjs)", async () => {
    // @ts-expect-error -- next.config.mjs is plain JavaScript (the project type-checks no JavaScript files)
    const config: unknown = await import("@/next.config.mjs");
    const list =
      typeof config === "object" && config !== null && "PACK_TABLE_PARAMS" in config ? config.PACK_TABLE_PARAMS : null;
    const PACK_TABLE_PARAMS = Array.isArray(list) ? list.map(String) : [];
    const everything: PackParams = {
      q: "ridge",
      cells: 4,
      minMah: 1,
      maxMah: 2,
      minC: 3,
      maxC: 4,
      minG: 5,
      maxG: 6,
      connector: "XT60",
      maker: "m",
      group: "g",
      sort: "weight",
      dir: "desc",
      page: 2,
      size: 50,
    };
    expect([...writePackParams(everything).keys()].sort()).toEqual([...PACK_TABLE_PARAMS].sort());
  });
});
