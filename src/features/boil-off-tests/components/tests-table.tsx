import { getCoreRowModel, getFilteredRowModel, getSortedRowModel, useReactTable, type ColumnFiltersState, type SortingState } from "@tanstack/react-table";
import { useMemo, useState } from "react";
import type { TestSummary } from "../../../../shared/schemas/boil-off-test";
import { DataTable } from "../../../components/ui/data-table";
import { TextField } from "../../../components/ui/field";
import { useUnitSystem } from "../../../lib/unit-system";
import { testColumns } from "./tests-columns";

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
      <DataTable table={table} caption="Boil-off tests" empty={tests.length === 0 ? "No boil-off test yet." : "No test matches."} />
    </div>
  );
}
