"use client";
// The packs table (TanStack Table). Sorting, filtering and paging happen on the server (manual modes);
// the table owns column visibility. Header sort controls are buttons, so the keyboard reaches them.
import {
  flexRender,
  getCoreRowModel,
  useReactTable,
  type ColumnDef,
  type VisibilityState,
} from "@tanstack/react-table";
import Link from "next/link";
import { useState } from "react";
import { fmt, labelSpec } from "@/lib/format";
import { PAGE_SIZES, writePackParams, type PackParams, type PackSortKey } from "@/lib/pack-query-params";
import type { ApiPackPage, ApiPackRow } from "./types";

type Change = (patch: Partial<PackParams>) => void;
type Meta = { sort: PackSortKey; numeric?: boolean; align?: "right" };

const dash = <span className="muted">—</span>;

function columns(): ColumnDef<ApiPackRow>[] {
  return [
    { id: "maker", header: "Maker", meta: { sort: "maker" } satisfies Meta, cell: ({ row }) => row.original.makerName },
    {
      id: "model",
      header: "Model",
      meta: { sort: "model" } satisfies Meta,
      cell: ({ row }) => (
        <a href={`/packs/${row.original.slug}`} className="font-medium">
          {row.original.model}
        </a>
      ),
    },
    {
      id: "cells",
      header: "S",
      meta: { sort: "cells", numeric: true, align: "right" } satisfies Meta,
      cell: ({ row }) => `${row.original.cellsInSeries}S`,
    },
    {
      id: "capacity",
      header: "Rated mAh",
      meta: { sort: "capacity", numeric: true, align: "right" } satisfies Meta,
      cell: ({ row }) => fmt(row.original.ratedCapacityMah),
    },
    {
      id: "labelledC",
      header: "Labelled C",
      meta: { sort: "labelledC", numeric: true, align: "right" } satisfies Meta,
      cell: ({ row }) => labelSpec(row.original).split(" ").pop(),
    },
    {
      id: "weight",
      header: "Weight g",
      meta: { sort: "weight", numeric: true, align: "right" } satisfies Meta,
      cell: ({ row }) => fmt(row.original.weightG),
    },
    {
      id: "connector",
      header: "Connector",
      meta: { sort: "connector" } satisfies Meta,
      cell: ({ row }) => row.original.connector,
    },
    {
      id: "results",
      header: "Results",
      meta: { sort: "results", numeric: true, align: "right" } satisfies Meta,
      cell: ({ row }) =>
        row.original.resultCount
          ? `${row.original.resultCount} in ${row.original.groupCount} group${row.original.groupCount === 1 ? "" : "s"}`
          : dash,
    },
    {
      id: "measuredC",
      header: "Sag-limited C (estimate)",
      meta: { sort: "measuredC", numeric: true, align: "right" } satisfies Meta,
      cell: ({ row }) => (row.original.measuredC === null ? dash : `${fmt(row.original.measuredC, 1)}C`),
    },
    {
      id: "labelRatio",
      header: "Label ratio (estimate ÷ label)",
      meta: { sort: "labelRatio", numeric: true, align: "right" } satisfies Meta,
      cell: ({ row }) => (row.original.labelRatio === null ? dash : fmt(row.original.labelRatio, 2)),
    },
    {
      id: "capacityRatio",
      header: "Capacity ratio",
      meta: { sort: "capacityRatio", numeric: true, align: "right" } satisfies Meta,
      cell: ({ row }) => (row.original.capacityRatio === null ? dash : fmt(row.original.capacityRatio, 2)),
    },
  ];
}

export function PackTable({
  page,
  params,
  loading,
  onChange,
  suggestedGroup = null,
}: {
  page: ApiPackPage;
  params: PackParams;
  loading: boolean;
  onChange?: Change;
  /** The group with the most packs, offered in one click when none is chosen. */
  suggestedGroup?: { key: string; label: string; packCount: number } | null;
}) {
  const hasGroup = params.group !== null;
  const [visibility, setVisibility] = useState<VisibilityState>({ capacityRatio: false });
  const table = useReactTable({
    data: page.data,
    columns: columns(),
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    pageCount: page.pageCount,
    state: { columnVisibility: visibility },
    onColumnVisibilityChange: setVisibility,
    getRowId: (r) => r.slug,
  });
  const sortBy = (m: Meta) => {
    if (params.sort === m.sort) onChange?.({ dir: params.dir === "asc" ? "desc" : "asc", page: 1 });
    // Numbers start high-to-low (the usual question is "which is best"), words A–Z.
    else onChange?.({ sort: m.sort, dir: m.numeric ? "desc" : "asc", page: 1 });
  };

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-2 text-sm">
        <p aria-live="polite" data-testid="pack-count">
          {loading ? "Loading packs…" : `${page.total} pack${page.total === 1 ? "" : "s"}`}
          {hasGroup ? null : (
            <span className="muted"> · choose a like-for-like group to fill the measured columns</span>
          )}
        </p>
        {!hasGroup && suggestedGroup ? (
          // A link (the state is in the URL), so it works before the page's script has loaded too.
          <Link
            href={`/packs?${writePackParams({ ...params, group: suggestedGroup.key, page: 1 }).toString()}`}
            scroll={false}
            data-testid="suggested-group"
            className="rounded border border-cell-500/40 px-2 py-1 text-left text-cell-700 no-underline hover:bg-cell-50 hover:no-underline dark:text-cell-100 dark:hover:bg-cell-700/20"
          >
            Fill them from the most tested group: {suggestedGroup.label} ({suggestedGroup.packCount} packs)
          </Link>
        ) : null}
        <details className="relative">
          <summary className="cursor-pointer rounded border border-ink/20 px-2 py-1 dark:border-night-line">
            Columns
          </summary>
          <fieldset className="card absolute right-0 z-20 mt-1 w-60 space-y-1">
            <legend className="sr-only">Show columns</legend>
            {table.getAllLeafColumns().map((c) => (
              <label key={c.id} className="flex items-center gap-2">
                <input
                  type="checkbox"
                  checked={c.getIsVisible()}
                  onChange={c.getToggleVisibilityHandler()}
                  disabled={c.id === "model"}
                />
                {String(c.columnDef.header)}
              </label>
            ))}
          </fieldset>
        </details>
      </div>
      <div
        className={`-mx-4 overflow-x-auto px-4 transition-opacity ${loading ? "opacity-50" : ""}`}
        aria-busy={loading}
        tabIndex={0}
        role="region"
        aria-label="Packs table"
      >
        <table className="w-full min-w-[52rem] border-collapse text-sm" data-testid="packs-table">
          <caption className="sr-only">
            Packs{hasGroup ? ", with medians in the chosen like-for-like group" : ""}. Column headers sort the table.
          </caption>
          <thead>
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id} className="border-b border-ink/15 dark:border-night-line">
                {hg.headers.map((h) => {
                  const m = h.column.columnDef.meta as Meta;
                  const active = params.sort === m.sort;
                  return (
                    <th
                      key={h.id}
                      scope="col"
                      aria-sort={active ? (params.dir === "asc" ? "ascending" : "descending") : "none"}
                      className={`px-2 py-2 align-bottom font-medium ${m.align === "right" ? "text-right" : "text-left"}`}
                    >
                      <button
                        type="button"
                        onClick={() => sortBy(m)}
                        className={`inline-flex items-center gap-1 rounded px-1 text-left hover:bg-paper-sunk dark:hover:bg-night-sunk ${active ? "text-cell-600 dark:text-cell-400" : ""}`}
                      >
                        {flexRender(h.column.columnDef.header, h.getContext())}
                        <span aria-hidden="true" className="text-xs">
                          {active ? (params.dir === "asc" ? "▲" : "▼") : "↕"}
                        </span>
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr
                key={row.id}
                className="border-b border-ink/5 hover:bg-paper-sunk/60 dark:border-night-line/60 dark:hover:bg-night-sunk/60"
              >
                {row.getVisibleCells().map((cell) => {
                  const m = cell.column.columnDef.meta as Meta;
                  return (
                    <td
                      key={cell.id}
                      className={`whitespace-nowrap px-2 py-1.5 ${m.align === "right" ? "num text-right" : ""}`}
                    >
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
        {!loading && page.data.length === 0 ? (
          <p className="muted py-8 text-center" data-testid="packs-empty">
            No packs match these filters.{" "}
            <button
              type="button"
              className="underline"
              onClick={() =>
                onChange?.({
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
                })
              }
            >
              Clear filters
            </button>
          </p>
        ) : null}
      </div>
      <nav aria-label="Pages" className="flex flex-wrap items-center justify-between gap-2 text-sm">
        <div className="flex items-center gap-2">
          <button
            type="button"
            className="rounded border border-ink/20 px-2 py-1 disabled:opacity-40 dark:border-night-line"
            disabled={page.page <= 1}
            onClick={() => onChange?.({ page: page.page - 1 })}
          >
            ← Previous
          </button>
          <span className="num">
            Page {page.page} of {page.pageCount}
          </span>
          <button
            type="button"
            className="rounded border border-ink/20 px-2 py-1 disabled:opacity-40 dark:border-night-line"
            disabled={page.page >= page.pageCount}
            onClick={() => onChange?.({ page: page.page + 1 })}
          >
            Next →
          </button>
        </div>
        <label className="flex items-center gap-2">
          Per page
          <select
            value={params.size}
            onChange={(e) => onChange?.({ size: Number(e.target.value), page: 1 })}
            className="rounded border border-ink/20 bg-paper-raised px-1 py-0.5 dark:border-night-line dark:bg-night-sunk"
          >
            {PAGE_SIZES.map((s) => (
              <option key={s} value={s}>
                {s}
              </option>
            ))}
          </select>
        </label>
      </nav>
    </div>
  );
}
