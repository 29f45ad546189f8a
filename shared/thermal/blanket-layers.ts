import { solveChain } from "./chain-solve";
import { Emissivity, emissivitySlope, evaluateEmissivity, validateEmissivity } from "./emissivity";
import { STEFAN_BOLTZMANN_W_PER_M2_K4 as SIGMA, ThermalInputError, requireAbove, requireWhole } from "./errors";
import { GASES, GasName, accommodationAt, freeMolecularParameter, requireAccommodation, requireGas } from "./gas-conduction";
import { MAX_SHIELDS } from "./radiation-network";

/**
 * Solid conduction through the spacer between two neighbours, per unit area. A conductance with
 * a reference temperature scales in proportion to the gap's mean temperature, h = h_ref·T_m/T_ref,
 * the form of the solid term of Cunnington, Keller & Glassford (NASA CR-134477, 1974),
 * h_s = C_s·N̄^a·T_m; without one it is the same at every temperature.
 */
export type SpacerModel =
  | { conductance_W_per_m2_K: number; referenceTemperature_K?: number }
  /** Bulk k/t scaled by the fraction that survives the point contacts (default 1: bulk, an upper bound). */
  | { conductivity_W_per_m_K: number; thickness_m: number; contactFactor?: number };

export interface BlanketGas {
  gas: GasName;
  pressure_Pa: number;
  /** Where the gauge reads pressure_Pa; default 300 K (common practice: a room-temperature gauge). */
  gaugeTemperature_K?: number;
  /** Coefficients of the warmer and the colder surface of every gap; default the gas table's, at each surface's temperature. */
  accommodation?: { warm: number; cold: number };
}

export interface BlanketLayersInput {
  area_m2: number;
  warm: { temperature_K: number; emissivity: Emissivity };
  cold: { temperature_K: number; emissivity: Emissivity };
  /** Number of shields (reflector layers). */
  layers: number;
  reflector: { warmSide: Emissivity; coldSide: Emissivity };
  spacer?: SpacerModel;
  gas?: BlanketGas;
}

export interface BlanketLayersResult {
  heatLeak_W: number;
  heatFlux_W_per_m2: number;
  /** radiation_W + solid_W + gas_W = heatLeak_W: each mechanism's part of the heat through the coldest gap. */
  radiation_W: number;
  solid_W: number;
  gas_W: number;
  /** Shields only, warm → cold. */
  layerTemperatures_K: number[];
  /** Newton iterations; 0 when there are no layers to solve for. */
  iterations: number;
}

const DEFAULT_GAUGE_K = 300;

/**
 * Layer-by-layer blanket, planar. Every gap i between node i (warmer) and node i + 1 carries
 * q_i = σ(T_i⁴ − T_{i+1}⁴)/(1/ε_i + 1/ε_{i+1} − 1) + h_s·(T_i − T_{i+1}) + q_gas(T_i, T_{i+1}),
 * radiation between two large parallel gray plates (Incropera, DeWitt, Bergman & Lavine, 6th
 * ed., Table 13.3), solid conduction through the spacer, and free-molecular gas conduction
 * (Corruccini 1959, see gas-conduction.ts). The blanket is taken to fill the space: the
 * spacer and the gas act in every gap, the two next to the walls included. The layer
 * temperatures make the heat equal through every gap (Newton on the chain, chain-solve.ts).
 */
export function estimateLayers(input: BlanketLayersInput): BlanketLayersResult {
  const v = validateLayers(input);
  const n = v.layers;
  const gaps = gapModel(v);
  const q = new Array<number>(n + 1).fill(0);
  const scratch = new Array<number>(n + 1).fill(0);
  // Offsets above the cold wall, u = T − T_c (see chain-solve.ts). Three starts: T falling
  // evenly (conduction-dominated), T⁴ falling evenly, and the pure-radiation network with ε
  // frozen at the latter's temperatures, solved twice (radiation-dominated); Newton begins
  // from whichever balances the gaps best.
  const u = new Array<number>(n + 2).fill(0);
  u[0] = v.tw - v.tc;
  let best = Infinity;
  let bestStart: number[] = [];
  for (let start = 0; start < 4; start++) {
    if (start === 0) for (let k = 1; k <= n; k++) u[k] = ((v.tw - v.tc) * (n + 1 - k)) / (n + 1);
    if (start === 1) for (let k = 1; k <= n; k++) u[k] = fourthRootOffset(v.tc ** 4 + ((v.tw ** 4 - v.tc ** 4) * (n + 1 - k)) / (n + 1), v.tc);
    if (start >= 2) radiationStart(v, u, q);
    gaps(u, q, scratch, scratch);
    let worst = 0;
    for (let g = 0; g < n; g++) worst = Math.max(worst, Math.abs(q[g] - q[g + 1]));
    if (worst < best) {
      best = worst;
      bestStart = u.slice();
    }
  }
  for (let k = 1; k <= n; k++) u[k] = bestStart[k];
  const iterations = n > 0 ? solveChain(u, gaps, "Blanket layer temperatures") : 0;
  const parts = gapParts(v, u[n], 0, n === 0 ? v.warmModel : v.reflector.coldSide, v.coldModel);
  const heatFlux_W_per_m2 = parts.radiation + parts.solid + parts.gas;
  return {
    heatLeak_W: heatFlux_W_per_m2 * v.area_m2,
    heatFlux_W_per_m2,
    radiation_W: parts.radiation * v.area_m2,
    solid_W: parts.solid * v.area_m2,
    gas_W: parts.gas * v.area_m2,
    layerTemperatures_K: u.slice(1, n + 1).map((offset) => v.tc + offset),
    iterations,
  };
}

type Validated = ReturnType<typeof validateLayers>;

function validateLayers(input: BlanketLayersInput) {
  if (input === null || typeof input !== "object") throw new ThermalInputError("input", input, "a blanket description");
  const area_m2 = requireAbove("area_m2", input.area_m2, 0, "m²");
  const tw = requireAbove("warm.temperature_K", input.warm?.temperature_K, 0, "K");
  const tc = requireAbove("cold.temperature_K", input.cold?.temperature_K, 0, "K");
  if (tw <= tc) throw new ThermalInputError("warm.temperature_K", tw, `a temperature above cold.temperature_K (${tc} K)`);
  validateEmissivity(input.warm.emissivity, "warm.emissivity");
  validateEmissivity(input.cold.emissivity, "cold.emissivity");
  const layers = requireWhole("layers", input.layers, 0, MAX_SHIELDS);
  if (input.reflector === null || typeof input.reflector !== "object") {
    throw new ThermalInputError("reflector", input.reflector, "a reflector { warmSide, coldSide }");
  }
  validateEmissivity(input.reflector.warmSide, "reflector.warmSide");
  validateEmissivity(input.reflector.coldSide, "reflector.coldSide");
  return {
    area_m2,
    tw,
    tc,
    layers,
    warmModel: input.warm.emissivity,
    coldModel: input.cold.emissivity,
    reflector: input.reflector,
    spacer: spacerConductance(input.spacer),
    gas: gasParameters(input.gas),
  };
}

/** The gap's spacer conductance as h(T_m) = constant + perKelvin·T_m, in W/(m²·K). */
type SpacerConductance = { constant: number; perKelvin: number };

function spacerConductance(spacer: SpacerModel | undefined): SpacerConductance {
  if (spacer === undefined) return { constant: 0, perKelvin: 0 };
  if (spacer === null || typeof spacer !== "object") throw new ThermalInputError("spacer", spacer, "a spacer conductance or conductivity model");
  if ("conductance_W_per_m2_K" in spacer) {
    const h = requireAbove("spacer.conductance_W_per_m2_K", spacer.conductance_W_per_m2_K, 0, "W/(m²·K)");
    if (spacer.referenceTemperature_K === undefined) return { constant: h, perKelvin: 0 };
    return { constant: 0, perKelvin: h / requireAbove("spacer.referenceTemperature_K", spacer.referenceTemperature_K, 0, "K") };
  }
  const k = requireAbove("spacer.conductivity_W_per_m_K", spacer.conductivity_W_per_m_K, 0, "W/(m·K)");
  const thickness_m = requireAbove("spacer.thickness_m", spacer.thickness_m, 0, "m");
  const contact = spacer.contactFactor ?? 1;
  if (typeof contact !== "number" || !(contact > 0 && contact <= 1)) {
    throw new ThermalInputError("spacer.contactFactor", contact, "a fraction above 0 and at most 1");
  }
  return { constant: (contact * k) / thickness_m, perKelvin: 0 };
}

/**
 * The spacer's heat across a gap from a to b and its derivatives: (c + p·(a + b)/2)·(a − b),
 * so ∂/∂a = c + p·a and ∂/∂b = −(c + p·b).
 */
function spacerTerm(s: SpacerConductance, a: number, b: number, drop: number) {
  return { heat: (s.constant + (s.perKelvin * (a + b)) / 2) * drop, dWarm: s.constant + s.perKelvin * a, dCold: -(s.constant + s.perKelvin * b) };
}

function gasParameters(gas: BlanketGas | undefined) {
  if (gas === undefined) return undefined;
  if (gas === null || typeof gas !== "object") throw new ThermalInputError("gas", gas, "a residual gas { gas, pressure_Pa, … }");
  const name = requireGas("gas.gas", gas.gas);
  if (typeof gas.pressure_Pa !== "number" || !Number.isFinite(gas.pressure_Pa) || gas.pressure_Pa < 0) {
    throw new ThermalInputError("gas.pressure_Pa", gas.pressure_Pa, "a number of at least 0 Pa");
  }
  const gauge_K = gas.gaugeTemperature_K === undefined ? DEFAULT_GAUGE_K : requireAbove("gas.gaugeTemperature_K", gas.gaugeTemperature_K, 0, "K");
  const fixed = gas.accommodation;
  if (fixed !== undefined) {
    requireAccommodation("gas.accommodation.warm", fixed?.warm);
    requireAccommodation("gas.accommodation.cold", fixed?.cold);
  }
  // G·P in W/(m²·K) per unit overall accommodation.
  return { perAccommodation: freeMolecularParameter(name, gauge_K) * gas.pressure_Pa, fixed, table: GASES[name].accommodation };
}

/** The gap heats and their derivatives for solveChain, per unit area, on offsets u = T − T_c. */
function gapModel(v: Validated) {
  const n = v.layers;
  return (u: number[], q: number[], dqdWarm: number[], dqdCold: number[]): void => {
    for (let g = 0; g <= n; g++) {
      const a = v.tc + u[g];
      const b = v.tc + u[g + 1];
      const upper = g === 0 ? v.warmModel : v.reflector.coldSide;
      const lower = g === n ? v.coldModel : v.reflector.warmSide;
      const eu = evaluateEmissivity(upper, a);
      const el = evaluateEmissivity(lower, b);
      const r = 1 / eu + 1 / el - 1;
      const drop = u[g] - u[g + 1];
      // a⁴ − b⁴ factored around the offset difference, so close neighbours keep their digits.
      const rad = (SIGMA * drop * (a + b) * (a * a + b * b)) / r;
      // dR/dT = −ε′/ε²; the wall faces sit at fixed temperatures, so only shields move.
      const dRu = g === 0 ? 0 : -emissivitySlope(upper, a, eu) / (eu * eu);
      const dRl = g === n ? 0 : -emissivitySlope(lower, b, el) / (el * el);
      // The spacer's terms as in spacerTerm, written out: this loop runs in every Newton step.
      const { constant, perKelvin } = v.spacer;
      let dWarm = (4 * SIGMA * a * a * a - rad * dRu) / r + constant + perKelvin * a;
      let dCold = (-4 * SIGMA * b * b * b - rad * dRl) / r - (constant + perKelvin * b);
      let heat = rad + (constant + (perKelvin * (a + b)) / 2) * drop;
      if (v.gas !== undefined && v.gas.perAccommodation > 0) {
        const gas = gasTerm(v.gas, a, b, drop, gasScratch);
        heat += gas.heat;
        dWarm += gas.dWarm;
        dCold += gas.dCold;
      }
      q[g] = heat;
      dqdWarm[g] = dWarm;
      dqdCold[g] = dCold;
    }
  };
}

type GasTerm = { heat: number; dWarm: number; dCold: number };
// Reused by the Newton loop so it allocates nothing per gap (the solve is not re-entrant).
const gasScratch: GasTerm = { heat: 0, dWarm: 0, dCold: 0 };
const hotScratch = { value: 0, slope: 0 };
const coldScratch = { value: 0, slope: 0 };

/**
 * G·P·a(T_a, T_b)·(T_a − T_b) with a = a_c·a_h/(a_h + a_c − a_c·a_h) and its derivatives
 * (∂a/∂a_h = a_c²/D², ∂a/∂a_c = a_h²/D²), written into `out` (a new object without it).
 */
function gasTerm(gas: NonNullable<Validated["gas"]>, a: number, b: number, drop: number, out: GasTerm = { heat: 0, dWarm: 0, dCold: 0 }): GasTerm {
  const hot = gas.fixed ? { value: gas.fixed.warm, slope: 0 } : accommodationAt(gas.table, a, hotScratch);
  const cold = gas.fixed ? { value: gas.fixed.cold, slope: 0 } : accommodationAt(gas.table, b, coldScratch);
  const d = hot.value + cold.value - cold.value * hot.value;
  const overall = (cold.value * hot.value) / d;
  out.heat = gas.perAccommodation * overall * drop;
  out.dWarm = gas.perAccommodation * (overall + (drop * cold.value * cold.value * hot.slope) / (d * d));
  out.dCold = gas.perAccommodation * (-overall + (drop * hot.value * hot.value * cold.slope) / (d * d));
  return out;
}

/**
 * Radiation alone with every gap's 1/ε_i + 1/ε_{i+1} − 1 frozen at the current temperatures:
 * the series network gives σT⁴ at each node exactly (as in radiation-network.ts). Overwrites
 * u with the new offsets; `resistance` is scratch of length n + 1.
 */
function radiationStart(v: Validated, u: number[], resistance: number[]): void {
  const n = v.layers;
  let total = 0;
  for (let g = 0; g <= n; g++) {
    const upper = g === 0 ? v.warmModel : v.reflector.coldSide;
    const lower = g === n ? v.coldModel : v.reflector.warmSide;
    resistance[g] = 1 / evaluateEmissivity(upper, v.tc + u[g]) + 1 / evaluateEmissivity(lower, v.tc + u[g + 1]) - 1;
    total += resistance[g];
  }
  const low = v.tc ** 4;
  const span = v.tw ** 4 - low;
  let below = 0;
  for (let k = n; k >= 1; k--) {
    below += resistance[k];
    u[k] = fourthRootOffset(low + (span * below) / total, v.tc);
  }
}

/** (x)^(1/4) − T_c without losing the digits of a small offset. */
function fourthRootOffset(fourth: number, tc: number): number {
  const t = Math.sqrt(Math.sqrt(fourth));
  // t − tc = (t⁴ − tc⁴)/((t + tc)(t² + tc²)), exact where t is close to tc.
  return (fourth - tc ** 4) / ((t + tc) * (t * t + tc * tc));
}

/** Each mechanism's heat flux through one gap, from the offsets of its two nodes. */
function gapParts(v: Validated, ua: number, ub: number, upper: Emissivity, lower: Emissivity) {
  const a = v.tc + ua;
  const b = v.tc + ub;
  const drop = ua - ub;
  const eu = evaluateEmissivity(upper, a);
  const el = evaluateEmissivity(lower, b);
  const radiation = (SIGMA * drop * (a + b) * (a * a + b * b)) / (1 / eu + 1 / el - 1);
  const gas = v.gas !== undefined && v.gas.perAccommodation > 0 ? gasTerm(v.gas, a, b, drop).heat : 0;
  return { radiation, solid: spacerTerm(v.spacer, a, b, drop).heat, gas };
}
