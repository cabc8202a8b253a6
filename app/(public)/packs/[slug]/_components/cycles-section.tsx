import { LineFigure } from "@/components/charts/line-figure";
import { METHODS_ANCHORS, methodsHref } from "@/lib/figure-words";
import { fmt } from "@/lib/format";
import { PACK_PAGE_MAX_CYCLE_POINTS } from "@/lib/bounded-lists";
import { Qty, UnitSymbol } from "@/components/quantity";
import type { CycleSeries, OnePackSeries, PackAgeing } from "@/lib/pack-summary";

const pct = (x: number) => Math.round(x * 1000) / 10;

/** The fitted line from the first cycle to the last measured — or to the projection where the data supports it. */
function trendLine(
  t: { intercept: number; slopePerCycle: number } | null,
  firstX: number,
  lastX: number,
  cyclesTo80: number | null,
) {
  if (!t) return [];
  const to = cyclesTo80 !== null && cyclesTo80 > lastX ? cyclesTo80 : lastX;
  return [firstX, to].map((x) => ({ x, y: pct(t.intercept + t.slopePerCycle * x) }));
}

function projectionWords(cyclesTo80: number | null, extrapolated: boolean, note: string): string {
  if (cyclesTo80 === null) return note;
  return `80 % at about cycle ${fmt(cyclesTo80, 0)}${extrapolated ? " (projected past the cycles measured, within the range the data supports)" : ""}. ${note}`;
}

/** One physical pack: the discharges of one result's log against their cycle. */
function OnePack({ s }: { s: OnePackSeries }) {
  const r = s.retention;
  const first = r.points[0]?.cycle ?? 1;
  const last = r.points[r.points.length - 1]?.cycle ?? first;
  const t = r.trend;
  return (
    <div className="space-y-3" data-testid="ageing-one-pack">
      <h3 className="text-base">Capacity kept over the cycles of one pack</h3>
      <p className="text-sm">
        From the log of <a href={`/results/${s.resultId}`}>result #{s.resultId}</a>: {r.points.length} discharges of one
        physical pack to its cut-off, in one log ({s.groupLabel}). Kept ={" "}
        {r.reference === "rated" ? "capacity ÷ rated capacity" : "capacity ÷ the first cycle's capacity"}
        {t
          ? `; straight-line fit ${fmt(t.slopePerCycle * 100, 3)} % per cycle${t.r2 !== null ? `, r² ${fmt(t.r2, 2)}` : ""}`
          : ""}
        .{" "}
        <strong className="num" data-testid="cycles-to-80">
          {projectionWords(r.cyclesTo80, r.extrapolated, r.projectionNote)}
        </strong>
        {s.otherSeries > 0 ? (
          <span className="muted">
            {" "}
            ({s.otherSeries} other result{s.otherSeries === 1 ? "" : "s"} of this pack also hold several cycles.)
          </span>
        ) : null}{" "}
        <a href={methodsHref(METHODS_ANCHORS.discharges)}>How it is computed</a>.
      </p>
      <LineFigure
        id="pack-one-kept"
        title="Capacity kept over the cycles of one pack"
        xLabel="Cycle in the log"
        yLabel={r.reference === "rated" ? "Delivered ÷ rated capacity, %" : "Delivered ÷ first cycle, %"}
        xDigits={0}
        yDigits={1}
        tableCaption={`Capacity kept per cycle, result #${s.resultId}`}
        refLines={[{ y: 80, label: "80 %" }]}
        series={[
          {
            id: "kept",
            label: "measured",
            points: r.points.map((p) => ({ x: p.cycle, y: pct(p.retained) })),
            mode: "points",
          },
          ...(t
            ? [
                {
                  id: "fit",
                  label: "fitted line",
                  points: trendLine(t, first, last, r.cyclesTo80),
                  styleIndex: 1,
                },
              ]
            : []),
        ]}
      />
    </div>
  );
}

/** Fewer distinct cycle counts than this, and the results are listed instead of drawn: a chart of two cycle counts
 * only joins two points, and its fitted line is that join. */
const MIN_CYCLE_COUNTS_FOR_CHART = 3;

/** The results of the series as a table, for a series of too few cycle counts to draw. */
function AcrossResultsTable({ c, points, cells }: { c: CycleSeries; points: CycleSeries["points"]; cells: number }) {
  const rows = [...points].sort((a, b) => a.cycles - b.cycles || a.resultId - b.resultId);
  return (
    <div className="-mx-4 overflow-x-auto px-4">
      <table className="figs" data-testid="ageing-across-table">
        <caption className="sr-only">Results at different cycle counts</caption>
        <thead>
          <tr>
            <th scope="col">Result</th>
            <th scope="col">Cycles before the test (stated)</th>
            <th scope="col">Delivered ÷ rated capacity, %</th>
            <th scope="col">
              DC resistance, <UnitSymbol q="r" cells={cells} />
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((p) => (
            <tr key={p.resultId}>
              <th scope="row">
                <a href={`/results/${p.resultId}`}>#{p.resultId}</a>
              </th>
              <td className="num">{p.cycles}</td>
              <td className="num">{p.capacityMah === null ? "—" : fmt(pct(p.capacityMah / c.ratedCapacityMah), 1)}</td>
              <td className="num">
                <Qty
                  q="r"
                  v={p.dcResistanceMohm === null ? null : p.dcResistanceMohm / cells}
                  digits={2}
                  cells={cells}
                  bare
                />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** Results at different cycle counts: separate tests, possibly of different packs — said plainly. */
function AcrossResults({ c, cells }: { c: CycleSeries; cells: number }) {
  // A much-tested pack draws its newest results only (the fit and the projection use every one, as said).
  const drawnPoints = [...c.points].sort((a, b) => b.resultId - a.resultId).slice(0, PACK_PAGE_MAX_CYCLE_POINTS);
  const cut = drawnPoints.length < c.points.length;
  const retained = drawnPoints.flatMap((p) =>
    p.capacityMah === null ? [] : [{ x: p.cycles, y: pct(p.capacityMah / c.ratedCapacityMah) }],
  );
  const xs = c.points.map((p) => p.cycles);
  const resistance = drawnPoints.flatMap((p) =>
    p.dcResistanceMohm === null ? [] : [{ x: p.cycles, y: Math.round((p.dcResistanceMohm / cells) * 1000) / 1000 }],
  );
  const t = c.trend;
  const drawn = new Set(xs).size >= MIN_CYCLE_COUNTS_FOR_CHART;
  return (
    <div className="space-y-3" data-testid="ageing-across-results">
      <h3 className="text-base">Results at different cycle counts</h3>
      <p className="text-sm">
        Series: {c.label} (results alike except for pack age).{" "}
        <strong>Each {drawn ? "point" : "row"} is a separate test</strong>, possibly of a different physical pack of
        this model, at the cycle count its tester stated — not one pack&apos;s ageing.{" "}
        {drawn
          ? "The line through them is a hint, not a measurement"
          : "A straight line through them is a hint at most"}
        {t
          ? ` (straight-line fit, ${fmt(t.slopePerCycle * 100, 3)} % per cycle${t.r2 !== null ? `, r² ${fmt(t.r2, 2)}` : ""})`
          : ""}
        .{drawn ? " " : ` Only ${new Set(xs).size} cycle counts so far, so they are listed rather than drawn. `}
        <span className="muted">
          {projectionWords(c.projection.cyclesTo80, c.projection.extrapolated, c.projection.projectionNote)}
        </span>
        {cut ? (
          <span data-testid="ageing-across-cut">
            {" "}
            The newest {drawnPoints.length} of {c.points.length} results are {drawn ? "drawn" : "listed"}; the fitted
            line and the projection use all of them.
          </span>
        ) : null}
      </p>
      {drawn ? (
        <div className="grid gap-4 lg:grid-cols-2">
          <LineFigure
            id="pack-kept"
            title="Capacity of results at different cycle counts"
            xLabel="Cycles before the test (stated)"
            yLabel="Delivered ÷ rated capacity, %"
            xDigits={0}
            yDigits={1}
            tableCaption="Capacity of results at different cycle counts"
            refLines={[{ y: 80, label: "80 %" }]}
            series={[
              { id: "retained", label: "one result", points: retained, mode: "points" },
              ...(t
                ? [
                    {
                      id: "trend",
                      label: "fitted line",
                      points: trendLine(t, Math.min(...xs), Math.max(...xs), c.projection.cyclesTo80),
                      styleIndex: 1,
                    },
                  ]
                : []),
            ]}
          />
          <LineFigure
            id="pack-dcr"
            title="DC resistance of results at different cycle counts"
            xLabel="Cycles before the test (stated)"
            yLabel="DC resistance"
            yUnit="r"
            cells={cells}
            xDigits={0}
            yDigits={2}
            tableCaption="DC resistance of results at different cycle counts"
            series={[{ id: "r", label: "one result", points: resistance, mode: "points", styleIndex: 2 }]}
          />
        </div>
      ) : (
        <AcrossResultsTable c={c} points={drawnPoints} cells={cells} />
      )}
    </div>
  );
}

/** A pack's ageing figures: one pack's series from a multi-cycle log first; results across cycle counts beside it. */
export function CyclesSection({ ageing, cells }: { ageing: PackAgeing; cells: number }) {
  if (!ageing.onePack && !ageing.acrossResults)
    return (
      <p className="muted">
        No published log holds several cycles of this pack yet, and there are not enough results at different cycle
        counts (under the same method) to show a trend.
      </p>
    );
  return (
    <div className="space-y-8">
      {ageing.onePack ? (
        <OnePack s={ageing.onePack} />
      ) : (
        <p className="muted text-sm">
          No published log holds several cycles of one pack yet: a log of many cycles gives this pack&apos;s own ageing.
        </p>
      )}
      {ageing.acrossResults ? <AcrossResults c={ageing.acrossResults} cells={cells} /> : null}
    </div>
  );
}
