// One chart drawing (issue 17): the page's chart and the image of the same data are drawn by the same
// components, so they encode each pack and each series alike — colour, marker shape, fill and dash.
// And the static markup writer used for images and fragments gives what React DOM itself renders.
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { LabelCheckFigure } from "@/components/charts/label-check-figure";
import { LineFigure } from "@/components/charts/line-figure";
import { curveSeries } from "@/components/charts/legends";
import { LogPanels } from "@/components/charts/draw/log-panels";
import { RankingPlot } from "@/components/charts/draw/ranking-plot";
import { toMarkup } from "@/components/charts/draw/markup";
import { chartSvgMarkup } from "@/components/charts/image/render";
import type { ChartData, CurveLine, LabelCheckPoint } from "@/lib/open-data/chart-data";

const points: LabelCheckPoint[] = [
  { id: "a-1300", label: "Alder 1300", labelledC: 75, ratingC: 82.4, n: 3 },
  { id: "b-1500", label: "Birch 1500", labelledC: 100, ratingC: 41.7, n: 5 },
  { id: "c-850", label: "Cedar 850", labelledC: 45, ratingC: 45, n: 1 },
  { id: "d-2200", label: "Dogwood 2200", labelledC: 120, ratingC: 58.2, n: 2 },
];
const curves: CurveLine[] = ["Alder 1300", "Birch 1500", "Cedar 850"].map((label, i) => ({
  label,
  points: Array.from({ length: 20 }, (_, j) => ({
    capacityPercent: j * 5,
    voltagePerCellV: 4.1 - i * 0.05 - j * 0.02,
  })),
}));
const data = (kind: ChartData["state"]["kind"], extra: Partial<ChartData>): ChartData => ({
  state: { v: 1, kind, group: "g", title: "T" },
  rating: "estimate",
  groupLabel: "DC step · 15–25 °C",
  counts: { packs: 4, results: 11 },
  leftOut: [],
  ...extra,
});

const SHAPES: Record<string, string> = {
  c: "circle",
  s: "square",
  t: "triangle",
  v: "triangle-down",
  d: "diamond",
  x: "cross",
};
/** Every marker in drawing order: the shape it uses, its fill and its stroke (a marker is a <use> of a shape
 * defined, coloured, once per style in the drawing's <defs>). */
const markers = (markup: string) => {
  const defs = new Map(
    [...markup.matchAll(/ id="([^"]+)" fill="([^"]+)" stroke="([^"]+)"/g)].map((m) => [m[1], `${m[2]} ${m[3]}`]),
  );
  return [...markup.matchAll(/<use href="#([^"]+-([cstvdx])(?:\d|[0-9A-F]{6})o?)"/g)].map(
    (m) => `${SHAPES[m[2] ?? ""]} ${defs.get(m[1] ?? "") ?? "undefined style"}`,
  );
};
/** Every line: its stroke and dash pattern (fill, width and join are set once on the lines' canvas). */
const lines = (markup: string) =>
  [...markup.matchAll(/<path d="M[^"]*" stroke="([^"]+)"(?: stroke-dasharray="([^"]+)")? vector-effect/g)].map(
    (m) => `${m[1]} ${m[2] ?? "solid"}`,
  );

describe("one chart drawing: the page and the image encode the data alike", () => {
  it("label check: each pack has the same marker, fill and colour on the page and in the image", () => {
    const page = renderToStaticMarkup(<LabelCheckFigure id="lc" points={points} groupLabel="DC step" />);
    const image = chartSvgMarkup(data("label-check", { labelCheck: points }));
    const onPage = markers(page);
    expect(onPage).toEqual(markers(image));
    // Blue filled circles reach their label, vermillion open down-triangles fall short (palette.ts).
    expect(onPage).toEqual([
      "circle #0072B2 #0072B2",
      "triangle-down none #D55E00",
      "circle #0072B2 #0072B2",
      "triangle-down none #D55E00",
    ]);
    // Not one teal dot for everything, as the hand-drawn image once had.
    expect(image).not.toContain("#146d63");
  });

  it("curves: each series has the same colour, dash and marker on the page and in the image", () => {
    const series = curveSeries(curves);
    const page = renderToStaticMarkup(
      <LineFigure id="cv" title="Curves" series={series} xLabel="x" yLabel="y" tableCaption="c" />,
    );
    const image = chartSvgMarkup(data("curves", { curves }));
    expect(lines(page)).toEqual(lines(image));
    expect(lines(page)).toEqual(["#0072B2 solid", "#E69F00 7 4", "#009E73 2 3"]);
    expect(markers(page)).toEqual(markers(image));
    expect(new Set(markers(page))).toEqual(
      new Set(["circle #0072B2 #0072B2", "square #E69F00 #E69F00", "triangle #009E73 #009E73"]),
    );
  });
});

describe("the static markup writer", () => {
  it("writes exactly what React DOM renders, for every drawing", () => {
    const trees = [
      <LabelCheckFigure key="a" id="lc" points={points} groupLabel="DC step · 15–25 °C & <more>" />,
      <LineFigure key="b" id="cv" title="Curves" series={curveSeries(curves)} xLabel="x" yLabel="y" tableCaption="c" />,
      <RankingPlot
        key="c"
        rating="measured"
        bars={[{ label: "Alder & Co", labelRatio: 0.8, packCount: 2, resultCount: 4 }]}
      />,
      <LogPanels
        key="d"
        points={Array.from({ length: 30 }, (_, i) => ({ s: i * 20, v: 4.1 - i * 0.02, a: 20, t: 25 + i * 0.5 }))}
        stopTemperatureC={60}
        interactive
        cells={4}
      />,
    ];
    for (const tree of trees) expect(toMarkup(tree)).toBe(renderToStaticMarkup(tree));
  });
});
