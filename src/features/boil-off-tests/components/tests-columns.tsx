import { createColumnHelper } from "@tanstack/react-table";
import type { TestSummary } from "../../../../shared/schemas/boil-off-test";
import type { UnitSystem } from "../../../../shared/units";
import { TextLink } from "../../../components/ui/text-link";
import { formatQuantity } from "../../../lib/format-quantity";
import { formatDateTime } from "../../../lib/format-time";
import { METHOD_LABELS } from "../utils/method-text";
import { RatioText } from "./ratio-text";
import { StatusBadge } from "./status-badge";

const col = createColumnHelper<TestSummary>();
// A test without a log has no measured value or ratio: those rows sort last either way.
const nullsLast = { sortUndefined: "last" as const, sortingFn: "basic" as const };

type Options = { system: UnitSystem; hrefOf: (id: string) => string; threshold?: number };

export function testColumns({ system, hrefOf, threshold }: Options) {
  return [
    col.accessor("designName", {
      header: "Design",
      cell: (c) => (
        <span>
          {c.getValue()} <span className="text-ink-300">rev. {c.row.original.revision}</span>
        </span>
      ),
    }),
    col.accessor("vesselLabel", {
      header: "Vessel",
      filterFn: "includesString",
      cell: (c) => <TextLink to={hrefOf(c.row.original.id)}>{c.getValue()}</TextLink>,
    }),
    col.accessor("testedAt", { header: "Date", cell: (c) => <span className="text-ink-300">{formatDateTime(c.getValue())}</span> }),
    col.accessor("method", { header: "Method", cell: (c) => METHOD_LABELS[c.getValue()] }),
    col.accessor((t) => t.measuredHeatLeak_W ?? undefined, {
      id: "measured",
      header: "Measured",
      meta: { numeric: true },
      ...nullsLast,
      cell: (c) => formatQuantity("heat", c.getValue(), system),
    }),
    col.accessor((t) => t.predictedHeatLeak_W ?? undefined, {
      id: "predicted",
      header: "Predicted",
      meta: { numeric: true },
      ...nullsLast,
      cell: (c) => formatQuantity("heat", c.getValue(), system),
    }),
    col.accessor((t) => t.ratio ?? undefined, {
      id: "ratio",
      header: "Ratio",
      meta: { numeric: true },
      ...nullsLast,
      cell: (c) => <RatioText ratio={c.getValue() ?? null} threshold={threshold} />,
    }),
    col.accessor("status", { header: "Status", cell: (c) => <StatusBadge status={c.getValue()} /> }),
  ];
}
