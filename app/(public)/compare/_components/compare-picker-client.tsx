"use client";
// Add, remove and reorder the compared packs; the list lives in the URL (?packs=a,b,c&group=…). Each change
// loads the page whole: its table and charts are static islands (components/static-island.tsx), sent once in the
// HTML rather than again in a client navigation's payload.
import { useId, useState } from "react";
import { MAX_COMPARE } from "@/lib/compare-limits";

type Option = { slug: string; title: string };

export function ComparePicker({
  selected,
  options,
  group,
}: {
  selected: Option[];
  options: Option[];
  group: string | null;
}) {
  const listId = useId();
  const [text, setText] = useState("");
  const [error, setError] = useState<string | null>(null);
  const go = (slugs: string[]) => {
    const qs = new URLSearchParams();
    if (slugs.length) qs.set("packs", slugs.join(","));
    if (group) qs.set("group", group);
    // eslint-disable-next-line @next/next/no-location-assign-relative-destination -- a whole page load, on purpose
    window.location.assign(`/compare${qs.size ? `?${qs.toString().replace(/%2C/g, ",")}` : ""}`);
  };
  const slugs = selected.map((s) => s.slug);
  const move = (i: number, by: -1 | 1) => {
    const next = [...slugs];
    const a = next[i];
    const b = next[i + by];
    if (a === undefined || b === undefined) return;
    next[i] = b;
    next[i + by] = a;
    go(next);
  };
  const add = () => {
    const q = text.trim().toLowerCase();
    const hit =
      options.find((o) => o.title.toLowerCase() === q) ??
      options.find((o) => o.slug === q) ??
      options.find((o) => o.title.toLowerCase().includes(q));
    if (!q || !hit) return setError("Pick a pack from the list.");
    if (slugs.includes(hit.slug)) return setError("That pack is already compared.");
    setError(null);
    setText("");
    go([...slugs, hit.slug]);
  };
  return (
    <div className="card space-y-3" data-testid="compare-picker">
      <ol className="flex flex-wrap gap-2">
        {selected.map((s, i) => (
          <li
            key={s.slug}
            className="flex items-center gap-1 rounded-md border border-ink/15 bg-paper px-2 py-1 text-sm dark:border-night-line dark:bg-night"
          >
            <span className="num muted">{i + 1}.</span> <span>{s.title}</span>
            <button
              type="button"
              onClick={() => move(i, -1)}
              disabled={i === 0}
              aria-label={`Move ${s.title} left`}
              className="inline-flex min-h-7 min-w-7 items-center justify-center disabled:opacity-30"
            >
              ←
            </button>
            <button
              type="button"
              onClick={() => move(i, 1)}
              disabled={i === selected.length - 1}
              aria-label={`Move ${s.title} right`}
              className="inline-flex min-h-7 min-w-7 items-center justify-center disabled:opacity-30"
            >
              →
            </button>
            <button
              type="button"
              onClick={() => go(slugs.filter((x) => x !== s.slug))}
              aria-label={`Remove ${s.title}`}
              className="inline-flex min-h-7 min-w-7 items-center justify-center text-warn dark:text-[#ffb4ab]"
            >
              ×
            </button>
          </li>
        ))}
      </ol>
      {selected.length < MAX_COMPARE ? (
        <form
          className="flex flex-wrap items-end gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            add();
          }}
        >
          <label className="flex-1 space-y-1">
            <span className="text-xs font-medium">
              Add a pack ({selected.length} of {MAX_COMPARE})
            </span>
            <input
              list={listId}
              value={text}
              onChange={(e) => setText(e.target.value)}
              placeholder="Type a maker or model"
              name="add"
              className="w-full rounded-md border border-ink/20 bg-paper-raised px-2 py-1.5 text-sm dark:border-night-line dark:bg-night-sunk"
            />
            <datalist id={listId}>
              {options
                .filter((o) => !slugs.includes(o.slug))
                .map((o) => (
                  <option key={o.slug} value={o.title} />
                ))}
            </datalist>
          </label>
          <button
            type="submit"
            className="rounded-md bg-charge-500 px-3 py-1.5 text-sm font-medium text-night hover:bg-charge-400"
          >
            Add
          </button>
        </form>
      ) : (
        <p className="muted text-sm">Six packs is the most one comparison shows.</p>
      )}
      {error ? (
        <p role="alert" className="text-sm text-warn">
          {error}
        </p>
      ) : null}
    </div>
  );
}
