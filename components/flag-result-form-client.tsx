"use client";
// The reader's "flag this result" form for the public result page: a reason from the list and a note,
// posted to POST /api/v1/results/[id]/flags (public, rate-limited). Collapsed until asked for.
import { useState } from "react";
import { Alert, buttonClass, describedBy, Field, inputClass } from "@/components/ui/form";
import { flagReasons } from "@/lib/enums";
import { flagReasonLabels } from "@/lib/labels";

type State =
  | { kind: "idle" }
  | { kind: "sending" }
  | { kind: "sent" }
  | { kind: "error"; message: string; fields: Record<string, string[]> };

export function FlagResultForm({ resultId }: { resultId: number }) {
  const [open, setOpen] = useState(false);
  const [state, setState] = useState<State>({ kind: "idle" });
  if (state.kind === "sent")
    return (
      <Alert tone="success">Thank you. The result now shows as disputed until a moderator has looked at it.</Alert>
    );
  if (!open)
    return (
      <button type="button" className={buttonClass("secondary")} onClick={() => setOpen(true)}>
        Flag this result
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
      const body = (await res.json().catch(() => null)) as {
        error?: { message?: string; fieldErrors?: Record<string, string[]> };
      } | null;
      setState({
        kind: "error",
        message: body?.error?.message ?? "The flag could not be sent.",
        fields: body?.error?.fieldErrors ?? {},
      });
    } catch {
      setState({
        kind: "error",
        message: "The flag could not be sent. Check your connection and try again.",
        fields: {},
      });
    }
  }
  const fields = state.kind === "error" ? state.fields : {};
  return (
    <form onSubmit={submit} className="space-y-3" aria-label="Flag this result" noValidate>
      <Field id="flag-reason" label="What is wrong?" error={fields.reason?.[0]}>
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
          {state.kind === "sending" ? "Sending…" : "Send flag"}
        </button>
        <button type="button" className={buttonClass("secondary")} onClick={() => setOpen(false)}>
          Cancel
        </button>
      </div>
    </form>
  );
}
