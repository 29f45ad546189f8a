import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { CompareResult } from "../../../../shared/schemas/design";
import { fromSi, unitLabel, type QuantityKind } from "../../../../shared/units";
import { chartColors as c, tooltipStyle } from "../../../components/charts/chart-theme";
import { formatNumber } from "../../../lib/format-quantity";
import { useUnitSystem } from "../../../lib/unit-system";
import { stageLabels } from "./stage-labels";

type Item = CompareResult["items"][number];

function StageBars({ result, title, kind, value }: { result: CompareResult; title: string; kind: QuantityKind; value: (s: Item["stages"][number]) => number | null }) {
  const system = useUnitSystem();
  const unit = unitLabel(kind, system);
  const labels = stageLabels(result).filter((l) => result.items.some((i) => { const s = i.stages.find((x) => x.label === l); return s !== undefined && value(s) !== null; }));
  const data = result.items.map((i) => ({
    name: i.name,
    ...Object.fromEntries(i.stages.flatMap((s) => { const v = value(s); return v === null ? [] : [[s.label, fromSi(kind, v, system)]]; })),
  }));
  if (labels.length === 0) return null;
  return (
    <figure className="space-y-2">
      <figcaption className="text-sm font-semibold text-ink-100">{title} ({unit})</figcaption>
      <div className="h-64 w-full" role="img" aria-label={`${title} of each compared design, one bar per stage: ${labels.join(", ")}`}>
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={data} margin={{ top: 8, right: 12, bottom: 8, left: 8 }}>
            <CartesianGrid stroke={c.grid} strokeDasharray="3 3" />
            <XAxis dataKey="name" stroke={c.axis} fontSize={11} interval={0} />
            <YAxis stroke={c.axis} fontSize={11} width={60} tickFormatter={(v: number) => formatNumber(v)} />
            <Tooltip contentStyle={tooltipStyle} formatter={(v, name) => [`${formatNumber(Number(v))} ${unit}`, String(name)]} />
            <Legend wrapperStyle={{ fontSize: 12, color: c.text }} />
            {labels.map((l, k) => (
              <Bar key={l} dataKey={l} name={l} fill={c.series[k % c.series.length]} isAnimationActive={false} />
            ))}
          </BarChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}

/** Heat per stage and boil-off per stage, one group of bars per design; the legend names each stage. */
export function CompareCharts({ result }: { result: CompareResult }) {
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <StageBars result={result} title="Heat into each stage" kind="heat" value={(s) => s.heatIn_W} />
      <StageBars result={result} title="Boil-off per stage" kind="volumePerDay" value={(s) => s.boilOff_L_per_day} />
    </div>
  );
}
