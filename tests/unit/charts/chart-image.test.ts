import { describe, expect, it } from "vitest";
import { chartSvgMarkup as renderChartSvg } from "@/components/charts/image/render";
import type { ChartData } from "@/lib/open-data/chart-data";
import { escapeXml, wrapText } from "@/lib/open-data/chart-svg-kit";

const base = (kind: ChartData["state"]["kind"]): ChartData => ({
  rating: "estimate",
  state: { v: 1, kind, group: "g", title: "A <chart> & more", note: "Note" },
  groupLabel: "DC step · 15–25 °C",
  counts: { packs: 2, results: 3 },
  leftOut: ["1 pack without a sag-limited C left out."],
});

describe("chart image", () => {
  it("carries the licence and 'Source: Sagline' inside the drawing (product rule)", () => {
    const svg = renderChartSvg({
      ...base("label-check"),
      labelCheck: [{ id: "p", label: "P", labelledC: 50, ratingC: 30, n: 2 }],
    });
    expect(svg).toContain("Source: Sagline");
    expect(svg).toContain("CC BY 4.0");
    expect(svg).toContain("1 pack without a sag-limited C left out.");
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
  });
  it("names the rating it draws: the estimate as an estimate, the measured rating as measured", () => {
    const point = [{ id: "p", label: "P", labelledC: 50, ratingC: 30, n: 2 }];
    const estimate = renderChartSvg({ ...base("label-check"), labelCheck: point });
    expect(estimate).toContain("Sag-limited C, an estimate from resistance (C)");
    expect(estimate).not.toMatch(/Measured C/);
    const measured = renderChartSvg({ ...base("label-check"), rating: "measured", labelCheck: point });
    expect(measured).toContain("Sustained C, measured from the run (C)");
    expect(measured).toContain("held its label or more");
    expect(measured).not.toContain("an estimate");
    const ranking = renderChartSvg({
      ...base("maker-ranking"),
      rating: "measured",
      ranking: [{ label: "M", labelRatio: 0.8, packCount: 2, resultCount: 3 }],
    });
    expect(ranking).toMatch(/label ratio \(sustained C measured ÷ labelled C\)|label ratio \(measured\)/);
  });
  it("escapes text as XML", () => {
    const svg = renderChartSvg(base("maker-ranking"));
    expect(svg).toContain("A &lt;chart&gt; &amp; more");
    expect(svg).not.toContain("<chart>");
    expect(escapeXml(`"'`)).toBe("&quot;&apos;");
  });
  it("draws each kind", () => {
    // One line in compact relative steps (tenths of a percent across, pixels down): falling voltage goes right and down.
    expect(
      renderChartSvg({
        ...base("curves"),
        curves: [
          {
            label: "P",
            points: [
              { capacityPercent: 0, voltagePerCellV: 4.1 },
              { capacityPercent: 90, voltagePerCellV: 3.5 },
            ],
          },
        ],
      }),
    ).toMatch(/<path d="M\d+,\d+l\d+,\d+"/);
    expect(
      renderChartSvg({
        ...base("maker-ranking"),
        ranking: [{ label: "M", labelRatio: 0.7, packCount: 2, resultCount: 3 }],
      }),
    ).toContain("label met (1.0)");
    expect(renderChartSvg({ ...base("label-check"), counts: { packs: 0, results: 0 } })).toContain(
      "No approved results match this chart yet.",
    );
  });
  it("wraps long titles and marks cut text with an ellipsis", () => {
    const lines = wrapText("word ".repeat(100), 400, 20, 2);
    expect(lines).toHaveLength(2);
    expect(lines[1]?.endsWith("…")).toBe(true);
  });
});
