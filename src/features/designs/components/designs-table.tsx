import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnFiltersState,
  type RowSelectionState,
  type SortingState,
} from "@tanstack/react-table";
import { useMemo, useState, type ReactNode } from "react";
import type { DesignSummary } from "../../../../shared/schemas/design";
import { TextField } from "../../../components/ui/field";
import { useUnitSystem } from "../../../lib/unit-system";
import { designColumns } from "./designs-columns";

export const MAX_COMPARED = 6;

type DesignsTableProps = {
  designs: DesignSummary[];
  hrefOf: (id: string) => string;
  /** Row actions for editors (duplicate); null for read-only roles. */
  rowActions: ((design: DesignSummary) => ReactNode) | null;
  /** The selection bar: what to do with the picked rows (compare 2–6). */
  selectionActions: (picked: DesignSummary[]) => ReactNode;
};

const SORT_WORDS = { asc: "ascending", desc: "descending" } as const;

/** The designs list: sortable columns, a vessel filter, and row picks for Compare. */
export function DesignsTable({ designs, hrefOf, rowActions, selectionActions }: DesignsTableProps) {
  const system = useUnitSystem();
  const [sorting, setSorting] = useState<SortingState>([{ id: "updatedAt", desc: true }]);
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const [rowSelection, setRowSelection] = useState<RowSelectionState>({});
  const columns = useMemo(() => designColumns({ system, hrefOf, rowActions }), [system, hrefOf, rowActions]);

  // The compiler cannot memoize this hook's result (it returns functions that change); the table
  // re-renders with its state, which is what we want here.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: designs,
    columns,
    state: { sorting, columnFilters, rowSelection },
    getRowId: (d) => d.id,
    onSortingChange: setSorting,
    onColumnFiltersChange: setColumnFilters,
    onRowSelectionChange: setRowSelection,
    enableRowSelection: (row) => row.getIsSelected() || Object.keys(rowSelection).length < MAX_COMPARED,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  const picked = designs.filter((d) => rowSelection[d.id]);
  const vessel = table.getColumn("vesselLabel");

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div className="w-64">
          <TextField label="Filter by vessel" value={(vessel?.getFilterValue() as string | undefined) ?? ""} onChange={(e) => vessel?.setFilterValue(e.target.value || undefined)} />
        </div>
        <div className="flex flex-wrap items-center gap-3" aria-live="polite">
          <span className="text-sm text-ink-300">
            {picked.length === 0 ? `Pick 2 to ${MAX_COMPARED} designs to compare them.` : `${picked.length} picked${picked.length === MAX_COMPARED ? " (the most Compare takes)" : ""}.`}
          </span>
          {selectionActions(picked)}
        </div>
      </div>
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <caption className="sr-only">Designs</caption>
          <thead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id} className="text-left text-xs uppercase tracking-wider text-ink-300">
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th key={header.id} scope="col" aria-sort={sorted ? SORT_WORDS[sorted] : undefined} className={`pb-2 pr-4 font-medium ${header.column.columnDef.meta?.numeric ? "text-right" : ""}`}>
                      {header.column.getCanSort() ? (
                        <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 uppercase hover:text-ink-50">
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <span aria-hidden="true">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
                        </button>
                      ) : (
                        flexRender(header.column.columnDef.header, header.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className={`border-t border-ink-800 align-top ${row.getIsSelected() ? "bg-ink-800/60" : ""}`}>
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className={`py-2.5 pr-4 ${cell.column.columnDef.meta?.numeric ? "text-right font-mono" : ""}`}>
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {table.getRowModel().rows.length === 0 ? <p className="py-6 text-sm text-ink-300">No design matches.</p> : null}
      </div>
    </div>
  );
}
