"use client";
// The column picker: the first rows of a log (read in the browser with previewLog), a labelled select above
// each column saying what it holds, the units, whether the log has a header row and which sign discharge
// current has — pre-filled by detection (or a bench profile's mapping). Native controls, so it works by
// keyboard and with a screen reader; problems are listed in words before the mapping can be used.
import { useId, useState } from "react";
import type { ColumnMapping, LogTablePreview } from "@/lib/analysis";
import {
  COLUMN_ROLE_LABELS,
  COLUMN_ROLES,
  dataRows,
  formFromMapping,
  headerFields,
  mappingFromForm,
  mappingProblems,
  setRole,
  type ColumnRole,
  type MappingForm,
  waitsForMapping,
} from "@/lib/column-mapping-form";

const control =
  "rounded border border-ink/20 bg-paper-raised px-1.5 py-1 text-sm dark:border-night-line dark:bg-night-sunk";

const UNIT_CHOICES = {
  timeUnit: [
    ["", "as the header says (else seconds)"],
    ["s", "seconds"],
    ["ms", "milliseconds"],
    ["min", "minutes"],
    ["h", "hours"],
  ],
  voltageUnit: [
    ["", "as the header says (else volts)"],
    ["V", "volts"],
    ["mV", "millivolts"],
  ],
  currentUnit: [
    ["", "as the header says (else amps)"],
    ["A", "amps"],
    ["mA", "milliamps"],
  ],
  temperatureUnit: [
    ["", "as the header says (else °C)"],
    ["C", "°C"],
    ["F", "°F"],
    ["K", "kelvin"],
  ],
} as const;
const UNIT_LABELS = {
  timeUnit: "Time unit",
  voltageUnit: "Voltage unit",
  currentUnit: "Current unit",
  temperatureUnit: "Temperature unit",
} as const;
type UnitKey = keyof typeof UNIT_CHOICES;
const UNIT_KEYS: UnitKey[] = ["timeUnit", "voltageUnit", "currentUnit", "temperatureUnit"];

function oneOf<T extends string>(values: readonly T[], v: string): T | "" {
  return values.find((x) => x === v) ?? "";
}

/** The form change for a unit select, narrowed to the units that select offers. */
function unitPatch(k: UnitKey, v: string): Partial<MappingForm> {
  switch (k) {
    case "timeUnit":
      return { timeUnit: oneOf(["s", "ms", "min", "h"] as const, v) };
    case "voltageUnit":
      return { voltageUnit: oneOf(["V", "mV"] as const, v) };
    case "currentUnit":
      return { currentUnit: oneOf(["A", "mA"] as const, v) };
    case "temperatureUnit":
      return { temperatureUnit: oneOf(["C", "F", "K"] as const, v) };
  }
}

export function ColumnMappingPicker({
  preview,
  initial,
  onApply,
  applyLabel,
  disabled = false,
}: {
  preview: LogTablePreview;
  initial: ColumnMapping | null;
  onApply: (mapping: ColumnMapping) => void;
  applyLabel: string;
  disabled?: boolean;
}) {
  const id = useId();
  const [form, setForm] = useState<MappingForm>(() => formFromMapping(initial ?? preview.detected, preview));
  const [tried, setTried] = useState(false);
  const header = headerFields(preview, form.hasHeader);
  const rows = dataRows(preview, form.hasHeader);
  const problems = mappingProblems(form);
  const set = (patch: Partial<MappingForm>) => setForm((f) => ({ ...f, ...patch }));

  return (
    <fieldset className="card min-w-0 space-y-3" data-testid="column-mapping">
      <legend className="px-1 text-sm font-semibold">Columns of this log</legend>
      <p className="muted text-xs">
        {waitsForMapping(preview)
          ? "The log has no header row, so Sagline could not name the columns by itself. Say what each column holds."
          : preview.problem
            ? `Sagline could not name the columns by itself: ${preview.problem}`
            : "Detected from the log; change anything that is wrong."}{" "}
        Columns are numbered from 1 here; the API counts from 0.
      </p>
      <label className="flex items-center gap-2 text-sm">
        <input
          type="checkbox"
          checked={form.hasHeader}
          onChange={(e) => set({ hasHeader: e.target.checked })}
          disabled={disabled}
        />
        The log has a header row naming its columns
      </label>
      <div className="-mx-1 overflow-x-auto px-1" tabIndex={0} role="region" aria-label="The first rows of the log">
        <table className="border-collapse text-xs">
          <caption className="sr-only">The first rows of the log, with what each column holds</caption>
          <thead>
            <tr>
              {form.roles.map((role, i) => (
                <th key={i} scope="col" className="px-1 pb-1 text-left align-bottom font-normal">
                  <label htmlFor={`${id}-col-${i}`} className="block">
                    <span className="font-medium">Column {i + 1}</span>
                    {header?.[i] ? <span className="muted block max-w-[9rem] truncate">“{header[i]}”</span> : null}
                  </label>
                  <select
                    id={`${id}-col-${i}`}
                    value={role}
                    disabled={disabled}
                    onChange={(e) => {
                      const next = COLUMN_ROLES.find((r) => r === e.target.value) ?? "ignore";
                      set({ roles: setRole(form.roles, i, next) });
                    }}
                    className={`${control} mt-1 w-full min-w-[8rem]`}
                    data-testid={`column-role-${i}`}
                  >
                    {COLUMN_ROLES.map((r: ColumnRole) => (
                      <option key={r} value={r}>
                        {COLUMN_ROLE_LABELS[r]}
                      </option>
                    ))}
                  </select>
                </th>
              ))}
            </tr>
          </thead>
          <tbody className="num">
            {rows.map((r) => (
              <tr key={r.line} className="border-t border-ink/10 dark:border-night-line">
                {form.roles.map((_, i) => (
                  <td key={i} className="px-1 py-0.5">
                    {r.fields[i] ?? ""}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="grid gap-2 sm:grid-cols-2">
        {UNIT_KEYS.map((k) => (
          <label key={k} className="flex flex-col text-sm">
            {UNIT_LABELS[k]}
            <select
              value={form[k]}
              disabled={disabled}
              onChange={(e) => set(unitPatch(k, e.target.value))}
              className={control}
            >
              {UNIT_CHOICES[k].map(([value, words]) => (
                <option key={value} value={value}>
                  {words}
                </option>
              ))}
            </select>
          </label>
        ))}
        <label className="flex flex-col text-sm">
          Discharge current is written as
          <select
            value={form.dischargeSign}
            disabled={disabled}
            onChange={(e) => {
              const v = e.target.value;
              set({ dischargeSign: v === "positive" || v === "negative" ? v : "" });
            }}
            className={control}
          >
            <option value="">detect from the data</option>
            <option value="positive">positive numbers</option>
            <option value="negative">negative numbers</option>
          </select>
        </label>
      </div>
      {tried && problems.length > 0 ? (
        <ul role="alert" className="list-disc pl-5 text-sm text-warn dark:text-[#ffb4ab]">
          {problems.map((p) => (
            <li key={p}>{p}</li>
          ))}
        </ul>
      ) : null}
      <button
        type="button"
        disabled={disabled}
        onClick={() => {
          setTried(true);
          if (problems.length === 0) onApply(mappingFromForm(form));
        }}
        className="rounded-md border border-ink/20 px-3 py-1.5 text-sm hover:bg-paper-sunk disabled:opacity-50 dark:border-night-line dark:hover:bg-night-sunk"
      >
        {applyLabel}
      </button>
    </fieldset>
  );
}
