// The label check draws a pack's 95 % median interval (order statistics, lib/analysis/uncertainty) as an error
// bar behind its marker, in the marker's colour, on the page and in the static markup alike; packs without an
// interval get none, and the table names the interval beside the median.
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { LabelCheckFigure } from "@/components/charts/label-check-figure";
import { LabelCheckPlot } from "@/components/charts/draw/label-check-plot";
import { toMarkup } from "@/components/charts/draw/markup";
import { MEETS_STYLE, SHORT_STYLE } from "@/components/charts/palette";
import type { LabelCheckPoint } from "@/lib/open-data/chart-data";

const points: LabelCheckPoint[] = [
  { id: "a-1300", label: "Alder 1300", labelledC: 75, ratingC: 82.4, n: 7, lowC: 78.1, highC: 90.2 },
  { id: "b-1500", label: "Birch 1500", labelledC: 100, ratingC: 41.7, n: 6, lowC: 38, highC: 44.5 },
  { id: "c-850", label: "Cedar 850", labelledC: 45, ratingC: 45, n: 2 },
];

/** Every error bar, with the stroke of the group that draws it (bars are grouped by colour). */
function bars(html: string) {
  return [
    ...html.matchAll(/<g stroke="([^"]+)" stroke-width="1.5">((?:<line[^>]*data-error-bar[^>]*><\/line>)*)<\/g>/g),
  ].flatMap((g) =>
    [...(g[2] ?? "").matchAll(/<line[^>]*>/g)].map((m) => {
      const attr = (name: string) => new RegExp(`${name}="([^"]*)"`).exec(m[0])?.[1] ?? "";
      return { y1: parseFloat(attr("y1")), y2: parseFloat(attr("y2")), stroke: g[1] ?? "", x: attr("x1") };
    }),
  );
}

describe("label check error bars", () => {
  it("draws one bar per pack with an interval, low below high, in the marker's colour", () => {
    const html = renderToStaticMarkup(<LabelCheckPlot prefix="t" points={points} rating="estimate" />);
    const found = bars(html);
    expect(found).toHaveLength(2);
    expect(html.match(/data-error-bar/g)).toHaveLength(2);
    for (const b of found) expect(b.y1).toBeGreaterThan(b.y2); // SVG y grows downwards: the low end is lower
    expect(found[0]?.stroke).toBe(MEETS_STYLE.color);
    expect(found[1]?.stroke).toBe(SHORT_STYLE.color);
    expect(toMarkup(<LabelCheckPlot prefix="t" points={points} rating="estimate" />)).toContain("data-error-bar");
  });

  it("names the interval in the table and says what the bars are", () => {
    const html = renderToStaticMarkup(<LabelCheckFigure id="lc" points={points} groupLabel="DC step" />);
    expect(html).toContain("82.4C (95 %: 78.1C–90.2C)");
    expect(html).toContain("A vertical bar spans the 95 % interval");
  });
});
