"use client";
// The bench profile form: react-hook-form with the same zod schema the server action uses. The browser
// checks first (errors appear beside each field); the server checks again and its field errors land in
// the same places.
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState, useTransition, type BaseSyntheticEvent } from "react";
import { useForm, type UseFormRegister } from "react-hook-form";
import { Alert, buttonClass, describedBy, Field, inputClass } from "@/components/ui/form";
import { loadModes, resistanceMethods } from "@/lib/enums";
import { loadModeLabels, resistanceMethodLabels } from "@/lib/labels";
import {
  benchProfileSchema,
  type BenchProfileFormValues,
  type BenchProfileInput,
} from "@/lib/validations/bench-profile";
import { saveBenchProfile } from "../actions/save-bench-profile";
import { AccuracyFieldset } from "./accuracy-fieldset-client";
import { MappingField } from "./mapping-field-client";

type Name = keyof BenchProfileFormValues;
const isName = (field: string, values: BenchProfileFormValues): field is Name => Object.hasOwn(values, field);

function TextInput(props: {
  name: Name;
  label: string;
  hint?: string;
  error?: string;
  register: UseFormRegister<BenchProfileFormValues>;
  inputMode?: "decimal" | "text";
  placeholder?: string;
  type?: string;
  max?: string;
}) {
  return (
    <Field id={props.name} label={props.label} hint={props.hint} error={props.error}>
      <input
        id={props.name}
        type={props.type ?? "text"}
        inputMode={props.inputMode}
        placeholder={props.placeholder}
        max={props.max}
        className={inputClass}
        {...describedBy(props.name, props.error, !!props.hint)}
        {...props.register(props.name)}
      />
    </Field>
  );
}

export function BenchProfileForm({ id, initial }: { id: number | null; initial: BenchProfileFormValues }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    setValue,
    watch,
    formState: { errors },
  } = useForm<BenchProfileFormValues, unknown, BenchProfileInput>({
    resolver: zodResolver(benchProfileSchema),
    defaultValues: initial,
    mode: "onTouched",
  });
  const err = (n: Name) => errors[n]?.message;
  const today = new Date().toISOString().slice(0, 10);

  // Send the form as typed (FormData), not the parsed values: the server parses with the same schema. The
  // submit event's target is the form itself (react-hook-form hands the event on after validating).
  const onValid = (_values: BenchProfileInput, event?: BaseSyntheticEvent) => {
    const el: unknown = event?.target;
    if (!(el instanceof HTMLFormElement)) return;
    const data = new FormData(el);
    startTransition(async () => {
      const res = await saveBenchProfile(null, data);
      if (res.ok) {
        router.push("/account/bench-profiles");
        router.refresh();
        return;
      }
      setFormError(res.fieldErrors ? "Some values need a look — see the marked fields." : res.error);
      for (const [field, messages] of Object.entries(res.fieldErrors ?? {})) {
        if (isName(field, initial)) setError(field, { type: "server", message: messages[0] });
      }
    });
  };

  const common = { register };
  return (
    <form
      noValidate
      onSubmit={handleSubmit(onValid, () => setFormError(null))}
      className="space-y-8"
      aria-busy={pending}
    >
      {id !== null ? <input type="hidden" name="id" value={id} /> : null}
      <fieldset className="card grid gap-4 md:grid-cols-2">
        <legend className="px-1 text-base font-semibold">Equipment</legend>
        <TextInput
          {...common}
          name="name"
          label="Profile name"
          placeholder="e.g. Garage bench, winter"
          error={err("name")}
        />
        <TextInput
          {...common}
          name="loadEquipment"
          label="Load equipment"
          placeholder="e.g. 400 W electronic load"
          error={err("loadEquipment")}
        />
        <TextInput
          {...common}
          name="logger"
          label="Logger (optional)"
          placeholder="What records voltage, current, temperature"
          error={err("logger")}
        />
        <TextInput
          {...common}
          name="resistanceMeter"
          label="Resistance meter (optional)"
          error={err("resistanceMeter")}
        />
        <Field
          id="resistanceMethod"
          label="Resistance method"
          error={err("resistanceMethod")}
          hint="How your readings are taken. Figures from different methods are never compared with each other."
        >
          <select
            id="resistanceMethod"
            className={inputClass}
            {...describedBy("resistanceMethod", err("resistanceMethod"), true)}
            {...register("resistanceMethod")}
          >
            <option value="">Choose…</option>
            {resistanceMethods.map((m) => (
              <option key={m} value={m}>
                {resistanceMethodLabels[m]}
              </option>
            ))}
          </select>
        </Field>
        <TextInput
          {...common}
          name="calibratedOn"
          type="date"
          max={today}
          label="Last calibrated (optional)"
          error={err("calibratedOn")}
        />
        <Field
          id="notes"
          label="Notes (optional)"
          error={err("notes")}
          className="md:col-span-2"
          hint="Wiring, shunt, thermocouple placement — anything that helps a reader judge your figures."
        >
          <textarea
            id="notes"
            rows={3}
            className={inputClass}
            {...describedBy("notes", err("notes"), true)}
            {...register("notes")}
          />
        </Field>
      </fieldset>

      <fieldset className="card grid gap-4 md:grid-cols-2">
        <legend className="px-1 text-base font-semibold">Method-card defaults (all optional)</legend>
        <TextInput
          {...common}
          name="defaultAmbientC"
          label="Ambient temperature (°C)"
          hint="−20 to 60 °C"
          error={err("defaultAmbientC")}
        />
        <Field id="defaultLoadMode" label="Load mode" error={err("defaultLoadMode")}>
          <select
            id="defaultLoadMode"
            className={inputClass}
            {...describedBy("defaultLoadMode", err("defaultLoadMode"))}
            {...register("defaultLoadMode")}
          >
            <option value="">Not set</option>
            {loadModes.map((m) => (
              <option key={m} value={m}>
                {loadModeLabels[m]}
              </option>
            ))}
          </select>
        </Field>
        <TextInput
          {...common}
          name="defaultCutoffVPerCell"
          inputMode="decimal"
          label="Cut-off voltage (V per cell)"
          hint="2.5 to 4.2 V per cell"
          error={err("defaultCutoffVPerCell")}
        />
        <TextInput
          {...common}
          name="defaultStopTemperatureC"
          inputMode="decimal"
          label="Stop temperature (°C)"
          hint="The pack temperature at which you end a test; at most 80 °C."
          error={err("defaultStopTemperatureC")}
        />
        <TextInput
          {...common}
          name="defaultSampleRateHz"
          inputMode="decimal"
          label="Sample rate (Hz)"
          hint="Samples per second, above 0"
          error={err("defaultSampleRateHz")}
        />
        <p className="muted text-xs md:col-span-2">
          Safety: stay within the pack maker’s limits, which may be lower than these. Never leave a pack under test or
          on charge unattended, test on a fire-safe surface, and retire swollen or damaged packs as local rules require.
        </p>
      </fieldset>

      <AccuracyFieldset register={register} errors={errors} />

      <fieldset className="card grid gap-4 md:grid-cols-2">
        <legend className="px-1 text-base font-semibold">Log columns (optional)</legend>
        <p className="muted text-sm md:col-span-2">
          If your logger writes no header row, or names its columns in a way Sagline does not recognise, say once which
          column holds what. Choosing this profile on the submit form then reads your logs with it.
        </p>
        <MappingField
          value={watch("logMapping") ?? ""}
          onChange={(json) => setValue("logMapping", json, { shouldDirty: true, shouldValidate: true })}
          error={err("logMapping")}
          registration={register("logMapping")}
        />
      </fieldset>

      {formError ? <Alert tone="error">{formError}</Alert> : null}
      <div className="flex flex-wrap gap-2">
        <button type="submit" className={buttonClass("primary")} disabled={pending}>
          {pending ? "Saving…" : id === null ? "Create bench profile" : "Save changes"}
        </button>
        <Link href="/account/bench-profiles" className={buttonClass("secondary")}>
          Cancel
        </Link>
      </div>
    </form>
  );
}
