"use client";
// How published results name the contributor: a display name, or anonymous — chosen explicitly (an empty
// name is not a choice). On the first-visit page the form goes on to where the person was heading.
import { useRouter } from "next/navigation";
import { useActionState, useEffect, useState } from "react";
import { Alert, buttonClass, describedBy, Field, inputClass } from "@/components/ui/form";
import { ANONYMOUS_NAME } from "@/lib/user-name";
import { updateProfile } from "../actions/update-profile";

type Initial = { displayName: string; anonymous: boolean; chosen: boolean };

export function ProfileForm({ initial, next }: { initial: Initial; next?: string }) {
  const router = useRouter();
  const [state, formAction, pending] = useActionState(updateProfile, null);
  const [displayName, setDisplayName] = useState(initial.displayName);
  const [choice, setChoice] = useState<"name" | "anonymous" | "">(
    initial.chosen ? (initial.anonymous ? "anonymous" : "name") : "",
  );
  const nameError = state && !state.ok ? state.fieldErrors?.displayName?.[0] : undefined;
  const choiceError = state && !state.ok ? state.fieldErrors?.publicName?.[0] : undefined;
  useEffect(() => {
    if (state?.ok && next) router.push(next);
  }, [state, next, router]);
  const radio = "mt-1 h-4 w-4 accent-cell-500";
  return (
    <form action={formAction} noValidate className="space-y-4">
      <fieldset className="space-y-3" aria-describedby={choiceError ? "publicName-error" : undefined}>
        <legend className="text-sm font-medium">How your published results name you</legend>
        <label className="flex items-start gap-2 text-sm">
          <input
            type="radio"
            name="publicName"
            value="name"
            checked={choice === "name"}
            onChange={() => setChoice("name")}
            className={radio}
          />
          <span>With a name I choose, shown beside each published result</span>
        </label>
        <div className="pl-6">
          <Field id="displayName" label="Display name" error={nameError} hint="2–60 characters; not an e-mail address.">
            <input
              id="displayName"
              name="displayName"
              value={displayName}
              onChange={(e) => {
                setDisplayName(e.target.value);
                if (choice === "") setChoice("name");
              }}
              maxLength={60}
              autoComplete="nickname"
              className={inputClass}
              {...describedBy("displayName", nameError, true)}
            />
          </Field>
        </div>
        <label className="flex items-start gap-2 text-sm">
          <input
            type="radio"
            name="publicName"
            value="anonymous"
            checked={choice === "anonymous"}
            onChange={() => setChoice("anonymous")}
            className={radio}
          />
          <span>Anonymously — published results show “{ANONYMOUS_NAME}”. Moderators still see who submitted them.</span>
        </label>
        {choiceError ? (
          <p id="publicName-error" role="alert" className="text-sm text-warn dark:text-red-300">
            {choiceError}
          </p>
        ) : null}
      </fieldset>
      {state && !state.ok && !nameError && !choiceError ? <Alert tone="error">{state.error}</Alert> : null}
      {state?.ok && !next ? <Alert tone="success">Saved: your published results now name you as chosen.</Alert> : null}
      <button type="submit" className={buttonClass("primary")} disabled={pending}>
        {pending ? "Saving…" : next ? "Save and continue" : "Save"}
      </button>
    </form>
  );
}
