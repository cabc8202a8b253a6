"use client";
import { useActionState } from "react";
import { Alert, buttonClass, Field, inputClass } from "@/components/ui/form";
import type { ResolvedFlag } from "@/lib/flag-resolution-message";
import type { ActionResult } from "@/lib/errors";
import { resolveFlag } from "../actions/resolve-flag";
import { useAnnounceResolvedFlag } from "./resolved-flag-notice-client";

/**
 * Keep the result (the flag is dismissed), keep it with a moderator's note saying what the reader got right (note
 * required), or take the result out of publication (reason required, shown on its page). The confirmation goes to
 * the page’s notice (ResolvedFlagNotice), because this form leaves with its row once the queue refreshes.
 */
export function ResolveFlagForm({ flagId, packTitle }: { flagId: number; packTitle: string }) {
  const announce = useAnnounceResolvedFlag();
  const [state, action, pending] = useActionState(async (prev: ActionResult<ResolvedFlag> | null, form: FormData) => {
    const out = await resolveFlag(prev, form);
    if (out.ok) announce(out.data, packTitle);
    return out;
  }, null);
  if (state?.ok) return <p className="muted text-sm">Resolved.</p>;
  const noteId = `resolve-note-${flagId}`;
  return (
    <form action={action} className="space-y-2" aria-label={`Resolve flag ${flagId}`}>
      <input type="hidden" name="flagId" value={flagId} />
      <Field
        id={noteId}
        label="Note (required for “keep, with a note” and for taking the result out)"
        error={state && !state.ok ? state.fieldErrors?.note?.[0] : undefined}
      >
        <textarea id={noteId} name="note" rows={2} maxLength={2000} className={inputClass} />
      </Field>
      {state && !state.ok && !state.fieldErrors ? <Alert tone="error">{state.error}</Alert> : null}
      <div className="flex flex-wrap gap-2">
        <button type="submit" name="resolution" value="kept" className={buttonClass("primary")} disabled={pending}>
          Keep the result
        </button>
        <button
          type="submit"
          name="resolution"
          value="corrected"
          className={buttonClass("secondary")}
          disabled={pending}
        >
          Keep, with a note
        </button>
        <button type="submit" name="resolution" value="withdrawn" className={buttonClass("danger")} disabled={pending}>
          Take out of publication
        </button>
      </div>
    </form>
  );
}
