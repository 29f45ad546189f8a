import { flexRender, getCoreRowModel, getFilteredRowModel, getSortedRowModel, useReactTable, type ColumnFiltersState, type SortingState } from "@tanstack/react-table";
import { useMemo, useState } from "react";
import type { TestSummary } from "../../../../shared/schemas/boil-off-test";
import { TextField } from "../../../components/ui/field";
import { useUnitSystem } from "../../../lib/unit-system";
import { testColumns } from "./tests-columns";

const SORT_WORDS = { asc: "ascending", desc: "descending" } as const;

/** Every boil-off test of the organization: sortable, filtered by vessel, newest first. */
export function TestsTable({ tests, hrefOf, threshold }: { tests: TestSummary[]; hrefOf: (id: string) => string; threshold?: number }) {
  const system = useUnitSystem();
  const [sorting, setSorting] = useState<SortingState>([{ id: "testedAt", desc: true }]);
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const columns = useMemo(() => testColumns({ system, hrefOf, threshold }), [system, hrefOf, threshold]);
  // As in the designs table: the compiler cannot memoize this hook's result, which is intended.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: tests,
    columns,
    state: { sorting, columnFilters },
    getRowId: (t) => t.id,
    onSortingChange: setSorting,
    onColumnFiltersChange: setColumnFilters,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  const vessel = table.getColumn("vesselLabel");

  return (
    <div className="space-y-4">
      <div className="w-64">
        <TextField label="Filter by vessel" value={(vessel?.getFilterValue() as string | undefined) ?? ""} onChange={(e) => vessel?.setFilterValue(e.target.value || undefined)} />
      </div>
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <caption className="sr-only">Boil-off tests</caption>
          <thead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id} className="text-left text-xs uppercase tracking-wider text-ink-300">
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th key={header.id} scope="col" aria-sort={sorted ? SORT_WORDS[sorted] : undefined} className={`pb-2 pr-4 font-medium ${header.column.columnDef.meta?.numeric ? "text-right" : ""}`}>
                      <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 uppercase hover:text-ink-50">
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <span aria-hidden="true">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
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
                  <td key={cell.id} className={`py-2.5 pr-4 ${cell.column.columnDef.meta?.numeric ? "text-right font-mono" : ""}`}>
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {table.getRowModel().rows.length === 0 ? <p className="py-6 text-sm text-ink-300">{tests.length === 0 ? "No boil-off test yet." : "No test matches."}</p> : null}
      </div>
    </div>
  );
}
