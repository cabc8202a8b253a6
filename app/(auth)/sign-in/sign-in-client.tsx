"use client";
import { useActionState, useState } from "react";
import { Alert, buttonClass, describedBy, Field, inputClass } from "@/components/ui/form";
import { requestSignInLink } from "./actions/request-sign-in-link";

export function SignInForm({ callbackUrl }: { callbackUrl: string }) {
  const [state, formAction, pending] = useActionState(requestSignInLink, null);
  // Controlled, so the address survives React's reset of the form after a refused request.
  const [email, setEmail] = useState("");
  const fieldError = state && !state.ok ? state.fieldErrors?.email?.[0] : undefined;
  const formError = state && !state.ok && !fieldError ? state.error : undefined;
  return (
    <form action={formAction} noValidate className="space-y-4">
      <input type="hidden" name="callbackUrl" value={callbackUrl} />
      <Field
        id="email"
        label="E-mail address"
        error={fieldError}
        hint="We only use it to send you sign-in links and notices you ask for."
      >
        <input
          id="email"
          name="email"
          type="email"
          autoComplete="email"
          inputMode="email"
          required
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          className={inputClass}
          {...describedBy("email", fieldError, true)}
        />
      </Field>
      {formError ? <Alert tone="error">{formError}</Alert> : null}
      <button type="submit" className={buttonClass("primary", "w-full py-2")} disabled={pending}>
        {pending ? "Sending…" : "E-mail me a sign-in link"}
      </button>
    </form>
  );
}
