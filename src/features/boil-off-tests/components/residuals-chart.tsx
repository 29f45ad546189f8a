import { CartesianGrid, ReferenceLine, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from "recharts";
import type { Series, TestMethod } from "../../../../shared/schemas/boil-off-test";
import { chartColors, tooltipStyle } from "../../../components/charts/chart-theme";
import { formatNumber } from "../../../lib/format-quantity";
import { useUnitSystem } from "../../../lib/unit-system";
import { hours, seriesDisplay } from "../utils/display-units";

/** Reading minus fitted line inside the window: a curve or a step here means the window is not steady. */
export function ResidualsChart({ series, method }: { series: Series; method: TestMethod }) {
  const system = useUnitSystem();
  const { factor, unit } = seriesDisplay(method, system);
  const rows = series.residuals.map(([t, r]) => ({ t: hours(t), r: r * factor }));
  return (
    <figure className="space-y-2">
      <ScatterChart responsive style={{ width: "100%", height: 200 }} margin={{ top: 8, right: 16, bottom: 24, left: 16 }} aria-label={`Residuals in ${unit} against time`}>
        <CartesianGrid stroke={chartColors.grid} />
        <XAxis dataKey="t" type="number" domain={["dataMin", "dataMax"]} stroke={chartColors.axis} tickFormatter={(t: number) => formatNumber(t, 3)} label={{ value: "Time from the first reading, h", position: "insideBottom", offset: -14, fill: chartColors.text }} />
        <YAxis dataKey="r" type="number" stroke={chartColors.axis} width={80} tickFormatter={(v: number) => formatNumber(v, 3)} label={{ value: unit, angle: -90, position: "insideLeft", fill: chartColors.text, style: { textAnchor: "middle" } }} />
        <Tooltip contentStyle={tooltipStyle} formatter={(v) => formatNumber(Number(v), 5)} />
        <ReferenceLine y={0} stroke={chartColors.muted} />
        <Scatter name="Residual" data={rows} fill={chartColors.good} shape="circle" isAnimationActive={false} />
      </ScatterChart>
      <figcaption className="text-sm text-ink-300">Residuals: each reading in the stored window minus the fitted line.</figcaption>
    </figure>
  );
}
