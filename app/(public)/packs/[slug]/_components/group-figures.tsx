import { SummaryValue } from "@/components/summary-value";
import { fmt, RESISTANCE_25C_SOURCE } from "@/lib/format";
import type { GroupFigures } from "@/lib/pack-summary";

/** Label vs measured, one row per like-for-like group: medians with n and spread. Groups are never pooled. */
export function GroupFiguresTable({
  groups,
  labelledC,
  ratedMah,
}: {
  groups: GroupFigures[];
  labelledC: number;
  ratedMah: number;
}) {
  if (groups.length === 0)
    return (
      <p className="muted">
        No published results yet. <a href="/submit">Submit one</a>.
      </p>
    );
  return (
    <div className="space-y-2">
      <p className="muted text-xs">
        Label: {fmt(labelledC)}C continuous, {fmt(ratedMah)} mAh. Each row is one like-for-like group; values are
        medians of its published results (n, and min–max underneath).
      </p>
      <div
        className="-mx-4 overflow-x-auto px-4"
        tabIndex={0}
        role="region"
        aria-label="Figures by like-for-like group"
      >
        <table className="w-full min-w-[60rem] border-collapse text-sm" data-testid="group-figures">
          <caption className="sr-only">Label against measured figures by like-for-like group</caption>
          <thead>
            <tr className="border-b border-ink/15 text-left align-bottom dark:border-night-line">
              <th scope="col" className="px-2 py-1 font-medium">
                Like-for-like group
              </th>
              <th scope="col" className="px-2 py-1 font-medium">
                Measured C <span className="muted font-normal">(sag-limited)</span>
              </th>
              <th scope="col" className="px-2 py-1 font-medium">
                Label ratio
              </th>
              <th scope="col" className="px-2 py-1 font-medium">
                Delivered
              </th>
              <th scope="col" className="px-2 py-1 font-medium">
                Capacity ratio
              </th>
              <th scope="col" className="px-2 py-1 font-medium">
                Hold voltage
              </th>
              <th scope="col" className="px-2 py-1 font-medium">
                DC resistance
              </th>
              <th scope="col" className="px-2 py-1 font-medium">
                At 25 °C <span className="muted font-normal">(estimate)</span>
              </th>
              <th scope="col" className="px-2 py-1 font-medium">
                Temp. rise
              </th>
              <th scope="col" className="px-2 py-1 font-medium">
                Sustained C
              </th>
            </tr>
          </thead>
          <tbody>
            {groups.map((g) => (
              <tr key={g.group.key} className="border-b border-ink/5 align-top dark:border-night-line/60">
                <th scope="row" className="min-w-[13rem] max-w-[18rem] px-2 py-2 text-left font-normal">
                  {g.group.label}
                  <span className="muted block text-xs">
                    {g.n} result{g.n === 1 ? "" : "s"}
                    {g.disputed ? `, ${g.disputed} disputed` : ""}
                  </span>
                </th>
                <td className="px-2 py-2">
                  <SummaryValue s={g.figures.sagLimitedC} digits={1} unit="C" />
                </td>
                <td className="px-2 py-2">
                  <SummaryValue s={g.figures.labelRatio} digits={2} />
                </td>
                <td className="px-2 py-2">
                  <SummaryValue s={g.figures.capacityMah} digits={0} unit="mAh" />
                </td>
                <td className="px-2 py-2">
                  <SummaryValue s={g.figures.capacityRatio} digits={2} />
                </td>
                <td className="px-2 py-2">
                  <SummaryValue s={g.figures.holdVoltagePerCellV} digits={3} unit="V/cell" />
                </td>
                <td className="px-2 py-2">
                  <SummaryValue s={g.figures.dcResistanceMohm} digits={1} unit="mΩ" />
                </td>
                <td className="px-2 py-2">
                  <SummaryValue s={g.figures.resistanceAt25CMohm} digits={1} unit="mΩ" />
                </td>
                <td className="px-2 py-2">
                  <SummaryValue s={g.figures.temperatureRiseC} digits={1} unit="°C" />
                </td>
                <td className="num px-2 py-2">
                  {g.sustainedC === null ? <span className="muted">—</span> : `${fmt(g.sustainedC, 1)}C`}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="muted text-xs">
        DC resistance is the pack&apos;s, as measured; &quot;at 25 °C&quot; is an estimate by {RESISTANCE_25C_SOURCE} —
        always read it beside the raw value. Definitions: <a href="/methods#figures">methods</a>.
      </p>
    </div>
  );
}
