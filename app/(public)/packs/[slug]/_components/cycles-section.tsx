import { LineFigure } from "@/components/charts/line-figure";
import { fmt } from "@/lib/format";
import type { CycleSeries } from "@/lib/pack-summary";

/** Capacity kept and resistance over cycles, with the fitted line and where it reaches 80 %. */
export function CyclesSection({ cycles, cells }: { cycles: CycleSeries | null; cells: number }) {
  if (!cycles)
    return (
      <p className="muted">Not enough results at different cycle counts (under the same method) to draw a trend yet.</p>
    );
  const retained = cycles.points
    .filter((p) => p.capacityMah !== null)
    .map((p) => ({ x: p.cycles, y: Math.round(((p.capacityMah as number) / cycles.ratedCapacityMah) * 1000) / 10 }));
  const t = cycles.trend;
  const lastX = Math.max(...cycles.points.map((p) => p.cycles));
  const trendTo = t?.cyclesTo80 && t.cyclesTo80 > 0 ? Math.min(t.cyclesTo80, lastX * 3) : lastX;
  const trendLine = t
    ? [0, trendTo].map((x) => ({ x, y: Math.round((t.intercept + t.slopePerCycle * x) * 1000) / 10 }))
    : [];
  const resistance = cycles.points
    .filter((p) => p.dcResistanceMohm !== null)
    .map((p) => ({ x: p.cycles, y: Math.round(((p.dcResistanceMohm as number) / cells) * 1000) / 1000 }));
  return (
    <div className="space-y-4">
      <p className="text-sm">
        Series: {cycles.label} (results alike except for pack age). Projected cycles to 80 % of rated capacity:{" "}
        <strong className="num" data-testid="cycles-to-80">
          {t?.cyclesTo80 != null && t.cyclesTo80 > 0 ? `about ${fmt(t.cyclesTo80, 0)}` : "—"}
        </strong>
        {t ? (
          <span className="muted">
            {" "}
            (straight-line fit, {fmt(t.slopePerCycle * 100, 3)} % per cycle{t.r2 !== null ? `, r² ${fmt(t.r2, 2)}` : ""}
            ; a projection, not a promise)
          </span>
        ) : null}
      </p>
      <div className="grid gap-4 lg:grid-cols-2">
        <LineFigure
          id="pack-kept"
          title="Capacity kept over cycles"
          xLabel="Cycles before the test"
          yLabel="Delivered ÷ rated capacity, %"
          xDigits={0}
          yDigits={1}
          tableCaption="Capacity kept over cycles"
          refLines={[{ y: 80, label: "80 %" }]}
          series={[
            { id: "retained", label: "measured", points: retained, mode: "points" },
            ...(trendLine.length ? [{ id: "trend", label: "fitted line", points: trendLine, styleIndex: 1 }] : []),
          ]}
        />
        <LineFigure
          id="pack-dcr"
          title="DC resistance over cycles"
          xLabel="Cycles before the test"
          yLabel="DC resistance"
          yUnit="r"
          cells={cells}
          xDigits={0}
          yDigits={2}
          tableCaption="DC resistance over cycles"
          series={[{ id: "r", label: "measured", points: resistance, mode: "points", styleIndex: 2 }]}
        />
      </div>
    </div>
  );
}
