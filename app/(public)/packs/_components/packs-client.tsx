"use client";
// /packs: the URL is the one source of truth for the filters. Every change reads the URL as it is at that
// moment, merges its patch in and writes it back (history.pushState, or replaceState while a search is refined),
// so changes made in quick succession build on each other and never on an older render. The page the URL asked
// for when it was opened is the server's static island (rendered from the search params); any other page comes
// from the public API and is drawn by the same markup.
import { useEffect, useRef, useState, useSyncExternalStore, type ReactNode } from "react";
import { PACK_SORT_KEYS, PAGE_SIZES, readPackParams, writePackParams, type PackParams } from "@/lib/pack-query-params";
import { PackFilters } from "./pack-filters";
import { PACK_COLUMNS, PackTable } from "./pack-table";
import type { ApiPackList, ApiPackPage, FilterOptions } from "./types";

const URL_EVENT = "sagline:url";
const subscribe = (fn: () => void) => {
  window.addEventListener("popstate", fn);
  window.addEventListener(URL_EVENT, fn);
  return () => {
    window.removeEventListener("popstate", fn);
    window.removeEventListener(URL_EVENT, fn);
  };
};
/** The filters in the address bar, written canonically (on the server: the query the page was rendered for). */
const useCanonicalQuery = (initialQuery: string) =>
  useSyncExternalStore(
    subscribe,
    () => writePackParams(readPackParams(new URLSearchParams(window.location.search))).toString(),
    () => initialQuery,
  );

/** Merges a patch into the URL as it is now; refining a search word by word replaces the entry. */
function changeFilters(patch: Partial<PackParams>, mode: "push" | "replace" = "push") {
  const now = new URLSearchParams(window.location.search);
  const base = readPackParams(now);
  const next = { ...base, ...patch };
  const how = mode === "replace" && base.q !== "" && next.q !== "" ? "replace" : "push";
  const qs = writePackParams(next);
  // Parameters that are not filters (the reader's units) stay.
  const units = now.get("units");
  if (units) qs.set("units", units);
  const url = `${window.location.pathname}${qs.size ? `?${qs}` : ""}`;
  if (how === "replace") window.history.replaceState(window.history.state, "", url);
  else window.history.pushState(window.history.state, "", url);
  window.dispatchEvent(new Event(URL_EVENT));
}

type Fetched = { key: string; page: ApiPackPage | null; error: string | null };

/** The first click in the server's table swaps it for the client's: the same control there takes the focus. */
let refocusIndex: number | null = null;

function onTableClick(e: React.MouseEvent<HTMLElement>) {
  const el = (e.target as Element).closest<HTMLButtonElement>(
    "button[data-sort], button[data-page], button[data-clear]",
  );
  if (!el || el.disabled) return;
  if (el.closest("[data-k]")) refocusIndex = [...e.currentTarget.querySelectorAll("button")].indexOf(el);
  const d = el.dataset;
  const sort = PACK_SORT_KEYS.find((k) => k === d.sort);
  if (sort) changeFilters({ sort, dir: d.dir === "desc" ? "desc" : "asc", page: 1 });
  else if (d.page) changeFilters({ page: Number(d.page) });
  else
    changeFilters({
      q: "",
      cells: null,
      minMah: null,
      maxMah: null,
      minC: null,
      maxC: null,
      minG: null,
      maxG: null,
      connector: null,
      maker: null,
      group: null,
      page: 1,
    });
}

export function PacksClient({
  first,
  options,
  initialQuery,
  initialError,
}: {
  first: ReactNode;
  options: FilterOptions;
  /** The canonical query (writePackParams) the server rendered `first` for. */
  initialQuery: string;
  /** The server's message for that query (unknown group, page past the last), if any. */
  initialError: string | null;
}) {
  const canonical = useCanonicalQuery(initialQuery);
  const params = readPackParams(new URLSearchParams(canonical));
  const [fetched, setFetched] = useState<Fetched>({ key: initialQuery, page: null, error: initialError });
  const [hidden, setHidden] = useState<string[]>(["capacityRatio"]);
  // The server's page shows until the reader changes a filter; back on that query, the API answers like for any page.
  const [filtered, setFiltered] = useState(false);
  if (canonical !== initialQuery && !filtered) setFiltered(true);
  const island = canonical === initialQuery && !filtered;

  useEffect(() => {
    if (island) return;
    const ctrl = new AbortController();
    fetch(`/api/v1/packs?${canonical}`, { signal: ctrl.signal, headers: { Accept: "application/json" } })
      .then(async (res) => {
        if (!res.ok)
          throw new Error(
            res.status === 429
              ? "Too many requests — wait a moment and try again."
              : res.status === 422 && params.page > 1
                ? `There is no page ${params.page} of these packs: go back to page 1.`
                : "The packs could not be loaded. Try again, or clear the filters.",
          );
        const { data, meta } = (await res.json()) as ApiPackList;
        setFetched({
          key: canonical,
          page: { data, page: meta.page, pageCount: meta.pageCount, total: meta.total },
          error: null,
        });
      })
      .catch((err: unknown) => {
        if (ctrl.signal.aborted) return;
        setFetched({ key: canonical, page: null, error: err instanceof Error ? err.message : String(err) });
      });
    return () => ctrl.abort();
  }, [canonical, island, params.page]);

  const loading = !island && fetched.key !== canonical;
  const tableBox = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (island || refocusIndex === null) return;
    tableBox.current?.querySelectorAll("button")[refocusIndex]?.focus();
    refocusIndex = null;
  }, [island]);
  const suggested = options.groups[0] ?? null;
  return (
    <div className="space-y-4">
      <PackFilters params={params} options={options} onChange={changeFilters} />
      {fetched.error && fetched.key === canonical ? (
        <p role="alert" className="rounded-md border border-warn/40 bg-warn-soft px-3 py-2 text-sm text-warn">
          {fetched.error}
        </p>
      ) : null}
      <div className="flex flex-wrap items-center justify-between gap-2 text-sm">
        {params.group === null ? (
          <p className="muted">Choose a like-for-like group to fill the measured columns.</p>
        ) : (
          <span />
        )}
        {params.group === null && suggested ? (
          // A link (the state is in the URL), so it works before the page's script has loaded too.
          <a
            href={`/packs?${writePackParams({ ...params, group: suggested.key, page: 1 }).toString()}`}
            onClick={(e) => {
              e.preventDefault();
              changeFilters({ group: suggested.key, page: 1 });
            }}
            data-testid="suggested-group"
            className="rounded border border-cell-500/40 px-2 py-1 text-left text-cell-700 no-underline hover:bg-cell-50 hover:no-underline dark:text-cell-100 dark:hover:bg-cell-700/20"
          >
            Fill them from the most tested group: {suggested.label} ({suggested.packCount} packs)
          </a>
        ) : null}
        <details className="menu">
          <summary className="btn-sm">Columns</summary>
          <fieldset className="menu-panel w-60 space-y-1">
            <legend className="sr-only">Show columns</legend>
            {PACK_COLUMNS.map((c) => (
              <label key={c.id} className="flex items-center gap-2">
                <input
                  type="checkbox"
                  checked={!hidden.includes(c.id)}
                  onChange={(e) => setHidden((h) => (e.target.checked ? h.filter((x) => x !== c.id) : [...h, c.id]))}
                />
                {c.name}
              </label>
            ))}
          </fieldset>
        </details>
      </div>
      {/* The hidden columns are a class on the wrapper, so the static island obeys them as well. */}
      <div ref={tableBox} onClick={onTableClick} className={hidden.map((h) => `hide-${h}`).join(" ")}>
        {island ? (
          first
        ) : (
          <PackTable
            page={fetched.key === canonical && fetched.page ? fetched.page : emptyPage(params)}
            params={params}
            loading={loading}
          />
        )}
      </div>
      <label className="flex items-center justify-end gap-2 text-sm">
        Per page
        <select
          value={params.size}
          onChange={(e) => changeFilters({ size: Number(e.target.value), page: 1 })}
          className="input py-0.5"
        >
          {PAGE_SIZES.map((s) => (
            <option key={s} value={s}>
              {s}
            </option>
          ))}
        </select>
      </label>
    </div>
  );
}

const emptyPage = (p: PackParams): ApiPackPage => ({
  data: [],
  page: p.page,
  pageCount: 1,
  total: 0,
});
