"use client";
import { useActionState, useState } from "react";
import { Alert, Field, buttonClass, describedBy, inputClass } from "@/components/ui/form";
import type { SiteSettings } from "@/db/queries/site-settings";
import { saveSiteSettings } from "../actions/save-site-settings";

export function SettingsForm({ current }: { current: SiteSettings }) {
  const [state, action, pending] = useActionState(saveSiteSettings, null);
  // Controlled, so what the admin typed survives the form reset React does after every action.
  const [paused, setPaused] = useState(current.submissionsPaused);
  const [notice, setNotice] = useState(current.notice ?? "");
  const [reason, setReason] = useState(current.pauseReason ?? "");
  const err = (k: string) => (state && !state.ok ? state.fieldErrors?.[k]?.[0] : undefined);
  return (
    <form action={action} className="card max-w-2xl space-y-5" aria-label="Site settings">
      <Field
        id="notice"
        label="Notice on every page"
        error={err("notice")}
        hint="One or two sentences shown under the header of every page, e.g. planned maintenance. Leave empty for none."
      >
        <textarea
          id="notice"
          name="notice"
          rows={2}
          maxLength={300}
          value={notice}
          onChange={(e) => setNotice(e.target.value)}
          className={inputClass}
          {...describedBy("notice", err("notice"), true)}
        />
      </Field>
      <fieldset className="space-y-3">
        <legend className="text-sm font-medium">New submissions</legend>
        <label className="flex items-start gap-2 text-sm">
          <input
            type="checkbox"
            name="submissionsPaused"
            checked={paused}
            onChange={(e) => setPaused(e.target.checked)}
            className="mt-1"
          />
          <span>
            Pause new submissions and resubmissions. Drafts stay in contributors&apos; browsers; review goes on as
            usual.
          </span>
        </label>
        {paused ? (
          <Field id="pauseReason" label="Why (contributors see this on the submit page)" error={err("pauseReason")}>
            <input
              id="pauseReason"
              name="pauseReason"
              maxLength={300}
              value={reason}
              onChange={(e) => setReason(e.target.value)}
              className={inputClass}
              {...describedBy("pauseReason", err("pauseReason"))}
            />
          </Field>
        ) : null}
      </fieldset>
      <div className="flex flex-wrap items-center gap-3">
        <button type="submit" className={buttonClass()} disabled={pending}>
          {pending ? "Saving…" : "Save settings"}
        </button>
        <div aria-live="polite" className="min-w-0 flex-1">
          {state?.ok ? <Alert tone="success">Saved. Every page shows the change now.</Alert> : null}
          {state && !state.ok && !state.fieldErrors ? <Alert tone="error">{state.error}</Alert> : null}
        </div>
      </div>
    </form>
  );
}
