// The server-only drawings place their axes and gridlines with @visx/axis and @visx/grid (draw/axes.tsx); the log
// panels, also drawn in the browser, place the same markup directly (kit.tsx). Inside their wrapping group the two
// give the same marks, values and positions — and the static writer gives what React DOM gives for the visx ones.
import { renderToStaticMarkup } from "react-dom/server";
import { scaleLinear } from "@visx/scale";
import { describe, expect, it } from "vitest";
import { XAxis, YGrid } from "@/components/charts/draw/axes";
import { PlainXAxis, PlainYGrid, fmtNum } from "@/components/charts/draw/kit";
import { toMarkup } from "@/components/charts/draw/markup";

/** The markup inside the outermost <g …>…</g>, and that group's class list. */
function inside(markup: string) {
  const m = /^<g([^>]*)>([\s\S]*)<\/g>$/.exec(markup);
  if (!m) throw new Error(`not one group: ${markup.slice(0, 80)}`);
  return { classes: (/class="([^"]*)"/.exec(m[1] ?? "")?.[1] ?? "").split(" "), body: m[2] ?? "" };
}

describe("visx axes draw what the plain placement draws", () => {
  const x = scaleLinear<number>({ domain: [0, 2000], range: [1, 99], nice: true });
  const y = scaleLinear<number>({ domain: [3.1, 4.25], range: [256, 34], nice: true });
  const xTicks = x.ticks(5);
  const yTicks = y.ticks(4);

  it("x axis: base line, ticks at percentages with anchors at the ends, values and title", () => {
    const props = { ticks: xTicks, y: 256, format: (v: number) => fmtNum(v, 0), title: "Time, s" };
    const visx = toMarkup(<XAxis x={x} {...props} />);
    expect(visx).toBe(renderToStaticMarkup(<XAxis x={x} {...props} />));
    const plain = toMarkup(<PlainXAxis x={x} {...props} />);
    expect(inside(visx).body).toBe(inside(plain).body);
    expect(inside(visx).classes).toContain("chart-axis");
    // The first tick sits at 1 % (anchored at its start), the last at 99 % (anchored at its end).
    expect(inside(visx).body).toMatch(/<text x="1%" y="272" text-anchor="start">0<\/text>/);
    // The values' size, colour and the middle anchor are set once on the axis' inner group and inherited.
    expect(inside(visx).body).toMatch(/^<g [^>]*font-size="11" text-anchor="middle">/);
    expect(inside(visx).body).toMatch(/<text x="99%"[^>]*text-anchor="end"[^>]*>2,000<\/text>/);
  });

  it("grid rows: one line and one value per tick, marked for the reader's units", () => {
    const props = { ticks: yTicks, format: (v: number) => fmtNum(v, 1), unit: "v" as const, cells: 4 };
    const visx = toMarkup(<YGrid y={y} {...props} />);
    expect(visx).toBe(renderToStaticMarkup(<YGrid y={y} {...props} />));
    const plain = toMarkup(<PlainYGrid y={y} {...props} />);
    expect(inside(visx).body).toBe(inside(plain).body);
    expect(inside(visx).classes).toContain("chart-grid");
    expect(inside(visx).body.match(/<line /g)).toHaveLength(yTicks.length);
    expect(inside(visx).body).toContain(`data-u="v" data-v="${yTicks[0]}" data-s="4"`);
  });
});
