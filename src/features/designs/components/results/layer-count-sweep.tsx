import { memo } from "react";
import { CartesianGrid, Line, LineChart, ReferenceDot, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { LayerSweep } from "../../../../../shared/design/prediction";
import { fromSi, unitLabel } from "../../../../../shared/units";
import { chartColors as c, tooltipStyle } from "../../../../components/charts/chart-theme";
import { formatNumber, formatQuantity } from "../../../../lib/format-quantity";
import { useUnitSystem } from "../../../../lib/unit-system";

/**
 * Heat into the cold vessel against the layer count of the design's main block, the target as a
 * horizontal line and the fewest layers that meet it marked; the sentence under the chart says
 * the same in words.
 */
function LayerCountSweepView({ sweep, blockName, currentLayers }: { sweep: LayerSweep; blockName: string; currentLayers: number | null }) {
  const system = useUnitSystem();
  const unit = unitLabel("heat", system);
  const data = sweep.points.map((p) => ({ layers: p.layers, heat: fromSi("heat", p.coldHeat_W, system) }));
  const target = sweep.targetColdHeat_W === null ? null : fromSi("heat", sweep.targetColdHeat_W, system);
  const fewest = sweep.fewestLayers === null ? undefined : sweep.points.find((p) => p.layers === sweep.fewestLayers);
  const last = sweep.points.at(-1);

  return (
    <figure className="space-y-2">
      <div className="h-56 w-full" role="img" aria-label={`Heat into the cold vessel against the layer count of ${blockName}, ${sweep.points[0]?.layers ?? 0} to ${last?.layers ?? 0} layers`}>
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data} margin={{ top: 8, right: 16, bottom: 18, left: 8 }}>
            <CartesianGrid stroke={c.grid} strokeDasharray="3 3" />
            <XAxis dataKey="layers" type="number" domain={["dataMin", "dataMax"]} stroke={c.axis} fontSize={11} label={{ value: `Layers in ${blockName}`, position: "insideBottom", offset: -10, fill: c.axis, fontSize: 11 }} />
            <YAxis stroke={c.axis} fontSize={11} width={56} tickFormatter={(v: number) => formatNumber(v)} label={{ value: unit, angle: -90, position: "insideLeft", fill: c.axis, fontSize: 11 }} />
            <Tooltip
              contentStyle={tooltipStyle}
              formatter={(v) => [`${formatNumber(Number(v))} ${unit}`, "Heat into the cold vessel"]}
              labelFormatter={(l) => `${String(l)} layers`}
            />
            <Line type="monotone" dataKey="heat" stroke={c.primary} strokeWidth={2} dot={false} isAnimationActive={false} />
            {target !== null ? <ReferenceLine y={target} stroke={c.caution} strokeDasharray="6 3" label={{ value: "target", position: "insideTopRight", fill: c.cautionText, fontSize: 11 }} /> : null}
            {currentLayers !== null ? <ReferenceLine x={currentLayers} stroke={c.muted} strokeDasharray="2 3" label={{ value: "now", position: "insideTopLeft", fill: c.text, fontSize: 11 }} /> : null}
            {fewest ? <ReferenceDot x={fewest.layers} y={fromSi("heat", fewest.coldHeat_W, system)} r={5} fill={c.good} stroke={c.background} /> : null}
          </LineChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="text-sm text-ink-200">
        {sweep.targetColdHeat_W === null
          ? "Set a target heat into the cold vessel to find the fewest layers that meet it."
          : sweep.fewestLayers !== null
            ? `Fewest layers in ${blockName} that meet the ${formatQuantity("heat", sweep.targetColdHeat_W, system)} target: ${sweep.fewestLayers} (green dot).`
            : `No layer count up to ${last?.layers ?? "the limit"} in ${blockName} meets the ${formatQuantity("heat", sweep.targetColdHeat_W, system)} target: look at the other blocks, the supports or the vacuum.`}
      </figcaption>
    </figure>
  );
}

// Memoized: a keystroke re-renders the page, not this part, until a new answer changes its props.
export const LayerCountSweep = memo(LayerCountSweepView);
