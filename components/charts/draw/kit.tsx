// The pieces every drawing shares. A drawing's x positions are percentages of its own width and its y
// positions pixels, so one drawing fits a 320-pixel phone column and an 800-pixel image alike with its text at
// its true size: on a page the <svg> is 100% wide; in an image it is nested at a known width. Lines and areas
// live in a stretched inner <svg> (viewBox 0..1000 wide, preserveAspectRatio none) with non-scaling strokes;
// markers are <use> of shapes defined once per drawing, placed with percentage x. Hook-free: see markup.ts.
import { DEFAULT_UNITS, symbol, type Quantity } from "@/lib/units";
import { PALETTE_COLOURS, type MarkerShape } from "../palette";

/** A percentage as an attribute value, rounded to 0.01 %. */
export const pct = (v: number) => `${Math.round(v * 100) / 100}%`;
/** Pixels rounded to 0.1. */
export const px = (v: number) => Math.round(v * 10) / 10;

const MARKER_SIZE = 9;
/** Pixels left of a drawing for its y values and titles: a page gives the <svg> a margin of this much (the
 * .chart-svg class), an image nests it this far in; the drawing writes there with overflow visible. */
export const GUTTER = 44;
const TICK_FONT = 11;
const TITLE_FONT = 12;

/** Numbers as the site writes them: en-GB grouping, a fixed number of decimals. */
export function fmtNum(v: number, digits: number): string {
  return v.toLocaleString("en-GB", { minimumFractionDigits: digits, maximumFractionDigits: digits });
}

/** How many y ticks a plot of this height has room for (about one per 30 px, 2 to 5). */
export const yTickCount = (plotPx: number) => Math.max(2, Math.min(5, Math.floor(plotPx / 30)));

/**
 * Path data for a line on the stretched canvas: points as (x in percent, y in pixels), written as one absolute
 * move and then whole-unit relative steps (x in 0.1 % of the width, y in pixels) — the shortest text for a
 * line that is exact to a pixel. Each step is taken between rounded absolute points, so no error piles up.
 */
export function linePath(points: { xPct: number; y: number }[]): string {
  let out = "";
  let px0 = 0;
  let py0 = 0;
  points.forEach((p, k) => {
    const x = Math.round(p.xPct * 10);
    const y = Math.round(p.y);
    if (k === 0) out += `M${x},${y}`;
    else {
      const dx = x - px0;
      const dy = y - py0;
      out += `l${dx}${dy < 0 ? "" : ","}${dy}`;
    }
    px0 = x;
    py0 = y;
  });
  return out;
}

/** The fewest decimals (up to `max`) that write every tick exactly: 0.05 steps need 2, 0.2 steps 1. */
export function tickDigits(ticks: number[], max = 3): number {
  for (let d = 0; d < max; d++)
    if (ticks.every((t) => Math.abs(t * 10 ** d - Math.round(t * 10 ** d)) < 1e-6)) return d;
  return max;
}

/** A shape centred on (0, 0), `size` roughly its diameter. */
function shapePath(shape: MarkerShape, size = MARKER_SIZE): string {
  const r = size / 2;
  const f = (v: number) => px(v);
  switch (shape) {
    case "square":
      return `M${f(-r * 0.85)},${f(-r * 0.85)}h${f(r * 1.7)}v${f(r * 1.7)}h${f(-r * 1.7)}Z`;
    case "triangle":
      return `M0,${f(-r * 1.1)}L${f(r)},${f(r * 0.75)}L${f(-r)},${f(r * 0.75)}Z`;
    case "triangle-down":
      return `M0,${f(r * 1.1)}L${f(r)},${f(-r * 0.75)}L${f(-r)},${f(-r * 0.75)}Z`;
    case "diamond":
      return `M0,${f(-r * 1.15)}L${f(r)},0L0,${f(r * 1.15)}L${f(-r)},0Z`;
    case "cross":
      return `M${f(-r)},${f(-r)}L${f(r)},${f(r)}M${f(r)},${f(-r)}L${f(-r)},${f(r)}`;
    default:
      return "";
  }
}

/** The shape as an element centred on (0, 0): a <circle> for circles, a <path> otherwise. */
export function Shape({ shape, ...rest }: { shape: MarkerShape } & React.SVGProps<SVGPathElement & SVGCircleElement>) {
  return shape === "circle" ? <circle r={MARKER_SIZE / 2} {...rest} /> : <path d={shapePath(shape)} {...rest} />;
}

/** Short codes of the shapes, for the ids markers refer to (markup is sent for every point). */
const SHAPE_CODE: Record<MarkerShape, string> = {
  circle: "c",
  square: "s",
  triangle: "t",
  "triangle-down": "v",
  diamond: "d",
  cross: "x",
};

/** A marker's look: its shape, colour and whether it is filled (open shapes are outlined, crosses always strokes). */
export type MarkStyle = { shape: MarkerShape; color: string; filled?: boolean };

/** The id of a marker style's shape in a drawing's <defs>: shape code, colour (its place in the palette, or its
 * hex digits) and "o" when open. */
export function markerId(prefix: string, m: MarkStyle): string {
  const k = PALETTE_COLOURS.indexOf(m.color);
  return `${prefix}-${SHAPE_CODE[m.shape]}${k >= 0 ? k : m.color.replace("#", "")}${m.filled === false ? "o" : ""}`;
}

/**
 * One shape element per marker style a drawing uses, coloured in its definition, so each marker is a bare
 * <use> with its position only (markup is sent for every point: a chart of 60 packs or 7 curves × 8 markers
 * would otherwise repeat its fill and stroke on each).
 */
export function MarkerDefs({ prefix, marks }: { prefix: string; marks: MarkStyle[] }) {
  const seen = new Map<string, MarkStyle>();
  for (const m of marks) seen.set(markerId(prefix, m), m);
  return (
    <defs>
      {[...seen].map(([id, m]) => (
        <Shape
          key={id}
          shape={m.shape}
          id={id}
          fill={m.filled !== false && m.shape !== "cross" ? m.color : "none"}
          stroke={m.color}
          strokeWidth={m.shape === "cross" ? 2 : 1.5}
        />
      ))}
    </defs>
  );
}

/** A marker at (x %, y px), of a style listed in the drawing's MarkerDefs. */
export function MarkerUse({ prefix, mark, xPct, y }: { prefix: string; mark: MarkStyle; xPct: number; y: number }) {
  return <use href={`#${markerId(prefix, mark)}`} x={pct(xPct)} y={px(y)} />;
}

/** A small stand-alone marker (legends, tooltips), drawn in its own box. */
export function MarkerSwatch({
  shape,
  color,
  filled = true,
  dash,
  line = false,
}: {
  shape?: MarkerShape;
  color: string;
  filled?: boolean;
  dash?: string;
  line?: boolean;
}) {
  const w = line ? 30 : 14;
  return (
    <svg width={w} height={14} viewBox={`0 0 ${w} 14`} aria-hidden="true" className="chart-swatch">
      {line ? <line x1={0} y1={7} x2={w} y2={7} stroke={color} strokeWidth={2} strokeDasharray={dash} /> : null}
      {shape ? (
        <Shape
          shape={shape}
          transform={`translate(${w / 2} 7)`}
          fill={filled && shape !== "cross" ? color : "none"}
          stroke={color}
          strokeWidth={shape === "cross" ? 2 : 1.5}
        />
      ) : null}
    </svg>
  );
}

/** One gridline across the plot at `y` pixels, its value in the gutter at the left (inside a group with GRID_LOOK). */
export function YGridRow({
  y,
  value,
  label,
  unit,
  cells,
}: {
  y: number;
  value: number;
  label: string;
  /** Marks the tick label for the reader's units (data-u, converted in the browser). */
  unit?: Quantity;
  /** Cells in series, for per-cell ↔ per-pack conversion. */
  cells?: number;
}) {
  return (
    <>
      <line x1="0%" x2="100%" y1={px(y)} y2={px(y)} stroke="currentColor" />
      <text x={-6} y={px(y + 4)} data-u={unit} data-v={unit ? value : undefined} data-s={unit ? cells : undefined}>
        {label}
      </text>
    </>
  );
}

/** What every gridline and y value shares, set once on the grid's group (SVG presentation attributes are
 * inherited): the rows carry only their positions. */
export const GRID_LOOK = {
  strokeOpacity: 0.14,
  fill: "currentColor",
  fillOpacity: 0.8,
  fontSize: TICK_FONT,
  textAnchor: "end",
} as const;

/** What the x axis' marks and values share, set once on the axis' group (see GRID_LOOK). */
export const AXIS_LOOK = {
  strokeOpacity: 0.5,
  fill: "currentColor",
  fillOpacity: 0.8,
  fontSize: TICK_FONT,
  textAnchor: "middle",
} as const;

/** One x tick at `at` percent of the width on the base line at `y` pixels: its mark and its value below. */
export function XTick({ at, y, label }: { at: number; y: number; label: string }) {
  const anchor = at < 4 ? "start" : at > 96 ? "end" : undefined;
  return (
    <>
      <line x1={pct(at)} x2={pct(at)} y1={px(y)} y2={px(y + 4)} stroke="currentColor" />
      <text x={pct(at)} y={px(y + 16)} textAnchor={anchor}>
        {label}
      </text>
    </>
  );
}

/** The x axis' base line across the plot at `y` pixels. */
export function XBaseLine({ y }: { y: number }) {
  return <line x1="0%" x2="100%" y1={px(y)} y2={px(y)} stroke="currentColor" />;
}

/** The x axis' title, centred below its values (full opacity, the title size). */
export function XTitle({ y, title }: { y: number; title?: string }) {
  return title ? (
    <text x="50%" y={px(y + 34)} fontSize={TITLE_FONT} fillOpacity={1}>
      {title}
    </text>
  ) : null;
}

/**
 * Gridlines placed directly, for the drawing that also runs in the browser (the log panels, drawn on /analyse
 * after an analysis): the server-only drawings place the same rows with @visx/grid (axes.tsx), which would add
 * its code to that page's script.
 */
export function PlainYGrid({
  ticks,
  y,
  format,
  unit,
  cells,
}: {
  ticks: number[];
  y: (v: number) => number;
  format: (v: number) => string;
  unit?: Quantity;
  cells?: number;
}) {
  return (
    <g className="chart-grid">
      <g {...GRID_LOOK}>
        {ticks.map((t) => (
          <YGridRow key={t} y={y(t)} value={t} label={format(t)} unit={unit} cells={cells} />
        ))}
      </g>
    </g>
  );
}

/** The x axis placed directly, for the log panels (see PlainYGrid); the others use @visx/axis (axes.tsx). */
export function PlainXAxis({
  ticks,
  x,
  y,
  format,
  title,
}: {
  ticks: number[];
  x: (v: number) => number;
  y: number;
  format: (v: number) => string;
  title?: string;
}) {
  return (
    <g className="chart-axis">
      <g {...AXIS_LOOK}>
        <XBaseLine y={y} />
        {ticks.map((t) => (
          <XTick key={t} at={x(t)} y={y} label={format(t)} />
        ))}
        <XTitle y={y} title={title} />
      </g>
    </g>
  );
}

/** A unit symbol inside an SVG text, marked for the reader's units (components/units/apply-units.ts). */
export function UnitTspan({ q, cells }: { q: Quantity; cells?: number }) {
  return (
    <tspan data-usym={q} data-s={cells}>
      {symbol(q, DEFAULT_UNITS, cells)}
    </tspan>
  );
}

/** A y-axis title written across the top left of a plot or panel (phones have no room for a turned title). */
export function YTitle({ y, children }: { y: number; children: React.ReactNode }) {
  return (
    <text x={-GUTTER} y={px(y)} fontSize={TITLE_FONT} fontWeight={600} fill="currentColor">
      {children}
    </text>
  );
}
