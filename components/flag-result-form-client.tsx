"use client";
// The reader's "ask moderators to check this result" form on the public result page: a reason from the list
// and a note, posted to POST /api/v1/results/[id]/flags. Flagging needs an account: the page is static and
// never reads cookies, so when the form opens it asks /api/v1/me, and a signed-out reader is asked to sign in
// first with a link that comes back here. A flag opens a case for moderators and changes nothing by itself.
import Link from "next/link";
import { useState } from "react";
import { z } from "zod";
import { Alert, buttonClass, describedBy, Field, inputClass } from "@/components/ui/form";
import { flagReasons } from "@/lib/enums";
import { flagReasonLabels } from "@/lib/labels";

type State =
  | { kind: "closed" }
  | { kind: "checking" }
  | { kind: "sign-in" }
  | { kind: "open" }
  | { kind: "sending" }
  | { kind: "sent" }
  | { kind: "error"; message: string; fields: Record<string, string[]> };

const meSchema = z.object({ user: z.object({ name: z.string() }).nullable() });
const errorSchema = z.object({
  error: z.object({ message: z.string(), fieldErrors: z.record(z.string(), z.array(z.string())).optional() }),
});

function SignInFirst({ resultId }: { resultId: number }) {
  const back = `/sign-in?${new URLSearchParams({ callbackUrl: `/results/${resultId}` })}`;
  return (
    <Alert tone="info">
      To ask moderators to check this result, <Link href={back}>sign in</Link> first (an e-mail link, no password); you
      come back here afterwards. Asking needs an account so one person cannot file many cases.
    </Alert>
  );
}

export function FlagResultForm({ resultId }: { resultId: number }) {
  const [state, setState] = useState<State>({ kind: "closed" });

  async function openForm() {
    setState({ kind: "checking" });
    const user = await fetch("/api/v1/me", { cache: "no-store", credentials: "same-origin" })
      .then(async (r) => (r.ok ? meSchema.parse(await r.json()).user : null))
      .catch(() => null);
    setState(user ? { kind: "open" } : { kind: "sign-in" });
  }

  if (state.kind === "sent")
    return (
      <Alert tone="success">
        Thank you. Moderators will look at it; the result keeps counting until they decide, and its page says that a
        check is open.
      </Alert>
    );
  if (state.kind === "sign-in") return <SignInFirst resultId={resultId} />;
  if (state.kind === "closed" || state.kind === "checking")
    return (
      <button
        type="button"
        className={buttonClass("secondary")}
        onClick={openForm}
        disabled={state.kind === "checking"}
      >
        Ask moderators to check this result
      </button>
    );

  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const fd = new FormData(e.currentTarget);
    setState({ kind: "sending" });
    try {
      const res = await fetch(`/api/v1/results/${resultId}/flags`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ reason: fd.get("reason") ?? "", note: fd.get("note") ?? "" }),
      });
      if (res.ok) return setState({ kind: "sent" });
      if (res.status === 401) return setState({ kind: "sign-in" });
      const body = errorSchema.safeParse(await res.json().catch(() => null));
      setState({
        kind: "error",
        message: body.success ? body.data.error.message : "The request could not be sent.",
        fields: (body.success ? body.data.error.fieldErrors : undefined) ?? {},
      });
    } catch {
      setState({
        kind: "error",
        message: "The request could not be sent. Check your connection and try again.",
        fields: {},
      });
    }
  }
  const fields = state.kind === "error" ? state.fields : {};
  return (
    <form onSubmit={submit} className="space-y-3" aria-label="Ask moderators to check this result" noValidate>
      <p className="muted text-sm">
        Moderators read every request. The result stays published and counted until they decide; its page shows that a
        check is open, with the reason in general words (your note goes to the moderators only).
      </p>
      <Field id="flag-reason" label="What should they check?" error={fields.reason?.[0]}>
        <select
          id="flag-reason"
          name="reason"
          defaultValue=""
          className={inputClass}
          {...describedBy("flag-reason", fields.reason?.[0])}
        >
          <option value="" disabled>
            Choose a reason…
          </option>
          {flagReasons.map((r) => (
            <option key={r} value={r}>
              {flagReasonLabels[r]}
            </option>
          ))}
        </select>
      </Field>
      <Field id="flag-note" label="Note for the moderators (optional)" error={fields.note?.[0]}>
        <textarea
          id="flag-note"
          name="note"
          rows={3}
          maxLength={1000}
          className={inputClass}
          {...describedBy("flag-note", fields.note?.[0])}
        />
      </Field>
      {state.kind === "error" && Object.keys(fields).length === 0 ? <Alert tone="error">{state.message}</Alert> : null}
      <div className="flex gap-2">
        <button type="submit" className={buttonClass("primary")} disabled={state.kind === "sending"}>
          {state.kind === "sending" ? "Sending…" : "Send to moderators"}
        </button>
        <button type="button" className={buttonClass("secondary")} onClick={() => setState({ kind: "closed" })}>
          Cancel
        </button>
      </div>
    </form>
  );
}
