import type { TestSummary } from "../../../../shared/schemas/boil-off-test";
import { TextLink } from "../../../components/ui/text-link";
import { formatDateTime } from "../../../lib/format-time";
import { RatioText } from "./ratio-text";
import { StatusBadge } from "./status-badge";

/** The latest few tests with their measured-over-predicted ratio, for Overview. */
export function RecentTests({ tests, hrefOf, threshold, limit = 5 }: { tests: TestSummary[]; hrefOf: (id: string) => string; threshold?: number; limit?: number }) {
  const recent = [...tests].sort((a, b) => b.testedAt.localeCompare(a.testedAt)).slice(0, limit);
  if (recent.length === 0) return <p className="text-sm text-ink-300">No boil-off test yet.</p>;
  return (
    <ul aria-label="Recent tests" className="divide-y divide-ink-800 text-sm">
      {recent.map((t) => (
        <li key={t.id} className="flex flex-wrap items-baseline justify-between gap-2 py-2">
          <span>
            <TextLink to={hrefOf(t.id)}>{t.vesselLabel}</TextLink> <span className="text-ink-300">· {t.designName} rev. {t.revision} · {formatDateTime(t.testedAt)}</span>
          </span>
          <span className="flex items-center gap-3">
            <span className="font-mono">measured / predicted <RatioText ratio={t.ratio} threshold={threshold} /></span>
            <StatusBadge status={t.status} />
          </span>
        </li>
      ))}
    </ul>
  );
}
