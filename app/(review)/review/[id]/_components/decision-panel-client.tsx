"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useActionState, useEffect } from "react";
import { Alert, buttonClass, describedBy, Field, inputClass } from "@/components/ui/form";
import { rejectReasonLabels, rejectReasons } from "@/lib/validations/review";
import { approveResult } from "../actions/approve-result";
import { rejectResult } from "../actions/reject-result";
import { requestChanges } from "../actions/request-changes";

const done = {
  approved: "Approved and published.",
  rejected: "Rejected.",
  changes_requested: "Sent back to the contributor.",
} as Record<string, string>;

/** Approve, reject with a reason, or request changes. Each form works with the keyboard alone (Tab, Enter). */
export function DecisionPanel({ resultId }: { resultId: number }) {
  const router = useRouter();
  const [approved, approve, approving] = useActionState(approveResult, null);
  const [rejected, reject, rejecting] = useActionState(rejectResult, null);
  const [changed, change, changing] = useActionState(requestChanges, null);
  const success = [approved, rejected, changed].find((s) => s?.ok);
  useEffect(() => {
    if (success) router.refresh();
  }, [success, router]);
  const busy = approving || rejecting || changing;

  if (success?.ok) {
    return (
      <div className="space-y-2" data-testid="decision-done">
        <Alert tone="success">{done[success.data.status] ?? "Saved."}</Alert>
        <Link href="/review" className={buttonClass("primary")}>
          Back to the queue
        </Link>
      </div>
    );
  }
  const rejectErr = rejected && !rejected.ok ? rejected : null;
  const changeErr = changed && !changed.ok ? changed : null;
  return (
    <div className="space-y-5">
      <form action={approve} className="space-y-2" aria-label="Approve">
        <input type="hidden" name="resultId" value={resultId} />
        <Field id="approve-note" label="Note (optional, sent to the contributor)">
          <textarea id="approve-note" name="note" rows={2} className={inputClass} maxLength={2000} />
        </Field>
        {approved && !approved.ok ? <Alert tone="error">{approved.error}</Alert> : null}
        <button type="submit" className={buttonClass("primary")} disabled={busy}>
          {approving ? "Approving…" : "Approve and publish"}
        </button>
      </form>

      <form
        action={reject}
        className="space-y-2 border-t border-ink/10 pt-4 dark:border-night-line"
        aria-label="Reject"
      >
        <input type="hidden" name="resultId" value={resultId} />
        <Field id="reject-reason" label="Reason" error={rejectErr?.fieldErrors?.reason?.[0]}>
          <select
            id="reject-reason"
            name="reason"
            defaultValue=""
            className={inputClass}
            {...describedBy("reject-reason", rejectErr?.fieldErrors?.reason?.[0])}
          >
            <option value="" disabled>
              Choose a reason…
            </option>
            {rejectReasons.map((r) => (
              <option key={r} value={r}>
                {rejectReasonLabels[r]}
              </option>
            ))}
          </select>
        </Field>
        <Field id="reject-note" label="Note (required for “other”)" error={rejectErr?.fieldErrors?.note?.[0]}>
          <textarea
            id="reject-note"
            name="note"
            rows={2}
            className={inputClass}
            maxLength={2000}
            {...describedBy("reject-note", rejectErr?.fieldErrors?.note?.[0])}
          />
        </Field>
        {rejectErr && !rejectErr.fieldErrors ? <Alert tone="error">{rejectErr.error}</Alert> : null}
        <button type="submit" className={buttonClass("danger")} disabled={busy}>
          {rejecting ? "Rejecting…" : "Reject"}
        </button>
      </form>

      <form
        action={change}
        className="space-y-2 border-t border-ink/10 pt-4 dark:border-night-line"
        aria-label="Request changes"
      >
        <input type="hidden" name="resultId" value={resultId} />
        <Field id="changes-note" label="What needs to change" error={changeErr?.fieldErrors?.note?.[0]}>
          <textarea
            id="changes-note"
            name="note"
            rows={2}
            className={inputClass}
            maxLength={2000}
            {...describedBy("changes-note", changeErr?.fieldErrors?.note?.[0])}
          />
        </Field>
        {changeErr && !changeErr.fieldErrors ? <Alert tone="error">{changeErr.error}</Alert> : null}
        <button type="submit" className={buttonClass("secondary")} disabled={busy}>
          {changing ? "Sending…" : "Request changes"}
        </button>
      </form>
    </div>
  );
}
