"use client";
import { useActionState } from "react";
import { buttonClass } from "@/components/ui/form";
import { retryMail } from "../actions/retry-mail";

export function RetryButton({ mailId }: { mailId: number }) {
  const [state, action, pending] = useActionState(retryMail, null);
  if (state?.ok) return <span className="text-sm">Queued again.</span>;
  return (
    <form action={action} className="space-y-1" aria-label={`Send message ${mailId} again`}>
      <input type="hidden" name="mailId" value={mailId} />
      <button type="submit" className={buttonClass("secondary")} disabled={pending}>
        {pending ? "Queuing…" : "Send again"}
      </button>
      {state && !state.ok ? (
        <p role="alert" className="text-sm text-warn dark:text-red-300">
          {state.error}
        </p>
      ) : null}
    </form>
  );
}
