"use client";
import { useActionState } from "react";
import { Alert, buttonClass, describedBy, Field, inputClass } from "@/components/ui/form";
import type { CataloguePack } from "@/db/queries/catalogue-admin";
import { editPackLabel } from "../actions/edit-pack-label";

const fields = [
  ["cellsInSeries", "Cells in series", "numeric"],
  ["ratedCapacityMah", "Rated capacity (mAh)", "numeric"],
  ["labelledContinuousC", "Labelled continuous C", "decimal"],
  ["labelledBurstC", "Labelled burst C (blank if none)", "decimal"],
  ["weightG", "Weight (g, blank if unknown)", "decimal"],
  ["connector", "Connector", "text"],
] as const;

/** Edit one pack's label figures; the ratios of its results are rescaled and the change is audited. */
export function PackLabelForm({ pack }: { pack: CataloguePack }) {
  const [state, action, pending] = useActionState(editPackLabel, null);
  const err = state && !state.ok ? state : null;
  return (
    <form action={action} className="space-y-3" aria-label={`Label of ${pack.makerName} ${pack.model}`}>
      <input type="hidden" name="packId" value={pack.id} />
      <div className="grid gap-3 sm:grid-cols-3">
        {fields.map(([name, label, mode]) => {
          const id = `${name}-${pack.id}`;
          const e = err?.fieldErrors?.[name]?.[0];
          return (
            <Field key={name} id={id} label={label} error={e}>
              <input
                id={id}
                name={name}
                inputMode={mode}
                defaultValue={pack[name] ?? ""}
                className={inputClass}
                {...describedBy(id, e)}
              />
            </Field>
          );
        })}
      </div>
      <Field id={`note-${pack.id}`} label="Why (kept in the audit log)">
        <input id={`note-${pack.id}`} name="note" maxLength={500} className={inputClass} />
      </Field>
      {err && !err.fieldErrors ? <Alert tone="error">{err.error}</Alert> : null}
      {state?.ok ? <Alert tone="success">Saved. Pages showing this pack are refreshed.</Alert> : null}
      <button type="submit" className={buttonClass("primary")} disabled={pending}>
        {pending ? "Saving…" : "Save label"}
      </button>
    </form>
  );
}
