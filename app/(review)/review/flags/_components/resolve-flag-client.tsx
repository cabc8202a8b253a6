"use client";
import { useActionState } from "react";
import { Alert, buttonClass, Field, inputClass } from "@/components/ui/form";
import { resolveFlag } from "../actions/resolve-flag";

const outcome = { approved: "Resolved: the result is published again.", withdrawn: "Resolved: the result is withdrawn (it stays in the audit log).", disputed: "Resolved; other flags on this result are still open." } as Record<string, string>;

/** Keep the result, correct it (note required), or withdraw it. */
export function ResolveFlagForm({ flagId }: { flagId: number }) {
  const [state, action, pending] = useActionState(resolveFlag, null);
  if (state?.ok) return <Alert tone="success">{outcome[state.data.status] ?? "Resolved."}</Alert>;
  const noteId = `resolve-note-${flagId}`;
  return (
    <form action={action} className="space-y-2" aria-label={`Resolve flag ${flagId}`}>
      <input type="hidden" name="flagId" value={flagId} />
      <Field id={noteId} label="Note (required when correcting)" error={state && !state.ok ? state.fieldErrors?.note?.[0] : undefined}>
        <textarea id={noteId} name="note" rows={2} maxLength={2000} className={inputClass} />
      </Field>
      {state && !state.ok && !state.fieldErrors ? <Alert tone="error">{state.error}</Alert> : null}
      <div className="flex flex-wrap gap-2">
        <button type="submit" name="resolution" value="kept" className={buttonClass("primary")} disabled={pending}>Keep</button>
        <button type="submit" name="resolution" value="corrected" className={buttonClass("secondary")} disabled={pending}>Corrected</button>
        <button type="submit" name="resolution" value="withdrawn" className={buttonClass("danger")} disabled={pending}>Withdraw result</button>
      </div>
    </form>
  );
}
