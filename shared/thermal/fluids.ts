import { ThermalInputError } from "./errors";

/**
 * Saturated cryogens at 1 atm (101.325 kPa). One row per fluid, each with its source.
 *
 * Most rows are read from the NIST Chemistry WebBook, "Thermophysical Properties of Fluid
 * Systems" (Lemmon, McLinden & Friend), saturation table in pressure increments at 1 atm,
 * which evaluates each fluid's reference equation of state (named per row). Where a value is
 * recalled rather than read off a table it says "from memory"; expect those to be good to
 * about 0.3 % (latent heats of hydrogen and neon to about 1 %). Molar masses are from the
 * IUPAC standard atomic weights.
 */
export type CryogenId =
  | "helium-4"
  | "hydrogen-normal"
  | "hydrogen-para"
  | "neon"
  | "nitrogen"
  | "argon"
  | "oxygen"
  | "methane";

export interface FluidProperties {
  id: CryogenId;
  label: string;
  /** Normal boiling point: saturation temperature at 101.325 kPa. */
  saturationTemperature_K: number;
  /** Latent heat of vaporization at the normal boiling point. */
  latentHeat_J_per_kg: number;
  liquidDensity_kg_per_m3: number;
  vapourDensity_kg_per_m3: number;
  molarMass_kg_per_mol: number;
  source: string;
  /** Isobaric heat capacity of the saturated liquid at 1 atm (the barometric correction's c_p). */
  liquidHeatCapacity_J_per_kg_K: number;
  liquidHeatCapacitySource: string;
}

/** The pressure every row of CRYOGENS is taken at. */
export const SATURATION_PRESSURE_PA = 101_325;

const WEBBOOK = "NIST Chemistry WebBook, Thermophysical Properties of Fluid Systems, saturation at 1 atm";

export const CRYOGENS: Record<CryogenId, FluidProperties> = {
  "helium-4": {
    id: "helium-4",
    label: "Helium-4",
    saturationTemperature_K: 4.222,
    latentHeat_J_per_kg: 20_720,
    liquidDensity_kg_per_m3: 124.96,
    vapourDensity_kg_per_m3: 16.76,
    molarMass_kg_per_mol: 4.002602e-3,
    source:
      `${WEBBOOK} (helium equation of state); T_sat is the ITS-90 4He vapour-pressure point; ` +
      "all values from memory, consistent with Van Sciver, Helium Cryogenics, 2nd ed., ch. 2",
    liquidHeatCapacity_J_per_kg_K: 4_480,
    liquidHeatCapacitySource: `${WEBBOOK}, c_p of the saturated liquid, from memory (about ±2 %)`,
  },
  "hydrogen-normal": {
    id: "hydrogen-normal",
    label: "Hydrogen (normal, 75 % ortho)",
    saturationTemperature_K: 20.369,
    latentHeat_J_per_kg: 449_000,
    liquidDensity_kg_per_m3: 70.85,
    vapourDensity_kg_per_m3: 1.332,
    molarMass_kg_per_mol: 2.01588e-3,
    source:
      `${WEBBOOK} (Leachman et al. 2009 equation of state): T_sat and liquid density read off the ` +
      "table; latent heat extrapolated from the 0.5 and 0.6 atm rows (about ±1 %); vapour density " +
      "from memory (NBS, Stewart & Roder, 0.6606 mol/L)",
    liquidHeatCapacity_J_per_kg_K: 9_700,
    liquidHeatCapacitySource: `${WEBBOOK}, c_p of the saturated liquid, from memory (about ±2 %)`,
  },
  "hydrogen-para": {
    id: "hydrogen-para",
    label: "Parahydrogen",
    saturationTemperature_K: 20.271,
    latentHeat_J_per_kg: 446_000,
    liquidDensity_kg_per_m3: 70.848,
    vapourDensity_kg_per_m3: 1.3378,
    molarMass_kg_per_mol: 2.01588e-3,
    source: `${WEBBOOK} (Leachman et al. 2009 equation of state), from memory; latent heat about ±1 %`,
    liquidHeatCapacity_J_per_kg_K: 9_690,
    liquidHeatCapacitySource: `${WEBBOOK}, c_p of the saturated liquid, from memory (about ±2 %)`,
  },
  neon: {
    id: "neon",
    label: "Neon",
    saturationTemperature_K: 27.104,
    latentHeat_J_per_kg: 85_750,
    liquidDensity_kg_per_m3: 1206.0,
    vapourDensity_kg_per_m3: 9.58,
    molarMass_kg_per_mol: 20.1797e-3,
    source: `${WEBBOOK} (Katti, Jacobsen et al. neon equation of state), from memory; latent heat about ±1 %`,
    liquidHeatCapacity_J_per_kg_K: 1_860,
    liquidHeatCapacitySource: `${WEBBOOK}, c_p of the saturated liquid, from memory (about ±2 %)`,
  },
  nitrogen: {
    id: "nitrogen",
    label: "Nitrogen",
    saturationTemperature_K: 77.355,
    latentHeat_J_per_kg: 199_180,
    liquidDensity_kg_per_m3: 806.08,
    vapourDensity_kg_per_m3: 4.6079,
    molarMass_kg_per_mol: 28.0134e-3,
    source: `${WEBBOOK} (Span et al. 2000 equation of state), from memory`,
    liquidHeatCapacity_J_per_kg_K: 2_041,
    liquidHeatCapacitySource: `${WEBBOOK}, c_p of the saturated liquid, from memory`,
  },
  argon: {
    id: "argon",
    label: "Argon",
    saturationTemperature_K: 87.302,
    latentHeat_J_per_kg: 161_140,
    liquidDensity_kg_per_m3: 1395.4,
    vapourDensity_kg_per_m3: 5.7748,
    molarMass_kg_per_mol: 39.948e-3,
    source: `${WEBBOOK} (Tegeler, Span & Wagner 1999 equation of state), from memory`,
    liquidHeatCapacity_J_per_kg_K: 1_117,
    liquidHeatCapacitySource: `${WEBBOOK}, c_p of the saturated liquid, from memory`,
  },
  oxygen: {
    id: "oxygen",
    label: "Oxygen",
    saturationTemperature_K: 90.188,
    latentHeat_J_per_kg: 213_060,
    liquidDensity_kg_per_m3: 1141.2,
    vapourDensity_kg_per_m3: 4.4671,
    molarMass_kg_per_mol: 31.9988e-3,
    source: `${WEBBOOK} (Schmidt & Wagner 1985 equation of state), from memory`,
    liquidHeatCapacity_J_per_kg_K: 1_699,
    liquidHeatCapacitySource: `${WEBBOOK}, c_p of the saturated liquid, from memory`,
  },
  methane: {
    id: "methane",
    label: "Methane",
    saturationTemperature_K: 111.67,
    latentHeat_J_per_kg: 510_830,
    liquidDensity_kg_per_m3: 422.36,
    vapourDensity_kg_per_m3: 1.8164,
    molarMass_kg_per_mol: 16.0425e-3,
    source: `${WEBBOOK} (Setzmann & Wagner 1991 equation of state), from memory`,
    liquidHeatCapacity_J_per_kg_K: 3_481,
    liquidHeatCapacitySource: `${WEBBOOK}, c_p of the saturated liquid, from memory`,
  },
};

export const CRYOGEN_IDS = Object.keys(CRYOGENS) as CryogenId[];

export function cryogenProperties(id: CryogenId, field = "cryogen"): FluidProperties {
  if (typeof id !== "string" || !Object.prototype.hasOwnProperty.call(CRYOGENS, id)) {
    throw new ThermalInputError(field, id, `one of ${CRYOGEN_IDS.join(", ")}`);
  }
  return CRYOGENS[id];
}

/**
 * Share of the evaporated mass that actually leaves the vent, 1 − ρ_v/ρ_l: the vapour that
 * fills the space the boiled liquid left stays in the vessel.
 */
export function ventedGasFactor(fluid: FluidProperties): number {
  return 1 - fluid.vapourDensity_kg_per_m3 / fluid.liquidDensity_kg_per_m3;
}

/**
 * dT_sat/dp at the normal boiling point from the Clapeyron equation,
 * dT/dp = T·(1/ρ_v − 1/ρ_l)/h_fg (e.g. Barron, Cryogenic Systems, 2nd ed., ch. on fluid
 * properties; any thermodynamics text). Used to say how far a barometric swing moves the bath.
 */
export function saturationTemperatureSlope_K_per_Pa(fluid: FluidProperties): number {
  const specificVolumeChange_m3_per_kg = 1 / fluid.vapourDensity_kg_per_m3 - 1 / fluid.liquidDensity_kg_per_m3;
  return (fluid.saturationTemperature_K * specificVolumeChange_m3_per_kg) / fluid.latentHeat_J_per_kg;
}
