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
  /** The log's suggestion when already worked out (it depends on the log only). */
  suggestedWindow?: { start_s: number; end_s: number };
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
  const suggestedWindow = ctx.suggestedWindow ?? suggestWindow(series);
  const window = chosen ?? suggestedWindow;
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
    suggestedWindow,
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

/**
 * Largest-Triangle-Three-Buckets (Steinarsson, "Downsampling Time Series for Visual
 * Representation", MSc thesis, University of Iceland, 2013): keeps the first and last points and,
 * from each of the threshold − 2 equal buckets between them, the point that makes the largest
 * triangle with the point kept before it and the mean of the next bucket. Written out over the
 * Float64 columns (the downsample package's accessor form took half a second on 1,000,000
 * readings); every point it returns is a real reading.
 */
export function downsample(x: Float64Array, y: Float64Array, threshold = SERIES_MAX_POINTS): [number, number][] {
  const n = x.length;
  if (threshold >= n || threshold < 3) {
    const all: [number, number][] = new Array(n);
    for (let i = 0; i < n; i++) all[i] = [x[i], y[i]];
    return all;
  }
  const out: [number, number][] = new Array(threshold);
  const every = (n - 2) / (threshold - 2);
  let a = 0;
  out[0] = [x[0], y[0]];
  for (let k = 0; k < threshold - 2; k++) {
    // The mean of the next bucket (the last point for the last bucket).
    const nextStart = Math.floor((k + 1) * every) + 1;
    const nextEnd = Math.min(Math.floor((k + 2) * every) + 1, n);
    let meanX = 0;
    let meanY = 0;
    for (let j = nextStart; j < nextEnd; j++) {
      meanX += x[j];
      meanY += y[j];
    }
    const count = nextEnd - nextStart;
    if (count > 0) {
      meanX /= count;
      meanY /= count;
    } else {
      meanX = x[n - 1];
      meanY = y[n - 1];
    }
    const start = Math.floor(k * every) + 1;
    const end = Math.floor((k + 1) * every) + 1;
    const ax = x[a];
    const ay = y[a];
    let best = start;
    let bestArea = -1;
    for (let j = start; j < end; j++) {
      const area = Math.abs((ax - meanX) * (y[j] - ay) - (ax - x[j]) * (meanY - ay));
      if (area > bestArea) {
        bestArea = area;
        best = j;
      }
    }
    out[k + 1] = [x[best], y[best]];
    a = best;
  }
  out[threshold - 1] = [x[n - 1], y[n - 1]];
  return out;
}
