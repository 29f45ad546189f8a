import { requireAbove, requireWhole, ThermalInputError } from "./errors";

/**
 * Conduction through supports and penetrations: Q = (A/L)·∫k dT·count (Fourier's law with a
 * temperature-dependent conductivity; e.g. Ekin, Experimental Techniques for Low-Temperature
 * Measurements, 2006, §2.2 on conductivity integrals).
 *
 * Conductivities are the NIST Cryogenics Technologies Group fits ("Material Properties" pages;
 * Marquardt, Le & Radebaugh, Cryogenic Material Properties Database, 11th Int. Cryocooler Conf.,
 * 2000). Coefficients were cross-checked against independent transcriptions of those pages.
 *
 * Range policy (our decision): below a fit's lower limit the log-polynomials turn over and are
 * meaningless, so the conductivity itself is refused there; but a support often ends in a
 * liquid-helium bath below the G-10 fits' 10–12 K limit, so the conductivity *integral* may start
 * as low as 1 K, holding k at its value at the fit's lower limit over the missing stretch. These
 * materials' k rises with T, so that overstates the (small) missing part: the estimate errs warm,
 * and a warning says so. From the upper limit (300 K) up to 400 K the fits stay smooth and
 * monotonic, so we extrapolate and warn; above 400 K we refuse.
 */
export type SupportMaterial =
  | "stainless-304"
  | "g10-normal"
  | "g10-warp"
  | "ptfe"
  | "copper-ofhc-rrr50"
  | "copper-ofhc-rrr100";

export interface SupportMaterialFit {
  label: string;
  fitSource: string;
  /** "log-polynomial": log10 k = Σ a_i (log10 T)^i. "copper-rational": NIST OFHC copper form. */
  fitForm: "log-polynomial" | "copper-rational";
  coefficients: readonly number[];
  validRange_K: [number, number];
  /** The fit's stated deviation from the data it was fitted to, where NIST states it. */
  fitError_percent?: number;
}

/** Above this we refuse even with a warning: the fits were never meant for it. */
export const EXTRAPOLATION_LIMIT_K = 400;
/** The lowest cold end of a conductivity integral (see the range policy above). */
export const INTEGRAL_FLOOR_K = 1;

const NIST_PAGES = "NIST Cryogenics Technologies Group, Material Properties pages";

export const SUPPORT_MATERIALS: Record<SupportMaterial, SupportMaterialFit> = {
  "stainless-304": {
    label: "304 stainless steel",
    fitSource: `${NIST_PAGES}: 304 stainless, thermal conductivity, equation range 1–300 K`,
    fitForm: "log-polynomial",
    coefficients: [-1.4087, 1.3982, 0.2543, -0.626, 0.2334, 0.4256, -0.4658, 0.165, -0.0199],
    validRange_K: [1, 300],
  },
  "g10-normal": {
    label: "G-10 CR glass-epoxy laminate, normal to the cloth",
    fitSource: `${NIST_PAGES}: G-10 CR fiberglass epoxy, normal direction, equation range 10–300 K`,
    fitForm: "log-polynomial",
    coefficients: [-4.1236, 13.788, -26.068, 26.272, -14.663, 4.4954, -0.6905, 0.0397, 0],
    validRange_K: [10, 300],
    fitError_percent: 5,
  },
  "g10-warp": {
    label: "G-10 CR glass-epoxy laminate, along the warp",
    fitSource: `${NIST_PAGES}: G-10 CR fiberglass epoxy, warp direction, equation range 12–300 K`,
    fitForm: "log-polynomial",
    coefficients: [-2.64827, 8.80228, -24.8998, 41.1625, -39.8754, 23.1778, -7.95635, 1.48806, -0.11701],
    validRange_K: [12, 300],
    fitError_percent: 5,
  },
  ptfe: {
    label: "PTFE",
    fitSource: `${NIST_PAGES}: polytetrafluoroethylene, equation range 4–300 K`,
    fitForm: "log-polynomial",
    coefficients: [2.738, -30.677, 89.43, -136.99, 124.69, -69.556, 23.32, -4.3135, 0.33829],
    validRange_K: [4, 300],
    fitError_percent: 5,
  },
  "copper-ofhc-rrr50": {
    label: "Oxygen-free high-conductivity copper, RRR 50",
    fitSource: `${NIST_PAGES}: OFHC copper, RRR = 50, equation range 4–300 K`,
    fitForm: "copper-rational",
    coefficients: [1.8743, -0.41538, -0.6018, 0.13294, 0.26426, -0.0219, -0.051276, 0.0014871, 0.003723],
    validRange_K: [4, 300],
    fitError_percent: 2,
  },
  "copper-ofhc-rrr100": {
    label: "Oxygen-free high-conductivity copper, RRR 100",
    fitSource: `${NIST_PAGES}: OFHC copper, RRR = 100, equation range 4–300 K`,
    fitForm: "copper-rational",
    coefficients: [2.2154, -0.47461, -0.88068, 0.13871, 0.29505, -0.02043, -0.04831, 0.001281, 0.003207],
    validRange_K: [4, 300],
    fitError_percent: 1,
  },
};

export const SUPPORT_MATERIAL_IDS = Object.keys(SUPPORT_MATERIALS) as SupportMaterial[];

function materialFit(material: SupportMaterial, field: string): SupportMaterialFit {
  if (typeof material !== "string" || !Object.prototype.hasOwnProperty.call(SUPPORT_MATERIALS, material)) {
    throw new ThermalInputError(field, material, `one of ${SUPPORT_MATERIAL_IDS.join(", ")}`);
  }
  return SUPPORT_MATERIALS[material];
}

function requireFitTemperature(field: string, value: unknown, fit: SupportMaterialFit): number {
  const [min] = fit.validRange_K;
  if (typeof value !== "number" || !Number.isFinite(value) || value < min || value > EXTRAPOLATION_LIMIT_K) {
    throw new ThermalInputError(
      field,
      value,
      `a temperature from ${min} K (the fit's lower limit) to ${EXTRAPOLATION_LIMIT_K} K for ${fit.label}`,
    );
  }
  return value;
}

/** The fit itself, no range checks: callers have already checked. */
function conductivity(fit: SupportMaterialFit, temperature_K: number): number {
  const c = fit.coefficients;
  if (fit.fitForm === "log-polynomial") {
    const x = Math.log10(temperature_K);
    let sum = 0;
    for (let i = c.length - 1; i >= 0; i--) sum = sum * x + c[i];
    return 10 ** sum;
  }
  // NIST OFHC copper: log10 k = (a + c·T^0.5 + e·T + g·T^1.5 + i·T²)/(1 + b·T^0.5 + d·T + f·T^1.5 + h·T²).
  const r = Math.sqrt(temperature_K);
  const [a, b, cc, d, e, f, g, h, i] = c;
  const numerator = a + cc * r + e * temperature_K + g * temperature_K * r + i * temperature_K ** 2;
  const denominator = 1 + b * r + d * temperature_K + f * temperature_K * r + h * temperature_K ** 2;
  return 10 ** (numerator / denominator);
}

/** Thermal conductivity from the NIST fit, W/(m·K). Refuses outside [fit minimum, 400 K]. */
export function thermalConductivity(material: SupportMaterial, temperature_K: number): number {
  const fit = materialFit(material, "material");
  return conductivity(fit, requireFitTemperature("temperature_K", temperature_K, fit));
}

function requireIntegralColdEnd(value: unknown, fit: SupportMaterialFit): number {
  if (typeof value !== "number" || !Number.isFinite(value) || value < INTEGRAL_FLOOR_K || value > EXTRAPOLATION_LIMIT_K) {
    throw new ThermalInputError("cold_K", value, `a temperature from ${INTEGRAL_FLOOR_K} K to ${EXTRAPOLATION_LIMIT_K} K for ${fit.label}`);
  }
  return value;
}

/**
 * ∫k dT from cold_K to warm_K, W/m, by adaptive Simpson quadrature to 1e-10 relative. Below the
 * fit's lower limit k is held at its value there (the range policy at the top of this file).
 */
export function conductivityIntegral(material: SupportMaterial, cold_K: number, warm_K: number): number {
  const fit = materialFit(material, "material");
  const cold = requireIntegralColdEnd(cold_K, fit);
  const warm = requireFitTemperature("warm_K", warm_K, fit);
  if (warm < cold) throw new ThermalInputError("warm_K", warm, `a temperature at or above cold_K (${cold} K)`);
  if (warm === cold) return 0;
  const key = `${material}|${cold}|${warm}`;
  const known = integrals.get(key);
  if (known !== undefined) return known;
  const min = fit.validRange_K[0];
  const below = cold < min ? conductivity(fit, min) * (min - cold) : 0;
  const from = Math.max(cold, min);
  const integral = below + (warm > from ? adaptiveSimpson((t) => conductivity(fit, t), from, warm, 1e-10) : 0);
  if (integrals.size >= INTEGRALS_KEPT) integrals.clear();
  integrals.set(key, integral);
  return integral;
}

// The fits are fixed, so an integral between two temperatures never changes: sweeps and bands
// re-solve the blanket many times between the same stage temperatures, and quadrature to 1e-10
// is the costly part of a support. A bounded memo, emptied when full.
const INTEGRALS_KEPT = 1024;
const integrals = new Map<string, number>();

export interface SupportConductionInput {
  material: SupportMaterial;
  area_m2: number;
  length_m: number;
  warm_K: number;
  cold_K: number;
  count?: number;
}

export interface SupportConductionResult {
  heat_W: number;
  conductivityIntegral_W_per_m: number;
  warnings: string[];
}

export function supportConduction(input: SupportConductionInput): SupportConductionResult {
  const fit = materialFit(input.material, "material");
  const area_m2 = requireAbove("area_m2", input.area_m2, 0, "m²");
  const length_m = requireAbove("length_m", input.length_m, 0, "m");
  const count = input.count === undefined ? 1 : requireWhole("count", input.count, 1, 1_000_000);
  const integral = conductivityIntegral(input.material, input.cold_K, input.warm_K);

  const warnings: string[] = [];
  const [min, max] = fit.validRange_K;
  if (input.cold_K < min) {
    warnings.push(
      `cold_K ${input.cold_K} K is below the ${fit.label} fit's range (from ${min} K); conductivity held at its ${min} K value below that, which errs on the warm side`,
    );
  }
  if (input.warm_K > max) {
    warnings.push(
      `warm_K ${input.warm_K} K is above the ${fit.label} fit's range (to ${max} K); conductivity extrapolated`,
    );
  }
  return { heat_W: (area_m2 / length_m) * integral * count, conductivityIntegral_W_per_m: integral, warnings };
}

/** Adaptive Simpson with Richardson correction (Lyness 1969); the integrands here are smooth. */
function adaptiveSimpson(f: (x: number) => number, a: number, b: number, relativeTolerance: number): number {
  const fa = f(a);
  const fb = f(b);
  const m = (a + b) / 2;
  const fm = f(m);
  const whole = ((b - a) / 6) * (fa + 4 * fm + fb);
  const tolerance = relativeTolerance * Math.abs(whole);
  return refine(f, a, b, fa, fm, fb, whole, tolerance, 60);
}

function refine(
  f: (x: number) => number,
  a: number,
  b: number,
  fa: number,
  fm: number,
  fb: number,
  whole: number,
  tolerance: number,
  depth: number,
): number {
  const m = (a + b) / 2;
  const lm = (a + m) / 2;
  const rm = (m + b) / 2;
  const flm = f(lm);
  const frm = f(rm);
  const left = ((m - a) / 6) * (fa + 4 * flm + fm);
  const right = ((b - m) / 6) * (fm + 4 * frm + fb);
  const delta = left + right - whole;
  if (depth <= 0 || Math.abs(delta) <= 15 * tolerance) return left + right + delta / 15;
  return (
    refine(f, a, m, fa, flm, fm, left, tolerance / 2, depth - 1) +
    refine(f, m, b, fm, frm, fb, right, tolerance / 2, depth - 1)
  );
}
