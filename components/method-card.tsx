import { Fragment } from "react";
import { RESISTANCE_METHODS, type ResistanceMethod } from "@/lib/analysis";
import { Qty } from "@/components/quantity";
import { fmt } from "@/lib/format";
import { loadModeLabels } from "@/lib/labels";
import type { PublicResultRow } from "@/lib/pack-summary";

export type MethodCardData = Pick<
  PublicResultRow,
  | "ambientTemperatureC"
  | "packStartTemperatureC"
  | "loadMode"
  | "loadCurrentA"
  | "loadRateC"
  | "cutoffVPerCell"
  | "stopTemperatureC"
  | "resistanceMethod"
  | "equipment"
  | "sampleRateHz"
  | "cyclesBeforeTest"
  | "testedOn"
>;

/** The method attached to every number: how the result was taken. */
export function MethodCard({ m, compact = false }: { m: MethodCardData; compact?: boolean }) {
  const rows: [string, React.ReactNode][] = [
    ["Ambient", <Qty key="a" q="temp" v={m.ambientTemperatureC} digits={1} />],
    ["Pack at start", <Qty key="p" q="temp" v={m.packStartTemperatureC} digits={1} />],
    ["Load", `${loadModeLabels[m.loadMode].toLowerCase()}, ${fmt(m.loadCurrentA, 1, "A")} (${fmt(m.loadRateC, 1)}C)`],
    ["Cut-off", fmt(m.cutoffVPerCell, 2, "V per cell")],
    ["Stop temperature", <Qty key="s" q="temp" v={m.stopTemperatureC} digits={0} />],
    ["Resistance method", RESISTANCE_METHODS[m.resistanceMethod as ResistanceMethod] ?? m.resistanceMethod],
    ["Cycles before test", String(m.cyclesBeforeTest)],
  ];
  if (!compact)
    rows.push(
      ["Sample rate", fmt(m.sampleRateHz, 1, "Hz")],
      ["Equipment", m.equipment],
      ["Tested on", m.testedOn ?? "—"],
    );
  return (
    // Terms muted, values in figures' type: set by .method-dl (globals.css), not on each of them.
    <dl className={compact ? "method-dl method-dl-2" : "method-dl"}>
      {rows.map(([k, v]) => (
        <Fragment key={k}>
          <dt>{k}</dt>
          <dd>{v}</dd>
        </Fragment>
      ))}
    </dl>
  );
}
