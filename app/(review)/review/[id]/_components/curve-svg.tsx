// A plain server-rendered plot of the log's voltage per cell (and temperature) over time, so a moderator
// sees the curve's shape without a chart library.
type Point = { timeS: number; voltageV: number; temperatureC: number | null };

export function CurveSvg({ curve, cells }: { curve: Point[]; cells: number }) {
  if (curve.length < 2) return <p className="muted text-sm">No curve stored for this log.</p>;
  const w = 640,
    h = 220,
    pad = { l: 44, r: 44, t: 10, b: 28 };
  const t0 = curve[0]?.timeS ?? 0;
  const t1 = curve[curve.length - 1]?.timeS ?? 1;
  const vs = curve.map((p) => p.voltageV / cells);
  const vMin = Math.min(...vs),
    vMax = Math.max(...vs);
  const temps = curve.map((p) => p.temperatureC).filter((t): t is number => t !== null);
  const tMin = temps.length ? Math.min(...temps) : 0,
    tMax = temps.length ? Math.max(...temps) : 1;
  const x = (t: number) => pad.l + ((t - t0) / Math.max(1e-9, t1 - t0)) * (w - pad.l - pad.r);
  const yV = (v: number) => pad.t + (1 - (v - vMin) / Math.max(1e-9, vMax - vMin)) * (h - pad.t - pad.b);
  const yT = (c: number) => pad.t + (1 - (c - tMin) / Math.max(1e-9, tMax - tMin)) * (h - pad.t - pad.b);
  const vLine = curve.map((p) => `${x(p.timeS).toFixed(1)},${yV(p.voltageV / cells).toFixed(1)}`).join(" ");
  const tLine = curve
    .filter((p) => p.temperatureC !== null)
    .map((p) => `${x(p.timeS).toFixed(1)},${yT(p.temperatureC as number).toFixed(1)}`)
    .join(" ");
  return (
    <figure className="space-y-1">
      <svg
        viewBox={`0 0 ${w} ${h}`}
        className="h-auto w-full"
        role="img"
        aria-label="Voltage per cell and temperature over time"
      >
        <rect
          x={pad.l}
          y={pad.t}
          width={w - pad.l - pad.r}
          height={h - pad.t - pad.b}
          className="fill-none stroke-ink/15 dark:stroke-night-line"
        />
        <polyline points={vLine} fill="none" stroke="#0072B2" strokeWidth={2} />
        {tLine ? (
          <polyline points={tLine} fill="none" stroke="#D55E00" strokeWidth={1.5} strokeDasharray="4 3" />
        ) : null}
        <text x={4} y={pad.t + 10} fontSize={11} className="fill-current">
          {vMax.toFixed(2)} V
        </text>
        <text x={4} y={h - pad.b} fontSize={11} className="fill-current">
          {vMin.toFixed(2)} V
        </text>
        {temps.length ? (
          <text x={w - pad.r + 4} y={pad.t + 10} fontSize={11} className="fill-current">
            {tMax.toFixed(0)} °C
          </text>
        ) : null}
        {temps.length ? (
          <text x={w - pad.r + 4} y={h - pad.b} fontSize={11} className="fill-current">
            {tMin.toFixed(0)} °C
          </text>
        ) : null}
        <text x={pad.l} y={h - 8} fontSize={11} className="fill-current">
          0 s
        </text>
        <text x={w - pad.r} y={h - 8} fontSize={11} textAnchor="end" className="fill-current">
          {Math.round(t1 - t0)} s
        </text>
      </svg>
      <figcaption className="muted text-xs">
        Blue: voltage per cell under load. Orange dashed: pack temperature.
      </figcaption>
    </figure>
  );
}
