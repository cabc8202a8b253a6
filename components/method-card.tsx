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
    <dl
      className={`grid gap-x-4 gap-y-1 text-sm ${compact ? "grid-cols-[auto_1fr] sm:grid-cols-[auto_1fr_auto_1fr]" : "grid-cols-[auto_1fr]"}`}
    >
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="muted">{k}</dt>
          <dd className="num">{v}</dd>
        </div>
      ))}
    </dl>
  );
}
