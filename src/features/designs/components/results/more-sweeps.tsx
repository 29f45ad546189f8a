import { useState } from "react";
import { useFormContext, useWatch } from "react-hook-form";
import { CartesianGrid, Legend, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { DesignContentInput, SweepResult, SweepVariable } from "../../../../../shared/schemas/design";
import { fromSi, unitLabel, type QuantityKind } from "../../../../../shared/units";
import { chartColors as c, tooltipStyle } from "../../../../components/charts/chart-theme";
import { Callout } from "../../../../components/ui/callout";
import { SelectField } from "../../../../components/ui/field";
import { Loading } from "../../../../components/ui/spinner";
import { useDebouncedValue } from "../../../../hooks/use-debounced-value";
import { isApiError } from "../../../../lib/api-client";
import { formatNumber } from "../../../../lib/format-quantity";
import { useUnitSystem } from "../../../../lib/unit-system";
import { useSweep } from "../../api/sweep-design";
import { contentKeyOf } from "../../hooks/use-live-prediction";

// As the live estimate: long enough to merge the keystrokes of one number (acceptance already waits for its own).
const DEBOUNCE_MS = 50;

const VARIABLES: Record<SweepVariable, { label: string; axis: (s: SweepResult) => string; kind: QuantityKind; log: boolean }> = {
  "layer-density": { label: "Layer density", axis: (s) => `Layer density of ${s.blockLabel ?? "the block"}`, kind: "layerDensity", log: false },
  "warm-temperature": { label: "Warm wall temperature", axis: () => "Warm wall temperature", kind: "temperature", log: false },
  pressure: { label: "Residual pressure", axis: () => "Residual pressure", kind: "pressure", log: true },
};

/**
 * Heat into the cold vessel (and, dashed on a right-hand axis, into each cooled stage) against one more variable, over the range the server picks from the
 * design. Reads the form itself (the panel sits inside its FormProvider) and asks only for the
 * last content the live estimate accepted (`accepted`: the panel's figures are the form's), once
 * it has settled; while the next answer loads, the previous chart stays.
 */
export function MoreSweeps({ accepted }: { accepted: boolean }) {
  const [variable, setVariable] = useState<SweepVariable>("layer-density");
  const { control } = useFormContext<DesignContentInput>();
  const key = contentKeyOf(useWatch({ control }));
  // Only content the live estimate has accepted is swept, so a design the engine refuses (a
  // cross-field rule the schema cannot see) is not posted twice; an invalid or refused form keeps
  // the last accepted design's chart, as the rest of the panel does.
  const [lastAccepted, setLastAccepted] = useState<string | null>(accepted ? key : null);
  if (accepted && key !== null && key !== lastAccepted) setLastAccepted(key);
  const settledKey = useDebouncedValue(lastAccepted, DEBOUNCE_MS);
  // Layer density belongs to one block: the server picks the thickest facing the vessel unless
  // the user names another. A choice the layup no longer has falls back to the server's.
  const [chosenBlock, setChosenBlock] = useState<number | undefined>(undefined);
  const blocks = sweepableBlocks(useWatch({ control, name: "layup" }));
  const blockIndex = variable === "layer-density" && blocks.some((b) => b.index === chosenBlock) ? chosenBlock : undefined;
  const sweep = useSweep(settledKey, variable, blockIndex);
  const data = sweep.data;
  const loadingOther = data !== undefined && (sweep.isPlaceholderData || data.variable !== variable);

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="w-56">
          <SelectField label="Sweep against" value={variable} onChange={(e) => setVariable(e.target.value as SweepVariable)}>
            {(Object.keys(VARIABLES) as SweepVariable[]).map((v) => (
              <option key={v} value={v}>
                {VARIABLES[v].label}
              </option>
            ))}
          </SelectField>
        </div>
        {variable === "layer-density" && blocks.length > 1 ? (
          <div className="w-64">
            <SelectField label="Block" value={blockIndex === undefined ? "" : String(blockIndex)} onChange={(e) => setChosenBlock(e.target.value === "" ? undefined : Number(e.target.value))}>
              <option value="">Thickest block facing the vessel</option>
              {blocks.map((b) => (
                <option key={b.index} value={b.index}>
                  {b.label}
                </option>
              ))}
            </SelectField>
          </div>
        ) : null}
        {loadingOther && !sweep.isError ? <p className="text-xs text-ink-300">Updating the sweep…</p> : null}
      </div>
      {sweep.isError ? (
        <Callout tone="warning" title={`No ${VARIABLES[variable].label.toLowerCase()} sweep for this design`}>
          {isApiError(sweep.error) && sweep.error.fields.length > 0 ? sweep.error.fields.map((f) => f.message).join(" ") : sweep.error.message}
        </Callout>
      ) : data ? (
        <SweepChart sweep={data} dimmed={loadingOther} />
      ) : settledKey === null ? (
        <p className="text-sm text-ink-300">Fix the marked fields in the form to draw the sweep.</p>
      ) : (
        <Loading label="Working out the sweep…" />
      )}
    </div>
  );
}

/** The layup's blocks that have a layer density to sweep (correlation or layers), named as the layup editor names them. */
function sweepableBlocks(layup: DesignContentInput["layup"] | undefined): { index: number; label: string }[] {
  let blockNo = 0;
  return (layup ?? []).flatMap((item, index) => {
    if (item?.kind !== "block") return [];
    blockNo += 1;
    const named = item.label?.trim();
    return item.model === "radiation" ? [] : [{ index, label: `Block ${blockNo}${named ? ` (${named})` : ""}` }];
  });
}

/** Decades that fall inside [lo, hi], for a log axis. */
function decadeTicks(lo: number, hi: number): number[] {
  const ticks: number[] = [];
  for (let e = Math.ceil(Math.log10(lo) - 1e-9); e <= Math.floor(Math.log10(hi) + 1e-9); e++) ticks.push(10 ** e);
  return ticks;
}

const powerOfTen = (v: number) => {
  const e = Math.round(Math.log10(v));
  return Math.abs(v / 10 ** e - 1) < 1e-6 && Math.abs(e) > 3 ? `1e${e}` : formatNumber(v);
};

function SweepChart({ sweep, dimmed }: { sweep: SweepResult; dimmed: boolean }) {
  const system = useUnitSystem();
  const v = VARIABLES[sweep.variable];
  const xUnit = unitLabel(v.kind, system);
  const heatUnit = unitLabel("heat", system);
  // Stages get their own axis on the right: a shield's load is often a hundred times the vessel's.
  const data = sweep.points.map((p) => ({
    x: fromSi(v.kind, p.x, system),
    heat: fromSi("heat", p.coldHeat_W, system),
    ...Object.fromEntries(p.heatIntoStages_W.map((q, i) => [`stage${i}`, fromSi("heat", q, system)])),
  }));
  const stages = sweep.stageLabels;
  const first = data[0]?.x ?? 0;
  const last = data.at(-1)?.x ?? 0;
  const own = fromSi(v.kind, sweep.designValue, system);
  // The design's own value is marked where it lies on the chart (a pressure of 0 has no place on a log axis).
  const ownShown = own >= Math.min(first, last) && own <= Math.max(first, last) && (!v.log || own > 0);
  const axis = v.axis(sweep);
  const tickX = v.log ? powerOfTen : (n: number) => formatNumber(n);
  // Over seven decades of pressure the heat spans several too: both heat axes go logarithmic with it.
  const heatAxis = (key: "heat" | "stages") => {
    if (!v.log) return { scale: "auto" as const, ticks: undefined };
    const values = data.flatMap((d) => (key === "heat" ? [d.heat] : stages.map((_, i) => (d as Record<string, number>)[`stage${i}`]))).filter((q) => q > 0);
    const ticks = values.length > 0 ? decadeTicks(Math.min(...values), Math.max(...values)) : [];
    return { scale: "log" as const, ticks: ticks.length >= 2 ? ticks : undefined, domain: ["dataMin", "dataMax"] as const };
  };
  const ownRightHalf = v.log ? Math.log10(own / first) > Math.log10(last / first) / 2 : own - first > (last - first) / 2;

  return (
    <figure className={`space-y-2 transition-opacity ${dimmed ? "opacity-60" : ""}`}>
      <div
        className="h-64 w-full"
        role="img"
        aria-label={`Heat into the cold vessel${stages.length > 0 ? " and each stage" : ""} against ${axis.toLowerCase()}, ${formatNumber(first)} to ${formatNumber(last)} ${xUnit}${v.log ? ", both on log scales" : ""}`}
      >
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data} margin={{ top: 8, right: 16, bottom: 18, left: 8 }}>
            <CartesianGrid stroke={c.grid} strokeDasharray="3 3" />
            <XAxis
              dataKey="x"
              type="number"
              scale={v.log ? "log" : "auto"}
              domain={["dataMin", "dataMax"]}
              ticks={v.log ? decadeTicks(first, last) : undefined}
              stroke={c.axis}
              fontSize={11}
              tickFormatter={tickX}
              label={{ value: `${axis} (${xUnit})`, position: "insideBottom", offset: -10, fill: c.axis, fontSize: 11 }}
            />
            <YAxis yAxisId="cold" {...heatAxis("heat")} stroke={c.axis} fontSize={11} width={56} tickFormatter={v.log ? powerOfTen : (n: number) => formatNumber(n)} label={{ value: `vessel, ${heatUnit}`, angle: -90, position: "insideLeft", fill: c.axis, fontSize: 11 }} />
            {stages.length > 0 ? (
              <YAxis yAxisId="stages" orientation="right" {...heatAxis("stages")} stroke={c.axis} fontSize={11} width={56} tickFormatter={v.log ? powerOfTen : (n: number) => formatNumber(n)} label={{ value: `stages, ${heatUnit}`, angle: 90, position: "insideRight", fill: c.axis, fontSize: 11 }} />
            ) : null}
            <Tooltip
              contentStyle={tooltipStyle}
              formatter={(value, name) => [`${formatNumber(Number(value))} ${heatUnit}`, String(name)]}
              labelFormatter={(l) => `${formatNumber(Number(l))} ${xUnit}`}
            />
            <Line yAxisId="cold" name="Cold vessel" type="monotone" dataKey="heat" stroke={c.primary} strokeWidth={2} dot={false} isAnimationActive={false} />
            {stages.map((label, i) => (
              <Line key={label} yAxisId="stages" name={`${label} (right axis)`} type="monotone" dataKey={`stage${i}`} stroke={c.series[(i + 1) % c.series.length]} strokeWidth={1.5} strokeDasharray="6 3" dot={false} isAnimationActive={false} />
            ))}
            {stages.length > 0 ? <Legend verticalAlign="top" height={24} wrapperStyle={{ fontSize: 11, color: c.text }} /> : null}
            {ownShown ? <ReferenceLine yAxisId="cold" x={own} stroke={c.muted} strokeDasharray="2 3" label={{ value: "this design", position: ownRightHalf ? "insideTopRight" : "insideTopLeft", fill: c.text, fontSize: 11 }} /> : null}
          </LineChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="text-sm text-ink-200">
        {`This design: ${formatNumber(own)} ${xUnit}${ownShown ? " (dotted line)" : ", outside the range drawn"}.`}
        {sweep.variable === "pressure" ? " Gas conduction through the blanket grows with the residual pressure; a leak or outgassing moves the design to the right." : null}
      </figcaption>
    </figure>
  );
}
