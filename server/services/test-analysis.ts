import { createLTTB } from "downsample";
import { SERIES_MAX_POINTS, SERIES_UNITS, type Analysis, type Series, type TestMethod } from "../../shared/schemas/boil-off-test";
import {
  boilOff,
  compareWithPrediction,
  cryogenProperties,
  DEFAULT_VENT_REFERENCE,
  fitRate,
  measuredHeatLeak,
  MINIMUM_FIT_POINTS,
  studentTQuantile,
  suggestSteadyWindow,
  VENT_REFERENCE_CONDITIONS,
  ventedGasFactor,
  type CryogenId,
  type VentReference,
} from "../../shared/thermal";
import { invalidInput } from "../errors";
import type { StoredSeries } from "../storage/series-codec";

/**
 * One test's analysis and chart from its stored series, with the engine's pure functions:
 * suggested window → least-squares fit → measured heat leak → ratio to the stage's prediction.
 * Run when a log arrives and when the window moves; the results are stored on the test row.
 */
export interface AnalysisContext {
  method: TestMethod;
  cryogen: CryogenId;
  stageIndex: number;
  stageLabel: string;
  predictedHeatLeak_W: number | null;
  predictedEvaporationRate: number | null;
  capacity_L: number | null;
  ventReference: VentReference | null;
  ambientPressure_Pa: number | null;
  firstReadingAt: string | null;
}

/**
 * The suggestion is a heuristic over local slopes and costs O(n log n) several times over; past
 * this many readings it runs on every k-th reading (real reading times, so the window's bounds
 * are times in the log). The fit always uses every reading in the window.
 */
const SUGGEST_MAX_POINTS = 20_000;

const UNCERTAINTY_NOTE =
  "95 % intervals come from ordinary least squares with Student's t and assume independent readings; " +
  "logger noise is often correlated in time, which makes them optimistic. The prediction is taken as exact.";

export function suggestWindow(series: StoredSeries): { start_s: number; end_s: number } {
  const n = series.time.length;
  const step = Math.ceil(n / SUGGEST_MAX_POINTS);
  if (step <= 1) {
    const w = suggestSteadyWindow(series.time, series.value);
    return { start_s: w.start_s, end_s: w.end_s };
  }
  const m = Math.ceil(n / step);
  const t = new Float64Array(m);
  const v = new Float64Array(m);
  for (let j = 0; j < m; j++) {
    t[j] = series.time[j * step];
    v[j] = series.value[j * step];
  }
  const w = suggestSteadyWindow(t, v);
  return { start_s: w.start_s, end_s: w.end_s };
}

function windowBounds(time: Float64Array, w: { start_s: number; end_s: number }): [number, number] {
  let lo = 0;
  while (lo < time.length && time[lo] < w.start_s) lo++;
  let hi = lo;
  while (hi < time.length && time[hi] <= w.end_s) hi++;
  return [lo, hi];
}

export function analyseSeries(series: StoredSeries, ctx: AnalysisContext, chosen: { start_s: number; end_s: number } | null): { analysis: Analysis; chart: Series } {
  const window = chosen ?? suggestWindow(series);
  const [lo, hi] = windowBounds(series.time, window);
  const duration = series.time[series.time.length - 1];
  if (hi - lo < MINIMUM_FIT_POINTS) {
    const message = `the window ${window.start_s} to ${window.end_s} s holds ${hi - lo} reading${hi - lo === 1 ? "" : "s"}; a fit needs at least ${MINIMUM_FIT_POINTS} (the log runs from 0 to ${duration} s)`;
    throw invalidInput(`Check the window: ${message}.`, [{ path: "window", message }]);
  }
  const fit = fitRate(series.time.subarray(lo, hi), series.value.subarray(lo, hi), window);

  const ventReference = ctx.method === "vent-flow" ? (ctx.ventReference ?? DEFAULT_VENT_REFERENCE) : null;
  // A vent flowmeter reads the boil-off directly: its signal is the mean flow, not a slope.
  const flow = ctx.method === "vent-flow";
  const tRate = studentTQuantile(0.975, flow ? fit.points - 1 : fit.degreesOfFreedom);
  const rate = flow ? fit.mean : fit.rate;
  const rateStdError = flow ? fit.meanStdError : fit.rateStdError;
  const interval95: [number, number] = flow ? [rate - tRate * rateStdError, rate + tRate * rateStdError] : fit.interval95;
  const toEngine = ctx.method === "level" ? 1 / 100 : 1; // % of capacity → fraction

  let pressureSum = 0;
  if (series.pressure) for (let i = lo; i < hi; i++) pressureSum += series.pressure[i];
  const barometric_Pa = series.pressure ? pressureSum / (hi - lo) : (ctx.ambientPressure_Pa ?? undefined);
  const heat = measuredHeatLeak({
    method: ctx.method,
    rate: rate * toEngine,
    rateStdError: rateStdError * toEngine,
    cryogen: ctx.cryogen,
    capacity_L: ctx.capacity_L ?? undefined,
    ventReference: ventReference ?? undefined,
    barometricPressure_Pa: barometric_Pa,
  });
  const q = heat.measuredHeatLeak_W;
  const qSe = heat.measuredHeatLeakStdError_W;
  const warnings = [...heat.warnings];

  let ratio: { ratio: number; ratioStdError: number } | null = null;
  if (ctx.predictedHeatLeak_W !== null && ctx.predictedHeatLeak_W > 0) {
    ratio = compareWithPrediction({ measured_W: q, measuredStdError_W: qSe, predicted_W: ctx.predictedHeatLeak_W });
  } else {
    warnings.push(`the revision predicts no heat into ${ctx.stageLabel}, so there is no ratio to the prediction`);
  }
  const fluid = cryogenProperties(ctx.cryogen);

  const analysis: Analysis = {
    window,
    suggested: chosen === null,
    method: ctx.method,
    cryogen: ctx.cryogen,
    stageIndex: ctx.stageIndex,
    stageLabel: ctx.stageLabel,
    seriesUnit: SERIES_UNITS[ctx.method],
    points: fit.points,
    totalPoints: series.time.length,
    rate,
    rateStdError,
    interval95,
    rateUnit: flow ? "standard L/min" : `${SERIES_UNITS[ctx.method]}/s`,
    slope: fit.rate,
    slopeStdError: fit.rateStdError,
    intercept: fit.intercept,
    residualStdDev: fit.residualStdDev,
    degreesOfFreedom: fit.degreesOfFreedom,
    measuredHeatLeak_W: q,
    measuredHeatLeakStdError_W: qSe,
    measuredHeatLeakInterval95_W: [q - tRate * qSe, q + tRate * qSe],
    predictedHeatLeak_W: ctx.predictedHeatLeak_W,
    ratio: ratio?.ratio ?? null,
    ratioStdError: ratio?.ratioStdError ?? null,
    ratioInterval95: ratio ? [ratio.ratio - tRate * ratio.ratioStdError, ratio.ratio + tRate * ratio.ratioStdError] : null,
    capacity_L: ctx.capacity_L,
    evaporationRate_percent_per_day: heat.evaporationRate_percent_per_day ?? null,
    predictedEvaporationRate_percent_per_day: ctx.predictedEvaporationRate,
    boilOff_L_per_day: q >= 0 ? boilOff({ heat_W: q, cryogen: ctx.cryogen }).liquidVolume_L_per_day : null,
    ventReference,
    ventReferenceLabel: ventReference ? VENT_REFERENCE_CONDITIONS[ventReference].label : null,
    ventedGasFactor: ventedGasFactor(fluid),
    barometric:
      heat.barometricPressure_Pa !== undefined
        ? { meanPressure_Pa: heat.barometricPressure_Pa, source: series.pressure ? "log" : "test", saturationTemperatureShift_K: heat.saturationTemperatureShift_K ?? 0, correctionApplied: false }
        : null,
    warnings,
    uncertaintyNote: UNCERTAINTY_NOTE,
  };
  return { analysis, chart: chartOf(series, ctx, analysis, lo, hi) };
}

function chartOf(series: StoredSeries, ctx: AnalysisContext, a: Analysis, lo: number, hi: number): Series {
  const line = (t: number) => a.intercept + a.slope * t;
  const residuals = new Float64Array(hi - lo);
  for (let i = lo; i < hi; i++) residuals[i - lo] = series.value[i] - line(series.time[i]);
  const windowTime = series.time.subarray(lo, hi);
  return {
    unit: SERIES_UNITS[ctx.method],
    totalPoints: series.time.length,
    firstReadingAt: ctx.firstReadingAt,
    points: downsample(series.time, series.value),
    pressure_Pa: series.pressure ? downsample(series.time, series.pressure) : null,
    window: a.window,
    suggested: a.suggested,
    fit: { start: [a.window.start_s, line(a.window.start_s)], end: [a.window.end_s, line(a.window.end_s)] },
    residuals: downsample(windowTime, residuals),
  };
}

/** LTTB (Steinarsson 2013, the downsample package) over reading indices, so no copy of the series is made. */
function downsample(x: Float64Array, y: Float64Array): [number, number][] {
  const indices = new Uint32Array(x.length);
  for (let i = 0; i < indices.length; i++) indices[i] = i;
  const lttb = createLTTB<number>({ x: (i: number) => x[i], y: (i: number) => y[i] });
  const picked = lttb(indices, SERIES_MAX_POINTS);
  const out: [number, number][] = new Array(picked.length);
  for (let k = 0; k < picked.length; k++) out[k] = [x[picked[k]], y[picked[k]]];
  return out;
}
