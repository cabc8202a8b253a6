"use client";
import { useActionState, useState } from "react";
import { Alert, buttonClass, describedBy, Field, inputClass } from "@/components/ui/form";
import { ANONYMOUS_NAME } from "@/lib/user-name";
import { updateProfile } from "../actions/update-profile";

export function ProfileForm({ initial }: { initial: { displayName: string; anonymous: boolean } }) {
  const [state, formAction, pending] = useActionState(updateProfile, null);
  const [displayName, setDisplayName] = useState(initial.displayName);
  const [anonymous, setAnonymous] = useState(initial.anonymous);
  const nameError = state && !state.ok ? state.fieldErrors?.displayName?.[0] : undefined;
  return (
    <form action={formAction} noValidate className="space-y-4">
      <Field id="displayName" label="Display name" error={nameError} hint="Shown beside your published results.">
        <input
          id="displayName"
          name="displayName"
          value={displayName}
          onChange={(e) => setDisplayName(e.target.value)}
          maxLength={60}
          autoComplete="nickname"
          className={inputClass}
          {...describedBy("displayName", nameError, true)}
        />
      </Field>
      <label className="flex items-start gap-2 text-sm">
        <input
          type="checkbox"
          name="anonymous"
          checked={anonymous}
          onChange={(e) => setAnonymous(e.target.checked)}
          className="mt-1 accent-cell-500"
        />
        <span>
          Stay anonymous — your published results show “{ANONYMOUS_NAME}” instead of a name. Moderators still see who
          submitted them.
        </span>
      </label>
      {state && !state.ok && !nameError ? <Alert tone="error">{state.error}</Alert> : null}
      {state?.ok ? <Alert tone="success">Profile saved.</Alert> : null}
      <button type="submit" className={buttonClass("primary")} disabled={pending}>
        {pending ? "Saving…" : "Save profile"}
      </button>
    </form>
  );
}
