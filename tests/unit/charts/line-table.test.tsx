// A line chart's table reads its series where its x column says it does: a cycle axis from 0 to 1 (whole cycles)
// is read at 0 and 1 — not at 16 points written "0" or "1" with values read in between — and a long axis keeps
// 16 readings, each at the value written in its x cell.
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { LineFigure, readingSteps } from "@/components/charts/line-figure";
import type { LineSeries } from "@/components/charts/draw/line-plot";

/** The table's body rows: the x cell and the value cells, as written. */
const rows = (markup: string) =>
  [...markup.matchAll(/<tr data-x="[^"]*"><th scope="row">([^<]*)<\/th>((?:<td>[^<]*<\/td>)*)<\/tr>/g)].map((m) => [
    m[1],
    ...[...(m[2] ?? "").matchAll(/<td>([^<]*)<\/td>/g)].map((c) => c[1]),
  ]);

describe("line chart tables", () => {
  it("reads a short whole-number axis at each whole number", () => {
    const series: LineSeries[] = [
      {
        id: "r",
        label: "one result",
        mode: "points",
        points: [
          { x: 0, y: 91.3 },
          { x: 1, y: 92 },
        ],
      },
      {
        id: "f",
        label: "fitted line",
        points: [
          { x: 0, y: 91.3 },
          { x: 1, y: 92 },
        ],
      },
    ];
    const html = renderToStaticMarkup(
      <LineFigure id="k" title="Kept" series={series} xLabel="Cycles" yLabel="%" tableCaption="Kept" yDigits={1} />,
    );
    expect(html).toContain("read at 2 evenly spaced points");
    expect(rows(html)).toEqual([
      ["0", "91.3", "91.3"],
      ["1", "92.0", "92.0"],
    ]);
  });

  it("keeps 16 readings on a long axis, each read at the x it writes", () => {
    // A straight line y = x / 100: every reading equals its own x cell ÷ 100 exactly when read where it is written.
    const series: LineSeries[] = [
      {
        id: "a",
        label: "a",
        points: [
          { x: 0, y: 0 },
          { x: 1500, y: 15 },
        ],
      },
    ];
    const html = renderToStaticMarkup(
      <LineFigure id="c" title="Curve" series={series} xLabel="mAh" yLabel="V" tableCaption="Curve" yDigits={3} />,
    );
    const body = rows(html);
    expect(body).toHaveLength(16);
    // The axis is rounded outwards ("nice"), so readings past the data's end say "—".
    const read = body.filter(([, y]) => y !== "—");
    expect(read.length).toBeGreaterThanOrEqual(14);
    for (const [x, y] of read) expect(Number(y)).toBeCloseTo(Number((x ?? "").replace(/,/g, "")) / 100, 3);
  });

  it("counts the steps by the x values the axis can write", () => {
    expect(readingSteps(0, 1, 0)).toBe(1);
    expect(readingSteps(0, 10, 0)).toBe(10);
    expect(readingSteps(0, 1500, 0)).toBe(15);
    expect(readingSteps(0, 1, 1)).toBe(10);
    expect(readingSteps(5, 5, 0)).toBe(1);
  });
});
