import { requireAbove, requireAtLeast, requireInRange, ThermalInputError } from "./errors";
import {
  heatFromLiquidVolume,
  heatFromStandardVentFlow,
  heatFromVentedMass,
  type VentReference,
} from "./boil-off";
import {
  cryogenProperties,
  saturationTemperatureSlope_K_per_Pa,
  SATURATION_PRESSURE_PA,
  type CryogenId,
  type FluidProperties,
} from "./fluids";
import { studentTQuantile } from "./student-t";
import { readSeries, type Series } from "./steady-window";

/**
 * Analysis of a logged boil-off test: fit a straight line to the steady part of the log, turn
 * the rate into a measured heat leak through the same fluid factors as the prediction, compare.
 */
export { suggestSteadyWindow, type SteadyWindow, type SteadyWindowOptions } from "./steady-window";

/** Fewer points than this and the slope's uncertainty is not worth showing. */
export const MINIMUM_FIT_POINTS = 10;

export interface RateFit {
  /** Slope of value against time, value units per second, signed (a mass loss is negative). */
  rate: number;
  rateStdError: number;
  interval95: [number, number];
  /** Value of the fitted line at t = 0 s. */
  intercept: number;
  points: number;
  residualStdDev: number;
  degreesOfFreedom: number;
  /** Mean of the values in the window and its standard error (for a vent-flow log). */
  mean: number;
  meanStdError: number;
}

/**
 * Ordinary least squares of value on time over the window (inclusive). Standard error of the
 * slope s/√Sxx with s² = Σe²/(n − 2); 95 % interval slope ± t(0.975, n − 2)·SE (NIST/SEMATECH
 * e-Handbook of Statistical Methods, §4.1.4.1; Montgomery & Runger, Applied Statistics and
 * Probability for Engineers, ch. 11, from memory). Logger noise is often correlated in time,
 * which makes this SE optimistic; we say so in the UI rather than guess a correction.
 */
export function fitRate(
  time_s: ArrayLike<number>,
  value: ArrayLike<number>,
  window: { start_s: number; end_s: number },
): RateFit {
  const series = readSeries(time_s, value);
  if (window === null || typeof window !== "object") {
    throw new ThermalInputError("window", window, "an object with start_s and end_s");
  }
  const start = requireFinite("window.start_s", window.start_s);
  const end = requireAbove("window.end_s", window.end_s, start, "s");

  const [lo, hi] = selectWindow(series, start, end);
  const n = hi - lo;
  if (n < MINIMUM_FIT_POINTS) {
    throw new ThermalInputError("window", window, `a window holding at least ${MINIMUM_FIT_POINTS} points (it holds ${n})`);
  }
  // Two-pass, centred sums: loggers give large offsets (a 200 kg dewar weighed to 1 g).
  let meanT = 0;
  let meanY = 0;
  for (let i = lo; i < hi; i++) {
    meanT += series.time[i];
    meanY += series.value[i];
  }
  meanT /= n;
  meanY /= n;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = lo; i < hi; i++) {
    const dt = series.time[i] - meanT;
    const dy = series.value[i] - meanY;
    sxx += dt * dt;
    sxy += dt * dy;
    syy += dy * dy;
  }
  const rate = sxy / sxx;
  let sse = 0;
  for (let i = lo; i < hi; i++) {
    const e = series.value[i] - meanY - rate * (series.time[i] - meanT);
    sse += e * e;
  }
  const degreesOfFreedom = n - 2;
  const residualStdDev = Math.sqrt(sse / degreesOfFreedom);
  const rateStdError = residualStdDev / Math.sqrt(sxx);
  const halfWidth = studentTQuantile(0.975, degreesOfFreedom) * rateStdError;
  return {
    rate,
    rateStdError,
    interval95: [rate - halfWidth, rate + halfWidth],
    intercept: meanY - rate * meanT,
    points: n,
    residualStdDev,
    degreesOfFreedom,
    mean: meanY,
    meanStdError: Math.sqrt(syy / (n - 1) / n),
  };
}

export type MeasurementMethod = "weighing" | "vent-flow" | "level";

export interface MeasuredHeatLeakInput {
  method: MeasurementMethod;
  /**
   * weighing: slope of vessel mass, kg/s (negative while boiling off);
   * vent-flow: steady vent flow, standard L/min at ventReference (the mean of a flow log, or
   *   60 × the slope of a totalizer log in standard L);
   * level: slope of liquid level as a fraction of capacity, 1/s (negative while boiling off).
   */
  rate: number;
  rateStdError: number;
  cryogen: CryogenId;
  capacity_L?: number;
  ventReference?: VentReference;
  /** Mean barometric pressure during the window (the saturation-temperature shift is reported). */
  barometricPressure_Pa?: number;
  /** Least-squares slope of the barometer over the same window and its standard error. */
  pressureTrend?: { slope_Pa_per_s: number; stdError_Pa_per_s: number };
  /** Liquid in the vessel during the window. */
  liquidMass_kg?: number;
}

export type BarometricCorrection =
  | {
      applied: true;
      /** m·c_p·(dT_sat/dp)·(dp/dt): heat the liquid stored (> 0, pressure rising) or released. */
      correction_W: number;
      correctionStdError_W: number;
      pressureSlope_Pa_per_s: number;
      pressureSlopeStdError_Pa_per_s: number;
      liquidMass_kg: number;
      liquidHeatCapacity_J_per_kg_K: number;
      saturationTemperatureSlope_K_per_Pa: number;
    }
  | { applied: false; reason: string };

export interface MeasuredHeatLeakResult {
  /** The heat leak: the vented heat plus the barometric correction when it is applied. */
  measuredHeatLeak_W: number;
  measuredHeatLeakStdError_W: number;
  /** What the boil-off rate alone gives (the heat leak before the barometric correction). */
  ventedHeatLeak_W: number;
  ventedHeatLeakStdError_W: number;
  evaporationRate_percent_per_day?: number;
  barometricPressure_Pa?: number;
  /** Shift of the bath's saturation temperature from its 1 atm value at that pressure. */
  saturationTemperatureShift_K?: number;
  barometricCorrectionApplied: boolean;
  barometricCorrection: BarometricCorrection;
  warnings: string[];
}

/** A barometer moving faster than this is more than weather: a sensor fault or a vessel pressure. */
const FAST_PRESSURE_TREND_PA_PER_S = 1000 / 3600;

/**
 * Measured heat leak from a fitted rate. Each method's rate becomes a heat through the same
 * factors boilOff uses, so a round trip closes: a scale weighs the vented gas, so
 * Q = ṁ_vented·h_fg/(1 − ρ_v/ρ_l); a vent flowmeter's standard litres become vented mass through
 * the ideal gas; a level gauge gives liquid volume, Q = V̇·ρ_l·h_fg. The conversion is linear, so
 * the standard error scales by the same factor.
 *
 * Barometric correction (common practice in boil-off testing): while the barometer drifts, the
 * bath's saturation temperature follows it, so the liquid stores (pressure rising) or releases
 * (falling) sensible heat that the vent never sees:
 *   Q = Q_vented + m·c_p·(dT_sat/dp)·(dp/dt),
 * dT_sat/dp from the Clapeyron equation at 1 atm, c_p of the saturated liquid at 1 atm. Its
 * standard error adds in quadrature, first order, from the pressure slope's alone (m, c_p and
 * the slope of the saturation curve are taken as exact). Without the trend or the liquid mass the
 * heat stays uncorrected and the result says why.
 */
export function measuredHeatLeak(input: MeasuredHeatLeakInput): MeasuredHeatLeakResult {
  const rate = requireFinite("rate", input.rate);
  const rateStdError = requireAtLeast("rateStdError", input.rateStdError, 0);
  const fluid = cryogenProperties(input.cryogen);
  const capacity_L = input.capacity_L === undefined ? undefined : requireAbove("capacity_L", input.capacity_L, 0, "L");
  const warnings: string[] = [];

  let heatPerUnit: number; // W per unit of boil-off signal, the signal being positive while boiling off
  let boilOffSignal: number;
  switch (input.method) {
    case "weighing":
      heatPerUnit = heatFromVentedMass({ ventedMass_kg_per_s: 1, cryogen: fluid.id }).heat_W;
      boilOffSignal = -rate;
      break;
    case "vent-flow":
      heatPerUnit = heatFromStandardVentFlow({
        flow_standard_L_per_min: 1,
        cryogen: fluid.id,
        ventReference: input.ventReference,
      }).heat_W;
      boilOffSignal = rate;
      break;
    case "level":
      if (capacity_L === undefined) {
        throw new ThermalInputError("capacity_L", input.capacity_L, "a capacity above 0 L (the level method needs it)");
      }
      heatPerUnit = heatFromLiquidVolume({ liquidVolume_m3_per_s: capacity_L / 1000, cryogen: fluid.id }).heat_W;
      boilOffSignal = -rate;
      break;
    default:
      throw new ThermalInputError("method", input.method, "one of weighing, vent-flow, level");
  }
  if (boilOffSignal < 0) {
    warnings.push(
      input.method === "vent-flow"
        ? "the vent flow is negative: check the flowmeter's zero and direction"
        : "the rate rises instead of falling: the window may include a fill, or the sign is reversed",
    );
  }

  const vented_W = heatPerUnit * boilOffSignal;
  const ventedStdError_W = heatPerUnit * rateStdError;
  const correction = barometricCorrection(fluid, input.pressureTrend, input.liquidMass_kg);
  const measuredHeatLeak_W = correction.applied ? vented_W + correction.correction_W : vented_W;
  const result: MeasuredHeatLeakResult = {
    measuredHeatLeak_W,
    measuredHeatLeakStdError_W: correction.applied ? Math.hypot(ventedStdError_W, correction.correctionStdError_W) : ventedStdError_W,
    ventedHeatLeak_W: vented_W,
    ventedHeatLeakStdError_W: ventedStdError_W,
    barometricCorrectionApplied: correction.applied,
    barometricCorrection: correction,
    warnings,
  };
  if (correction.applied && Math.abs(correction.pressureSlope_Pa_per_s) > FAST_PRESSURE_TREND_PA_PER_S) {
    warnings.push(
      `the barometer moves ${((correction.pressureSlope_Pa_per_s * 3600) / 1000).toFixed(2)} kPa/h, faster than weather does: ` +
        "check the pressure column's unit and sensor",
    );
  }
  if (capacity_L !== undefined) {
    const liquid_L_per_day =
      (measuredHeatLeak_W / (fluid.latentHeat_J_per_kg * fluid.liquidDensity_kg_per_m3)) * 1000 * 86_400;
    result.evaporationRate_percent_per_day = (liquid_L_per_day / capacity_L) * 100;
  }
  if (input.barometricPressure_Pa !== undefined) {
    const pressure = requireInRange("barometricPressure_Pa", input.barometricPressure_Pa, 50_000, 120_000, "Pa");
    const shift_K = saturationTemperatureSlope_K_per_Pa(fluid) * (pressure - SATURATION_PRESSURE_PA);
    result.barometricPressure_Pa = pressure;
    result.saturationTemperatureShift_K = shift_K;
    if (Math.abs(pressure - SATURATION_PRESSURE_PA) > 2_000) {
      warnings.push(
        `the mean barometric pressure (${(pressure / 1000).toFixed(1)} kPa) is away from 101.325 kPa: ` +
          `the bath sits ${shift_K.toFixed(3)} K off its normal boiling point; properties are taken at 1 atm` +
          (correction.applied ? "" : " and the heat leak is not corrected"),
      );
    }
  }
  return result;
}

function barometricCorrection(
  fluid: FluidProperties,
  trend: MeasuredHeatLeakInput["pressureTrend"],
  liquidMass_kg: number | undefined,
): BarometricCorrection {
  if (trend === undefined) return { applied: false, reason: "no barometer column in the log, so no pressure trend" };
  if (trend === null || typeof trend !== "object") {
    throw new ThermalInputError("pressureTrend", trend, "an object with slope_Pa_per_s and stdError_Pa_per_s");
  }
  const slope = requireFinite("pressureTrend.slope_Pa_per_s", trend.slope_Pa_per_s);
  const slopeStdError = requireAtLeast("pressureTrend.stdError_Pa_per_s", trend.stdError_Pa_per_s, 0, "Pa/s");
  if (liquidMass_kg === undefined) return { applied: false, reason: "the liquid mass in the vessel is unknown" };
  const mass = requireAbove("liquidMass_kg", liquidMass_kg, 0, "kg");
  const dTdp = saturationTemperatureSlope_K_per_Pa(fluid);
  // Heat the liquid takes per pascal of pressure rise, J/Pa.
  const storage_J_per_Pa = mass * fluid.liquidHeatCapacity_J_per_kg_K * dTdp;
  return {
    applied: true,
    correction_W: storage_J_per_Pa * slope,
    correctionStdError_W: storage_J_per_Pa * slopeStdError,
    pressureSlope_Pa_per_s: slope,
    pressureSlopeStdError_Pa_per_s: slopeStdError,
    liquidMass_kg: mass,
    liquidHeatCapacity_J_per_kg_K: fluid.liquidHeatCapacity_J_per_kg_K,
    saturationTemperatureSlope_K_per_Pa: dTdp,
  };
}

/** Ratio of measured to predicted heat leak; the prediction is taken as exact. */
export function compareWithPrediction(input: {
  measured_W: number;
  measuredStdError_W: number;
  predicted_W: number;
}): { ratio: number; ratioStdError: number } {
  const measured = requireFinite("measured_W", input.measured_W);
  const stdError = requireAtLeast("measuredStdError_W", input.measuredStdError_W, 0, "W");
  const predicted = requireAbove("predicted_W", input.predicted_W, 0, "W");
  return { ratio: measured / predicted, ratioStdError: stdError / predicted };
}

/** The readings inside [start_s, end_s] as an index range [lo, hi): times increase, so they are contiguous. */
function selectWindow(series: Series, start_s: number, end_s: number): [number, number] {
  const t = series.time;
  const firstAtOrAfter = (x: number, strict: boolean) => {
    let lo = 0;
    let hi = t.length;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (strict ? t[mid] <= x : t[mid] < x) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  };
  return [firstAtOrAfter(start_s, false), firstAtOrAfter(end_s, true)];
}

function requireFinite(field: string, value: unknown): number {
  if (typeof value !== "number" || !Number.isFinite(value)) throw new ThermalInputError(field, value, "a finite number");
  return value;
}

