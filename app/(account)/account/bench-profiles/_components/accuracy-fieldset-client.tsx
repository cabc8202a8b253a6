"use client";
// The bench profile's instrument accuracy: "± (% of reading + offset)" and the read-out's resolution for each
// channel, and the sampling interval. Every part is optional; a blank one is assumed from a stated default
// (lib/analysis/uncertainty/accuracy-classes.ts, from memory of common instruments) and named on result pages.
import type { FieldErrors, UseFormRegister } from "react-hook-form";
import { describedBy, Field, inputClass } from "@/components/ui/form";
import { ACCURACY_CLASSES, DEFAULT_ACCURACY_CLASS } from "@/lib/analysis/uncertainty";
import type { BenchProfileFormValues } from "@/lib/validations/bench-profile";

type AccuracyName = Extract<
  keyof BenchProfileFormValues,
  | "voltageAccuracyPct"
  | "voltageOffsetV"
  | "voltageResolutionV"
  | "currentAccuracyPct"
  | "currentOffsetA"
  | "currentResolutionA"
  | "temperatureAccuracyPct"
  | "temperatureOffsetC"
  | "temperatureResolutionC"
  | "samplingIntervalS"
>;

const fallback = ACCURACY_CLASSES[DEFAULT_ACCURACY_CLASS];
const d = fallback.accuracy;

const ROWS: { name: AccuracyName; label: string; assumed: string }[] = [
  { name: "voltageAccuracyPct", label: "Voltage: ± % of reading", assumed: `${d.voltage.percentOfReading} %` },
  { name: "voltageOffsetV", label: "Voltage: ± offset (V)", assumed: `${d.voltage.offsetV} V` },
  { name: "voltageResolutionV", label: "Voltage: resolution (V)", assumed: `${d.voltage.resolutionV} V` },
  { name: "currentAccuracyPct", label: "Current: ± % of reading", assumed: `${d.current.percentOfReading} %` },
  { name: "currentOffsetA", label: "Current: ± offset (A)", assumed: `${d.current.offsetA} A` },
  { name: "currentResolutionA", label: "Current: resolution (A)", assumed: `${d.current.resolutionA} A` },
  {
    name: "temperatureAccuracyPct",
    label: "Temperature: ± % of reading",
    assumed: `${d.temperature.percentOfReading} %`,
  },
  { name: "temperatureOffsetC", label: "Temperature: ± offset (°C)", assumed: `${d.temperature.offsetC} °C` },
  {
    name: "temperatureResolutionC",
    label: "Temperature: resolution (°C)",
    assumed: `${d.temperature.resolutionC} °C`,
  },
  { name: "samplingIntervalS", label: "Sampling interval (s)", assumed: `${d.samplingIntervalS} s` },
];

export function AccuracyFieldset(props: {
  register: UseFormRegister<BenchProfileFormValues>;
  errors: FieldErrors<BenchProfileFormValues>;
}) {
  return (
    <fieldset className="card grid gap-4 md:grid-cols-3">
      <legend className="px-1 text-base font-semibold">Instrument accuracy (all optional)</legend>
      <p className="muted text-sm md:col-span-3">
        As your instruments’ specification sheets state it: “± (% of reading + offset)” and the smallest step the
        read-out shows. Sagline uses it for the ± beside every figure (<a href="/methods#uncertainty">how</a>). Leave a
        part blank when you do not know it: the value shown is then assumed, for a {fallback.name} — Sagline’s
        assumption from memory of common instruments, not a maker’s specification — and result pages say so.
      </p>
      {ROWS.map((row) => {
        const error = props.errors[row.name]?.message;
        return (
          <Field key={row.name} id={row.name} label={row.label} error={error} hint={`Blank: ${row.assumed} assumed`}>
            <input
              id={row.name}
              type="text"
              inputMode="decimal"
              className={inputClass}
              {...describedBy(row.name, error, true)}
              {...props.register(row.name)}
            />
          </Field>
        );
      })}
    </fieldset>
  );
}
