import type { Analysis } from "../../../../shared/schemas/boil-off-test";
import { formatNumber } from "../../../lib/format-quantity";
import { useUnitSystem } from "../../../lib/unit-system";
import { formatHours, formatRate, seriesDisplay } from "../utils/display-units";

const RATE_WORDS = { weighing: "Mass rate (slope)", "vent-flow": "Mean vent flow", level: "Level rate (slope)" } as const;

/** The least-squares fit over the window: the rate, its standard error and its 95 % interval. */
export function FitSummary({ analysis: a }: { analysis: Analysis }) {
  const system = useUnitSystem();
  const shown = seriesDisplay(a.method, system);
  const rows: [string, string][] = [
    ["Window", `${formatHours(a.window.start_s)} to ${formatHours(a.window.end_s)} (${a.suggested ? "suggested" : "set by hand"})`],
    ["Readings in the window", `${a.points.toLocaleString("en-US")} of ${a.totalPoints.toLocaleString("en-US")}`],
    [RATE_WORDS[a.method], `${formatRate(a, a.rate, system)} ± ${formatRate(a, a.rateStdError, system)} (standard error)`],
    ["95 % interval", `${formatRate(a, a.interval95[0], system)} to ${formatRate(a, a.interval95[1], system)}`],
    ["Residual standard deviation", `${formatNumber(a.residualStdDev * shown.factor, 3)} ${shown.unit}`],
    ["Vented-gas factor (1 − ρ vapour / ρ liquid)", formatNumber(a.ventedGasFactor, 3)],
  ];
  if (a.ventReferenceLabel) rows.push(["Flowmeter reference", a.ventReferenceLabel]);
  return (
    <dl aria-label="Fit" className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[max-content_1fr]">
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="text-ink-300">{k}</dt>
          <dd className="font-mono text-ink-50">{v}</dd>
        </div>
      ))}
    </dl>
  );
}
