import { CartesianGrid, ComposedChart, Legend, Line, Scatter, Tooltip, XAxis, YAxis } from "recharts";
import type { MaterialVersion } from "../../../../shared/schemas/material";
import { chartSeries, type Series } from "../utils/chart-series";
import { formatNumber } from "../utils/library-text";

// Faces differ by colour and by dash, bands are thin dotted lines, and tabulated points by shape,
// so the chart still reads in grey.
const FACE_COLOURS = ["#7fe1ee", "#fdb97c", "#c6f0d8"];
const FACE_DASH = [undefined, "8 4", "2 3"];
const MARK_SHAPES = ["circle", "diamond", "square"] as const;

function lineStyle(series: Series) {
  return series.band
    ? { stroke: FACE_COLOURS[series.face], strokeWidth: 1, strokeDasharray: "2 4" }
    : { stroke: FACE_COLOURS[series.face], strokeWidth: 2, strokeDasharray: FACE_DASH[series.face] };
}

/**
 * Emissivity (reflector faces, wall finish) or thermal conductivity (support material) against
 * temperature over the version's valid range, computed by the engine's own functions.
 */
export function MaterialChart({ version }: { version: MaterialVersion }) {
  const chart = chartSeries(version.properties, version.validRange_K);
  if (!chart) return null;
  const isK = chart.quantity === "conductivity";
  const yLabel = isK ? "Thermal conductivity, W/(m·K)" : "Emissivity";
  const caption = isK
    ? `Thermal conductivity of ${version.name} from ${chart.range[0]} to ${chart.range[1]} K (${chart.fitLabel}).`
    : `Emissivity of ${version.name} from ${chart.range[0]} to ${chart.range[1]} K${chart.marks.length > 0 ? "; marked points are the tabulated values" : ""}.`;

  return (
    <figure className="space-y-2">
      <ComposedChart
        responsive
        style={{ width: "100%", height: 320 }}
        data={chart.rows}
        margin={{ top: 8, right: 16, bottom: 24, left: 16 }}
        aria-label={`${yLabel} against temperature`}
      >
        <CartesianGrid stroke="#2b3a52" />
        <XAxis
          dataKey="temperature_K"
          type="number"
          scale={chart.logScale ? "log" : "linear"}
          domain={chart.range}
          allowDataOverflow
          ticks={isK ? chart.ticks : undefined}
          stroke="#9fb0c5"
          tickFormatter={(t: number) => formatNumber(t, 3)}
          label={{ value: "Temperature, K", position: "insideBottom", offset: -14, fill: "#c5d0de" }}
        />
        <YAxis
          type="number"
          scale={chart.logScale ? "log" : "linear"}
          domain={isK ? ["auto", "auto"] : [0, "auto"]}
          stroke="#9fb0c5"
          width={72}
          tickFormatter={(v: number) => formatNumber(v, 3)}
          label={{ value: yLabel, angle: -90, position: "insideLeft", offset: 0, fill: "#c5d0de", style: { textAnchor: "middle" } }}
        />
        <Tooltip
          contentStyle={{ background: "#131c2c", border: "1px solid #3d4f69" }}
          labelFormatter={(t) => `${formatNumber(Number(t), 4)} K`}
          formatter={(value) => formatNumber(Number(value), 4)}
        />
        <Legend verticalAlign="top" height={32} />
        {chart.lines.map((series) => (
          <Line key={series.key} dataKey={series.key} name={series.label} type="linear" dot={false} isAnimationActive={false} {...lineStyle(series)} />
        ))}
        {chart.marks.map((marks) => (
          <Scatter
            key={marks.key}
            name={marks.label}
            data={marks.points}
            dataKey="value"
            fill={FACE_COLOURS[marks.face]}
            shape={MARK_SHAPES[marks.face]}
            isAnimationActive={false}
          />
        ))}
      </ComposedChart>
      <figcaption className="text-sm text-ink-300">{caption}</figcaption>
    </figure>
  );
}
