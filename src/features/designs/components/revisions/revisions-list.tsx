import type { RevisionSummary } from "../../../../../shared/schemas/design";
import { TextLink } from "../../../../components/ui/text-link";
import { formatQuantity } from "../../../../lib/format-quantity";
import { formatDateTime } from "../../../../lib/format-time";
import { useUnitSystem } from "../../../../lib/unit-system";

type RevisionsListProps = { revisions: RevisionSummary[]; shown: number; latest: number; hrefOf: (revision: number) => string };

/** Every saved revision, newest first; the shown and the latest one say so in words. */
export function RevisionsList({ revisions, shown, latest, hrefOf }: RevisionsListProps) {
  const system = useUnitSystem();
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm">
        <caption className="sr-only">Revisions, newest first</caption>
        <thead>
          <tr className="text-left text-xs uppercase tracking-wider text-ink-300">
            <th scope="col" className="pb-2 pr-3 font-medium">Revision</th>
            <th scope="col" className="pb-2 pr-3 font-medium">Change note</th>
            <th scope="col" className="pb-2 pr-3 font-medium">By</th>
            <th scope="col" className="pb-2 pr-3 font-medium">When</th>
            <th scope="col" className="pb-2 pr-3 text-right font-medium">Heat into the cold vessel</th>
          </tr>
        </thead>
        <tbody>
          {revisions.map((r) => (
            <tr key={r.revision} className={`border-t border-ink-800 align-top ${r.revision === shown ? "bg-ink-800/60" : ""}`}>
              <th scope="row" className="py-2 pr-3 text-left font-medium">
                {r.revision === shown ? (
                  <span className="text-ink-50">{r.revision} (shown)</span>
                ) : (
                  <TextLink to={hrefOf(r.revision)} aria-label={`Open revision ${r.revision}`}>
                    {r.revision}
                  </TextLink>
                )}
                {r.revision === latest ? <span className="ml-1 text-xs font-normal text-ink-300">latest</span> : null}
              </th>
              <td className="py-2 pr-3 text-ink-200">{r.changeNote ?? "—"}</td>
              <td className="py-2 pr-3 text-ink-200">{r.createdBy ?? "—"}</td>
              <td className="py-2 pr-3 text-ink-300">{formatDateTime(r.createdAt)}</td>
              <td className="py-2 pr-3 text-right font-mono text-ink-100">{formatQuantity("heat", r.coldHeat_W, system)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
