// The packs table as plain markup: the server renders the first page into a static island, the client renders
// filtered pages with the same component. Sorting, paging and "clear filters" are buttons carrying data-*
// attributes that packs-client.tsx handles for the whole table (so the markup needs no script of its own).
// The pack's name stays in a sticky first column while the figures scroll beside it on a phone.
import { Qty, UnitSymbol } from "@/components/quantity";
import { fmt, fmtC, fmtLabelledC, fmtRatio } from "@/lib/format";
import type { PackParams, PackSortKey } from "@/lib/pack-query-params";
import type { ApiPackPage, ApiPackRow } from "./types";

type Column = {
  id: string;
  header: React.ReactNode;
  /** Words for the "Columns" menu. */
  name: string;
  sort: PackSortKey;
  numeric?: boolean;
  cell: (r: ApiPackRow) => React.ReactNode;
};

const dash = <span className="muted">—</span>;

export const PACK_COLUMNS: Column[] = [
  { id: "cells", header: "S", name: "Cells (S)", sort: "cells", numeric: true, cell: (r) => `${r.cellsInSeries}S` },
  {
    id: "capacity",
    header: "Rated mAh",
    name: "Rated mAh",
    sort: "capacity",
    numeric: true,
    cell: (r) => fmt(r.ratedCapacityMah),
  },
  {
    id: "labelledC",
    header: (
      <>
        Labelled C<span className="block text-xs font-normal">continuous/burst</span>
      </>
    ),
    name: "Labelled C",
    sort: "labelledC",
    numeric: true,
    cell: (r) =>
      r.labelledBurstC
        ? `${fmtLabelledC(r.labelledContinuousC)}/${fmtLabelledC(r.labelledBurstC)}`
        : fmtLabelledC(r.labelledContinuousC),
  },
  {
    id: "weight",
    header: (
      <>
        Weight, <UnitSymbol q="mass" />
      </>
    ),
    name: "Weight",
    sort: "weight",
    numeric: true,
    cell: (r) => <Qty q="mass" v={r.weightG} digits={0} bare />,
  },
  { id: "connector", header: "Connector", name: "Connector", sort: "connector", cell: (r) => r.connector },
  {
    id: "results",
    header: "Results",
    name: "Results",
    sort: "results",
    numeric: true,
    cell: (r) => (r.resultCount ? `${r.resultCount} in ${r.groupCount} group${r.groupCount === 1 ? "" : "s"}` : dash),
  },
  {
    id: "measuredC",
    header: (
      <>
        Sag-limited C<span className="block text-xs font-normal">estimate, median</span>
      </>
    ),
    name: "Sag-limited C",
    sort: "measuredC",
    numeric: true,
    cell: (r) => (r.measuredC === null ? dash : fmtC(r.measuredC)),
  },
  {
    id: "labelRatio",
    header: (
      <>
        Label ratio<span className="block text-xs font-normal">estimate</span>
      </>
    ),
    name: "Label ratio (estimate ÷ label)",
    sort: "labelRatio",
    numeric: true,
    cell: (r) => (r.labelRatio === null ? dash : fmtRatio(r.labelRatio)),
  },
  {
    id: "capacityRatio",
    header: "Capacity ratio",
    name: "Capacity ratio",
    sort: "capacityRatio",
    numeric: true,
    cell: (r) => (r.capacityRatio === null ? dash : fmtRatio(r.capacityRatio)),
  },
];

function SortButton({
  params,
  sort,
  numeric,
  children,
}: {
  params: PackParams;
  sort: PackSortKey;
  numeric?: boolean;
  children: React.ReactNode;
}) {
  const active = params.sort === sort;
  // Numbers start high-to-low (the usual question is "which is best"), words A–Z.
  const next = active ? (params.dir === "asc" ? "desc" : "asc") : numeric ? "desc" : "asc";
  return (
    <button type="button" data-sort={sort} data-dir={next} className={`sort${active ? " on" : ""}`}>
      <span>{children}</span>
      <span aria-hidden="true" className="text-xs">
        {active ? (params.dir === "asc" ? "▲" : "▼") : "↕"}
      </span>
    </button>
  );
}

const ariaSort = (params: PackParams, sort: PackSortKey) =>
  params.sort === sort ? (params.dir === "asc" ? "ascending" : "descending") : "none";

export function PackTable({
  page,
  params,
  loading = false,
}: {
  page: ApiPackPage;
  params: PackParams;
  loading?: boolean;
}) {
  const hasGroup = params.group !== null;
  return (
    <div className="space-y-3">
      <p aria-live="polite" data-testid="pack-count" className="text-sm">
        {loading ? "Loading packs…" : `${page.total} pack${page.total === 1 ? "" : "s"}`}
      </p>
      <div
        className={`packs-scroll ${loading ? "opacity-50" : ""}`}
        aria-busy={loading}
        tabIndex={0}
        role="region"
        aria-label="Packs table"
      >
        <table className="packs" data-testid="packs-table">
          <caption className="sr-only">
            Packs{hasGroup ? ", with medians in the chosen like-for-like group" : ""}. Column headers sort the table;
            the pack column stays in view while the others scroll.
          </caption>
          <thead>
            <tr>
              <th scope="col" className="pack" aria-sort={ariaSort(params, "maker")}>
                <SortButton params={params} sort="maker">
                  Pack
                </SortButton>
              </th>
              {PACK_COLUMNS.map((c) => (
                <th
                  key={c.id}
                  scope="col"
                  className={`c-${c.id}${c.numeric ? " n" : ""}`}
                  aria-sort={ariaSort(params, c.sort)}
                >
                  <SortButton params={params} sort={c.sort} numeric={c.numeric}>
                    {c.header}
                  </SortButton>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {page.data.map((r) => (
              <tr key={r.slug}>
                <th scope="row" className="pack">
                  <span className="muted block text-xs">{r.makerName}</span>
                  <a href={`/packs/${r.slug}`} className="font-medium">
                    {r.model}
                  </a>
                </th>
                {PACK_COLUMNS.map((c) => (
                  <td key={c.id} className={`c-${c.id}${c.numeric ? " n" : ""}`}>
                    {c.cell(r)}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {!loading && page.data.length === 0 ? (
          <p className="muted py-8 text-center" data-testid="packs-empty">
            No packs match these filters.{" "}
            <button type="button" className="underline" data-clear="">
              Clear filters
            </button>
          </p>
        ) : null}
      </div>
      <nav aria-label="Pages" className="flex flex-wrap items-center justify-between gap-2 text-sm">
        <div className="flex items-center gap-2">
          <button
            type="button"
            className="btn-sm disabled:opacity-40"
            disabled={page.page <= 1}
            data-page={page.page - 1}
          >
            ← Previous
          </button>
          <span className="num">
            Page {page.page} of {page.pageCount}
          </span>
          <button
            type="button"
            className="btn-sm disabled:opacity-40"
            disabled={page.page >= page.pageCount}
            data-page={page.page + 1}
          >
            Next →
          </button>
        </div>
      </nav>
    </div>
  );
}
