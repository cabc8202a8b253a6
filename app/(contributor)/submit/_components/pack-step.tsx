"use client";
// Step 1: find the pack in the catalogue (fuzzy search), or propose a new maker/pack with its label
// figures. A proposal goes to moderation together with the result.
import Fuse from "fuse.js";
import { useMemo, useState } from "react";
import { describedBy, Field, inputClass } from "@/components/ui/form";
import { labelSpec } from "@/lib/format";
import type { MakerOption, PackOption, SubmitFormApi } from "./types";

type Props = { form: SubmitFormApi; packs: PackOption[]; makers: MakerOption[] };
type NewField =
  | "makerName"
  | "model"
  | "cellsInSeries"
  | "ratedCapacityMah"
  | "labelledContinuousC"
  | "labelledBurstC"
  | "weightG"
  | "connector";

const NEW_FIELDS: { name: NewField; label: string; unit?: string; placeholder?: string; decimal?: boolean }[] = [
  { name: "model", label: "Model, as printed on the label", placeholder: "e.g. Volt 1300 4S 75C" },
  { name: "cellsInSeries", label: "Cells in series", unit: "S", decimal: true },
  { name: "ratedCapacityMah", label: "Rated capacity", unit: "mAh", decimal: true },
  { name: "labelledContinuousC", label: "Labelled continuous C", unit: "C", decimal: true },
  { name: "labelledBurstC", label: "Labelled burst C (if printed)", unit: "C", decimal: true },
  { name: "weightG", label: "Weight (optional)", unit: "g", decimal: true },
  { name: "connector", label: "Connector", placeholder: "e.g. XT60" },
];

export function PackStep({ form, packs, makers }: Props) {
  const {
    register,
    setValue,
    watch,
    formState: { errors },
  } = form;
  const [query, setQuery] = useState("");
  const mode = watch("pack.mode");
  const packId = watch("pack.packId");
  const makerId = watch("pack.makerId");
  const fuse = useMemo(
    // Extended search: each word is matched fuzzily and all must match, anywhere in the pack's label text.
    () =>
      new Fuse(
        packs.map((p) => ({ ...p, label: `${p.makerName} ${p.model} ${labelSpec(p)} ${p.connector}` })),
        { keys: ["label"], threshold: 0.4, ignoreLocation: true, useExtendedSearch: true },
      ),
    [packs],
  );
  const hits = query.trim() ? fuse.search(query.trim(), { limit: 8 }).map((r) => r.item) : [];
  const chosen = packs.find((p) => String(p.id) === packId) ?? null;
  const pe = errors.pack;

  const choose = (id: string) => setValue("pack.packId", id, { shouldDirty: true, shouldValidate: true });
  return (
    <div className="space-y-5">
      <div role="radiogroup" aria-label="Pack" className="flex flex-wrap gap-2">
        {(["existing", "new"] as const).map((m) => (
          <label
            key={m}
            className={`cursor-pointer rounded-md border px-3 py-1.5 text-sm has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-charge-500 ${mode === m ? "border-cell-500 bg-cell-50 dark:bg-cell-700/20" : "border-ink/20 dark:border-night-line"}`}
          >
            <input type="radio" value={m} className="sr-only" {...register("pack.mode")} />
            {m === "existing" ? "Choose from the catalogue" : "Propose a new pack"}
          </label>
        ))}
      </div>

      {mode === "existing" ? (
        <div className="space-y-3">
          <Field
            id="pack-search"
            label="Search packs"
            hint="Maker, model, cells, capacity or C rating — small typos are fine."
            error={pe?.packId?.message}
          >
            <input
              id="pack-search"
              type="search"
              autoComplete="off"
              value={query}
              onChange={(e) => setQuery(e.target.value)}
              placeholder="e.g. 1300 4S 75"
              className={inputClass}
              {...describedBy("pack-search", pe?.packId?.message, true)}
            />
          </Field>
          {hits.length > 0 && (
            <ul
              className="divide-y divide-ink/10 rounded-md border border-ink/10 dark:divide-night-line dark:border-night-line"
              data-testid="pack-hits"
            >
              {hits.map((p) => (
                <li key={p.id}>
                  <button
                    type="button"
                    onClick={() => choose(String(p.id))}
                    aria-pressed={String(p.id) === packId}
                    className={`flex w-full flex-wrap items-baseline justify-between gap-x-3 px-3 py-2 text-left hover:bg-paper-sunk dark:hover:bg-night-sunk ${String(p.id) === packId ? "bg-cell-50 dark:bg-cell-700/20" : ""}`}
                  >
                    <span className="font-medium">
                      {p.makerName} {p.model}
                      {p.proposed ? " (your proposal, awaiting moderation)" : ""}
                    </span>
                    <span className="muted num text-sm">
                      {labelSpec(p)} · {p.connector}
                    </span>
                  </button>
                </li>
              ))}
            </ul>
          )}
          {query.trim() && hits.length === 0 && (
            <p className="muted text-sm">No pack matches. Check the spelling, or propose it as a new pack.</p>
          )}
          {chosen ? (
            <p className="card text-sm" data-testid="chosen-pack">
              Chosen:{" "}
              <span className="font-medium">
                {chosen.makerName} {chosen.model}
              </span>{" "}
              <span className="muted num">
                {labelSpec(chosen)}
                {chosen.weightG ? ` · ${chosen.weightG} g` : ""} · {chosen.connector}
              </span>
            </p>
          ) : (
            <p className="muted text-sm">No pack chosen yet.</p>
          )}
        </div>
      ) : (
        <fieldset className="grid gap-4 md:grid-cols-2">
          <legend className="sr-only">New pack</legend>
          <p className="muted text-sm md:col-span-2">
            Copy the figures exactly as the label prints them. A moderator checks new catalogue entries before they are
            published with your result.
          </p>
          <Field id="pack-maker" label="Maker" error={pe?.makerId?.message}>
            <select
              id="pack-maker"
              className={inputClass}
              {...describedBy("pack-maker", pe?.makerId?.message)}
              {...register("pack.makerId")}
            >
              <option value="">A maker not listed yet…</option>
              {makers.map((m) => (
                <option key={m.id} value={m.id}>
                  {m.name}
                </option>
              ))}
            </select>
          </Field>
          {makerId === "" && (
            <Field id="pack-makerName" label="New maker's name" error={pe?.makerName?.message}>
              <input
                id="pack-makerName"
                className={inputClass}
                {...describedBy("pack-makerName", pe?.makerName?.message)}
                {...register("pack.makerName")}
              />
            </Field>
          )}
          {NEW_FIELDS.filter((f) => f.name !== "makerName").map((f) => {
            const message = pe?.[f.name]?.message;
            return (
              <Field key={f.name} id={`pack-${f.name}`} label={f.label} error={message}>
                <div className="flex items-center gap-2">
                  <input
                    id={`pack-${f.name}`}
                    inputMode={f.decimal ? "decimal" : "text"}
                    placeholder={f.placeholder}
                    className={inputClass}
                    {...describedBy(`pack-${f.name}`, message)}
                    {...register(`pack.${f.name}`)}
                  />
                  {f.unit && <span className="muted w-10 shrink-0 text-sm">{f.unit}</span>}
                </div>
              </Field>
            );
          })}
        </fieldset>
      )}
    </div>
  );
}
