"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useActionState, useEffect } from "react";
import { Alert, buttonClass, describedBy, Field, inputClass } from "@/components/ui/form";
import type { ProposalChoices } from "@/db/queries/review";
import { rejectReasons } from "@/lib/enums";
import { decisionWords, rejectReasonLabels } from "@/lib/labels";
import { approveResult } from "../actions/approve-result";
import { askContributor } from "../actions/ask-contributor";
import { rejectResult } from "../actions/reject-result";

const done: Record<string, string> = {
  approved: decisionWords.approve.done,
  rejected: decisionWords.reject.done,
  awaiting_answer: decisionWords.ask.done,
};

/** For a result on a proposed pack or maker: go live as proposed, or merge into what the catalogue has. */
function CatalogueChoice({ proposal }: { proposal: ProposalChoices }) {
  return (
    <fieldset className="space-y-2 rounded-md border border-ink/10 p-3 dark:border-night-line">
      <legend className="px-1 text-sm font-medium">Catalogue entry</legend>
      {proposal.packProposed ? (
        <Field
          id="into-pack"
          label="This pack is"
          hint="Only packs with the same cells, rated capacity and labelled C are offered."
        >
          <select id="into-pack" name="intoPackId" defaultValue="" className={inputClass}>
            <option value="">New: add it to the catalogue as proposed</option>
            {proposal.samePacks.map((p) => (
              <option key={p.id} value={p.id}>
                The same as {p.title}
              </option>
            ))}
          </select>
        </Field>
      ) : null}
      {proposal.makerProposed ? (
        <Field id="into-maker" label="Its maker is" hint="Ignored when the pack is merged into an existing one.">
          <select id="into-maker" name="intoMakerId" defaultValue="" className={inputClass}>
            <option value="">New: add the maker as proposed</option>
            {proposal.makers.map((m) => (
              <option key={m.id} value={m.id}>
                The same as {m.name}
              </option>
            ))}
          </select>
        </Field>
      ) : null}
      <p className="muted text-xs">
        Approving puts the entry live at once: its page, the packs list, the API and the sitemap.
      </p>
    </fieldset>
  );
}

/** Approve, do not accept (with a reason), or send back for an answer. Each form works with the keyboard alone. */
export function DecisionPanel({ resultId, proposal }: { resultId: number; proposal: ProposalChoices | null }) {
  const router = useRouter();
  const [approved, approve, approving] = useActionState(approveResult, null);
  const [rejected, reject, rejecting] = useActionState(rejectResult, null);
  const [asked, ask, asking] = useActionState(askContributor, null);
  const success = [approved, rejected, asked].find((s) => s?.ok);
  useEffect(() => {
    if (success) router.refresh();
  }, [success, router]);
  const busy = approving || rejecting || asking;

  if (success?.ok) {
    const packSlug = success.data.packSlug;
    return (
      <div className="space-y-2" data-testid="decision-done">
        <Alert tone="success">{done[success.data.status] ?? "Saved."}</Alert>
        {success.data.status === "approved" ? (
          <p className="text-sm">
            <Link href={`/packs/${packSlug}`} data-testid="live-pack-link">
              Open the pack’s public page
            </Link>
          </p>
        ) : null}
        <Link href="/review" className={buttonClass("primary")}>
          Back to the queue
        </Link>
      </div>
    );
  }
  const rejectErr = rejected && !rejected.ok ? rejected : null;
  const askErr = asked && !asked.ok ? asked : null;
  return (
    <div className="space-y-5">
      <form action={approve} className="space-y-2" aria-label="Approve">
        <input type="hidden" name="resultId" value={resultId} />
        {proposal ? <CatalogueChoice proposal={proposal} /> : null}
        <Field id="approve-note" label="Note (optional, sent to the contributor)">
          <textarea id="approve-note" name="note" rows={2} className={inputClass} maxLength={2000} />
        </Field>
        {approved && !approved.ok ? <Alert tone="error">{approved.error}</Alert> : null}
        <button type="submit" className={buttonClass("primary")} disabled={busy}>
          {approving ? "Approving…" : decisionWords.approve.button}
        </button>
      </form>

      <form
        action={ask}
        className="space-y-2 border-t border-ink/10 pt-4 dark:border-night-line"
        aria-label="Send back"
      >
        <input type="hidden" name="resultId" value={resultId} />
        <Field
          id="ask-note"
          label="What the contributor should answer or change"
          error={askErr?.fieldErrors?.note?.[0]}
          hint="They see this beside their edit form and in the e-mail."
        >
          <textarea
            id="ask-note"
            name="note"
            rows={3}
            className={inputClass}
            maxLength={2000}
            {...describedBy("ask-note", askErr?.fieldErrors?.note?.[0], true)}
          />
        </Field>
        {askErr && !askErr.fieldErrors ? <Alert tone="error">{askErr.error}</Alert> : null}
        <button type="submit" className={buttonClass("secondary")} disabled={busy}>
          {asking ? "Sending…" : decisionWords.ask.button}
        </button>
      </form>

      <form
        action={reject}
        className="space-y-2 border-t border-ink/10 pt-4 dark:border-night-line"
        aria-label="Do not accept"
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
          {rejecting ? "Saving…" : decisionWords.reject.button}
        </button>
      </form>
    </div>
  );
}
