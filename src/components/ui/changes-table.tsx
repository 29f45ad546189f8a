import type { ReactNode } from "react";

export interface Change {
  key: string;
  /** The field's name as the reader knows it. */
  field: ReactNode;
  from: ReactNode;
  to: ReactNode;
}

/** Fields that differ between two versions of something, one row each, old struck through → new. */
export function ChangesTable({ caption, fromLabel, toLabel, changes }: { caption: string; fromLabel: string; toLabel: string; changes: Change[] }) {
  return (
    <table className="w-full text-sm">
      <caption className="sr-only">{caption}</caption>
      <thead>
        <tr className="text-left text-xs uppercase tracking-wider text-ink-300">
          <th scope="col" className="pb-2 pr-3 font-medium">Field</th>
          <th scope="col" className="pb-2 pr-3 font-medium">{fromLabel}</th>
          <th scope="col" className="pb-2 font-medium">{toLabel}</th>
        </tr>
      </thead>
      <tbody>
        {changes.map((c) => (
          <tr key={c.key} className="border-t border-ink-800 align-top">
            <th scope="row" className="py-1.5 pr-3 text-left font-normal text-ink-200">{c.field}</th>
            <td className="py-1.5 pr-3 font-mono text-xs text-ink-300 line-through decoration-ink-500">{c.from}</td>
            <td className="py-1.5 font-mono text-xs text-ink-50">
              <span aria-hidden="true">→ </span>
              {c.to}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
