// Axes and gridlines of the drawings that are only ever drawn on the server (line, label check and ranking plots:
// pages, embeds, images): @visx/axis and @visx/grid place and format the ticks, and their render props draw the
// kit's tick and row markup, x in percent of the width. Both render without hooks or state, so draw/markup.ts can
// walk them like React DOM does. The log panels, which /analyse also draws in the browser, place the same markup
// directly (kit.tsx PlainXAxis, PlainYGrid) so that page's script does not carry visx's axis code.
import { Axis } from "@visx/axis";
import { GridRows } from "@visx/grid";
import type { scaleLinear } from "@visx/scale";
import type { Quantity } from "@/lib/units";
import { AXIS_LOOK, GRID_LOOK, XBaseLine, XTick, XTitle, YGridRow } from "./kit";

/** A linear scale as the drawings make them (@visx/scale): x in percent of the width, y in pixels. */
type LinearScale = ReturnType<typeof scaleLinear<number>>;

/** Horizontal gridlines across the plot, their values in the gutter at the left. */
export function YGrid({
  ticks,
  y,
  format,
  unit,
  cells,
}: {
  ticks: number[];
  y: LinearScale;
  format: (v: number) => string;
  /** Marks the tick labels for the reader's units (data-u, converted in the browser). */
  unit?: Quantity;
  /** Cells in series, for per-cell ↔ per-pack conversion. */
  cells?: number;
}) {
  return (
    <GridRows scale={y} tickValues={ticks} width={0} className="chart-grid">
      {({ lines }) => (
        <g {...GRID_LOOK}>
          {lines.map(({ from, index }) => {
            const t = ticks[index] ?? 0;
            return <YGridRow key={t} y={from.y ?? 0} value={t} label={format(t)} unit={unit} cells={cells} />;
          })}
        </g>
      )}
    </GridRows>
  );
}

/** The x axis: a base line, ticks and their values under the plot, and the axis title centred below. */
export function XAxis({
  ticks,
  x,
  y,
  format,
  title,
}: {
  ticks: number[];
  x: LinearScale;
  y: number;
  format: (v: number) => string;
  title?: string;
}) {
  return (
    <Axis scale={x} tickValues={ticks} tickFormat={(v) => format(Number(v))} axisClassName="chart-axis">
      {({ ticks: placed }) => (
        <g {...AXIS_LOOK}>
          <XBaseLine y={y} />
          {placed.map(({ from, formattedValue, index }) => (
            <XTick key={ticks[index] ?? index} at={from.x} y={y} label={formattedValue ?? ""} />
          ))}
          <XTitle y={y} title={title} />
        </g>
      )}
    </Axis>
  );
}
