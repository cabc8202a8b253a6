"use client";
// Answering a moderator's request: the method card as stored, an optional corrected log, more photos, and the
// contributor's answer. The server recomputes the figures, records the answer and queues its receipt; the
// browser then lands on the contributor's view of the result, which confirms it with the result's number.
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { Alert, buttonClass, describedBy, Field, inputClass } from "@/components/ui/form";
import type { OwnResult } from "@/db/queries/submissions";
import type { LogPreview } from "@/lib/analysis";
import { submitResultSchema, type SubmitResultValues } from "@/lib/validations/result";
import { LogStep } from "../../_components/log-step";
import { MethodStep } from "../../_components/method-step";
import { PhotosStep } from "../../_components/photos-step";
import type { BenchProfileOption, Limits } from "../../_components/types";
import { resubmitResult } from "../actions/resubmit-result";

// The same values as a new submission, except that a new log is optional (empty keeps the stored one).
const resubmitFormSchema = submitResultSchema.extend({
  log: z.object({ key: z.string().max(300), filename: z.string().max(200), mapping: z.string().max(2100).optional() }),
});
const noteSchema = z
  .string()
  .trim()
  .min(1, "Say what you changed, for the moderator.")
  .max(2000, "The answer can be at most 2000 characters.");

const str = (n: number | null) => (n === null ? "" : String(n));
type MethodKey = keyof SubmitResultValues["method"];

function initialValues(r: OwnResult): SubmitResultValues {
  const m = r.method;
  return {
    idempotencyKey: crypto.randomUUID(),
    pack: {
      mode: "existing",
      packId: String(r.pack.id),
      makerId: "",
      makerName: "",
      model: "",
      cellsInSeries: "",
      ratedCapacityMah: "",
      labelledContinuousC: "",
      labelledBurstC: "",
      weightG: "",
      connector: "",
    },
    method: {
      benchProfileId: str(m.benchProfileId),
      ambientTemperatureC: str(m.ambientTemperatureC),
      packStartTemperatureC: str(m.packStartTemperatureC),
      loadMode: m.loadMode,
      loadCurrentA: str(m.loadCurrentA),
      cutoffVPerCell: str(m.cutoffVPerCell),
      stopTemperatureC: str(m.stopTemperatureC),
      resistanceMethod: m.resistanceMethod,
      equipment: m.equipment,
      sampleRateHz: str(m.sampleRateHz),
      cyclesBeforeTest: str(m.cyclesBeforeTest),
      testedOn: m.testedOn ?? "",
      notes: m.notes ?? "",
    },
    log: { key: "", filename: "", mapping: "" },
    photoKeys: [],
    declaration: false,
  };
}

export function ResubmitForm({
  result,
  profiles,
  limits,
}: {
  result: OwnResult;
  profiles: BenchProfileOption[];
  limits: Limits;
}) {
  const router = useRouter();
  const form = useForm<SubmitResultValues, unknown, z.output<typeof resubmitFormSchema>>({
    resolver: zodResolver(resubmitFormSchema),
    defaultValues: initialValues(result),
    mode: "onTouched",
  });
  const [note, setNote] = useState("");
  const [noteError, setNoteError] = useState<string | null>(null);
  const [formError, setFormError] = useState<{ message: string; signIn?: boolean } | null>(null);
  const [preview, setPreview] = useState<LogPreview | null>(null);
  const [pending, startTransition] = useTransition();
  const isMethodKey = (k: string): k is MethodKey => Object.hasOwn(form.getValues("method"), k);
  const p = result.pack;
  const facts = {
    cells: p.cellsInSeries,
    ratedMah: p.ratedCapacityMah,
    labelledC: p.labelledContinuousC,
    weightG: p.weightG,
    title: `${p.makerName} ${p.model}`,
  };

  const send = (values: z.output<typeof resubmitFormSchema>) => {
    const checked = noteSchema.safeParse(note);
    setNoteError(checked.success ? null : (checked.error.issues[0]?.message ?? "Say what you changed."));
    if (!checked.success) return;
    setFormError(null);
    startTransition(async () => {
      const raw = form.getValues();
      const res = await resubmitResult(null, {
        resultId: String(result.id),
        method: raw.method,
        log: values.log.key ? raw.log : null,
        photoKeys: raw.photoKeys,
        note,
        declaration: raw.declaration,
      });
      if (res.ok) {
        router.push(`/account/results/${res.data.resultId}?sent=answer`);
        return;
      }
      if (res.code === "unauthenticated") return setFormError({ message: res.error, signIn: true });
      for (const [field, messages] of Object.entries(res.fieldErrors ?? {})) {
        if (field === "note") setNoteError(messages[0] ?? null);
        else if (field === "log" || field === "photoKeys" || field === "declaration")
          form.setError(field, { type: "server", message: messages[0] });
        else {
          const key = field.replace(/^method\./, "");
          if (field.startsWith("method.") && isMethodKey(key))
            form.setError(`method.${key}`, { type: "server", message: messages[0] });
        }
      }
      setFormError({ message: res.fieldErrors ? "Some values need a look — see the marked fields." : res.error });
    });
  };

  return (
    <form noValidate onSubmit={form.handleSubmit(send)} className="space-y-6" aria-busy={pending}>
      <fieldset className="card min-w-0 space-y-4">
        <legend className="px-1 text-base font-semibold">Method card</legend>
        <MethodStep form={form} profiles={profiles} ratedMah={p.ratedCapacityMah} />
      </fieldset>
      <fieldset className="card min-w-0 space-y-4">
        <legend className="px-1 text-base font-semibold">Log</legend>
        <p className="text-sm">
          Stored log: <span className="num">{result.logFilename}</span>. It is analysed again with the edited method
          card when you resubmit; upload a corrected log only if the log itself was wrong.
        </p>
        <LogStep
          form={form}
          facts={facts}
          limits={limits}
          profiles={profiles}
          preview={preview}
          previewState="idle"
          onPreview={setPreview}
          onRecheck={() => undefined}
          optional
        />
      </fieldset>
      <fieldset className="card min-w-0 space-y-4">
        <legend className="px-1 text-base font-semibold">Photos, answer and declaration</legend>
        <PhotosStep form={form} limits={limits} existingPhotos={result.photoKeys.length}>
          <Field
            id="resubmit-note"
            label="Your answer to the moderator"
            error={noteError ?? undefined}
            hint="What you changed, and why."
          >
            <textarea
              id="resubmit-note"
              rows={4}
              value={note}
              onChange={(e) => setNote(e.target.value)}
              className={inputClass}
              {...describedBy("resubmit-note", noteError ?? undefined, true)}
            />
          </Field>
        </PhotosStep>
      </fieldset>
      {formError && (
        <Alert tone="error">
          {formError.message}{" "}
          {formError.signIn && <Link href={`/sign-in?callbackUrl=/submit/${result.id}`}>Sign in again.</Link>}
        </Alert>
      )}
      <div className="flex flex-wrap justify-between gap-2">
        <Link href={`/account/results/${result.id}`} className={buttonClass("secondary")}>
          Cancel
        </Link>
        <button type="submit" className={buttonClass("primary")} disabled={pending}>
          {pending ? "Sending…" : "Send my answer"}
        </button>
      </div>
    </form>
  );
}
