// What the measurement core made of a log: every discharge (and which one the headline figures describe),
// the figures with their units and links to their definitions on /methods, both ratings saying what they
// are, the warnings in words, the checks against the method card, and the curve (stacked panels).
import { LogFigure } from "@/components/charts/log-figure";
import type { CardCheck, CurvePoint, PublicFigures } from "@/lib/analysis";
import { prepareTimeCurve } from "@/lib/curves";
import { METHODS_ANCHORS, methodsHref, type MethodsAnchor } from "@/lib/figure-words";
import { fmt } from "@/lib/format";
import { DischargesTable } from "./discharges-table";
import { RatingFigures } from "./rating-figures";
import { RetentionSummary } from "./retention-summary";

type Row = { label: string; value: string; anchor: MethodsAnchor };
const A = METHODS_ANCHORS;

const RESISTANCE_METHOD: Record<string, string> = {
  "iec-61960-two-level": "IEC 61960-3 two-level",
  step: "rest→load step at 1 s",
};

function rows(f: PublicFigures): Row[] {
  const perCell = (x: number | null, digits: number) => (x === null ? "" : ` (${fmt(x, digits)} V per cell)`);
  return [
    { label: "Delivered capacity", value: fmt(f.capacityMah, 0, "mAh"), anchor: A.deliveredCapacity },
    { label: "Delivered energy", value: fmt(f.energyWh, 2, "Wh"), anchor: A.deliveredEnergy },
    {
      label: "Mean voltage under load",
      value: `${fmt(f.meanVoltageV, 2, "V")}${perCell(f.meanVoltagePerCellV, 3)}`,
      anchor: A.meanVoltage,
    },
    {
      label: "Minimum voltage",
      value: `${fmt(f.minVoltageV, 2, "V")}${perCell(f.minVoltagePerCellV, 3)}`,
      anchor: A.minimumVoltage,
    },
    {
      label: `Hold voltage (${f.parameters.holdDelayS} s)`,
      value: fmt(f.holdVoltagePerCellV, 3, "V per cell"),
      anchor: A.holdVoltage,
    },
    {
      label: "DC resistance",
      value:
        f.dcResistanceMohm === null
          ? fmt(null)
          : `${fmt(f.dcResistanceMohm, 1, "mΩ")} (${fmt(f.dcResistancePerCellMohm, 2, "mΩ per cell")}; ${RESISTANCE_METHOD[f.dcResistanceMethod ?? ""] ?? "no method"}${f.dcResistanceIndicative ? "; indicative only" : ""})`,
      anchor: A.dcResistance,
    },
    {
      label: "Resistance at 25 °C (estimate)",
      value:
        f.resistanceAt25CMohm === null
          ? fmt(null)
          : `${fmt(f.resistanceAt25CMohm, 1, "mΩ")} (measured at ${fmt(f.resistanceTemperatureC, 1, "°C")}; Ea ${f.parameters.activationEnergyKJPerMol} kJ/mol)`,
      anchor: A.resistanceAt25C,
    },
    { label: "Peak current", value: fmt(f.peakCurrentA, 1, "A"), anchor: A.peakCurrent },
    {
      label: "Temperature rise",
      value:
        f.temperatureRiseC === null
          ? fmt(null)
          : `${fmt(f.temperatureRiseC, 1, "°C")} (${fmt(f.startTemperatureC, 1)} → ${fmt(f.peakTemperatureC, 1, "°C")})`,
      anchor: A.temperatureRise,
    },
    { label: "Capacity ratio (delivered ÷ rated)", value: fmt(f.capacityRatio, 2), anchor: A.capacityRatio },
    { label: "Specific energy", value: fmt(f.specificEnergyWhKg, 0, "Wh/kg"), anchor: A.specificEnergy },
    {
      label: "Time to cut-off",
      value: f.reachedCutoff ? fmt(f.timeToCutoffS, 0, "s") : "not reached",
      anchor: A.timeToCutoff,
    },
    { label: "Sample interval (median)", value: fmt(f.sampleIntervalS, 2, "s"), anchor: A.sampleInterval },
  ];
}

const CELLS_SOURCE: Record<string, string> = {
  given: "as given",
  "cell-columns": "from the per-cell columns",
  "rest-voltage": "inferred from the rest voltage",
};

export function LogPreview({
  figures,
  curve,
  checks = [],
}: {
  figures: PublicFigures;
  curve: CurvePoint[];
  checks?: CardCheck[];
}) {
  return (
    <div className="space-y-5" data-testid="log-preview">
      <p className="muted num text-sm">
        {fmt(figures.samples)} samples over {fmt(figures.durationS, 0)} s ·{" "}
        {figures.cells === null
          ? "cells unknown"
          : `${figures.cells}S (${CELLS_SOURCE[figures.cellsSource ?? ""] ?? "unknown"})`}
        {figures.skippedLines > 0 ? ` · ${fmt(figures.skippedLines)} lines skipped` : ""}
      </p>
      {checks.length > 0 && (
        <div
          role="alert"
          className="rounded-md border border-warn/40 bg-warn-soft p-3 text-sm text-warn dark:bg-warn/15 dark:text-[#ffb4ab]"
        >
          <p className="font-medium">Checks against your method card</p>
          <ul className="mt-1 list-disc space-y-1 pl-5">
            {checks.map((c) => (
              <li key={c.code} data-check={c.code}>
                {c.message}
              </li>
            ))}
          </ul>
        </div>
      )}
      {figures.warnings.length > 0 && (
        <div className="rounded-md border border-charge-400/60 bg-charge-50 p-3 text-sm text-ink dark:border-charge-600 dark:bg-charge-700/20 dark:text-paper">
          <p className="font-medium">Warnings from the analysis</p>
          <ul className="mt-1 list-disc space-y-1 pl-5" data-testid="log-warnings">
            {figures.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </div>
      )}
      <DischargesTable discharges={figures.discharges} headline={figures.headlineDischarge} />
      <RetentionSummary retention={figures.retention} />
      <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-2" data-testid="log-figures">
        {rows(figures).map((r) => (
          <div key={r.label} className="flex flex-col border-b border-ink/10 pb-1 dark:border-night-line">
            <dt className="muted">
              <a
                href={methodsHref(r.anchor)}
                className="text-inherit underline decoration-dotted underline-offset-2 hover:text-cell-600 dark:hover:text-cell-400"
              >
                {r.label}
              </a>
            </dt>
            <dd className="num">{r.value}</dd>
          </div>
        ))}
      </dl>
      <RatingFigures f={figures} />
      <LogFigure
        id="log-preview-chart"
        title="Voltage, current and temperature over time"
        points={prepareTimeCurve(curve, figures.cells ?? 1, 300).map((q) => ({ s: q.s, v: q.vpc, a: q.a, t: q.tc }))}
        perCell={figures.cells !== null}
        cells={figures.cells ?? undefined}
        caption="The log"
      />
      <p className="muted text-xs">
        How each figure is computed: <a href="/methods">Methods</a>. Figures describe this log only; they are not a
        rating or a safety assessment of the pack.
      </p>
    </div>
  );
}
