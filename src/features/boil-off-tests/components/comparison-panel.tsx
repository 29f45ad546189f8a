import type { ReactNode } from "react";
import type { Analysis } from "../../../../shared/schemas/boil-off-test";
import { Callout } from "../../../components/ui/callout";
import { linkClass } from "../../../components/ui/text-link";
import { formatNumber, formatQuantity } from "../../../lib/format-quantity";
import { useUnitSystem } from "../../../lib/unit-system";
import { LIQUID_MASS_FIGURES, LIQUID_MASS_TITLE, needsLiquidMassFigure } from "../utils/liquid-mass";
import { MeasuredCautions } from "./measured-cautions";

const signed = (text: string) => (text.startsWith("-") || text.startsWith("—") ? text : `+${text}`);

/**
 * Measured against predicted: the heat leak with its uncertainty, the revision's prediction,
 * and their ratio with its 95 % interval, flagged when it passes the organization's threshold.
 * The barometric correction shows with the pressure trend, or the reason it was not applied;
 * when the log has a barometer, that reason points at the test's liquid-mass figure, and
 * onSetLiquidMass (given to those who may change it) takes the user to its field.
 */
export function ComparisonPanel({ analysis: a, threshold, onSetLiquidMass, liquidMass }: {
  analysis: Analysis;
  threshold?: number;
  onSetLiquidMass?: () => void;
  /** The test's liquid-mass figure, shown right under the correction it feeds. */
  liquidMass?: ReactNode;
}) {
  const system = useUnitSystem();
  const heat = (w: number | null) => formatQuantity("heat", w, system);
  const over = a.ratio !== null && threshold !== undefined && a.ratio > threshold;
  const correction = a.barometricCorrection;
  return (
    <div className="space-y-4">
      <dl aria-label="Measured against predicted" className="grid gap-3 sm:grid-cols-3">
        <div className="rounded-md border border-ink-700 p-3">
          <dt className="text-xs uppercase tracking-wider text-ink-300">Measured heat leak</dt>
          <dd className="mt-1 font-mono text-lg text-ink-50">{heat(a.measuredHeatLeak_W)}</dd>
          <dd className="font-mono text-xs text-ink-300">± {heat(a.measuredHeatLeakStdError_W)}; 95 %: {formatQuantity("heat", a.measuredHeatLeakInterval95_W[0], system, 5)} to {formatQuantity("heat", a.measuredHeatLeakInterval95_W[1], system, 5)}</dd>
        </div>
        <div className="rounded-md border border-ink-700 p-3">
          <dt className="text-xs uppercase tracking-wider text-ink-300">Predicted ({a.stageLabel})</dt>
          <dd className="mt-1 font-mono text-lg text-ink-50">{heat(a.predictedHeatLeak_W)}</dd>
        </div>
        <div className={`rounded-md border p-3 ${over ? "border-ember-400" : "border-ink-700"}`}>
          <dt className="text-xs uppercase tracking-wider text-ink-300">Measured / predicted</dt>
          <dd className="mt-1 font-mono text-lg text-ink-50">{a.ratio === null ? "—" : `${formatNumber(a.ratio, 3)}×`}</dd>
          {a.ratioStdError !== null && a.ratioInterval95 ? (
            <dd className="font-mono text-xs text-ink-300">± {formatNumber(a.ratioStdError, 3)}; 95 %: {formatNumber(a.ratioInterval95[0], 5)} to {formatNumber(a.ratioInterval95[1], 5)}</dd>
          ) : null}
        </div>
      </dl>
      {over ? (
        <Callout tone="warning" title={`Over the alert threshold of ${formatNumber(threshold, 3)}×`}>
          Accepting this analysis e-mails the design's engineers and the owners. A vessel well over its prediction may have a degraded vacuum, a damaged blanket or a thermal short.
        </Callout>
      ) : null}
      <dl className="grid gap-x-6 gap-y-1 text-sm sm:grid-cols-[max-content_1fr]">
        {a.evaporationRate_percent_per_day !== null ? (
          <>
            <dt className="text-ink-300">Normal evaporation rate, measured</dt>
            <dd className="font-mono">{formatQuantity("percentPerDay", a.evaporationRate_percent_per_day, system)}{a.predictedEvaporationRate_percent_per_day !== null ? ` (predicted ${formatQuantity("percentPerDay", a.predictedEvaporationRate_percent_per_day, system)})` : ""}</dd>
          </>
        ) : null}
        {a.boilOff_L_per_day !== null ? (
          <>
            <dt className="text-ink-300">Liquid boiled off</dt>
            <dd className="font-mono">{formatQuantity("volumePerDay", a.boilOff_L_per_day, system)}</dd>
          </>
        ) : null}
        {a.barometric ? (
          <>
            <dt className="text-ink-300">Mean barometric pressure ({a.barometric.source === "log" ? "from the log" : "from the test"})</dt>
            <dd className="font-mono">{formatQuantity("pressure", a.barometric.meanPressure_Pa, system, 5)}; boiling point shift {formatNumber(a.barometric.saturationTemperatureShift_K, 3)} K</dd>
          </>
        ) : null}
        {a.pressureTrend ? (
          <>
            <dt className="text-ink-300">Pressure trend</dt>
            <dd className="font-mono">{signed(formatQuantity("pressure", a.pressureTrend.slope_Pa_per_s * 3600, system))}/h ± {formatQuantity("pressure", a.pressureTrend.stdError_Pa_per_s * 3600, system)}/h</dd>
          </>
        ) : null}
        {correction ? (
          <>
            <dt className="text-ink-300">Barometric correction</dt>
            {correction.applied ? (
              <dd className="font-mono">
                {signed(heat(correction.correction_W))} ± {heat(correction.correctionStdError_W)}, included above; {formatQuantity("mass", correction.liquidMass_kg, system)} of liquid; uncorrected {heat(a.uncorrectedHeatLeak_W ?? null)}
              </dd>
            ) : (
              <dd>
                Not applied: {correction.reason}.
                {a.pressureTrend && needsLiquidMassFigure(a.method) ? (
                  <>
                    {" "}The liquid mass comes from the test's {LIQUID_MASS_FIGURES[a.method].label.toLowerCase()}, under {LIQUID_MASS_TITLE} below.{" "}
                    {onSetLiquidMass ? (
                      <button type="button" onClick={onSetLiquidMass} className={linkClass}>
                        Set the {LIQUID_MASS_FIGURES[a.method].label.toLowerCase()}
                      </button>
                    ) : null}
                  </>
                ) : null}
              </dd>
            )}
          </>
        ) : null}
      </dl>
      {liquidMass}
      {a.warnings.length > 0 ? (
        <Callout tone="warning" title="About this analysis">
          <ul className="list-disc pl-4">{a.warnings.map((w) => <li key={w}>{w}</li>)}</ul>
        </Callout>
      ) : null}
      <p className="text-xs text-ink-300">{a.uncertaintyNote}</p>
      <MeasuredCautions />
    </div>
  );
}
