import { flexRender, type Row, type RowData, type Table } from "@tanstack/react-table";

declare module "@tanstack/react-table" {
  // Numbers align right; the table reads this per column. The augmentation must repeat the
  // library's own type parameters, used or not.
  // eslint-disable-next-line @typescript-eslint/no-unused-vars
  interface ColumnMeta<TData extends RowData, TValue> {
    numeric?: boolean;
  }
}

const SORT_WORDS = { asc: "ascending", desc: "descending" } as const;

/**
 * The markup of a TanStack table the feature has set up (its columns, sorting, filters and
 * selection stay with the feature): a header button per sortable column that says its order to
 * screen readers, numeric columns right-aligned in mono, and a line when no row is shown.
 */
export function DataTable<T>({ table, caption, empty, rowClassName }: { table: Table<T>; caption: string; empty: string; rowClassName?: (row: Row<T>) => string }) {
  const rows = table.getRowModel().rows;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id} className="text-left text-xs uppercase tracking-wider text-ink-300">
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                const title = flexRender(header.column.columnDef.header, header.getContext());
                return (
                  <th key={header.id} scope="col" aria-sort={sorted ? SORT_WORDS[sorted] : undefined} className={`pb-2 pr-4 font-medium ${header.column.columnDef.meta?.numeric ? "text-right" : ""}`}>
                    {header.column.getCanSort() ? (
                      <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 uppercase hover:text-ink-50">
                        {title}
                        <span aria-hidden="true" className={sorted ? "text-frost-300" : "text-ink-500"}>{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
                      </button>
                    ) : (
                      title
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.id} className={`border-t border-ink-800 align-top ${rowClassName?.(row) ?? ""}`}>
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className={`py-2.5 pr-4 ${cell.column.columnDef.meta?.numeric ? "text-right font-mono" : ""}`}>
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      {rows.length === 0 ? <p className="py-6 text-sm text-ink-300">{empty}</p> : null}
    </div>
  );
}
