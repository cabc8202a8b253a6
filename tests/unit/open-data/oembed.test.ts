import { describe, expect, it } from "vitest";
import { encodeChartState } from "@/lib/open-data/chart-state";
import { chartStateFromUrl, oembedResponse } from "@/lib/open-data/oembed";

const BASE = "http://localhost:3000";
const s = encodeChartState({ v: 1, kind: "curves", group: "g1", title: "Curves" });

// Field rules from the oEmbed specification (oembed.com), sections 2.3.4 and 2.3.4.4 (rich type).
describe("oEmbed response", () => {
  it("is type rich, version 1.0, with html, width and height", () => {
    const r = oembedResponse(`${BASE}/charts/view/${s}`, BASE);
    expect(r).toMatchObject({ version: "1.0", type: "rich", title: "Curves", provider_name: "Sagline", provider_url: BASE, width: 800 });
    expect(r?.html).toContain(`src="${BASE}/embed/chart/${s}"`);
    expect(r?.html).toContain('loading="lazy"');
    expect(r?.height).toBeGreaterThan(0);
  });
  it("honours maxwidth and maxheight", () => {
    const narrow = oembedResponse(`${BASE}/charts/view/${s}`, BASE, 400);
    expect(narrow?.width).toBeLessThanOrEqual(400);
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
});
