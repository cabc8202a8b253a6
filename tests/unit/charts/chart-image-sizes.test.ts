// Legibility of the chart image at every size: each text is measured with the real shipped font (resvg lays it
// out alone, in its place in the picture), so estimates in the layout cannot hide an overflow or a collision.
import { Resvg } from "@resvg/resvg-js";
import { describe, expect, it } from "vitest";
import type { ChartData } from "@/lib/open-data/chart-data";
import type { ChartSize } from "@/lib/open-data/chart-size";
import { chartSvgMarkup as renderChartSvg } from "@/components/charts/image/render";
import { chartFontFiles } from "@/server/open-data/font";

const labels = [
  "Ridgeway Pro 1300 4S 100C",
  "Tallow Racing 1500 6S",
  "Cinder 850 3S",
  "Northbank Sport 2200 4S 75C",
  "Quillon Max 1800 6S",
  "Fenwick 1000 4S",
  "Harrow Lite 650 2S",
  "Osprey Flux 1550 5S",
];
const base = (kind: ChartData["state"]["kind"]): ChartData => ({
  rating: "estimate",
  state: {
    v: 1,
    kind,
    group: "g",
    title: "How close makers come to their labels, in one like-for-like group of packs",
    note: "Medians of approved results; DC step resistance, 15–25 °C ambient, 3.3 V cut-off per cell, new packs.",
  },
  groupLabel: "DC step · 15–25 °C · 3.3 V/cell · 10–20C · new",
  counts: { packs: 9, results: 23 },
  leftOut: ["1 pack without a sag-limited C left out."],
});
const charts: Record<string, ChartData> = {
  "label-check": {
    ...base("label-check"),
    labelCheck: labels.map((label, i) => ({ id: `p${i}`, label, labelledC: 30 + i * 15, ratingC: 20 + i * 6, n: 3 })),
  },
  curves: {
    ...base("curves"),
    curves: labels.slice(0, 7).map((label, i) => ({
      label,
      points: Array.from({ length: 30 }, (_, j) => ({
        capacityPercent: j * 3.4,
        voltagePerCellV: 4.05 - i * 0.04 - j * 0.015,
      })),
    })),
  },
  "maker-ranking": {
    ...base("maker-ranking"),
    ranking: labels.map((l, i) => ({
      label: l.split(" ").slice(0, 2).join(" "),
      labelRatio: 0.35 + i * 0.11,
      packCount: 2 + i,
      resultCount: 3 + i,
    })),
  },
  empty: { ...base("label-check"), counts: { packs: 0, results: 0 } },
};
const sizes: ChartSize[] = [
  { width: 320, height: 400 },
  { width: 320, height: 300 },
  { width: 480, height: 400 },
  { width: 800, height: 500 },
  { width: 800, height: 320 },
  { width: 1600, height: 1000 },
];

type Measured = { text: string; fontSize: number; x0: number; y0: number; x1: number; y1: number };

const TEXT = /<text ([^>]*)>([^<]*)<\/text>/g;
/** The picture's own units: its viewBox, and how many pixels one of them is. */
function frame(svg: string) {
  const [, , w, h] = (/viewBox="([^"]+)"/.exec(svg)?.[1] ?? "").split(" ").map(Number);
  const width = Number(/ width="(\d+)"/.exec(svg)?.[1]);
  return { w: w ?? 0, h: h ?? 0, k: width / (w ?? 1) };
}

/** The font size each text is drawn at, by the text's offset in the markup: its own font-size or the nearest
 * enclosing element's (SVG inherits font-size, and a drawing sets it once on a group of tick values). */
function fontSizes(svg: string): Map<number, number> {
  const stack: (number | undefined)[] = [];
  const sizes = new Map<number, number>();
  for (const m of svg.matchAll(/<(\/?)([a-zA-Z]+)([^>]*?)(\/?)>/g)) {
    const [, closing, name, attrs = "", selfClosing] = m;
    if (closing) {
      stack.pop();
      continue;
    }
    const own = /font-size="([\d.]+)"/.exec(attrs)?.[1];
    const size = own !== undefined ? Number(own) : stack[stack.length - 1];
    if (name === "text") sizes.set(m.index, size ?? Number.NaN);
    if (!selfClosing) stack.push(size);
  }
  return sizes;
}

/** Each text alone in its place: the other texts and every shape removed, the nesting kept. */
function measureTexts(svg: string): Measured[] {
  const shapes = /<(path|circle|rect|line|use)\b[^>]*>(<\/\1>)?/g;
  const texts = [...svg.matchAll(TEXT)];
  const sizes = fontSizes(svg);
  return texts
    .map((m, i) => {
      let k = -1;
      const alone = svg.replace(TEXT, (t) => (++k === i ? t : "")).replace(shapes, "");
      const box = new Resvg(alone, {
        font: { fontFiles: chartFontFiles(), loadSystemFonts: false, defaultFontFamily: "Inter" },
      }).getBBox();
      if (!box) throw new Error(`nothing drawn for ${m[0]}`);
      const f = frame(svg);
      // getBBox answers in the picture's own units (its viewBox); the font size is turned into pixels.
      const fontSize = (sizes.get(m.index) ?? Number.NaN) * f.k;
      return { text: m[2] ?? "", fontSize, x0: box.x, y0: box.y, x1: box.x + box.width, y1: box.y + box.height };
    })
    .filter((t) => t.text.trim() !== "");
}

const overlap = (a: Measured, b: Measured) =>
  Math.min(a.x1, b.x1) - Math.max(a.x0, b.x0) > 0.5 && Math.min(a.y1, b.y1) - Math.max(a.y0, b.y0) > 0.5;

describe("chart SVG at the asked size", () => {
  it("has the asked width and height, and a viewBox of the same shape", () => {
    const svg = renderChartSvg(charts.curves as ChartData, { width: 480, height: 400 });
    expect(svg).toMatch(/^<svg [^>]*width="480" height="400"/);
    const f = frame(svg);
    expect(f.w / f.h).toBeCloseTo(480 / 400, 2);
    expect(renderChartSvg(charts.curves as ChartData)).toMatch(
      /^<svg [^>]*viewBox="0 0 800 500" width="800" height="500"/,
    );
  });

  for (const [kind, data] of Object.entries(charts)) {
    for (const size of sizes) {
      it(`${kind} at ${size.width} × ${size.height}: text at least 10 px, inside the picture, no two texts on top of each other`, () => {
        const svg = renderChartSvg(data, size);
        const texts = measureTexts(svg);
        const f = frame(svg);
        expect(texts.length).toBeGreaterThan(3);
        for (const t of texts) {
          expect(t.fontSize, t.text).toBeGreaterThanOrEqual(10);
          expect(t.x0, `${t.text} starts inside`).toBeGreaterThanOrEqual(0);
          expect(t.x1, `${t.text} ends inside`).toBeLessThanOrEqual(f.w);
          expect(t.y0, `${t.text} below the top`).toBeGreaterThanOrEqual(0);
          expect(t.y1, `${t.text} above the bottom`).toBeLessThanOrEqual(f.h);
        }
        for (let i = 0; i < texts.length; i++) {
          for (let j = i + 1; j < texts.length; j++) {
            const [a, b] = [texts[i] as Measured, texts[j] as Measured];
            expect(overlap(a, b), `"${a.text}" and "${b.text}" overlap`).toBe(false);
          }
        }
        // The licence and the source stay in every size (product rule), whole.
        const all = texts.map((t) => t.text).join(" ");
        expect(all).toContain("Source: Sagline");
        expect(all).toContain("Data: Sagline contributors, licensed CC BY 4.0");
      });
    }
  }

  it("scales markers and type with the width (common practice: keep marks readable on small screens)", () => {
    // The layout is drawn at a design size and scaled by the viewBox: one factor for type, markers and strokes.
    const marker = (svg: string) => Number(/<circle r="([\d.]+)" id="img-c\d"/.exec(svg)?.[1]) * frame(svg).k;
    const title = (svg: string) => Number(/font-size="([\d.]+)" font-weight="700"/.exec(svg)?.[1]) * frame(svg).k;
    const withMeets = {
      ...(charts["label-check"] as ChartData),
      labelCheck: [{ id: "m", label: "Meets", labelledC: 30, ratingC: 40, n: 2 }],
    };
    const narrow = renderChartSvg(withMeets, { width: 320, height: 400 });
    const wide = renderChartSvg(withMeets, { width: 1600, height: 1000 });
    expect(marker(narrow)).toBeGreaterThanOrEqual(4);
    expect(marker(wide)).toBeGreaterThan(marker(narrow));
    expect(title(wide)).toBeGreaterThan(title(narrow));
    expect(title(narrow)).toBeGreaterThanOrEqual(16);
  });
});
