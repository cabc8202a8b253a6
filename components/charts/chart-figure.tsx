// Every chart on a page sits in this frame, drawn on the server: a title, a skip link past the chart, the
// legend, the drawing, the same numbers as a table (hidden until "Show as table"), notes and the licence.
// The numbers are written once, in the table: points are described by their table row (aria-describedby), and
// tooltips and keyboard readings read the rows (chart-behaviour-client.tsx), so no figure travels twice.
import type { ReactNode } from "react";
import type { Quantity } from "@/lib/units";
import { UnitSymbol, unitValue } from "../quantity";
import type { MarkerShape } from "./palette";
import { MarkerSwatch } from "./draw/kit";

export type TableCell = string | { text: string; href?: string; u?: Quantity; v?: number; s?: number };
type TableRow = {
  /** Row id suffix: points of a drawing name their row `${id}-r${rowId}` in aria-describedby. */
  rowId?: string;
  /** For readings across a line chart: where on the x axis (percent of the plot width) the row reads. */
  xPct?: number;
  cells: TableCell[];
};
/** A column header; one with a quantity gets its unit symbol, and its whole column is converted for the
 * reader's units (components/units/apply-units.ts reads the numbers from the cells). */
type TableColumn = string | { label: string; u: Quantity; s?: number };
export type ChartTableData = { caption: string; columns: TableColumn[]; rows: TableRow[] };
export type LegendItem = {
  label: string;
  href?: string;
  color: string;
  shape?: MarkerShape;
  filled?: boolean;
  dash?: string;
  line?: boolean;
};

function Cell({ cell, first }: { cell: TableCell; first: boolean }) {
  const c = typeof cell === "string" ? { text: cell } : cell;
  const body = c.href ? <a href={c.href}>{c.text}</a> : c.text;
  const unit = c.u ? { "data-u": c.u, "data-v": c.v === undefined ? undefined : unitValue(c.v), "data-s": c.s } : {};
  return first ? (
    <th scope="row" {...unit}>
      {body}
    </th>
  ) : (
    <td {...unit}>{body}</td>
  );
}

function ChartTable({ id, table }: { id: string; table: ChartTableData }) {
  return (
    <table>
      <caption>{table.caption}</caption>
      <thead>
        <tr>
          {table.columns.map((c) =>
            typeof c === "string" ? (
              <th key={c} scope="col">
                {c}
              </th>
            ) : (
              <th key={c.label} scope="col" data-cu={c.u} data-s={c.s}>
                {c.label}, <UnitSymbol q={c.u} cells={c.s} />
              </th>
            ),
          )}
        </tr>
      </thead>
      <tbody>
        {table.rows.map((r, i) => (
          <tr key={r.rowId ?? i} id={r.rowId ? `${id}-r${r.rowId}` : undefined} data-x={r.xPct}>
            {r.cells.map((cell, j) => (
              <Cell key={j} cell={cell} first={j === 0} />
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export function ChartLegend({ items }: { items: LegendItem[] }) {
  return (
    <ul className="chart-legend" aria-label="Legend">
      {items.map((it) => (
        <li key={it.label}>
          <MarkerSwatch shape={it.shape} color={it.color} filled={it.filled} dash={it.dash} line={it.line} />
          {it.href ? <a href={it.href}>{it.label}</a> : it.label}
        </li>
      ))}
    </ul>
  );
}

export function ChartFigure({
  id,
  title,
  headingLevel = 3,
  legend,
  table,
  notes,
  children,
  empty,
}: {
  /** Unique in the page; the drawing's prefix. */
  id: string;
  title: string;
  headingLevel?: 2 | 3;
  legend?: ReactNode;
  table: ChartTableData;
  notes?: ReactNode;
  /** The drawing. */
  children: ReactNode;
  /** Said instead of the drawing when there is nothing to draw. */
  empty?: string;
}) {
  const H = headingLevel === 2 ? "h2" : "h3";
  return (
    <figure className="card chart" id={id} data-chart aria-labelledby={`${id}-t`}>
      <div className="chart-head">
        <H id={`${id}-t`}>{title}</H>
        {empty ? null : (
          <button type="button" className="btn-sm" data-chart-toggle aria-pressed="false" aria-controls={`${id}-tbl`}>
            Show as table
          </button>
        )}
      </div>
      {empty ? (
        <p className="muted py-10 text-center">{empty}</p>
      ) : (
        <>
          <a href={`#${id}-end`} className="skip-chart">
            Skip past the chart
          </a>
          {legend}
          <div className="chart-plot" data-chart-plot>
            {children}
            <div className="chart-tip" data-chart-tip role="status" hidden />
          </div>
          <div
            id={`${id}-tbl`}
            className="chart-table"
            data-chart-table
            hidden
            tabIndex={0}
            role="region"
            aria-label={`${title}: the data as a table`}
          >
            <ChartTable id={id} table={table} />
          </div>
        </>
      )}
      <figcaption className="muted space-y-1 text-xs">
        {notes}
        <p>Data: Sagline contributors, CC BY 4.0.</p>
      </figcaption>
      <span id={`${id}-end`} tabIndex={-1} />
    </figure>
  );
}
