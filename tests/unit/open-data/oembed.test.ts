import { describe, expect, it } from "vitest";
import { encodeChartState, statePath } from "@/lib/open-data/chart-state";
import { parseChartImageSize } from "@/lib/open-data/chart-size";
import { chartStateFromUrl, oembedResponse } from "@/lib/open-data/oembed";

const BASE = "http://localhost:3000";
const s = encodeChartState({ v: 1, kind: "curves", group: "g1", title: "Curves" });

// Field rules from the oEmbed specification (oembed.com), sections 2.3.4 and 2.3.4.4 (rich type).
describe("oEmbed response", () => {
  it("is type rich, version 1.0, with html, width and height", () => {
    const r = oembedResponse(`${BASE}/charts/view/${s}`, BASE);
    expect(r).toMatchObject({
      version: "1.0",
      type: "rich",
      title: "Curves",
      provider_name: "Sagline",
      provider_url: BASE,
      width: 800,
    });
    expect(r?.html).toContain(`src="${BASE}/embed/chart/${s}"`);
    expect(r?.html).toContain('loading="lazy"');
    expect(r?.height).toBeGreaterThan(0);
  });
  it("honours maxwidth and maxheight", () => {
    const narrow = oembedResponse(`${BASE}/charts/view/${s}`, BASE, 400);
    expect(narrow?.width).toBeLessThanOrEqual(400);
    // Below 560 px the embed shows the square narrow layout: 400 px of chart plus the credit line.
    expect(narrow?.height).toBe(432);
    expect(oembedResponse(`${BASE}/charts/view/${s}`, BASE, 600)?.height).toBe(375 + 32);
    const low = oembedResponse(`${BASE}/embed/chart/${s}`, BASE, 800, 200);
    expect(low?.height).toBeLessThanOrEqual(200);
    expect(low?.width).toBeLessThanOrEqual(800);
    expect(low?.html).toContain(`height="${low?.height}"`);
  });
  it("knows only our own chart URLs", () => {
    expect(chartStateFromUrl(`https://elsewhere.example/charts/view/${s}`, BASE)).toBeNull();
    expect(chartStateFromUrl(`${BASE}/packs/x`, BASE)).toBeNull();
    expect(chartStateFromUrl("not a url", BASE)).toBeNull();
    expect(oembedResponse(`${BASE}/charts/view/garbage`, BASE)).toBeNull();
  });
  it("offers a PNG thumbnail whose stated size is the size its URL draws, within maxwidth and maxheight (§2.3.4)", () => {
    const drawn = (url: string) => {
      const u = new URL(url);
      const out = parseChartImageSize(u.searchParams, "png");
      return out.ok ? { width: out.size.width * out.size.scale, height: out.size.height * out.size.scale } : null;
    };
    for (const [maxwidth, maxheight] of [
      [undefined, undefined],
      [400, undefined],
      [800, 350],
      [1200, 900],
    ] as const) {
      const r = oembedResponse(`${BASE}/charts/view/${s}`, BASE, maxwidth, maxheight);
      expect(r?.thumbnail_url).toContain(`${BASE}/charts/image/${s}/chart.png?`);
      expect(drawn(r?.thumbnail_url ?? "")).toEqual({ width: r?.thumbnail_width, height: r?.thumbnail_height });
      expect(r?.thumbnail_width).toBeLessThanOrEqual(maxwidth ?? 800);
      expect(r?.thumbnail_height).toBeLessThanOrEqual(maxheight ?? 500);
    }
    // Narrower than the smallest drawing, or too low for its width: no thumbnail rather than a wrong one.
    expect(oembedResponse(`${BASE}/charts/view/${s}`, BASE, 200)).not.toHaveProperty("thumbnail_url");
    expect(oembedResponse(`${BASE}/charts/view/${s}`, BASE, 800, 250)).not.toHaveProperty("thumbnail_url");
  });
});

describe("oEmbed reads split permalinks", () => {
  it("finds the chart in a permalink or embed whose state is split into segments", () => {
    const state = {
      v: 1 as const,
      kind: "label-check" as const,
      group: "dc-step_a15-25_co3.3_r5-10_new",
      title: "T".repeat(120),
      note: "n".repeat(300),
    };
    const path = statePath(encodeChartState(state));
    expect(path).toContain("/");
    expect(chartStateFromUrl(`${BASE}/charts/view/${path}`, BASE)).toEqual(state);
    expect(chartStateFromUrl(`${BASE}/embed/chart/${path}`, BASE)).toEqual(state);
    expect(chartStateFromUrl(`${BASE}/charts/view/${path}/x.y`, BASE)).toBeNull();
  });
});
