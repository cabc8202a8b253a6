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

const loadWords = (m: MethodCardData) =>
  `${loadModeLabels[m.loadMode].toLowerCase()}, ${fmt(m.loadCurrentA, 1, "A")} (${fmt(m.loadRateC, 1)}C)`;
const resistanceWords = (m: MethodCardData) =>
  RESISTANCE_METHODS[m.resistanceMethod as ResistanceMethod] ?? m.resistanceMethod;

/** The method attached to every number: how the result was taken. */
export function MethodCard({ m }: { m: MethodCardData }) {
  const rows: [string, React.ReactNode][] = [
    ["Ambient", <Qty key="a" q="temp" v={m.ambientTemperatureC} digits={1} />],
    ["Pack at start", <Qty key="p" q="temp" v={m.packStartTemperatureC} digits={1} />],
    ["Load", loadWords(m)],
    ["Cut-off", fmt(m.cutoffVPerCell, 2, "V per cell")],
    ["Stop temperature", <Qty key="s" q="temp" v={m.stopTemperatureC} digits={0} />],
    ["Resistance method", resistanceWords(m)],
    ["Cycles before test", String(m.cyclesBeforeTest)],
    ["Sample rate", fmt(m.sampleRateHz, 1, "Hz")],
    ["Equipment", m.equipment],
    ["Tested on", m.testedOn ?? "—"],
  ];
  return (
    // Terms muted, values in figures' type: set by .method-dl (globals.css), not on each of them.
    <dl className="method-dl">
      {rows.map(([k, v]) => (
        <Fragment key={k}>
          <dt>{k}</dt>
          <dd>{v}</dd>
        </Fragment>
      ))}
    </dl>
  );
}

/**
 * The same method in one line, for lists (a pack page's results): every condition that sets a result's figures,
 * with the equipment, sample rate and test date left to the result's own page and its full card.
 */
export function MethodLine({ m }: { m: MethodCardData }) {
  return (
    <p className="muted text-xs" data-testid="method-line">
      Method: <Qty q="temp" v={m.ambientTemperatureC} digits={1} /> ambient, pack at{" "}
      <Qty q="temp" v={m.packStartTemperatureC} digits={1} />; {loadWords(m)} to{" "}
      {fmt(m.cutoffVPerCell, 2, "V per cell")}, stop at <Qty q="temp" v={m.stopTemperatureC} digits={0} />; resistance:{" "}
      {resistanceWords(m)}; {m.cyclesBeforeTest} cycle
      {m.cyclesBeforeTest === 1 ? "" : "s"} before the test.
    </p>
  );
}
