import type { ImportPreview } from "../../../../shared/schemas/material";
import { ErrorIcon, SuccessIcon } from "../../../components/ui/icons";

/** Every row of the dry run, with its line in the file and each problem named by column. */
export function ImportPreviewTable({ preview }: { preview: ImportPreview }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm">
        <caption className="sr-only">Rows of the file and their problems</caption>
        <thead>
          <tr className="text-left text-xs uppercase tracking-wider text-ink-300">
            <th scope="col" className="pb-2 pr-4 font-medium">Line</th>
            <th scope="col" className="pb-2 pr-4 font-medium">Kind</th>
            <th scope="col" className="pb-2 pr-4 font-medium">Name</th>
            <th scope="col" className="pb-2 font-medium">Check</th>
          </tr>
        </thead>
        <tbody>
          {preview.rows.map((row) => (
            <tr key={row.line} className="border-t border-ink-800 align-top">
              <td className="py-2 pr-4 font-mono text-ink-200">{row.line}</td>
              <td className="py-2 pr-4 text-ink-200">{row.kind ?? "—"}</td>
              <th scope="row" className="py-2 pr-4 text-left font-normal text-ink-50">{row.name ?? "—"}</th>
              <td className="py-2">
                {row.problems.length === 0 ? (
                  <span className="inline-flex items-center gap-1.5 text-moss-300">
                    <SuccessIcon /> <span className="text-ink-100">Ready</span>
                  </span>
                ) : (
                  <ul className="space-y-1">
                    {row.problems.map((p, i) => (
                      <li key={i} className="flex items-start gap-1.5 text-fault-300">
                        <ErrorIcon className="mt-0.5 size-4" />
                        <span>
                          <span className="font-mono text-xs text-ink-200">{p.column}</span>: {p.message}
                        </span>
                      </li>
                    ))}
                  </ul>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
