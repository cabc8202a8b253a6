"use client";
import { useId, useState } from "react";

export type ChartTable = { caption: string; columns: string[]; rows: (string | { text: string; href?: string })[][] };

/**
 * Every chart sits in this frame: a title, the chart or its data table ("Show as table"), notes, and the
 * licence. The table holds the same numbers the chart draws.
 */
export function ChartFrame({
  title,
  children,
  table,
  notes,
  legend,
  headingLevel = 3,
}: {
  title: string;
  children: React.ReactNode;
  table: ChartTable;
  notes?: React.ReactNode;
  legend?: React.ReactNode;
  headingLevel?: 2 | 3;
}) {
  const [asTable, setAsTable] = useState(false);
  const id = useId();
  const H = headingLevel === 2 ? "h2" : "h3";
  return (
    <figure className="card space-y-3" aria-labelledby={`${id}-title`}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <H id={`${id}-title`}>{title}</H>
        <button
          type="button"
          onClick={() => setAsTable((v) => !v)}
          aria-pressed={asTable}
          className="rounded border border-ink/20 px-2 py-1 text-sm hover:bg-paper-sunk dark:border-night-line dark:hover:bg-night-sunk"
        >
          {asTable ? "Show as chart" : "Show as table"}
        </button>
      </div>
      {legend && !asTable ? <div className="text-sm">{legend}</div> : null}
      {asTable ? (
        <div className="max-h-[28rem] overflow-auto" tabIndex={0} role="region" aria-label="Chart data as a table">
          <table className="w-full border-collapse text-sm">
            <caption className="muted pb-2 text-left text-xs">{table.caption}</caption>
            <thead>
              <tr>
                {table.columns.map((c) => (
                  <th
                    key={c}
                    scope="col"
                    className="sticky top-0 border-b border-ink/15 bg-paper-raised px-2 py-1 text-left font-medium dark:border-night-line dark:bg-night-raised"
                  >
                    {c}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {table.rows.map((row, i) => (
                <tr key={i} className="border-b border-ink/5 dark:border-night-line/60">
                  {row.map((cell, j) => {
                    const c = typeof cell === "string" ? { text: cell } : cell;
                    return (
                      <td key={j} className={`px-2 py-1 ${j > 0 ? "num" : ""}`}>
                        {c.href ? <a href={c.href}>{c.text}</a> : c.text}
                      </td>
                    );
                  })}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : (
        children
      )}
      <figcaption className="muted space-y-1 text-xs">
        {notes}
        <p>Data: Sagline contributors, CC BY 4.0.</p>
      </figcaption>
    </figure>
  );
}
