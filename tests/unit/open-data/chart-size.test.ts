import { describe, expect, it } from "vitest";
import { defaultHeight, heightRange, imageSizeQuery, parseChartImageSize } from "@/lib/open-data/chart-size";

const parse = (query: string, format: "svg" | "png" = "png") => parseChartImageSize(new URLSearchParams(query), format);

describe("chart image size parameters", () => {
  it("keeps the old default when no size is asked for: 800 × 500, PNG at 2×", () => {
    expect(parse("")).toEqual({ ok: true, size: { width: 800, height: 500, scale: 2 } });
    expect(parse("", "svg")).toEqual({ ok: true, size: { width: 800, height: 500, scale: 1 } });
  });

  it("derives the height from the width (5/8, at least 400) and takes an explicit one in range", () => {
    expect(parse("width=1600")).toMatchObject({ ok: true, size: { width: 1600, height: 1000 } });
    expect(parse("width=320")).toMatchObject({ ok: true, size: { width: 320, height: 400 } });
    expect(parse("width=1000&height=700&scale=1")).toEqual({ ok: true, size: { width: 1000, height: 700, scale: 1 } });
    expect(defaultHeight(480)).toBe(400);
    expect(heightRange(320)).toEqual({ min: 300, max: 480 });
    expect(heightRange(1600)).toEqual({ min: 640, max: 1600 });
  });

  it.each([
    ["width=abc", "width"],
    ["width=800.5", "width"],
    ["width=0800", "width"],
    ["width=8e2", "width"],
    ["width=-400", "width"],
    ["width=319", "width"],
    ["width=1601", "width"],
    ["width=", "width"],
    ["height=299", "height"],
    ["width=320&height=481", "height"],
    ["width=1600&height=600", "height"],
    ["height=tall", "height"],
    ["scale=4", "scale"],
    ["scale=1.5", "scale"],
    ["scale=0", "scale"],
    ["width=1600&scale=3", "scale"],
    ["width=1200&height=1200&scale=3", "scale"],
  ])("refuses %s with a message on %s", (query, field) => {
    const out = parse(query);
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(Object.keys(out.fieldErrors)).toContain(field);
    expect(out.fieldErrors[field]?.[0]).toMatch(/\d/); // says the allowed numbers
  });

  it("refuses scale on an SVG (it is sharp at any scale) and reports the PNG's would-be size", () => {
    const svg = parse("scale=2", "svg");
    expect(svg.ok).toBe(false);
    if (!svg.ok) expect(svg.fieldErrors.scale?.[0]).toContain("chart.png only");
    const big = parse("width=1600&scale=3");
    if (!big.ok) expect(big.fieldErrors.scale?.[0]).toContain("4800 × 3000");
    expect(parse("width=1600&scale=2").ok).toBe(true); // 3200 × 2000: the largest side allowed
  });

  it("writes the canonical query (defaults left out), which parses back to the same size", () => {
    expect(imageSizeQuery("png")).toBe("");
    expect(imageSizeQuery("png", { width: 800, scale: 2 })).toBe("");
    expect(imageSizeQuery("png", { width: 400, scale: 3 })).toBe("?width=400&scale=3");
    expect(imageSizeQuery("svg", { width: 400, scale: 3 })).toBe("?width=400");
    expect(imageSizeQuery("png", { width: 1000, height: 625 })).toBe("?width=1000");
    for (const size of [
      { width: 400, scale: 1 },
      { width: 1000, height: 700, scale: 3 },
      { width: 1600, height: 900, scale: 1 },
    ]) {
      expect(parse(imageSizeQuery("png", size).slice(1))).toEqual({
        ok: true,
        size: { height: defaultHeight(size.width), ...size },
      });
    }
  });
});
