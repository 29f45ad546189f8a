import { requireAbove, requireAtLeast, requireInRange, ThermalInputError } from "./errors";
import { cryogenProperties, ventedGasFactor, type CryogenId, type FluidProperties } from "./fluids";

/**
 * Boil-off of a saturated cryogen at 1 atm from the heat reaching it.
 *
 * Liquid evaporated ṁ = Q/h_fg. The gas leaving the vent (what a scale or a flowmeter sees) is
 * ṁ·(1 − ρ_v/ρ_l): vapour fills the space the boiled liquid left. Liquid volume lost V̇ = ṁ/ρ_l.
 * (Energy balance on a saturated bath; e.g. Barron, Cryogenic Systems, 2nd ed., ch. on storage
 * vessels.) Vent flow is given at a stated reference state, ideal gas.
 */

/** Molar gas constant, CODATA 2018 (exact), J/(mol·K). */
export const MOLAR_GAS_CONSTANT_J_PER_MOL_K = 8.314462618;

export type VentReference = "normal-0C" | "standard-15C" | "standard-20C";

/** Reference states for "standard litres"; say which one beside every vent flow shown. */
export const VENT_REFERENCE_CONDITIONS: Record<
  VentReference,
  { label: string; temperature_K: number; pressure_Pa: number }
> = {
  // DIN 1343 "normal" conditions, the usual basis of mass-flow-meter "standard" litres.
  "normal-0C": { label: "0 °C and 101.325 kPa (normal conditions)", temperature_K: 273.15, pressure_Pa: 101_325 },
  // ISO 13443 standard reference conditions (from memory).
  "standard-15C": { label: "15 °C and 101.325 kPa", temperature_K: 288.15, pressure_Pa: 101_325 },
  "standard-20C": { label: "20 °C and 101.325 kPa", temperature_K: 293.15, pressure_Pa: 101_325 },
};

export const DEFAULT_VENT_REFERENCE: VentReference = "normal-0C";

const SECONDS_PER_HOUR = 3600;
const HOURS_PER_DAY = 24;
const LITRES_PER_M3 = 1000;

export interface BoilOffInput {
  heat_W: number;
  cryogen: CryogenId;
  capacity_L?: number;
  /** Liquid fill when the hold time starts, as a fraction of capacity (default 1). */
  fillFraction?: number;
  /** Liquid left when the hold time ends, as a fraction of capacity (default 0). */
  minimumFraction?: number;
  ventReference?: VentReference;
}

export interface BoilOffResult {
  evaporatedMass_kg_per_h: number;
  ventedMass_kg_per_h: number;
  liquidVolume_L_per_h: number;
  liquidVolume_L_per_day: number;
  /** Normal evaporation rate, % of capacity per day; only with a capacity. */
  evaporationRate_percent_per_day?: number;
  /** Only with a capacity; Infinity when the heat is 0 W. */
  holdTime_h?: number;
  ventFlow_standard_L_per_min: number;
  ventReference: VentReference;
  ventedGasFactor: number;
}

export function boilOff(input: BoilOffInput): BoilOffResult {
  const heat_W = requireAtLeast("heat_W", input.heat_W, 0, "W");
  const fluid = cryogenProperties(input.cryogen);
  const reference = ventReference(input.ventReference);
  const capacity_L = input.capacity_L === undefined ? undefined : requireAbove("capacity_L", input.capacity_L, 0, "L");
  const fill = input.fillFraction === undefined ? 1 : requireInRange("fillFraction", input.fillFraction, 0, 1);
  const minimum = input.minimumFraction === undefined ? 0 : requireInRange("minimumFraction", input.minimumFraction, 0, 1);
  if (minimum >= fill) {
    throw new ThermalInputError("minimumFraction", minimum, `a fraction below the fill fraction (${fill})`);
  }

  const evaporated_kg_per_s = heat_W / fluid.latentHeat_J_per_kg;
  const factor = ventedGasFactor(fluid);
  const vented_kg_per_s = evaporated_kg_per_s * factor;
  const liquidVolume_L_per_h = (evaporated_kg_per_s / fluid.liquidDensity_kg_per_m3) * LITRES_PER_M3 * SECONDS_PER_HOUR;
  const liquidVolume_L_per_day = liquidVolume_L_per_h * HOURS_PER_DAY;

  const result: BoilOffResult = {
    evaporatedMass_kg_per_h: evaporated_kg_per_s * SECONDS_PER_HOUR,
    ventedMass_kg_per_h: vented_kg_per_s * SECONDS_PER_HOUR,
    liquidVolume_L_per_h,
    liquidVolume_L_per_day,
    ventFlow_standard_L_per_min: ventedMassToStandardFlow(vented_kg_per_s, fluid, reference),
    ventReference: reference,
    ventedGasFactor: factor,
  };
  if (capacity_L !== undefined) {
    result.evaporationRate_percent_per_day = (liquidVolume_L_per_day / capacity_L) * 100;
    result.holdTime_h = heat_W === 0 ? Infinity : ((fill - minimum) * capacity_L) / liquidVolume_L_per_h;
  }
  return result;
}

/** Heat that boils the liquid behind a vented-gas mass flow (a scale's reading). */
export function heatFromVentedMass(input: { ventedMass_kg_per_s: number; cryogen: CryogenId }): { heat_W: number } {
  const vented = requireAtLeast("ventedMass_kg_per_s", input.ventedMass_kg_per_s, 0, "kg/s");
  const fluid = cryogenProperties(input.cryogen);
  return { heat_W: (vented * fluid.latentHeat_J_per_kg) / ventedGasFactor(fluid) };
}

/** Heat that boils a liquid volume per second (a level gauge's reading). */
export function heatFromLiquidVolume(input: { liquidVolume_m3_per_s: number; cryogen: CryogenId }): { heat_W: number } {
  const volume = requireAtLeast("liquidVolume_m3_per_s", input.liquidVolume_m3_per_s, 0, "m³/s");
  const fluid = cryogenProperties(input.cryogen);
  return { heat_W: volume * fluid.liquidDensity_kg_per_m3 * fluid.latentHeat_J_per_kg };
}

/** Heat behind a vent flow in standard litres per minute at the stated reference state. */
export function heatFromStandardVentFlow(input: {
  flow_standard_L_per_min: number;
  cryogen: CryogenId;
  ventReference?: VentReference;
}): { heat_W: number } {
  const flow = requireAtLeast("flow_standard_L_per_min", input.flow_standard_L_per_min, 0, "standard L/min");
  const fluid = cryogenProperties(input.cryogen);
  const reference = VENT_REFERENCE_CONDITIONS[ventReference(input.ventReference)];
  // Ideal gas at the reference state: n = pV/(RT), m = n·M.
  const volume_m3_per_s = flow / LITRES_PER_M3 / 60;
  const vented_kg_per_s =
    ((reference.pressure_Pa * volume_m3_per_s) / (MOLAR_GAS_CONSTANT_J_PER_MOL_K * reference.temperature_K)) *
    fluid.molarMass_kg_per_mol;
  return heatFromVentedMass({ ventedMass_kg_per_s: vented_kg_per_s, cryogen: fluid.id });
}

function ventedMassToStandardFlow(vented_kg_per_s: number, fluid: FluidProperties, reference: VentReference): number {
  const state = VENT_REFERENCE_CONDITIONS[reference];
  const moles_per_s = vented_kg_per_s / fluid.molarMass_kg_per_mol;
  const volume_m3_per_s = (moles_per_s * MOLAR_GAS_CONSTANT_J_PER_MOL_K * state.temperature_K) / state.pressure_Pa;
  return volume_m3_per_s * LITRES_PER_M3 * 60;
}

function ventReference(value: VentReference | undefined): VentReference {
  if (value === undefined) return DEFAULT_VENT_REFERENCE;
  if (!Object.prototype.hasOwnProperty.call(VENT_REFERENCE_CONDITIONS, value)) {
    throw new ThermalInputError("ventReference", value, `one of ${Object.keys(VENT_REFERENCE_CONDITIONS).join(", ")}`);
  }
  return value;
}
