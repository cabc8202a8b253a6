"use client";
// Step 4's summary: what is about to be sent — the pack (chosen or proposed), the method card, the log with
// its headline figures, the photos — each with a way back to its step.
import type { LogPreview } from "@/lib/analysis";
import { fmt } from "@/lib/format";
import { loadModeLabels, resistanceMethodLabels } from "@/lib/labels";
import type { LoadMode, ResistanceMethod } from "@/lib/enums";
import type { SubmitResultValues } from "@/lib/validations/result";
import type { PackFactsClient } from "./types";

type Props = {
  values: SubmitResultValues;
  facts: PackFactsClient | null;
  preview: LogPreview | null;
  onGo: (step: number) => void;
};

const isIn = <T extends string>(table: Record<T, string>, v: string): v is T => Object.hasOwn(table, v);
const num = (s: string) => (s.trim() === "" ? null : Number(s.replace(",", ".")));

export function SubmitSummary({ values, facts, preview, onGo }: Props) {
  const m = values.method;
  const load = isIn<LoadMode>(loadModeLabels, m.loadMode) ? loadModeLabels[m.loadMode] : "—";
  const resistance = isIn<ResistanceMethod>(resistanceMethodLabels, m.resistanceMethod)
    ? resistanceMethodLabels[m.resistanceMethod]
    : "—";
  const rows: [string, string, number][] = [
    [
      "Pack",
      facts
        ? `${facts.title} · ${facts.cells}S ${fmt(facts.ratedMah, 0, "mAh")} ${fmt(facts.labelledC, 0, "C")}${values.pack.mode === "new" ? " (new: you propose it)" : ""}`
        : "—",
      0,
    ],
    ["Load", `${load}, ${fmt(num(m.loadCurrentA), 1, "A")}`, 1],
    [
      "Cut-off, ambient, stop",
      `${fmt(num(m.cutoffVPerCell), 2, "V per cell")}, ${fmt(num(m.ambientTemperatureC), 1, "°C")}, ${fmt(num(m.stopTemperatureC), 0, "°C")}`,
      1,
    ],
    ["Resistance method", resistance, 1],
    ["Equipment", m.equipment.trim() || "—", 1],
    [
      "Log",
      values.log.filename
        ? `${values.log.filename}${preview ? ` · ${fmt(preview.figures.capacityMah, 0, "mAh")} delivered, DC resistance ${fmt(preview.figures.dcResistanceMohm, 1, "mΩ")}` : ""}`
        : "—",
      2,
    ],
    ["Label photos", values.photoKeys.length === 0 ? "none" : String(values.photoKeys.length), 3],
  ];
  return (
    <section className="space-y-2" aria-labelledby="summary-heading" data-testid="submit-summary">
      <h3 id="summary-heading">What you are about to send</h3>
      <dl className="divide-y divide-ink/10 rounded-md border border-ink/10 text-sm dark:divide-night-line dark:border-night-line">
        {rows.map(([k, v, step]) => (
          <div key={k} className="flex flex-wrap items-baseline gap-x-3 px-3 py-1.5">
            <dt className="muted w-44 shrink-0">{k}</dt>
            <dd className="num min-w-0 flex-1 break-words">{v}</dd>
            {step < 3 ? (
              <dd>
                <button
                  type="button"
                  className="text-sm underline"
                  onClick={() => onGo(step)}
                  aria-label={`Change: ${k}`}
                >
                  Change
                </button>
              </dd>
            ) : null}
          </div>
        ))}
      </dl>
      <p className="muted text-xs">
        Sagline computes the figures again from the stored log when you submit; the ones above are the preview.
      </p>
    </section>
  );
}
