import { CartesianGrid, ComposedChart, Legend, Line, ReferenceArea, ReferenceLine, Tooltip, XAxis, YAxis } from "recharts";
import type { Series, TestMethod } from "../../../../shared/schemas/boil-off-test";
import { chartColors, tooltipStyle } from "../../../components/charts/chart-theme";
import { formatNumber } from "../../../lib/format-quantity";
import { useUnitSystem } from "../../../lib/unit-system";
import { hours, seriesDisplay } from "../utils/display-units";

type Window = { start_s: number; end_s: number };

/**
 * The logged series (downsampled on the server), the steady window as a shaded band that
 * follows the sliders as they move, and the line fitted over the stored window (dashed).
 */
export function SeriesChart({ series, method, window }: { series: Series; method: TestMethod; window: Window }) {
  const system = useUnitSystem();
  const { factor, unit } = seriesDisplay(method, system);
  const rows = series.points.map(([t, v]) => ({ t: hours(t), v: v * factor }));
  const [a, b] = [series.fit.start, series.fit.end];
  return (
    <figure className="space-y-2">
      <ComposedChart responsive style={{ width: "100%", height: 320 }} data={rows} margin={{ top: 8, right: 16, bottom: 24, left: 16 }} aria-label={`Logged ${unit} against time, with the steady window`}>
        <CartesianGrid stroke={chartColors.grid} />
        <XAxis dataKey="t" type="number" domain={["dataMin", "dataMax"]} stroke={chartColors.axis} tickFormatter={(t: number) => formatNumber(t, 3)} label={{ value: "Time from the first reading, h", position: "insideBottom", offset: -14, fill: chartColors.text }} />
        <YAxis type="number" domain={["auto", "auto"]} stroke={chartColors.axis} width={80} tickFormatter={(v: number) => formatNumber(v, 5)} label={{ value: unit, angle: -90, position: "insideLeft", fill: chartColors.text, style: { textAnchor: "middle" } }} />
        <Tooltip contentStyle={tooltipStyle} labelFormatter={(t) => `${formatNumber(Number(t), 5)} h`} formatter={(v) => `${formatNumber(Number(v), 5)} ${unit}`} />
        <Legend verticalAlign="top" height={32} />
        <ReferenceArea x1={hours(window.start_s)} x2={hours(window.end_s)} fill={chartColors.primary} fillOpacity={0.12} stroke={chartColors.primary} strokeOpacity={0.5} ifOverflow="extendDomain" label={{ value: "steady window", position: "insideTop", fill: chartColors.text, fontSize: 12 }} />
        <Line dataKey="v" name="Logged" type="linear" dot={false} stroke={chartColors.primary} strokeWidth={1.5} isAnimationActive={false} />
        <ReferenceLine
          segment={[{ x: hours(a[0]), y: a[1] * factor }, { x: hours(b[0]), y: b[1] * factor }]}
          stroke={chartColors.caution}
          strokeWidth={2}
          strokeDasharray="8 4"
          ifOverflow="extendDomain"
          label={{ value: "fitted line", position: "insideTopRight", fill: chartColors.cautionText, fontSize: 12 }}
        />
      </ComposedChart>
      <figcaption className="text-sm text-ink-300">
        {series.totalPoints.toLocaleString("en-US")} readings{series.points.length < series.totalPoints ? `, drawn as ${series.points.length.toLocaleString("en-US")} points` : ""}. Shaded: the steady window; dashed: the line fitted over the stored window.
      </figcaption>
    </figure>
  );
}
