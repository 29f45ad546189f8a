import { flexRender, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState, type Table, type VisibilityState } from "@tanstack/react-table";
import { useState } from "react";
import type { MaterialSummary } from "../../../../shared/schemas/material";
import { materialColumns } from "./material-columns";

const SORT_WORDS = { asc: "ascending", desc: "descending" } as const;

/** Show or hide columns; the name always stays, so every row can still be opened. */
function ColumnPicker({ table }: { table: Table<MaterialSummary> }) {
  return (
    <details className="relative">
      <summary className="cursor-pointer rounded-md border border-ink-600 bg-ink-800 px-2.5 py-1 text-sm text-ink-100 hover:border-ink-400">Columns</summary>
      <fieldset className="absolute right-0 z-10 mt-1 w-52 space-y-1.5 rounded-md border border-ink-600 bg-ink-900 p-3 shadow-lg shadow-black/40">
        <legend className="sr-only">Columns shown</legend>
        {table.getAllLeafColumns().filter((c) => c.getCanHide()).map((c) => (
          <label key={c.id} className="flex items-center gap-2 text-sm text-ink-100">
            <input type="checkbox" checked={c.getIsVisible()} onChange={c.getToggleVisibilityHandler()} className="accent-frost-400" />
            {String(c.columnDef.header)}
          </label>
        ))}
      </fieldset>
    </details>
  );
}

/**
 * The library's entries, sortable by any column (click a header) with a column picker. Rows
 * come already filtered by the server, so the CSV export can ask for exactly these.
 */
export function MaterialsTable({ materials, toolbar }: { materials: MaterialSummary[]; toolbar?: React.ReactNode }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "name", desc: false }]);
  const [columnVisibility, setColumnVisibility] = useState<VisibilityState>({ updatedAt: false });
  // TanStack Table returns fresh functions each render by design; the compiler lint knows this.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: materials,
    columns: materialColumns,
    state: { sorting, columnVisibility },
    onSortingChange: setSorting,
    onColumnVisibilityChange: setColumnVisibility,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center justify-end gap-2">
        {toolbar}
        <ColumnPicker table={table} />
      </div>
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <caption className="sr-only">Library entries; select a column header to sort</caption>
          <thead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id} className="text-left text-xs uppercase tracking-wider text-ink-300">
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th key={header.id} scope="col" className="pb-2 pr-4 font-medium" aria-sort={sorted ? SORT_WORDS[sorted] : undefined}>
                      <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 uppercase hover:text-ink-50">
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <span aria-hidden="true" className="w-3 text-frost-300">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : ""}</span>
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-t border-ink-800 align-top">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="py-2.5 pr-4 text-ink-200">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {materials.length === 0 ? <p className="py-6 text-sm text-ink-300">No entries match these filters.</p> : null}
      </div>
    </div>
  );
}
