import { createColumnHelper } from "@tanstack/react-table";
import { formatSource, type MaterialSummary } from "../../../../shared/schemas/material";
import { TextLink } from "../../../components/ui/text-link";
import { paths } from "../../../config/paths";
import { formatDateTime } from "../../../lib/format-time";
import { KIND_LABELS, SCOPE_LABELS, formatRange } from "../utils/library-text";
import { ScopeLabel, StatusLabel, STATUS_WORDS } from "./status-label";

const column = createColumnHelper<MaterialSummary>();

// Sorting uses the words the table shows, so "Approved" sorts before "Draft" as a reader expects.
export const materialColumns = [
  column.accessor("name", {
    header: "Name",
    enableHiding: false,
    cell: (info) => <TextLink to={paths.app.libraryEntry.getHref(info.row.original.id)}>{info.getValue()}</TextLink>,
  }),
  column.accessor((m) => KIND_LABELS[m.kind], { id: "kind", header: "Kind" }),
  column.accessor((m) => STATUS_WORDS[m.status], { id: "status", header: "Status", cell: (info) => <StatusLabel status={info.row.original.status} /> }),
  column.accessor((m) => SCOPE_LABELS[m.scope], { id: "scope", header: "Scope", cell: (info) => <ScopeLabel scope={info.row.original.scope} /> }),
  column.accessor((m) => m.shown.validRange_K.min, { id: "validRange", header: "Valid range", cell: (info) => formatRange(info.row.original.shown.validRange_K) }),
  column.accessor((m) => formatSource(m.shown.source), { id: "source", header: "Source", cell: (info) => <span className="line-clamp-2 max-w-xs">{info.getValue()}</span> }),
  column.accessor("latestVersion", {
    id: "version",
    header: "Version",
    cell: (info) => {
      const m = info.row.original;
      return m.draftVersion !== null && m.currentVersion !== null ? `${m.currentVersion} (draft ${m.draftVersion} waiting)` : String(m.currentVersion ?? m.latestVersion);
    },
  }),
  column.accessor("updatedAt", { header: "Updated", cell: (info) => formatDateTime(info.getValue()) }),
];

