import { describe, expect, it } from "vitest";
import type { PackRow } from "@/lib/catalogue";
import { queryPacks, sortPacks } from "@/lib/pack-query";
import { DEFAULT_PACK_PARAMS, readPackParams, writePackParams } from "@/lib/pack-query-params";
import { parsePackQuery } from "@/lib/validations/pack-query";

let id = 0;
const row = (o: Partial<PackRow>): PackRow => ({
  id: ++id,
  slug: `p${id}`,
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

  it("turns bad params into defaults on the page, and into field errors in the API", () => {
    const sp = new URLSearchParams("cells=abc&size=7&sort=colour&page=-1&minMah=12.5");
    expect(readPackParams(sp)).toEqual({ ...DEFAULT_PACK_PARAMS, minMah: 12.5 });
    const parsed = parsePackQuery(sp);
    expect(parsed.success).toBe(false);
  });
});

describe("pack table query", () => {
  it("sorts missing measured values last in both directions", () => {
    const rows = [row({ measuredC: 20 }), row({ measuredC: null }), row({ measuredC: 40 })];
    expect(sortPacks(rows, "measuredC", "desc").map((r) => r.measuredC)).toEqual([40, 20, null]);
    expect(sortPacks(rows, "measuredC", "asc").map((r) => r.measuredC)).toEqual([20, 40, null]);
  });

  it("pages and clamps the page number", () => {
    const rows = Array.from({ length: 30 }, () => row({}));
    const page = queryPacks(rows, { ...DEFAULT_PACK_PARAMS, size: 10, page: 9 });
    expect(page).toMatchObject({ total: 30, page: 3, pageCount: 3 });
    expect(page.rows).toHaveLength(10);
  });

  it("searches fuzzily across maker and model, every word must match", () => {
    const rows = [
      row({ makerName: "Kitebrook", model: "Gust 1300 4S 75C" }),
      row({ makerName: "Kitebrook", model: "Updraft 2200 3S 50C" }),
      row({ makerName: "Glimwatt", model: "Spark 1300 4S 75C" }),
    ];
    const page = queryPacks(rows, { ...DEFAULT_PACK_PARAMS, q: "kitbrook gust" });
    expect(page.rows.map((r) => r.model)).toEqual(["Gust 1300 4S 75C"]);
    expect(queryPacks(rows, { ...DEFAULT_PACK_PARAMS, q: "glimwat" }).total).toBe(1);
  });
});
