"use client";
import { useActionState } from "react";
import { Alert, buttonClass, Field, inputClass } from "@/components/ui/form";
import { mergeMakers } from "../actions/merge-makers";
import { mergePacks } from "../actions/merge-packs";

type Option = { id: number; label: string };

/** Merge a duplicate (source) into the entry that stays (target); the source's results move with it. */
export function MergeForm({ kind, options }: { kind: "makers" | "packs"; options: Option[] }) {
  const packsForm = useActionState(mergePacks, null);
  const makersForm = useActionState(mergeMakers, null);
  const [state, action, pending] = kind === "packs" ? packsForm : makersForm;
  const err = state && !state.ok ? state : null;
  const word = kind === "packs" ? "pack" : "maker";
  return (
    <form action={action} className="space-y-3" aria-label={`Merge ${kind}`}>
      <div className="grid gap-3 sm:grid-cols-2">
        <Field id={`${kind}-source`} label={`Duplicate ${word} (merged away)`} error={err?.fieldErrors?.sourceId?.[0]}>
          <select id={`${kind}-source`} name="sourceId" defaultValue="" className={inputClass}>
            <option value="" disabled>
              Choose…
            </option>
            {options.map((o) => (
              <option key={o.id} value={o.id}>
                {o.label}
              </option>
            ))}
          </select>
        </Field>
        <Field
          id={`${kind}-target`}
          label={`${word[0]?.toUpperCase()}${word.slice(1)} that stays`}
          error={err?.fieldErrors?.targetId?.[0]}
        >
          <select id={`${kind}-target`} name="targetId" defaultValue="" className={inputClass}>
            <option value="" disabled>
              Choose…
            </option>
            {options.map((o) => (
              <option key={o.id} value={o.id}>
                {o.label}
              </option>
            ))}
          </select>
        </Field>
      </div>
      <label className="flex items-start gap-2 text-sm">
        <input type="checkbox" required className="mt-1" />
        <span>
          I checked that these are the same {word}. A merge moves every result and cannot be undone from this page.
        </span>
      </label>
      {err && !err.fieldErrors ? <Alert tone="error">{err.error}</Alert> : null}
      {state?.ok ? (
        <Alert tone="success">
          Merged.{" "}
          {"movedResults" in state.data
            ? `${state.data.movedResults} results moved.`
            : `${state.data.movedPacks} packs moved.`}{" "}
          The merge is in the audit log.
        </Alert>
      ) : null}
      <button type="submit" className={buttonClass("danger")} disabled={pending}>
        {pending ? "Merging…" : `Merge ${kind}`}
      </button>
    </form>
  );
}
