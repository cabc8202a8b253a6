import { Qty } from "@/components/quantity";
import { RatingFigures } from "@/components/analysis/rating-figures";
import type { Figures } from "@/lib/analysis";
import { METHODS_ANCHORS, methodsHref } from "@/lib/figure-words";
import { fmt, RESISTANCE_25C_SOURCE } from "@/lib/format";

/** Time to cut-off in words: the time, "not reached", or "—" for results stored before reaching was recorded. */
function cutoffWords(f: Figures): string {
  if (f.timeToCutoffS !== null) return fmt(f.timeToCutoffS, 0, "s");
  return f.reachedCutoff === false ? "not reached" : fmt(null);
}

/** Every figure computed from the log (the headline discharge), with its unit; missing ones show "—". */
export function FiguresList({ f }: { f: Figures }) {
  const rows: [string, React.ReactNode, React.ReactNode?][] = [
    ["Delivered capacity", fmt(f.capacityMah, 0, "mAh")],
    ["Capacity ratio", fmt(f.capacityRatio, 2), "delivered ÷ rated"],
    ["Delivered energy", fmt(f.energyWh, 2, "Wh")],
    ["Mean voltage under load", `${fmt(f.meanVoltageV, 2, "V")} (${fmt(f.meanVoltagePerCellV, 3, "V/cell")})`],
    ["Minimum voltage", `${fmt(f.minVoltageV, 2, "V")} (${fmt(f.minVoltagePerCellV, 3, "V/cell")})`],
    ["Hold voltage", fmt(f.holdVoltagePerCellV, 3, "V/cell")],
    [
      "DC resistance",
      `${fmt(f.dcResistanceMohm, 1, "mΩ")} (${fmt(f.dcResistancePerCellMohm, 2, "mΩ/cell")})`,
      [
        f.dcResistanceMethod === "iec-61960-two-level"
          ? "IEC 61960-3 two-level"
          : f.dcResistanceMethod === "step"
            ? "rest→load step at 1 s"
            : "",
        f.dcResistanceIndicative ? "indicative only (see the warnings)" : "",
      ]
        .filter(Boolean)
        .join("; ") || undefined,
    ],
    [
      "DC resistance at 25 °C",
      fmt(f.resistanceAt25CMohm, 1, "mΩ"),
      <>
        estimate from <Qty q="temp" v={f.resistanceTemperatureC} digits={1} />: {RESISTANCE_25C_SOURCE}
      </>,
    ],
    [
      "Temperature rise",
      <Qty key="r" q="dtemp" v={f.temperatureRiseC} digits={1} />,
      <>
        <Qty q="temp" v={f.startTemperatureC} digits={1} /> → <Qty q="temp" v={f.peakTemperatureC} digits={1} />
      </>,
    ],
    ["Time to cut-off", cutoffWords(f)],
    [
      "Time to stop temperature",
      f.timeToStopTemperatureS === null ? "not reached" : fmt(f.timeToStopTemperatureS, 0, "s"),
    ],
    ["Specific energy", fmt(f.specificEnergyWhKg, 0, "Wh/kg")],
    ["Specific power", fmt(f.specificPowerWKg, 0, "W/kg")],
    [
      "Samples",
      `${fmt(f.samples)} over ${fmt(f.durationS, 0, "s")}`,
      f.sampleIntervalS === undefined || f.sampleIntervalS === null
        ? undefined
        : `median interval ${fmt(f.sampleIntervalS, 2, "s")}`,
    ],
  ];
  return (
    <div className="space-y-4">
      <dl className="grid grid-cols-1 gap-x-6 gap-y-2 text-sm sm:grid-cols-2">
        {rows.map(([k, v, note]) => (
          <div key={k}>
            <dt className="muted">{k}</dt>
            <dd className="num">
              {v}
              {note ? <span className="muted block font-sans text-xs">{note}</span> : null}
            </dd>
          </div>
        ))}
      </dl>
      <RatingFigures f={f} />
      {f.warnings.length > 0 ? (
        <div className="text-sm" data-testid="result-warnings">
          <p className="font-medium">Warnings from the analysis</p>
          <ul className="list-disc space-y-1 pl-5">
            {f.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
          <p className="muted text-xs">
            <a href={methodsHref(METHODS_ANCHORS.readings)}>What the warnings mean</a>
          </p>
        </div>
      ) : null}
    </div>
  );
}
