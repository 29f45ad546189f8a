import { Link } from "react-router-dom";
import type { MaterialVersion } from "../../../../shared/schemas/material";
import { buttonClass } from "../../../components/ui/button";
import { paths } from "../../../config/paths";
import { formatDateTime } from "../../../lib/format-time";
import { StatusLabel } from "./status-label";

type Props = { materialId: string; versions: MaterialVersion[]; viewing: number };

function decision(v: MaterialVersion): string | null {
  if (v.status === "draft") return "Waiting for an owner's decision";
  const verb = v.status === "approved" ? "Approved" : "Rejected";
  return `${verb}${v.decidedBy ? ` by ${v.decidedBy}` : ""}${v.decidedAt ? `, ${formatDateTime(v.decidedAt)}` : ""}${v.decisionComment ? `: “${v.decisionComment}”` : ""}`;
}

/** Every version, newest first (the server's order), each with who proposed and who decided. */
export function VersionHistory({ materialId, versions, viewing }: Props) {
  return (
    <ol className="divide-y divide-ink-800" aria-label="Versions, newest first">
      {versions.map((v) => (
        <li key={v.version} className="flex flex-wrap items-start justify-between gap-3 py-3 text-sm">
          <div className="space-y-0.5">
            <p className="flex flex-wrap items-center gap-2 font-medium text-ink-50">
              Version {v.version}
              <StatusLabel status={v.status} />
              {v.isCurrent ? <span className="rounded border border-moss-400 px-1.5 text-xs text-moss-200">current</span> : null}
            </p>
            <p className="text-ink-200">{v.changeNote ?? "No change note"}</p>
            <p className="text-ink-300">
              Proposed {v.proposedBy ? `by ${v.proposedBy} ` : ""}
              {formatDateTime(v.proposedAt)}
            </p>
            <p className="text-ink-300">{decision(v)}</p>
          </div>
          {v.version === viewing ? (
            <span className="text-xs text-ink-300">Shown above</span>
          ) : (
            <Link to={paths.app.libraryEntry.getHref(materialId, v.version)} className={buttonClass("secondary", "sm")} aria-label={`Show version ${v.version}`}>
              Show
            </Link>
          )}
        </li>
      ))}
    </ol>
  );
}
