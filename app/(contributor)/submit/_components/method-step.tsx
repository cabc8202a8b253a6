"use client";
// Step 2: the method card, prefilled from a bench profile. Every number shows its unit and bounds.
import { describedBy, Field, inputClass } from "@/components/ui/form";
import { loadModes, resistanceMethods } from "@/lib/enums";
import { fmt } from "@/lib/format";
import { loadModeLabels, resistanceMethodLabels } from "@/lib/labels";
import type { MethodCardValues } from "@/lib/validations/result";
import type { BenchProfileOption, SubmitFormApi } from "./types";

type Props = { form: SubmitFormApi; profiles: BenchProfileOption[]; ratedMah: number | null; idPrefix?: string };
type NumberField =
  | "ambientTemperatureC"
  | "packStartTemperatureC"
  | "loadCurrentA"
  | "cutoffVPerCell"
  | "stopTemperatureC"
  | "sampleRateHz"
  | "cyclesBeforeTest";

const NUMBERS: { name: NumberField; label: string; unit: string; hint: string; optional?: boolean }[] = [
  { name: "ambientTemperatureC", label: "Ambient temperature", unit: "°C", hint: "Air around the pack, −20 to 60 °C." },
  {
    name: "packStartTemperatureC",
    label: "Pack temperature at the start",
    unit: "°C",
    optional: true,
    hint: "Used for the 25 °C resistance estimate when the log has no temperature.",
  },
  {
    name: "loadCurrentA",
    label: "Load current",
    unit: "A",
    hint: "The main discharge current, above 0 A (for constant power or resistance: its mean).",
  },
  {
    name: "cutoffVPerCell",
    label: "Cut-off voltage",
    unit: "V/cell",
    hint: "Where the discharge stopped, 2.5 to 4.2 V per cell.",
  },
  {
    name: "stopTemperatureC",
    label: "Stop temperature",
    unit: "°C",
    hint: "You end a test when the pack reaches it; at most 80 °C.",
  },
  { name: "sampleRateHz", label: "Sample rate", unit: "Hz", optional: true, hint: "Samples per second in the log." },
  { name: "cyclesBeforeTest", label: "Cycles before this test", unit: "cycles", hint: "0 for a new pack." },
];

const PROFILE_FIELDS = [
  "benchProfileId",
  "equipment",
  "resistanceMethod",
  "ambientTemperatureC",
  "loadMode",
  "cutoffVPerCell",
  "stopTemperatureC",
  "sampleRateHz",
] as const;

/** The method-card values a bench profile fills in (only what it holds). */
export function methodFromProfile(p: BenchProfileOption): Partial<MethodCardValues> {
  const s = (n: number | null) => (n === null ? undefined : String(n));
  const out: Partial<MethodCardValues> = {
    benchProfileId: String(p.id),
    equipment: p.equipment,
    resistanceMethod: p.resistanceMethod,
  };
  if (p.defaultAmbientC !== null) out.ambientTemperatureC = s(p.defaultAmbientC);
  if (p.defaultLoadMode !== null) out.loadMode = p.defaultLoadMode;
  if (p.defaultCutoffVPerCell !== null) out.cutoffVPerCell = s(p.defaultCutoffVPerCell);
  if (p.defaultStopTemperatureC !== null) out.stopTemperatureC = s(p.defaultStopTemperatureC);
  if (p.defaultSampleRateHz !== null) out.sampleRateHz = s(p.defaultSampleRateHz);
  return out;
}

export function MethodStep({ form, profiles, ratedMah, idPrefix = "method" }: Props) {
  const {
    register,
    setValue,
    watch,
    formState: { errors },
  } = form;
  const me = errors.method;
  const current = Number(String(watch("method.loadCurrentA") ?? "").replace(",", "."));
  const cRate = ratedMah && current > 0 ? current / (ratedMah / 1000) : null;
  const id = (n: string) => `${idPrefix}-${n}`;

  const applyProfile = (value: string) => {
    const p = profiles.find((x) => String(x.id) === value);
    setValue("method.benchProfileId", value, { shouldDirty: true });
    if (!p) return;
    const values = methodFromProfile(p);
    for (const k of PROFILE_FIELDS) {
      const v = values[k];
      if (v !== undefined) setValue(`method.${k}`, v, { shouldDirty: true, shouldValidate: false });
    }
  };

  return (
    <div className="grid gap-4 md:grid-cols-2">
      <Field
        id={id("profile")}
        label="Bench profile"
        className="md:col-span-2"
        hint={
          profiles.length
            ? "Fills in your equipment and usual values; change anything that differed for this test."
            : "No bench profiles yet — add one under Account to fill this in next time."
        }
      >
        <select
          id={id("profile")}
          className={inputClass}
          value={watch("method.benchProfileId") ?? ""}
          onChange={(e) => applyProfile(e.target.value)}
        >
          <option value="">None</option>
          {profiles.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name}
            </option>
          ))}
        </select>
      </Field>
      {NUMBERS.map((f) => {
        const message = me?.[f.name]?.message;
        return (
          <Field
            key={f.name}
            id={id(f.name)}
            label={`${f.label} (${f.unit}${f.optional ? ", optional" : ""})`}
            error={message}
            hint={
              f.name === "loadCurrentA" && cRate !== null
                ? `${f.hint} That is ${fmt(cRate, 1)}C for this pack.`
                : f.hint
            }
          >
            <div className="flex items-center gap-2">
              <input
                id={id(f.name)}
                inputMode="decimal"
                autoComplete="off"
                className={inputClass}
                {...describedBy(id(f.name), message, true)}
                {...register(`method.${f.name}`)}
              />
              <span className="muted w-12 shrink-0 text-sm">{f.unit}</span>
            </div>
          </Field>
        );
      })}
      <Field id={id("loadMode")} label="Load mode" error={me?.loadMode?.message}>
        <select
          id={id("loadMode")}
          className={inputClass}
          {...describedBy(id("loadMode"), me?.loadMode?.message)}
          {...register("method.loadMode")}
        >
          <option value="">Choose…</option>
          {loadModes.map((m) => (
            <option key={m} value={m}>
              {loadModeLabels[m]}
            </option>
          ))}
        </select>
      </Field>
      <Field
        id={id("resistanceMethod")}
        label="Resistance method"
        error={me?.resistanceMethod?.message}
        hint="How you measured resistance; results are compared only with the same method."
      >
        <select
          id={id("resistanceMethod")}
          className={inputClass}
          {...describedBy(id("resistanceMethod"), me?.resistanceMethod?.message, true)}
          {...register("method.resistanceMethod")}
        >
          <option value="">Choose…</option>
          {resistanceMethods.map((m) => (
            <option key={m} value={m}>
              {resistanceMethodLabels[m]}
            </option>
          ))}
        </select>
      </Field>
      <Field id={id("testedOn")} label="Test date (optional)" error={me?.testedOn?.message}>
        <input
          id={id("testedOn")}
          type="date"
          max={new Date().toISOString().slice(0, 10)}
          className={inputClass}
          {...describedBy(id("testedOn"), me?.testedOn?.message)}
          {...register("method.testedOn")}
        />
      </Field>
      <Field
        id={id("equipment")}
        label="Equipment"
        error={me?.equipment?.message}
        className="md:col-span-2"
        hint="Load, logger, meter and where the temperature probe sat."
      >
        <input
          id={id("equipment")}
          className={inputClass}
          {...describedBy(id("equipment"), me?.equipment?.message, true)}
          {...register("method.equipment")}
        />
      </Field>
      <Field id={id("notes")} label="Notes (optional)" error={me?.notes?.message} className="md:col-span-2">
        <textarea
          id={id("notes")}
          rows={3}
          className={inputClass}
          {...describedBy(id("notes"), me?.notes?.message)}
          {...register("method.notes")}
        />
      </Field>
      <p className="muted text-xs md:col-span-2">
        Safety: stay within the pack maker’s limits, which may be lower than these bounds. Test on a fire-safe surface,
        never leave a pack under load or on charge unattended, stop at your stop temperature, and retire swollen or
        damaged packs as local rules require.
      </p>
    </div>
  );
}
