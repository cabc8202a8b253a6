"use client";
// Add, remove and reorder the compared packs; the list lives in the URL (?packs=a,b,c&group=…). Each change
// loads the page whole: its table and charts are static islands (components/static-island.tsx), sent once in the
// HTML rather than again in a client navigation's payload. The packs to add are searched as the reader types
// (GET /api/v1/packs?q=…, the one pack search), so the page never carries the whole catalogue.
import { useEffect, useId, useState } from "react";
import { MAX_COMPARE } from "@/lib/compare-limits";

type Option = { slug: string; title: string };

/** How many matches the list under the box offers. */
const SUGGESTED = 12;

/** The packs matching `text`, best first, from the public API (an empty list when it cannot answer). */
async function searchPacks(text: string, signal?: AbortSignal): Promise<Option[]> {
  const qs = new URLSearchParams({ q: text, size: String(SUGGESTED) });
  const res = await fetch(`/api/v1/packs?${qs.toString()}`, { signal }).catch(() => null);
  if (!res?.ok) return [];
  const body: unknown = await res.json().catch(() => null);
  const data = typeof body === "object" && body !== null && "data" in body && Array.isArray(body.data) ? body.data : [];
  return data.flatMap((d: unknown) =>
    typeof d === "object" &&
    d !== null &&
    "slug" in d &&
    "makerName" in d &&
    "model" in d &&
    typeof d.slug === "string" &&
    typeof d.makerName === "string" &&
    typeof d.model === "string"
      ? [{ slug: d.slug, title: `${d.makerName} ${d.model}` }]
      : [],
  );
}

export function ComparePicker({ selected, group }: { selected: Option[]; group: string | null }) {
  const listId = useId();
  const [text, setText] = useState("");
  const [options, setOptions] = useState<Option[]>([]);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    const q = text.trim();
    if (q.length < 2) return;
    const ctl = new AbortController();
    const t = setTimeout(() => void searchPacks(q, ctl.signal).then(setOptions), 200);
    return () => {
      clearTimeout(t);
      ctl.abort();
    };
  }, [text]);
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
  const add = async () => {
    const q = text.trim().toLowerCase();
    if (q.length < 2) return setError("Type two or more letters of a maker or model, then pick a pack.");
    // Searched again on sending, so a list from earlier typing never decides.
    const found = await searchPacks(q);
    const hit =
      found.find((o) => o.title.toLowerCase() === q) ??
      found.find((o) => o.slug === q) ??
      found.find((o) => o.title.toLowerCase().includes(q)) ??
      (found.length === 1 ? found[0] : undefined);
    if (!hit) return setError("Pick a pack from the list.");
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
            void add();
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
