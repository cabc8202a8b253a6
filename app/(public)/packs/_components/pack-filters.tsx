"use client";
import { useEffect, useId, useRef, useState } from "react";
import type { PackParams } from "@/lib/pack-query-params";
import { gramsToOunces, ouncesToGrams } from "@/lib/units";
import { useUnits } from "@/components/units/units-store";
import type { FilterOptions } from "./types";

type Change = (patch: Partial<PackParams>, mode?: "push" | "replace") => void;
const input = "input w-full";

/**
 * A text or number box that commits a moment after the reader stops typing, and otherwise shows the URL
 * (the back button included).
 */
function SyncedInput({
  value,
  commit,
  ms = 350,
  ...rest
}: { value: string; commit: (v: string) => void; ms?: number } & Omit<
  React.InputHTMLAttributes<HTMLInputElement>,
  "value" | "onChange"
>) {
  const [draft, setDraft] = useState(value);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  // The URL is the truth: the box shows it, except while what was typed here has not been committed yet.
  useEffect(() => {
    if (!timer.current) setDraft(value);
  }, [value]);
  useEffect(
    () => () => {
      if (timer.current) clearTimeout(timer.current);
    },
    [],
  );
  return (
    <input
      {...rest}
      value={draft}
      className={input}
      onChange={(e) => {
        const v = e.target.value;
        setDraft(v);
        if (timer.current) clearTimeout(timer.current);
        timer.current = setTimeout(() => {
          timer.current = null;
          commit(v);
        }, ms);
      }}
    />
  );
}

function toNum(v: string): number | null {
  const n = Number(v);
  return v.trim() === "" || !Number.isFinite(n) || n < 0 ? null : n;
}

/** A from–to pair. `toShown`/`fromShown` convert between the URL's unit and the one the reader sees. */
function Range({
  label,
  unit,
  min,
  max,
  minKey,
  maxKey,
  onChange,
  toShown = (v) => v,
  fromShown = (v) => v,
}: {
  label: string;
  unit?: string;
  min: number | null;
  max: number | null;
  minKey: keyof PackParams;
  maxKey: keyof PackParams;
  onChange?: Change;
  toShown?: (v: number) => number;
  fromShown?: (v: number) => number;
}) {
  const shown = (v: number | null) => (v === null ? "" : String(Math.round(toShown(v) * 100) / 100));
  const stored = (v: string) => {
    const n = toNum(v);
    return n === null ? null : Math.round(fromShown(n) * 10) / 10;
  };
  const unitText = unit ? ` (${unit})` : "";
  return (
    <fieldset className="space-y-1">
      <legend className="text-xs font-medium">
        {label} {unit ? <span className="muted font-normal">({unit})</span> : null}
      </legend>
      <div className="flex items-center gap-1">
        <SyncedInput
          type="number"
          inputMode="decimal"
          min={0}
          aria-label={`${label} from${unitText}`}
          placeholder="from"
          value={shown(min)}
          commit={(v) => onChange?.({ [minKey]: stored(v), page: 1 })}
          name={String(minKey)}
        />
        <span aria-hidden="true">–</span>
        <SyncedInput
          type="number"
          inputMode="decimal"
          min={0}
          aria-label={`${label} to${unitText}`}
          placeholder="to"
          value={shown(max)}
          commit={(v) => onChange?.({ [maxKey]: stored(v), page: 1 })}
          name={String(maxKey)}
        />
      </div>
    </fieldset>
  );
}

export function PackFilters({
  params,
  options,
  onChange,
}: {
  params: PackParams;
  options: FilterOptions;
  onChange?: Change;
}) {
  const [open, setOpen] = useState(false);
  const moreId = useId();
  const units = useUnits();
  const oz = units.mass === "oz";
  const active = [
    params.group,
    params.maker,
    params.cells,
    params.connector,
    params.minMah,
    params.maxMah,
    params.minC,
    params.maxC,
    params.minG,
    params.maxG,
  ].filter((v) => v !== null).length;
  const select = (key: "connector" | "maker" | "group") => (e: React.ChangeEvent<HTMLSelectElement>) =>
    onChange?.({ [key]: e.target.value || null, page: 1 });
  return (
    <form
      role="search"
      aria-label="Filter packs"
      className="card grid gap-3 sm:grid-cols-2 lg:grid-cols-4"
      onSubmit={(e) => e.preventDefault()}
    >
      <label className="space-y-1 sm:col-span-2">
        <span className="text-xs font-medium">Search maker and model</span>
        <SyncedInput
          type="search"
          name="q"
          value={params.q}
          placeholder="e.g. ridge 1800"
          ms={250}
          commit={(v) => onChange?.({ q: v, page: 1 }, "replace")}
          autoComplete="off"
        />
      </label>
      {/* On a phone the other filters fold away behind one button; from sm up they are always shown. */}
      <button
        type="button"
        className="btn-sm sm:hidden"
        aria-expanded={open}
        aria-controls={moreId}
        onClick={() => setOpen((v) => !v)}
      >
        {open ? "Fewer filters" : `More filters${active ? ` (${active} on)` : ""}`}
      </button>
      <div
        id={moreId}
        className={`${open ? "grid" : "hidden"} gap-3 sm:col-span-2 sm:grid sm:grid-cols-2 lg:col-span-4 lg:grid-cols-4`}
      >
        <label className="space-y-1">
          <span className="text-xs font-medium">Like-for-like group</span>
          <select name="group" value={params.group ?? ""} onChange={select("group")} className={input}>
            <option value="">any (no measured columns)</option>
            {options.groups.map((g) => (
              <option key={g.key} value={g.key}>
                {g.label} ({g.packCount} packs)
              </option>
            ))}
          </select>
        </label>
        <label className="space-y-1">
          <span className="text-xs font-medium">Maker</span>
          <select name="maker" value={params.maker ?? ""} onChange={select("maker")} className={input}>
            <option value="">any</option>
            {options.makers.map((m) => (
              <option key={m.slug} value={m.slug}>
                {m.name}
              </option>
            ))}
          </select>
        </label>
        <label className="space-y-1">
          <span className="text-xs font-medium">Cells in series</span>
          <select
            name="cells"
            value={params.cells ?? ""}
            onChange={(e) => onChange?.({ cells: e.target.value ? Number(e.target.value) : null, page: 1 })}
            className={input}
          >
            <option value="">any</option>
            {options.cells.map((c) => (
              <option key={c} value={c}>
                {c}S
              </option>
            ))}
          </select>
        </label>
        <label className="space-y-1">
          <span className="text-xs font-medium">Connector</span>
          <select name="connector" value={params.connector ?? ""} onChange={select("connector")} className={input}>
            <option value="">any</option>
            {options.connectors.map((c) => (
              <option key={c} value={c}>
                {c}
              </option>
            ))}
          </select>
        </label>
        <Range
          label="Rated capacity"
          unit="mAh"
          min={params.minMah}
          max={params.maxMah}
          minKey="minMah"
          maxKey="maxMah"
          onChange={onChange}
        />
        <Range
          label="Labelled continuous C"
          min={params.minC}
          max={params.maxC}
          minKey="minC"
          maxKey="maxC"
          onChange={onChange}
        />
        <Range
          label="Weight"
          unit={oz ? "oz" : "g"}
          min={params.minG}
          max={params.maxG}
          minKey="minG"
          maxKey="maxG"
          onChange={onChange}
          toShown={oz ? gramsToOunces : undefined}
          fromShown={oz ? ouncesToGrams : undefined}
        />
      </div>
    </form>
  );
}
