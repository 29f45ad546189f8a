import { ThermalInputError, requireAbove, requireEmissivityValue, requireInRange } from "./errors";

/**
 * Total hemispherical emissivity of a gray surface, as a constant, a power law in temperature,
 * or a table of measured points.
 */
export type Emissivity =
  | number
  | { kind: "power"; reference: number; referenceTemperature_K: number; exponent: number }
  | { kind: "table"; points: [temperature_K: number, emissivity: number][] }; // linear in T, clamped at the ends

// A power-law exponent beyond this is a typo, not a surface: the Hagen–Rubens regime of metals
// gives n ≈ 0.5 (R. Siegel & J. R. Howell, Thermal Radiation Heat Transfer, 4th ed., Ch. 4,
// the Hagen–Rubens relation; from memory).
const MAX_EXPONENT = 5;

const MODEL_ALLOWED = 'an emissivity above 0 and at most 1, or { kind: "power" | "table", … }';

/** Throws ThermalInputError naming the bad part of the model (e.g. "shields[2].warmSide.points[1][0]"). */
export function validateEmissivity(model: Emissivity, field: string): void {
  if (typeof model === "number") {
    requireEmissivityValue(field, model);
    return;
  }
  if (model === null || typeof model !== "object") throw new ThermalInputError(field, model, MODEL_ALLOWED);
  if (model.kind === "power") {
    requireEmissivityValue(`${field}.reference`, model.reference);
    requireAbove(`${field}.referenceTemperature_K`, model.referenceTemperature_K, 0, "K");
    requireInRange(`${field}.exponent`, model.exponent, -MAX_EXPONENT, MAX_EXPONENT);
    return;
  }
  if (model.kind === "table") {
    const points: unknown = model.points;
    if (!Array.isArray(points) || points.length === 0) {
      throw new ThermalInputError(`${field}.points`, points, "a non-empty list of [temperature_K, emissivity] points");
    }
    let previous_K = 0;
    points.forEach((point: unknown, i: number) => {
      if (!Array.isArray(point) || point.length !== 2) {
        throw new ThermalInputError(`${field}.points[${i}]`, point, "a pair [temperature_K, emissivity]");
      }
      const temperature_K = requireAbove(`${field}.points[${i}][0]`, point[0], 0, "K");
      if (i > 0 && temperature_K <= previous_K) {
        throw new ThermalInputError(
          `${field}.points[${i}][0]`,
          temperature_K,
          `a temperature above the previous point's ${previous_K} K (points sorted by temperature, strictly increasing)`,
        );
      }
      requireEmissivityValue(`${field}.points[${i}][1]`, point[1]);
      previous_K = temperature_K;
    });
    return;
  }
  throw new ThermalInputError(`${field}.kind`, (model as { kind?: unknown }).kind, '"power" or "table"');
}

/** True when the model gives the same emissivity at every temperature (no iteration needed). */
export function isConstantEmissivity(model: Emissivity): boolean {
  validateEmissivity(model, "emissivity");
  return isConstantModel(model);
}

/** isConstantEmissivity for a model the caller has already validated. */
export function isConstantModel(model: Emissivity): boolean {
  if (typeof model === "number") return true;
  if (model.kind === "power") return model.exponent === 0;
  const first = model.points[0][1];
  return model.points.every((point) => point[1] === first);
}

/** Emissivity at a temperature; validates the model and the temperature first. */
export function emissivityAt(model: Emissivity, temperature_K: number, field = "emissivity"): number {
  validateEmissivity(model, field);
  requireAbove("temperature_K", temperature_K, 0, "K");
  return evaluateEmissivity(model, temperature_K);
}

/**
 * The unchecked evaluation used in the solvers' inner loops: the caller has validated the
 * model once. Power law ε = ε_ref·(T/T_ref)^n, capped at 1 (a gray surface cannot exceed a
 * black body); table linear in T between points and held at the end values outside them.
 */
export function evaluateEmissivity(model: Emissivity, temperature_K: number): number {
  if (typeof model === "number") return model;
  if (model.kind === "power") {
    const ratio = temperature_K / model.referenceTemperature_K;
    // sqrt for the common Hagen–Rubens exponent and exp∘log otherwise: both several times
    // cheaper than Math.pow in V8, which matters inside the shield-temperature iteration.
    const scale = model.exponent === 0.5 ? Math.sqrt(ratio) : Math.exp(model.exponent * Math.log(ratio));
    const value = model.reference * scale;
    return value < 1 ? value : 1;
  }
  return interpolateTable(model.points, temperature_K);
}

function interpolateTable(points: [number, number][], temperature_K: number): number {
  const last = points.length - 1;
  if (temperature_K <= points[0][0]) return points[0][1];
  if (temperature_K >= points[last][0]) return points[last][1];
  const lo = segmentBelow(points, temperature_K);
  const [t0, e0] = points[lo];
  const [t1, e1] = points[lo + 1];
  return e0 + ((e1 - e0) * (temperature_K - t0)) / (t1 - t0);
}

/** Binary search: the index lo of the segment [lo, lo + 1] holding a temperature from the first point up to (not at) the last. */
function segmentBelow(points: [number, number][], temperature_K: number): number {
  let lo = 0;
  let hi = points.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (points[mid][0] <= temperature_K) lo = mid;
    else hi = mid;
  }
  return lo;
}

/**
 * dε/dT of a validated model, for the Newton solvers: n·ε/T on the power law (0 where it is
 * capped at 1), the segment slope inside a table, 0 outside it and for constants. Pass the
 * emissivity at this temperature as `value` when it is already known, to skip a second power.
 */
export function emissivitySlope(model: Emissivity, temperature_K: number, value = evaluateEmissivity(model, temperature_K)): number {
  if (typeof model === "number") return 0;
  if (model.kind === "power") return value < 1 ? (model.exponent * value) / temperature_K : 0;
  const points = model.points;
  const last = points.length - 1;
  if (last === 0 || temperature_K < points[0][0] || temperature_K >= points[last][0]) return 0;
  const lo = segmentBelow(points, temperature_K);
  return (points[lo + 1][1] - points[lo][1]) / (points[lo + 1][0] - points[lo][0]);
}
