import { describe, expect, it } from "vitest";
import { PNG_DOWNLOADS, chartImagePath, imageSnippet, pngPixels } from "@/lib/open-data/chart-links";
import { parseChartImageSize } from "@/lib/open-data/chart-size";
import { encodeChartState, statePath, type ChartState } from "@/lib/open-data/chart-state";

const state: ChartState = { v: 1, kind: "label-check", group: "g1", title: `Packs "against" <labels> & more` };
const BASE = "https://sagline.example";
const sizeOf = (path: string) => {
  const out = parseChartImageSize(new URL(path, BASE).searchParams, path.includes("chart.png") ? "png" : "svg");
  return out.ok ? out.size : null;
};

describe("chart image links", () => {
  it("put the size in the query only when it is not the default", () => {
    const s = encodeChartState(state);
    expect(chartImagePath(state, "png")).toBe(`/charts/image/${s}/chart.png`);
    expect(chartImagePath(state, "png", { width: 400, scale: 3 })).toBe(
      `/charts/image/${s}/chart.png?width=400&scale=3`,
    );
    expect(chartImagePath(state, "svg", { width: 400 })).toBe(`/charts/image/${s}/chart.svg?width=400`);
  });

  it("offer PNG downloads whose stated pixel size is what their URL draws, each one allowed", () => {
    for (const d of PNG_DOWNLOADS) {
      const size = sizeOf(chartImagePath(state, "png", d));
      expect(size, d.label).not.toBeNull();
      expect({
        width: (size?.width ?? 0) * (size?.scale ?? 0),
        height: (size?.height ?? 0) * (size?.scale ?? 0),
      }).toEqual(pngPixels(d));
    }
    expect(pngPixels(PNG_DOWNLOADS[0])).toEqual({ width: 1600, height: 1000 }); // the old default download
  });

  it("give an image snippet with 1×–3× sources, a narrow-screen source, escaped text and every URL allowed", () => {
    const html = imageSnippet(state, BASE);
    expect(html).toContain(`<a href="${BASE}/charts/view/${statePath(encodeChartState(state))}">`);
    expect(html).toContain('<source media="(max-width: 559px)"');
    expect(html).toContain('width="800" height="500"');
    expect(html).toContain(
      'alt="Packs &quot;against&quot; &lt;labels&gt; &amp; more — chart by Sagline contributors (Sagline), licensed CC BY 4.0"',
    );
    const srcsets = [...html.matchAll(/srcset="([^"]+)"/g)].map((m) => (m[1] ?? "").split(", "));
    expect(srcsets).toHaveLength(2);
    for (const set of srcsets) {
      expect(set.map((c) => c.split(" ")[1])).toEqual(["1x", "2x", "3x"]);
      for (const c of set) expect(sizeOf((c.split(" ")[0] ?? "").replace(/&amp;/g, "&")), c).not.toBeNull();
    }
    expect(sizeOf(/src="([^"]+)"/.exec(html)?.[1]?.replace(/&amp;/g, "&") ?? "")).toEqual({
      width: 800,
      height: 500,
      scale: 1,
    });
  });
});
