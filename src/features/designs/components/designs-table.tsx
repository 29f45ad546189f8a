import {
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
import { DataTable } from "../../../components/ui/data-table";
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
      <DataTable table={table} caption="Designs" empty="No design matches." rowClassName={(row) => (row.getIsSelected() ? "bg-ink-800/60" : "")} />
    </div>
  );
}
