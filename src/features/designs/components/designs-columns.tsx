import { createColumnHelper } from "@tanstack/react-table";
import type { ReactNode } from "react";
import type { DesignSummary } from "../../../../shared/schemas/design";
import type { UnitSystem } from "../../../../shared/units";
import { TextLink } from "../../../components/ui/text-link";
import { formatQuantity } from "../../../lib/format-quantity";
import { formatDateTime } from "../../../lib/format-time";

const col = createColumnHelper<DesignSummary>();
// Empty heat (no prediction yet) sorts last whatever the direction.
const nullsLast = { sortUndefined: "last" as const, sortingFn: "basic" as const };

type Options = { system: UnitSystem; hrefOf: (id: string) => string; rowActions: ((d: DesignSummary) => ReactNode) | null };

export function designColumns({ system, hrefOf, rowActions }: Options) {
  return [
    col.display({
      id: "pick",
      header: () => <span className="sr-only">Pick for Compare</span>,
      cell: ({ row }) => (
        <input
          type="checkbox"
          aria-label={`Pick ${row.original.name} for Compare`}
          checked={row.getIsSelected()}
          disabled={!row.getCanSelect()}
          onChange={row.getToggleSelectedHandler()}
          className="size-4 accent-frost-400"
        />
      ),
    }),
    col.accessor("name", {
      header: "Name",
      cell: (c) => <TextLink to={hrefOf(c.row.original.id)}>{c.getValue()}</TextLink>,
    }),
    col.accessor((d) => d.vesselLabel ?? "", { id: "vesselLabel", header: "Vessel", filterFn: "includesString", cell: (c) => c.getValue() || "—" }),
    col.accessor("latestRevision", { header: "Latest revision", meta: { numeric: true } }),
    col.accessor((d) => d.coldHeat_W ?? undefined, {
      id: "coldHeat_W",
      header: "Heat into the cold vessel",
      meta: { numeric: true },
      ...nullsLast,
      cell: (c) => formatQuantity("heat", c.getValue(), system),
    }),
    col.accessor((d) => d.boilOff_L_per_day ?? undefined, {
      id: "boilOff_L_per_day",
      header: "Boil-off",
      meta: { numeric: true },
      ...nullsLast,
      cell: (c) => (c.getValue() === undefined ? "—" : formatQuantity("volumePerDay", c.getValue(), system)),
    }),
    col.accessor("updatedAt", { header: "Updated", cell: (c) => <span className="text-ink-300">{formatDateTime(c.getValue())}</span> }),
    ...(rowActions ? [col.display({ id: "actions", header: () => <span className="sr-only">Actions</span>, cell: ({ row }) => rowActions(row.original) })] : []),
  ];
}
