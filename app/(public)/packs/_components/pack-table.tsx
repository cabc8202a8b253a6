// The packs table as plain markup: the server renders the first page into a static island (its header row and
// body laid out from a @tanstack/react-table row model, pack-table-model.tsx), the client renders later pages with
// the same cells. Sorting, paging and "clear filters" are buttons carrying data-*
// attributes that packs-client.tsx handles for the whole table (so the markup needs no script of its own).
// The pack's name stays in a sticky first column while the figures scroll beside it on a phone.
import { Qty, UnitSymbol } from "@/components/quantity";
import { fmt, fmtC, fmtLabelledC, fmtRatio } from "@/lib/format";
import type { PackParams, PackSortKey } from "@/lib/pack-query-params";
import type { ApiPackPage, ApiPackRow } from "./types";

export type Column = {
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

/** The sortable "Pack" column's header. */
export function PackNameHead({ params }: { params: PackParams }) {
  return (
    <th scope="col" className="pack" aria-sort={ariaSort(params, "maker")}>
      <SortButton params={params} sort="maker">
        Pack
      </SortButton>
    </th>
  );
}

/** A figure column's header. */
export function PackColumnHead({ params, column: c }: { params: PackParams; column: Column }) {
  return (
    <th scope="col" className={`c-${c.id}${c.numeric ? " n" : ""}`} aria-sort={ariaSort(params, c.sort)}>
      <SortButton params={params} sort={c.sort} numeric={c.numeric}>
        {c.header}
      </SortButton>
    </th>
  );
}

/** A row's first cell: maker and model, linked to the pack's page. */
export function PackNameCell({ row: r }: { row: ApiPackRow }) {
  return (
    <th scope="row" className="pack">
      <span className="muted block text-xs">{r.makerName}</span>
      <a href={`/packs/${r.slug}`} className="font-medium">
        {r.model}
      </a>
    </th>
  );
}

/** A row's figure in one column. */
export function PackValueCell({ row, column: c }: { row: ApiPackRow; column: Column }) {
  return <td className={`c-${c.id}${c.numeric ? " n" : ""}`}>{c.cell(row)}</td>;
}

/**
 * The table, its count and its pages. `rows` are the header row and body the server builds from its row model
 * (pack-table-model.tsx, @tanstack/react-table, never sent to the browser); without them (in the browser) the
 * same cells are laid out here from the page's rows directly.
 */
export function PackTable({
  page,
  params,
  loading = false,
  rows,
}: {
  page: ApiPackPage;
  params: PackParams;
  loading?: boolean;
  rows?: { head: React.ReactNode; body: React.ReactNode };
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
              {rows ? (
                rows.head
              ) : (
                <>
                  <PackNameHead params={params} />
                  {PACK_COLUMNS.map((c) => (
                    <PackColumnHead key={c.id} params={params} column={c} />
                  ))}
                </>
              )}
            </tr>
          </thead>
          <tbody>
            {rows
              ? rows.body
              : page.data.map((r) => (
                  <tr key={r.slug}>
                    <PackNameCell row={r} />
                    {PACK_COLUMNS.map((c) => (
                      <PackValueCell key={c.id} row={r} column={c} />
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
