import type { DesignSummary } from "../../../../shared/schemas/design";
import { TextLink } from "../../../components/ui/text-link";
import { paths } from "../../../config/paths";
import { formatQuantity } from "../../../lib/format-quantity";
import { formatDateTime } from "../../../lib/format-time";
import { useUnitSystem } from "../../../lib/unit-system";

const SHOWN = 5;

/** The latest designs by their last save, each with its heat into the cold vessel and boil-off. */
export function RecentDesigns({ designs }: { designs: DesignSummary[] }) {
  const system = useUnitSystem();
  if (designs.length === 0) return <p className="text-sm text-ink-300">No designs yet.</p>;
  const recent = [...designs].sort((a, b) => b.updatedAt.localeCompare(a.updatedAt)).slice(0, SHOWN);
  return (
    <ul className="divide-y divide-ink-800">
      {recent.map((d) => (
        <li key={d.id} className="py-2.5 first:pt-0 last:pb-0">
          <p className="text-sm">
            <TextLink to={paths.app.design.getHref(d.id)}>{d.name}</TextLink>
            <span className="text-ink-300"> · revision {d.latestRevision} · {formatDateTime(d.updatedAt)}</span>
          </p>
          <p className="mt-1 font-mono text-sm text-ink-100">
            {d.coldHeat_W === null ? "—" : formatQuantity("heat", d.coldHeat_W, system)} into the cold vessel
            {d.boilOff_L_per_day === null ? "" : ` · ${formatQuantity("volumePerDay", d.boilOff_L_per_day, system)} boil-off`}
          </p>
        </li>
      ))}
    </ul>
  );
}
