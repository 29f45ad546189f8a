import { getCoreRowModel, getSortedRowModel, useReactTable, type SortingState, type Table, type VisibilityState } from "@tanstack/react-table";
import { useState } from "react";
import type { MaterialSummary } from "../../../../shared/schemas/material";
import { DataTable } from "../../../components/ui/data-table";
import { materialColumns } from "./material-columns";

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
      <DataTable table={table} caption="Library entries; select a column header to sort" empty="No entries match these filters." />
    </div>
  );
}
