import { describe, expect, it } from "vitest";
import { byTopPacksRule, groupTableHref, shownOf } from "@/lib/bounded-lists";

describe("bounded lists", () => {
  it("orders packs by most results, ties by slug in byte order (as PostgreSQL's C collation sorts them)", () => {
    const packs = [
      { packSlug: "b-2", resultCount: 1 },
      { packSlug: "a-10", resultCount: 1 },
      { packSlug: "z", resultCount: 4 },
      { packSlug: "a-9", resultCount: 1 },
      { packSlug: "a-1", resultCount: 4 },
    ];
    expect([...packs].sort(byTopPacksRule).map((p) => p.packSlug)).toEqual(["a-1", "z", "a-10", "a-9", "b-2"]);
  });

  it("says where a list was cut, and nothing when it was not", () => {
    expect(shownOf(60, 245, "pack")).toBe("Showing 60 of 245 packs");
    expect(shownOf(60, 60, "pack")).toBeNull();
    expect(shownOf(3, 2, "maker")).toBeNull();
    expect(groupTableHref("4s_1300_a b")).toBe("/packs?group=4s_1300_a%20b&sort=results&dir=desc");
  });
});
