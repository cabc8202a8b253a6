"use client";
// The multi-step submission: pack → method card → log → photos and declaration. One zod schema checks
// each step here and everything again on the server; the draft (with the uploaded log's storage key)
// survives reloads; a server error lands on its field and the form goes back to that step.
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useCallback, useEffect, useMemo, useRef, useState, useTransition } from "react";
import { useForm, type FieldPath } from "react-hook-form";
import { Alert, buttonClass } from "@/components/ui/form";
import type { LogPreview } from "@/lib/analysis";
import { submitResultSchema, type SubmitResultInput, type SubmitResultValues } from "@/lib/validations/result";
import { previewStoredLog } from "../actions/preview-stored-log";
import { submitResult } from "../actions/submit-result";
import { blankValues, valuesFromDraft } from "./draft-values";
import { LogStep } from "./log-step";
import { MethodStep } from "./method-step";
import { PackStep } from "./pack-step";
import { PhotosStep } from "./photos-step";
import { StepList } from "./step-list";
import { SubmitSummary } from "./submit-summary";
import type { BenchProfileOption, Limits, MakerOption, PackFactsClient, PackOption } from "./types";
import { draftKey, readDraft, useDraftStorage } from "./use-draft";
import { useKeepDraftFiles } from "./use-keep-draft-files";

type Props = {
  userId: string;
  packs: PackOption[];
  makers: MakerOption[];
  profiles: BenchProfileOption[];
  limits: Limits;
};
type Path = FieldPath<SubmitResultValues>;

const STEPS = ["Pack", "Method card", "Log", "Photos and submit"] as const;
const STEP_FIELDS: Path[][] = [["pack"], ["method"], ["log"], ["photoKeys", "declaration"]];

/** Which step shows a server field error ("method.cutoffVPerCell" → step 1). */
function stepOf(field: string): number {
  if (field.startsWith("pack")) return 0;
  if (field.startsWith("method")) return 1;
  if (field.startsWith("log")) return 2;
  return 3;
}

/** Every field name the form knows ("pack.packId", "log", "photoKeys", …), to place server errors safely. */
function knownPaths(v: SubmitResultValues): Set<string> {
  const out = new Set<string>(["root"]);
  for (const [k, val] of Object.entries(v)) {
    out.add(k);
    if (val && typeof val === "object" && !Array.isArray(val))
      for (const sub of Object.keys(val)) out.add(`${k}.${sub}`);
  }
  return out;
}

const num = (s: string | undefined) =>
  s && s.trim() !== "" && Number.isFinite(Number(s.replace(",", "."))) ? Number(s.replace(",", ".")) : null;

function packFacts(v: SubmitResultValues["pack"], packs: PackOption[], makers: MakerOption[]): PackFactsClient | null {
  if (v.mode === "existing") {
    const p = packs.find((x) => String(x.id) === v.packId);
    return p
      ? {
          cells: p.cellsInSeries,
          ratedMah: p.ratedCapacityMah,
          labelledC: p.labelledContinuousC,
          weightG: p.weightG,
          title: `${p.makerName} ${p.model}`,
        }
      : null;
  }
  const cells = num(v.cellsInSeries);
  const ratedMah = num(v.ratedCapacityMah);
  const labelledC = num(v.labelledContinuousC);
  if (cells === null || ratedMah === null || labelledC === null) return null;
  const maker = makers.find((m) => String(m.id) === v.makerId)?.name ?? v.makerName;
  return { cells, ratedMah, labelledC, weightG: num(v.weightG), title: `${maker} ${v.model}` };
}

export function SubmitForm({ userId, packs, makers, profiles, limits }: Props) {
  const storageKey = draftKey(userId);
  const blank = useMemo(() => blankValues(profiles), [profiles]);
  const form = useForm<SubmitResultValues, unknown, SubmitResultInput>({
    resolver: zodResolver(submitResultSchema),
    defaultValues: blank,
    mode: "onTouched",
  });
  const { getValues, setError, trigger, watch, reset } = form;
  const [step, setStep] = useState(0);
  const [restored, setRestored] = useState(false);
  const [preview, setPreview] = useState<LogPreview | null>(null);
  const [previewState, setPreviewState] = useState<"idle" | "loading" | "error">("idle");
  const [formError, setFormError] = useState<{ message: string; signIn?: boolean } | null>(null);
  const [done, setDone] = useState<{ resultId: number } | null>(null);
  const [pending, startTransition] = useTransition();
  const draft = useDraftStorage(storageKey);
  // After Next/Back (or a step button) the new step's first control takes focus, so a keyboard user does
  // not have to Shift+Tab back through the whole step from the Next button.
  const stepBox = useRef<HTMLFieldSetElement>(null);
  const focusStep = useRef(false);
  const known = useMemo(() => knownPaths(blank), [blank]);
  const isPath = (f: string): f is Path => known.has(f);

  useEffect(() => {
    const saved = readDraft(storageKey);
    if (saved) {
      reset(valuesFromDraft(blank, saved.values));
      setStep(saved.step);
    }
    setRestored(true);
  }, [storageKey, blank, reset]);

  useEffect(() => {
    if (!restored || done) return;
    draft.save({ step, values: getValues() });
    const sub = watch((values) => draft.save({ step, values }));
    return () => sub.unsubscribe();
  }, [restored, step, done, draft, watch, getValues]);

  // The files of a restored draft are kept from the storage sweep; any already gone are asked for again.
  useKeepDraftFiles(
    restored && !done,
    () => ({ logKey: getValues("log.key") || null, photoKeys: getValues("photoKeys") ?? [] }),
    ({ logMissing, missingPhotoKeys }) => {
      if (logMissing)
        setError("log", { type: "server", message: "The uploaded log is no longer stored: please upload it again." });
      if (missingPhotoKeys.length)
        setError("photoKeys", { type: "server", message: "A photo is no longer stored: remove it and add it again." });
    },
  );

  const recheck = useCallback(() => {
    const { log, pack, method } = getValues();
    if (!log.key) return;
    setPreviewState("loading");
    startTransition(async () => {
      const res = await previewStoredLog(null, { log, pack, method });
      if (res.ok) {
        setPreview(res.data);
        setPreviewState("idle");
      } else {
        setPreviewState("error");
        if (res.code === "unauthenticated") setFormError({ message: res.error, signIn: true });
        for (const [field, messages] of Object.entries(res.fieldErrors ?? {}))
          if (field.startsWith("log")) setError("log", { type: "server", message: messages[0] });
      }
    });
  }, [getValues, setError]);

  // After a reload the draft has the stored log but not its figures: fetch them again.
  useEffect(() => {
    if (restored && step === 2 && !preview && previewState === "idle" && getValues("log.key")) recheck();
  }, [restored, step, preview, previewState, getValues, recheck]);

  const go = async (to: number) => {
    setFormError(null);
    if (to > step) {
      for (let s = step; s < to; s++) {
        if (!(await trigger(STEP_FIELDS[s] ?? [], { shouldFocus: true }))) {
          setFormError({ message: `Some values on “${STEPS[s]}” need a look — see the marked fields.` });
          return setStep(s);
        }
      }
    }
    focusStep.current = to !== step;
    setStep(to);
    window.scrollTo({ top: 0, behavior: "smooth" });
  };

  useEffect(() => {
    if (!focusStep.current) return;
    focusStep.current = false;
    stepBox.current
      ?.querySelector<HTMLElement>(
        "input:checked, input:not([type=radio]):not([type=hidden]):not(:disabled), select:not(:disabled), textarea:not(:disabled), button:not(:disabled)",
      )
      ?.focus({ preventScroll: true });
  }, [step]);

  const submit = () => {
    setFormError(null);
    startTransition(async () => {
      const res = await submitResult(null, getValues());
      if (res.ok) {
        draft.clear();
        setDone(res.data);
        return;
      }
      if (res.code === "unauthenticated") return setFormError({ message: res.error, signIn: true });
      const fields = Object.entries(res.fieldErrors ?? {});
      for (const [field, messages] of fields) {
        const path = field.replace(/\.\d+$/, ""); // "photoKeys.0" → "photoKeys"
        if (isPath(path)) setError(path, { type: "server", message: messages[0] });
      }
      if (fields.length > 0) setStep(Math.min(...fields.map(([f]) => stepOf(f))));
      setFormError({
        message: fields.length > 0 ? "Some values need a look — see the marked fields. Your draft is kept." : res.error,
      });
    });
  };

  if (done) {
    return (
      <div className="card space-y-3" data-testid="submit-done">
        <h2>Thank you — result #{done.resultId} is waiting for review</h2>
        <p>
          A moderator will check it against its log, photos and method card. We e-mailed you a receipt with its number
          and a link; you can follow it, or withdraw it while it waits, from its page.
        </p>
        <div className="flex flex-wrap gap-2">
          <Link href={`/account/results/${done.resultId}`} className={buttonClass("primary")}>
            Follow result #{done.resultId}
          </Link>
          <button
            type="button"
            className={buttonClass("secondary")}
            onClick={() => {
              reset(blankValues(profiles));
              setPreview(null);
              setStep(0);
              setDone(null);
            }}
          >
            Submit another result
          </button>
        </div>
      </div>
    );
  }

  const facts = packFacts(watch("pack"), packs, makers);
  return (
    <form
      noValidate
      className="space-y-6"
      aria-busy={pending}
      onSubmit={(e) => {
        e.preventDefault();
        // Enter in a field moves on a step; only the last step submits.
        if (step < STEPS.length - 1) void go(step + 1);
        else
          void form.handleSubmit(submit, (errs) =>
            setStep(Math.min(...Object.keys(errs).map(stepOf), STEPS.length - 1)),
          )();
      }}
    >
      <StepList steps={STEPS} current={step} onGo={go} />
      <fieldset ref={stepBox} className="card min-w-0 space-y-4" disabled={!restored}>
        <legend className="px-1 text-base font-semibold">{`Step ${step + 1} of ${STEPS.length}: ${STEPS[step]}`}</legend>
        {step === 0 && <PackStep form={form} packs={packs} makers={makers} />}
        {step === 1 && <MethodStep form={form} profiles={profiles} ratedMah={facts?.ratedMah ?? null} />}
        {step === 2 && (
          <LogStep
            form={form}
            facts={facts}
            limits={limits}
            profiles={profiles}
            preview={preview}
            previewState={previewState}
            onPreview={setPreview}
            onRecheck={recheck}
          />
        )}
        {step === 3 && (
          <>
            <SubmitSummary values={watch()} facts={facts} preview={preview} onGo={go} />
            <PhotosStep form={form} limits={limits} />
          </>
        )}
      </fieldset>
      {formError && (
        <Alert tone="error">
          {formError.message}{" "}
          {formError.signIn && (
            <Link href="/sign-in?callbackUrl=/submit">Sign in again — this draft is kept in this browser.</Link>
          )}
        </Alert>
      )}
      <div className="flex flex-wrap justify-between gap-2">
        <button
          type="button"
          className={buttonClass("secondary")}
          onClick={() => go(step - 1)}
          disabled={step === 0 || pending}
        >
          Back
        </button>
        {/* Distinct keys: React must not turn the clicked "Next" button into the submit button mid-click. */}
        {step < STEPS.length - 1 ? (
          <button
            key="next"
            type="button"
            className={buttonClass("primary")}
            // The field being typed in keeps its focus until the click lands: its blur would check it and
            // remove its error message, moving this button from under the pointer between press and release,
            // so the first click after fixing a value went nowhere. go() checks the whole step anyway.
            onMouseDown={(e) => e.preventDefault()}
            onClick={() => go(step + 1)}
            disabled={pending}
          >
            Next: {STEPS[step + 1]}
          </button>
        ) : (
          <button key="submit" type="submit" className={buttonClass("primary")} disabled={pending}>
            {pending ? "Submitting…" : "Submit the result"}
          </button>
        )}
      </div>
    </form>
  );
}
