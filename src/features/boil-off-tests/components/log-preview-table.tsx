import type { LogPreview } from "../../../../shared/schemas/boil-off-test";

type Roles = { time?: string; value?: string; pressure?: string };

/** The file's first rows as read, with the mapped columns marked in the header. */
export function LogPreviewTable({ preview, roles }: { preview: LogPreview; roles: Roles }) {
  const roleOf = (name: string) => (name === roles.time ? "time" : name === roles.value ? "value" : name === roles.pressure ? "pressure" : null);
  return (
    <div className="max-h-72 overflow-auto rounded-md border border-ink-700">
      <table className="w-full text-xs">
        <caption className="sr-only">First rows of the logger file</caption>
        <thead className="sticky top-0 bg-ink-800">
          <tr>
            <th scope="col" className="px-2 py-1.5 text-left font-medium text-ink-300">Line</th>
            {preview.header.map((name, i) => {
              const role = roleOf(name);
              return (
                <th key={`${i}-${name}`} scope="col" className={`px-2 py-1.5 text-left font-medium ${role ? "text-frost-200" : "text-ink-200"}`}>
                  {name}
                  {role ? <span className="ml-1 rounded border border-frost-600 px-1 text-[0.65rem] font-normal">{role}</span> : null}
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody className="font-mono">
          {preview.rows.map((row, r) => (
            <tr key={r} className="border-t border-ink-800">
              <td className="px-2 py-1 text-ink-400">{r + 2}</td>
              {preview.header.map((name, i) => (
                <td key={`${i}-${name}`} className="px-2 py-1 text-ink-100">{row[i] ?? ""}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
