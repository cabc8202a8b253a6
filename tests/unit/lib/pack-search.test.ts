// The search's words and how each must match (the SQL side is tested in tests/integration/pack-search.test.ts).
import { describe, expect, it } from "vitest";
import { MAX_SEARCH_WORDS, searchWords } from "@/lib/pack-search";

describe("search words", () => {
  it("lower-cases, splits at anything but letters and digits, and keeps each word once", () => {
    expect(searchWords("  Spark-1300  spark, 4S ").map((w) => w.text)).toEqual(["spark", "1300", "4s"]);
    expect(searchWords(" -- %_ ")).toEqual([]);
  });

  it("lets long words match with a typo, short ones only as typed", () => {
    expect(searchWords("torrent gt")).toEqual([
      { kind: "fuzzy", text: "torrent", like: "%torrent%" },
      { kind: "exact", text: "gt", like: "%gt%" },
    ]);
  });

  it("never lets a number match inside a longer number", () => {
    const [n, cells, c] = searchWords("1300 4s c75");
    const re = new RegExp(n?.kind === "number" ? n.regex : "^$");
    expect(["spark 1300 4s", "1300", "x1300y"].every((t) => re.test(t))).toBe(true);
    expect(["spark 11300", "13000 4s", "1500"].some((t) => re.test(t))).toBe(false);
    expect(cells).toMatchObject({ kind: "number", regex: "(^|[^0-9])4s" });
    expect(c).toMatchObject({ kind: "number", regex: "c75([^0-9]|$)" });
  });

  it("searches at most a fixed number of words", () => {
    expect(searchWords("a b c d e f g h i j k")).toHaveLength(MAX_SEARCH_WORDS);
  });
});
