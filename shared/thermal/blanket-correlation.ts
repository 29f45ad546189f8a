import { requireAbove, requireAtLeast, requireEmissivityValue, requireWhole, ThermalInputError } from "./errors";

/**
 * The empirical multilayer correlation of Keller, Cunnington & Glassford, "Thermal Performance
 * of Multilayer Insulations", final report, NASA CR-134477 (1974):
 *
 *   q = C_s·N̄^a·T_m·(T_h − T_c)/(N + 1) + C_r·ε·(T_h^4.67 − T_c^4.67)/N + C_g·P·(T_h^0.52 − T_c^0.52)/N
 *
 * T_m = (T_h + T_c)/2, N̄ in layers/cm, N layers, P in torr, q in W/m². The three terms are
 * solid conduction through the spacer, radiation, and residual-gas conduction.
 *
 * The later modified form (NASA Marshall work on variable-density blankets, e.g. Hastings,
 * Hedayat & Brown, NASA/TM-2004-213175; reproduced in Johnson, "Thermal Performance of Cryogenic
 * Multilayer Insulation at Various Layer Spacings", 2010) replaces T_m by the conductivity of
 * polyester at T_m, k_p = 0.017 + 7e-6·(800 − T_m) + 0.0228·ln T_m (W/(m·K)). Its coefficient
 * C_s = 2.4e-4 belongs to that form only: used with T_m it overstates the solid term by ~1000×.
 */
export type SolidTemperatureTerm = "mean-temperature" | "polyester-conductivity";

export interface BlanketCoefficients {
  solid: number;
  solidExponent: number;
  radiation: number;
  gas: number;
  /** Which factor multiplies the solid term: T_m (1974 form, default) or k_p(T_m) (modified form). */
  solidTemperatureTerm?: SolidTemperatureTerm;
}

export interface BlanketCorrelationInput {
  layers: number;
  layerDensity_per_cm: number;
  warm_K: number;
  cold_K: number;
  pressure_torr: number;
  emissivity: number;
  coefficients: BlanketCoefficients;
}

export interface BlanketCorrelationResult {
  heatFlux_W_per_m2: number;
  solid_W_per_m2: number;
  radiation_W_per_m2: number;
  gas_W_per_m2: number;
}

export interface CorrelationSet {
  id: string;
  label: string;
  coefficients: BlanketCoefficients;
  /** Shield emissivity the set was fitted with; the user may enter another. */
  emissivity: number;
  provenance: string;
}

export const CORRELATION_SETS: CorrelationSet[] = [
  {
    id: "kcg-1974-polyester-netting",
    label: "Double-aluminized polyester film with polyester netting (1974 form)",
    coefficients: { solid: 7.3e-8, solidExponent: 2.63, radiation: 7.07e-10, gas: 1.46e4 },
    emissivity: 0.031,
    provenance:
      "Keller, Cunnington & Glassford, NASA CR-134477 (1974), fit for double-aluminized polyester " +
      "film with polyester netting; from memory, and matching two independent transcriptions",
  },
  {
    id: "kcg-1974-silk-netting",
    label: "Double-aluminized polyester film with silk netting (1974 form)",
    coefficients: { solid: 8.95e-8, solidExponent: 2.56, radiation: 5.39e-10, gas: 1.46e4 },
    emissivity: 0.031,
    provenance:
      "Keller, Cunnington & Glassford, NASA CR-134477 (1974), fit for double-aluminized polyester " +
      "film with silk netting; from memory",
  },
  {
    id: "modified-polyester-netting",
    label: "Double-aluminized polyester film with polyester netting (modified form)",
    coefficients: {
      solid: 2.4e-4,
      solidExponent: 2.63,
      radiation: 4.944e-10,
      gas: 1.46e4,
      solidTemperatureTerm: "polyester-conductivity",
    },
    emissivity: 0.031,
    provenance:
      "Modified correlation as reproduced in Johnson, Thermal Performance of Cryogenic Multilayer " +
      "Insulation at Various Layer Spacings (2010), after Hastings et al., NASA/TM-2004-213175; " +
      "from memory, with the polyester conductivity k_p(T_m) in place of T_m",
  },
];

/** Conductivity of polyester used by the modified form, W/(m·K), T in K (see the file comment). */
export function polyesterConductivity_W_per_m_K(temperature_K: number): number {
  return 0.017 + 7e-6 * (800 - temperature_K) + 0.0228 * Math.log(temperature_K);
}

export function blanketCorrelation(input: BlanketCorrelationInput): BlanketCorrelationResult {
  const layers = requireWhole("layers", input.layers, 1, 10_000);
  const density = requireAbove("layerDensity_per_cm", input.layerDensity_per_cm, 0, "layers/cm");
  const cold = requireAbove("cold_K", input.cold_K, 0, "K");
  const warm = requireAbove("warm_K", input.warm_K, 0, "K");
  if (warm < cold) throw new ThermalInputError("warm_K", warm, `a temperature at or above cold_K (${cold} K)`);
  const pressure = requireAtLeast("pressure_torr", input.pressure_torr, 0, "torr");
  const emissivity = requireEmissivityValue("emissivity", input.emissivity);
  const c = coefficients(input.coefficients);

  const meanTemperature_K = (warm + cold) / 2;
  const temperatureFactor =
    c.solidTemperatureTerm === "polyester-conductivity"
      ? polyesterConductivity_W_per_m_K(meanTemperature_K)
      : meanTemperature_K;

  const solid = (c.solid * density ** c.solidExponent * temperatureFactor * (warm - cold)) / (layers + 1);
  const radiation = (c.radiation * emissivity * (warm ** 4.67 - cold ** 4.67)) / layers;
  const gas = (c.gas * pressure * (warm ** 0.52 - cold ** 0.52)) / layers;
  return {
    heatFlux_W_per_m2: solid + radiation + gas,
    solid_W_per_m2: solid,
    radiation_W_per_m2: radiation,
    gas_W_per_m2: gas,
  };
}

function coefficients(value: BlanketCoefficients | undefined): Required<BlanketCoefficients> {
  if (value === null || typeof value !== "object") {
    throw new ThermalInputError("coefficients", value, "an object with solid, solidExponent, radiation and gas");
  }
  const term = value.solidTemperatureTerm ?? "mean-temperature";
  if (term !== "mean-temperature" && term !== "polyester-conductivity") {
    throw new ThermalInputError(
      "coefficients.solidTemperatureTerm",
      term,
      "one of mean-temperature, polyester-conductivity",
    );
  }
  return {
    solid: requireAtLeast("coefficients.solid", value.solid, 0),
    solidExponent: requireAtLeast("coefficients.solidExponent", value.solidExponent, 0),
    radiation: requireAtLeast("coefficients.radiation", value.radiation, 0),
    gas: requireAtLeast("coefficients.gas", value.gas, 0),
    solidTemperatureTerm: term,
  };
}
