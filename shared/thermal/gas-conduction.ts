import { ThermalInputError, requireAbove, requireEmissivityValue } from "./errors";

export type GasName = "helium" | "hydrogen" | "neon" | "nitrogen" | "air" | "argon";

export interface GasData {
  /** Ratio of specific heats. */
  gamma: number;
  molarMass_kg_per_mol: number;
  /** Hard-sphere molecular diameter, for the mean free path. */
  diameter_m: number;
  /** Default thermal accommodation coefficient on clean metal against surface temperature. */
  accommodation: [temperature_K: number, coefficient: number][];
}

/**
 * Gas data, one row per gas.
 * - γ: 5/3 for the monatomic gases and 7/5 for the diatomic ones (kinetic theory of ideal
 *   gases; measured room-temperature values are within 1 %, common practice). Hydrogen's
 *   rotational heat capacity freezes out below ~100 K; G keeps the room-temperature γ, as
 *   the published tables of G do.
 * - Molar masses: IUPAC standard atomic weights; dry air 28.965 g/mol (common practice).
 * - Diameters: viscosity-derived hard-sphere diameters as tabulated in J. F. O'Hanlon,
 *   A User's Guide to Vacuum Technology, 3rd ed., appendix of gas properties (from memory).
 * - Accommodation at 300, 76 and 20 K for helium, hydrogen, neon and air: R. J. Corruccini,
 *   Vacuum 7–8 (1959) 19–29, as reproduced in R. F. Barron, Cryogenic Systems, 2nd ed.,
 *   chapter on insulation (from memory; air's 0.8–0.9 at 300 K taken as 0.85). Nitrogen and
 *   argon take air's values: an assumption, not a measurement. Pass measured coefficients
 *   whenever they exist; published values scatter widely with the state of the surface.
 */
export const GASES: Record<GasName, GasData> = {
  helium: { gamma: 5 / 3, molarMass_kg_per_mol: 4.002602e-3, diameter_m: 2.18e-10, accommodation: [[20, 0.59], [76, 0.42], [300, 0.29]] },
  hydrogen: { gamma: 1.4, molarMass_kg_per_mol: 2.01588e-3, diameter_m: 2.74e-10, accommodation: [[20, 0.97], [76, 0.53], [300, 0.29]] },
  neon: { gamma: 5 / 3, molarMass_kg_per_mol: 20.1797e-3, diameter_m: 2.59e-10, accommodation: [[20, 1], [76, 0.83], [300, 0.66]] },
  nitrogen: { gamma: 1.4, molarMass_kg_per_mol: 28.0134e-3, diameter_m: 3.75e-10, accommodation: [[20, 1], [76, 1], [300, 0.85]] },
  air: { gamma: 1.4, molarMass_kg_per_mol: 28.965e-3, diameter_m: 3.72e-10, accommodation: [[20, 1], [76, 1], [300, 0.85]] },
  argon: { gamma: 5 / 3, molarMass_kg_per_mol: 39.948e-3, diameter_m: 3.64e-10, accommodation: [[20, 1], [76, 1], [300, 0.85]] },
};

/** Molar gas constant and Boltzmann constant, CODATA 2018 (both exact in the 2019 SI; R truncated). */
const R_J_PER_MOL_K = 8.314462618;
const BOLTZMANN_J_PER_K = 1.380649e-23;
// Free-molecular conduction needs the mean free path well above the gap (common practice: Kn > 10).
const MIN_KNUDSEN = 10;

export interface GasConductionInput {
  gas: GasName;
  pressure_Pa: number;
  /** Where the gauge reads pressure_Pa, usually ~300 K. */
  gaugeTemperature_K: number;
  warm_K: number;
  cold_K: number;
  accommodation?: { warm: number; cold: number };
  gap_m?: number;
  /** A_cold/A_warm; 1 for parallel plates. */
  areaRatio?: number;
}

export interface GasConductionResult {
  /** On the cold surface. */
  heatFlux_W_per_m2: number;
  overallAccommodation: number;
  meanFreePath_m?: number;
  knudsen?: number;
  warning?: string;
}

/**
 * Free-molecular gas conduction, q = G·a·P·(T_h − T_c), with
 * G = [(γ + 1)/(γ − 1)]·sqrt(R/(8π·M·T_gauge)) and P the pressure read at T_gauge
 * (R. J. Corruccini, "Gaseous heat conduction at low pressures and temperatures",
 * Vacuum 7–8 (1959) 19–29).
 */
export function gasConduction(input: GasConductionInput): GasConductionResult {
  if (input === null || typeof input !== "object") throw new ThermalInputError("input", input, "a gas-conduction description");
  const gas = requireGas("gas", input.gas);
  const pressure_Pa = requireAtLeastZero("pressure_Pa", input.pressure_Pa, "Pa");
  const gauge_K = requireAbove("gaugeTemperature_K", input.gaugeTemperature_K, 0, "K");
  const cold_K = requireAbove("cold_K", input.cold_K, 0, "K");
  const warm_K = requireAbove("warm_K", input.warm_K, 0, "K");
  if (warm_K <= cold_K) throw new ThermalInputError("warm_K", warm_K, `a temperature above cold_K (${cold_K} K)`);
  const areaRatio = input.areaRatio === undefined ? 1 : requireAbove("areaRatio", input.areaRatio, 0);
  let aWarm: number;
  let aCold: number;
  if (input.accommodation === undefined) {
    aWarm = defaultAccommodation(gas, warm_K);
    aCold = defaultAccommodation(gas, cold_K);
  } else {
    aWarm = requireAccommodation("accommodation.warm", input.accommodation?.warm);
    aCold = requireAccommodation("accommodation.cold", input.accommodation?.cold);
  }
  const a = overallAccommodation(aWarm, aCold, areaRatio);
  const result: GasConductionResult = {
    heatFlux_W_per_m2: freeMolecularParameter(gas, gauge_K) * a * pressure_Pa * (warm_K - cold_K),
    overallAccommodation: a,
  };
  if (pressure_Pa > 0) {
    const meanFreePath_m = meanFreePath(gas, pressure_Pa, gauge_K);
    result.meanFreePath_m = meanFreePath_m;
    if (input.gap_m !== undefined) {
      const gap_m = requireAbove("gap_m", input.gap_m, 0, "m");
      const knudsen = meanFreePath_m / gap_m;
      result.knudsen = knudsen;
      if (knudsen < MIN_KNUDSEN) {
        result.warning =
          `Mean free path ${meanFreePath_m.toPrecision(3)} m is not much larger than the ${gap_m} m gap ` +
          `(Knudsen number ${knudsen.toPrecision(3)} < ${MIN_KNUDSEN}): the free-molecular formula overstates the gas conduction here.`;
      }
    }
  } else if (input.gap_m !== undefined) {
    requireAbove("gap_m", input.gap_m, 0, "m");
  }
  return result;
}

/** G in W/(m²·Pa·K) of Corruccini's free-molecular formula, for the gauge temperature. */
export function freeMolecularParameter(gas: GasName, gaugeTemperature_K: number): number {
  const data = GASES[requireGas("gas", gas)];
  const gauge_K = requireAbove("gaugeTemperature_K", gaugeTemperature_K, 0, "K");
  return ((data.gamma + 1) / (data.gamma - 1)) * Math.sqrt(R_J_PER_MOL_K / (8 * Math.PI * data.molarMass_kg_per_mol * gauge_K));
}

/** Hard-sphere mean free path λ = k_B·T/(√2·π·d²·P) (kinetic theory; O'Hanlon, 3rd ed., Ch. 2). */
export function meanFreePath(gas: GasName, pressure_Pa: number, temperature_K: number): number {
  const d = GASES[requireGas("gas", gas)].diameter_m;
  requireAbove("pressure_Pa", pressure_Pa, 0, "Pa");
  requireAbove("temperature_K", temperature_K, 0, "K");
  return (BOLTZMANN_J_PER_K * temperature_K) / (Math.SQRT2 * Math.PI * d * d * pressure_Pa);
}

/**
 * Overall accommodation between a cold and a warm surface,
 * a = a_c·a_h / (a_h + a_c·(1 − a_h)·(A_c/A_h)) (Corruccini 1959).
 */
export function overallAccommodation(warm: number, cold: number, areaRatio = 1): number {
  requireAccommodation("accommodation.warm", warm);
  requireAccommodation("accommodation.cold", cold);
  requireAbove("areaRatio", areaRatio, 0);
  return (cold * warm) / (warm + cold * (1 - warm) * areaRatio);
}

/** Default coefficient at a surface temperature: linear between the table's points, held at its ends. */
export function defaultAccommodation(gas: GasName, temperature_K: number): number {
  const points = GASES[requireGas("gas", gas)].accommodation;
  requireAbove("temperature_K", temperature_K, 0, "K");
  return accommodationAt(points, temperature_K).value;
}

/** Unchecked table lookup with its slope, for the layer-by-layer Newton solve; fills `out` when given, so the loop allocates nothing. */
export function accommodationAt(points: [number, number][], temperature_K: number, out = { value: 0, slope: 0 }): { value: number; slope: number } {
  const last = points.length - 1;
  out.slope = 0;
  if (temperature_K <= points[0][0]) out.value = points[0][1];
  else if (temperature_K >= points[last][0]) out.value = points[last][1];
  else {
    let i = 0;
    while (points[i + 1][0] < temperature_K) i++;
    const t0 = points[i][0];
    const a0 = points[i][1];
    out.slope = (points[i + 1][1] - a0) / (points[i + 1][0] - t0);
    out.value = a0 + out.slope * (temperature_K - t0);
  }
  return out;
}

export function requireGas(field: string, gas: unknown): GasName {
  if (typeof gas !== "string" || !Object.prototype.hasOwnProperty.call(GASES, gas)) {
    throw new ThermalInputError(field, gas, `one of ${Object.keys(GASES).join(", ")}`);
  }
  return gas as GasName;
}

function requireAtLeastZero(field: string, value: unknown, unit: string): number {
  if (typeof value !== "number" || !Number.isFinite(value) || value < 0) {
    throw new ThermalInputError(field, value, `a number of at least 0 ${unit}`);
  }
  return value;
}

/** An accommodation coefficient lives in (0, 1] like an emissivity: the same check, its own words. */
export function requireAccommodation(field: string, value: unknown): number {
  try {
    return requireEmissivityValue(field, value);
  } catch {
    throw new ThermalInputError(field, value, "an accommodation coefficient above 0 and at most 1");
  }
}
