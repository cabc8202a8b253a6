import { Qty } from "@/components/quantity";
import { RatingFigures } from "@/components/analysis/rating-figures";
import type { Figures } from "@/lib/analysis";
import { METHODS_ANCHORS, methodsHref } from "@/lib/figure-words";
import { fmt, RESISTANCE_25C_SOURCE } from "@/lib/format";
import { PlusMinus } from "@/components/analysis/plus-minus";
import type { FigureU95 } from "@/lib/figure-u95";

/** Time to cut-off in words: the time, "not reached", or "—" for results stored before reaching was recorded. */
function cutoffWords(f: Figures): string {
  if (f.timeToCutoffS !== null) return fmt(f.timeToCutoffS, 0, "s");
  return f.reachedCutoff === false ? "not reached" : fmt(null);
}

/** Every figure computed from the log (the headline discharge), with its unit; missing ones show "—". */
export function FiguresList({ f, u95 }: { f: Figures; u95: FigureU95 }) {
  const rows: [string, React.ReactNode, React.ReactNode?][] = [
    ["Delivered capacity", <PlusMinus key="c" value={f.capacityMah} u95={u95.capacityMah} digits={0} unit="mAh" />],
    [
      "Capacity ratio",
      <PlusMinus key="cr" value={f.capacityRatio} u95={u95.capacityRatio} digits={2} />,
      "delivered ÷ rated",
    ],
    ["Delivered energy", <PlusMinus key="e" value={f.energyWh} u95={u95.energyWh} digits={2} unit="Wh" />],
    [
      "Mean voltage under load",
      <>
        <PlusMinus value={f.meanVoltagePerCellV} u95={u95.meanVoltagePerCellV} digits={3} unit="V/cell" /> (
        {fmt(f.meanVoltageV, 2, "V")})
      </>,
    ],
    ["Minimum voltage", `${fmt(f.minVoltageV, 2, "V")} (${fmt(f.minVoltagePerCellV, 3, "V/cell")})`],
    [
      "Hold voltage",
      <PlusMinus key="h" value={f.holdVoltagePerCellV} u95={u95.holdVoltagePerCellV} digits={3} unit="V/cell" />,
    ],
    [
      "DC resistance",
      <>
        <PlusMinus value={f.dcResistanceMohm} u95={u95.dcResistanceMohm} digits={1} unit="mΩ" /> (
        {fmt(f.dcResistancePerCellMohm, 2, "mΩ/cell")})
      </>,
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
      <PlusMinus key="r25" value={f.resistanceAt25CMohm} u95={u95.resistanceAt25CMohm} digits={1} unit="mΩ" />,
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
      <RatingFigures f={f} u95={u95} />
      <p className="muted text-xs" data-testid="plus-minus-note">
        ± is the expanded uncertainty (k = 2, about 95 %) from the instrument accuracy below: how sure each figure is,
        not a spread between packs. <a href={methodsHref(METHODS_ANCHORS.uncertainty)}>What the ± means</a>.
      </p>
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
