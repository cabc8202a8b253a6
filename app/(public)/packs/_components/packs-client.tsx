"use client";
// The /packs state lives in the URL: reading it here, writing it with router.push (so the back button
// walks through filters), and fetching anything but the server-rendered first page from the public API.
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useEffect, useMemo, useRef, useState } from "react";
import { isDefaultPackParams, readPackParams, writePackParams, type PackParams } from "@/lib/pack-query-params";
import { PackFilters } from "./pack-filters";
import { PackTable } from "./pack-table";
import type { ApiPackList, ApiPackPage, FilterOptions } from "./types";

export function PacksView({
  params,
  page,
  options,
  loading = false,
  error = null,
  onChange,
}: {
  params: PackParams;
  page: ApiPackPage;
  options: FilterOptions;
  loading?: boolean;
  error?: string | null;
  onChange?: (patch: Partial<PackParams>, mode?: "push" | "replace") => void;
}) {
  return (
    <div className="space-y-4">
      <PackFilters params={params} options={options} onChange={onChange} />
      {error ? (
        <p role="alert" className="rounded-md border border-warn/40 bg-warn-soft px-3 py-2 text-sm text-warn">
          {error}
        </p>
      ) : null}
      <PackTable
        page={page}
        params={params}
        loading={loading}
        onChange={onChange}
        suggestedGroup={options.groups[0] ?? null}
      />
    </div>
  );
}

export function PacksClient({ initial, options }: { initial: ApiPackPage; options: FilterOptions }) {
  const router = useRouter();
  const pathname = usePathname();
  const search = useSearchParams();
  const key = search.toString();
  const params = useMemo(() => readPackParams(new URLSearchParams(key)), [key]);
  const canonical = writePackParams(params).toString();
  const isDefault = isDefaultPackParams(params);
  // The default view is the server-rendered first page; any other comes from the API.
  const [fetched, setFetched] = useState<{ key: string; page: ApiPackPage; error: string | null }>({
    key: "",
    page: initial,
    error: null,
  });
  const shown = isDefault ? { page: initial, error: null } : fetched;
  const loading = !isDefault && fetched.key !== canonical;

  useEffect(() => {
    if (isDefault) return;
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
        setFetched((s) => ({
          key: canonical,
          page: { ...s.page, data: [], total: 0 },
          error: err instanceof Error ? err.message : String(err),
        }));
      });
    return () => ctrl.abort();
  }, [canonical, isDefault, params.page]);

  // Filters changed in quick succession (a second box typed in before the first reached the URL) build on
  // each other, never on the URL of an earlier render: `heading` holds where the page is going. It follows
  // the URL once the URL shows what was asked, or when the URL moves some other way (the back button).
  const heading = useRef<{ params: PackParams; sent: Set<string> }>({ params, sent: new Set() });
  useEffect(() => {
    const h = heading.current;
    if (!h.sent.has(canonical) || writePackParams(h.params).toString() === canonical)
      heading.current = { params, sent: new Set() };
  }, [canonical, params]);

  const onChange = (patch: Partial<PackParams>, mode: "push" | "replace" = "push") => {
    const base = heading.current.params;
    const next = { ...base, ...patch };
    // Refining a search word by word replaces the entry; starting or clearing one adds it.
    const how = mode === "replace" && base.q !== "" && next.q !== "" ? "replace" : "push";
    const qs = writePackParams(next).toString();
    heading.current = { params: next, sent: new Set([...heading.current.sent, qs]) };
    router[how](qs ? `${pathname}?${qs}` : pathname, { scroll: false });
  };

  return (
    <PacksView
      params={params}
      page={shown.page}
      options={options}
      loading={loading}
      error={shown.error}
      onChange={onChange}
    />
  );
}
