// A log on a page — /analyse, review and result pages: stacked panels over one time axis (draw/log-panels.tsx,
// which the log images draw too), and the readings as a table the keyboard steps through.
import { fmt } from "@/lib/format";
import { ChartFigure, type ChartTableData } from "./chart-figure";
import { READING_STEPS } from "./draw/line-plot";
import { LogPanels, logTime, logX, type LogPoint } from "./draw/log-panels";

/** The reading nearest in time (logs are downsampled on the server: nearest, not interpolated). */
function nearest(points: LogPoint[], s: number): LogPoint | undefined {
  let best = points[0];
  for (const p of points) if (best && Math.abs(p.s - s) < Math.abs(best.s - s)) best = p;
  return best;
}

function logTable(points: LogPoint[], caption: string, perCell: boolean, cells?: number): ChartTableData {
  const x = logX(points);
  const time = logTime(points);
  const [d0, d1] = x.domain() as [number, number];
  const hasA = points.some((p) => p.a !== null);
  const hasT = points.some((p) => p.t !== null);
  return {
    caption: `${caption} (the reading nearest to ${READING_STEPS + 1} evenly spaced times)`,
    columns: [
      time.title,
      perCell ? { label: "Voltage", u: "v", s: cells } : "Pack voltage, V",
      ...(hasA ? ["Current, A"] : []),
      ...(hasT ? [{ label: "Pack temperature", u: "temp" as const }] : []),
    ],
    rows: Array.from({ length: READING_STEPS + 1 }, (_, i) => d0 + ((d1 - d0) * i) / READING_STEPS).flatMap((t) => {
      const p = nearest(points, t * time.div);
      if (!p) return [];
      return [
        {
          xPct: Math.round(x(t) * 100) / 100,
          cells: [
            fmt(t, time.div === 1 ? 0 : 1),
            fmt(p.v, perCell ? 3 : 2),
            ...(hasA ? [fmt(p.a, 2)] : []),
            ...(hasT ? [fmt(p.t, 1)] : []),
          ],
        },
      ];
    }),
  };
}

export function LogFigure({
  id,
  title = "Log",
  points,
  cells,
  perCell = true,
  stopTemperatureC,
  notes,
  caption,
  headingLevel,
}: {
  id: string;
  title?: string;
  points: LogPoint[];
  /** Cells in series (per-cell ↔ per-pack, lib/units.ts). */
  cells?: number;
  /** Whether `v` is per cell (else per pack). */
  perCell?: boolean;
  stopTemperatureC?: number | null;
  notes?: React.ReactNode;
  caption: string;
  headingLevel?: 2 | 3;
}) {
  return (
    <ChartFigure
      id={id}
      title={title}
      headingLevel={headingLevel}
      table={logTable(points, caption, perCell, perCell ? cells : undefined)}
      notes={notes}
      empty={points.length < 2 ? "No curve stored for this log." : undefined}
    >
      <LogPanels
        points={points}
        perCell={perCell}
        stopTemperatureC={stopTemperatureC}
        interactive
        cells={perCell ? cells : undefined}
      />
    </ChartFigure>
  );
}
