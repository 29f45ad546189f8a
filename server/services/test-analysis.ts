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
  type FluidProperties,
  type VentReference,
} from "../../shared/thermal";
import type { TestRow } from "../db/repositories/boil-off-tests";
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
  /** Weighing: the empty vessel's mass (readings − tare = the liquid). */
  tareMass_kg: number | null;
  /** Vent-flow: the share of the capacity filled at the first reading. */
  fillFraction: number | null;
  firstReadingAt: string | null;
  /** The log's suggestion when already worked out (it depends on the log only). */
  suggestedWindow?: { start_s: number; end_s: number };
}

export const analysisContextOf = (t: TestRow, firstReadingAt: string | null, suggestedWindow?: { start_s: number; end_s: number }): AnalysisContext => ({
  method: t.method,
  cryogen: t.cryogen as CryogenId,
  stageIndex: t.stageIndex,
  stageLabel: t.stageLabel,
  predictedHeatLeak_W: t.predictedHeatLeak_W,
  predictedEvaporationRate: t.predictedEvaporationRate,
  capacity_L: t.capacity_L,
  ventReference: t.ventReference,
  ambientPressure_Pa: t.ambientPressure_Pa,
  tareMass_kg: t.tareMass_kg,
  fillFraction: t.fillFraction,
  firstReadingAt,
  suggestedWindow,
});

/** The test row's columns that hold an analysis. */
export const resultColumns = (analysis: Analysis, chart: Series, suggested: boolean) => ({
  windowStart_s: analysis.window.start_s,
  windowEnd_s: analysis.window.end_s,
  windowSuggested: suggested,
  analysis,
  chart,
  measuredHeatLeak_W: analysis.measuredHeatLeak_W,
  ratio: analysis.ratio,
});

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

  const fluid = cryogenProperties(ctx.cryogen);
  // The barometer's mean and least-squares trend over the same window.
  const pressureFit = series.pressure ? fitRate(series.time.subarray(lo, hi), series.pressure.subarray(lo, hi), window) : null;
  const pressureTrend = pressureFit ? { slope_Pa_per_s: pressureFit.rate, stdError_Pa_per_s: pressureFit.rateStdError } : null;
  const engineInput = {
    method: ctx.method,
    rate: rate * toEngine,
    rateStdError: rateStdError * toEngine,
    cryogen: ctx.cryogen,
    capacity_L: ctx.capacity_L ?? undefined,
    ventReference: ventReference ?? undefined,
    barometricPressure_Pa: pressureFit ? pressureFit.mean : (ctx.ambientPressure_Pa ?? undefined),
  };
  const uncorrected = measuredHeatLeak(engineInput);
  const liquid = liquidMass(ctx, fluid, fit.mean, (window.start_s + window.end_s) / 2, uncorrected.ventedHeatLeak_W);
  const heat =
    pressureTrend && "mass_kg" in liquid ? measuredHeatLeak({ ...engineInput, pressureTrend, liquidMass_kg: liquid.mass_kg }) : uncorrected;
  const correction: NonNullable<Analysis["barometricCorrection"]> = heat.barometricCorrection.applied
    ? {
        applied: true,
        correction_W: heat.barometricCorrection.correction_W,
        correctionStdError_W: heat.barometricCorrection.correctionStdError_W,
        liquidMass_kg: heat.barometricCorrection.liquidMass_kg,
        liquidMassBasis: "basis" in liquid ? liquid.basis : "",
        liquidHeatCapacity_J_per_kg_K: heat.barometricCorrection.liquidHeatCapacity_J_per_kg_K,
        saturationTemperatureSlope_K_per_Pa: heat.barometricCorrection.saturationTemperatureSlope_K_per_Pa,
      }
    : { applied: false, reason: pressureTrend && "reason" in liquid ? liquid.reason : heat.barometricCorrection.reason };
  const q = heat.measuredHeatLeak_W;
  const qSe = heat.measuredHeatLeakStdError_W;
  const warnings = [...heat.warnings];

  let ratio: { ratio: number; ratioStdError: number } | null = null;
  if (ctx.predictedHeatLeak_W !== null && ctx.predictedHeatLeak_W > 0) {
    ratio = compareWithPrediction({ measured_W: q, measuredStdError_W: qSe, predicted_W: ctx.predictedHeatLeak_W });
  } else {
    warnings.push(`the revision predicts no heat into ${ctx.stageLabel}, so there is no ratio to the prediction`);
  }

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
        ? { meanPressure_Pa: heat.barometricPressure_Pa, source: series.pressure ? "log" : "test", saturationTemperatureShift_K: heat.saturationTemperatureShift_K ?? 0, correctionApplied: heat.barometricCorrectionApplied }
        : null,
    uncorrectedHeatLeak_W: heat.ventedHeatLeak_W,
    uncorrectedHeatLeakStdError_W: heat.ventedHeatLeakStdError_W,
    pressureTrend,
    barometricCorrectionApplied: heat.barometricCorrectionApplied,
    barometricCorrection: correction,
    warnings,
    uncertaintyNote: UNCERTAINTY_NOTE,
  };
  return { analysis, chart: chartOf(series, ctx, analysis, lo, hi) };
}

type LiquidMass = { mass_kg: number; basis: string } | { reason: string };

/**
 * The liquid in the vessel during the window, for the barometric correction. Weighing: the mean
 * reading less the empty vessel's tare. Level: the mean level × capacity × liquid density.
 * Vent-flow: the starting fill × capacity × liquid density, less what boiled off up to the
 * window's middle (the vented heat over h_fg).
 */
function liquidMass(ctx: AnalysisContext, fluid: FluidProperties, meanReading: number, windowMiddle_s: number, vented_W: number): LiquidMass {
  const fromVolume = (litres: number) => (litres / 1000) * fluid.liquidDensity_kg_per_m3;
  let mass_kg: number;
  let basis: string;
  switch (ctx.method) {
    case "weighing":
      if (ctx.tareMass_kg === null) return { reason: "no tare mass on the test (the scale reading includes the vessel)" };
      mass_kg = meanReading - ctx.tareMass_kg;
      basis = `mean reading ${meanReading.toPrecision(5)} kg less the tare ${ctx.tareMass_kg} kg`;
      break;
    case "level":
      if (ctx.capacity_L === null) return { reason: "no capacity on the test" };
      mass_kg = fromVolume((meanReading / 100) * ctx.capacity_L);
      basis = `mean level ${meanReading.toPrecision(4)} % of ${ctx.capacity_L} L`;
      break;
    case "vent-flow":
      if (ctx.capacity_L === null) return { reason: "no capacity on the test" };
      if (ctx.fillFraction === null) return { reason: "no starting fill fraction on the test" };
      mass_kg = fromVolume(ctx.fillFraction * ctx.capacity_L) - (Math.max(vented_W, 0) / fluid.latentHeat_J_per_kg) * windowMiddle_s;
      basis = `fill ${ctx.fillFraction} of ${ctx.capacity_L} L less the boil-off up to the window's middle`;
      break;
  }
  if (!(mass_kg > 0)) return { reason: `the liquid mass works out at ${mass_kg.toPrecision(3)} kg (${basis}): check the test's figures` };
  return { mass_kg, basis };
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
