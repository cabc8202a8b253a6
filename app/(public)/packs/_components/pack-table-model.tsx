// The /packs table on the server: its columns defined and its row model built with @tanstack/react-table's table
// core (createTable, getCoreRowModel, flexRender — no hook, so it runs in a server component and inside a static
// island), drawn with the same cells as the browser's table (pack-table.tsx). None of this reaches the browser:
// the browser draws later pages with those cells directly. The rows arrive in the table's order from the one pack
// filter (server/pack-search.ts), which sorts across every page, so no client-side sorted row model is applied.
import "server-only";
import { Fragment } from "react";
import { createTable, flexRender, getCoreRowModel, type ColumnDef } from "@tanstack/react-table";
import type { PackParams } from "@/lib/pack-query-params";
import { PACK_COLUMNS, PackColumnHead, PackNameCell, PackNameHead, PackTable, PackValueCell } from "./pack-table";
import type { ApiPackPage, ApiPackRow } from "./types";

/** The table's columns: the pack (maker and model), then each figure column of PACK_COLUMNS. */
function packColumns(params: PackParams): ColumnDef<ApiPackRow>[] {
  return [
    {
      id: "pack",
      accessorFn: (r) => `${r.makerName} ${r.model}`,
      header: () => <PackNameHead params={params} />,
      cell: ({ row }) => <PackNameCell row={row.original} />,
    },
    ...PACK_COLUMNS.map((c): ColumnDef<ApiPackRow> => ({
      id: c.id,
      header: () => <PackColumnHead params={params} column={c} />,
      cell: ({ row }) => <PackValueCell row={row.original} column={c} />,
    })),
  ];
}

/** The header row and body of one page, from the table core's header groups and row model. */
export function packTableRows(page: ApiPackPage, params: PackParams) {
  const table = createTable<ApiPackRow>({
    data: page.data,
    columns: packColumns(params),
    getCoreRowModel: getCoreRowModel(),
    getRowId: (r) => r.slug,
    state: {},
    onStateChange: () => {},
    renderFallbackValue: null,
  });
  // The table core's own starting state (what useReactTable would keep in React state).
  table.setOptions((prev) => ({ ...prev, state: table.initialState }));
  const head = (table.getHeaderGroups()[0]?.headers ?? []).map((h) => (
    <Fragment key={h.id}>{flexRender(h.column.columnDef.header, h.getContext())}</Fragment>
  ));
  const body = table.getRowModel().rows.map((row) => (
    <tr key={row.id}>
      {row.getVisibleCells().map((cell) => (
        <Fragment key={cell.id}>{flexRender(cell.column.columnDef.cell, cell.getContext())}</Fragment>
      ))}
    </tr>
  ));
  return { head, body };
}

/** The packs table as the server draws it (the /packs page's static island). */
export function ServerPackTable({ page, params }: { page: ApiPackPage; params: PackParams }) {
  return <PackTable page={page} params={params} rows={packTableRows(page, params)} />;
}
