import type { ReflectorFaces } from "./assembly-design";
import { TORR_PA, type Plan, type PlanBlock } from "./assembly-plan";
import { blanketCorrelation } from "./blanket-correlation";
import { estimateLayers, type BlanketGas, type BlanketLayersInput, type BlanketLayersResult, type SpacerModel } from "./blanket-layers";
import { evaluateEmissivity, isConstantModel, type Emissivity } from "./emissivity";
import { STEFAN_BOLTZMANN_W_PER_M2_K4 as SIGMA } from "./errors";
import { estimateStack, type StackResistance } from "./radiation-network";
import type { StackGeometry } from "./stack-geometry";

/**
 * One block between its two bounding surfaces, as the segment solver sees it. The bounding
 * surfaces are the fixed ones (warm wall, stage, cold wall) or, between two blocks, the warmer
 * block's last layer: so a block followed by another block has N − 1 shields of its own
 * between its bounding surfaces, otherwise N. A null block is a bare gap between two fixed
 * surfaces.
 */
export interface BlockFrame {
  block: PlanBlock | null;
  faces: ReflectorFaces;
  /** Emissivity of the warm bounding surface's face toward the cold side. */
  warmFace: Emissivity;
  /** Emissivity of the cold bounding surface's face toward the warm side. */
  coldFace: Emissivity;
  /** Shields strictly between the bounding surfaces. */
  interior: number;
  /** True when the cold bounding surface is this block's own last layer. */
  endsOnOwnLayer: boolean;
  /** The two bounding surfaces, as a stack geometry. */
  place: StackGeometry;
  vacuum: Plan["vacuum"];
}

export interface BlockDetail {
  heat_W: number;
  radiation_W: number;
  solid_W: number;
  gas_W: number;
  /** Every layer of the block warm → cold; null for the correlation, which gives no layer temperatures. */
  shieldTemperatures_K: number[] | null;
  resistances: StackResistance[] | null;
  coldArea_m2: number;
}

/** Area of the cold bounding surface. */
export function coldArea(place: StackGeometry): number {
  if (place.kind === "planar") return place.area_m2;
  if (place.kind === "cylinder") return 2 * Math.PI * place.coldRadius_m * place.length_m;
  return 4 * Math.PI * place.coldRadius_m * place.coldRadius_m;
}

/**
 * The planar models (correlation, layers) applied to a curved blanket use the area that makes
 * a planar wall of the same thickness carry the curved wall's conduction: the log-mean area
 * 2πL(r₂ − r₁)/ln(r₂/r₁) for a cylinder, the geometric-mean 4π·r₁r₂ for a sphere (from the
 * conduction resistances ln(r₂/r₁)/(2πLk) and (1/r₁ − 1/r₂)/(4πk), Incropera, DeWitt,
 * Bergman & Lavine, Fundamentals of Heat and Mass Transfer, 6th ed., Table 3.3).
 */
export function equivalentArea(place: StackGeometry): number {
  if (place.kind === "planar") return place.area_m2;
  const r1 = place.coldRadius_m;
  const r2 = place.warmRadius_m;
  if (place.kind === "cylinder") return (2 * Math.PI * place.length_m * (r2 - r1)) / Math.log(r2 / r1);
  return 4 * Math.PI * r1 * r2;
}

/** The block's heat, degradation included; the cheap path used inside root finding and sweeps. */
export function blockHeat(frame: BlockFrame, warm_K: number, cold_K: number): number {
  if (!(warm_K > cold_K)) return 0;
  const block = frame.block;
  const factor = block === null ? 1 : block.degradationFactor;
  if (block === null || block.model === "radiation") {
    if (frame.interior === 0 || (isConstantModel(frame.faces.warmSide) && isConstantModel(frame.faces.coldSide))) {
      return factor * constantStackHeat(frame, warm_K, cold_K);
    }
    return factor * estimateStack(stackInput(frame, warm_K, cold_K)).heatLeak_W;
  }
  if (block.model === "correlation") return factor * correlation(frame, block, warm_K, cold_K).heat_W;
  return factor * (layersPerArea(frame, block, warm_K, cold_K).heatLeak_W * equivalentArea(frame.place));
}

/** The block's heat with its parts, layer temperatures and (radiation) resistance ladder. */
export function blockDetail(frame: BlockFrame, warm_K: number, cold_K: number): BlockDetail {
  const block = frame.block;
  const coldArea_m2 = coldArea(frame.place);
  const factor = block === null ? 1 : block.degradationFactor;
  const own = frame.endsOnOwnLayer ? [cold_K] : [];
  if (!(warm_K > cold_K)) {
    const layers = block === null ? 0 : frame.interior;
    return { heat_W: 0, radiation_W: 0, solid_W: 0, gas_W: 0, shieldTemperatures_K: [...new Array<number>(layers).fill(warm_K), ...own], resistances: null, coldArea_m2 };
  }
  if (block === null || block.model === "radiation") {
    const stack = estimateStack(stackInput(frame, warm_K, cold_K));
    const heat_W = factor * stack.heatLeak_W;
    const shields = [...stack.shields.map((s) => s.temperature_K), ...own];
    return { heat_W, radiation_W: heat_W, solid_W: 0, gas_W: 0, shieldTemperatures_K: shields, resistances: stack.resistances, coldArea_m2 };
  }
  if (block.model === "correlation") {
    const c = correlation(frame, block, warm_K, cold_K);
    return { heat_W: factor * c.heat_W, radiation_W: factor * c.radiation_W, solid_W: factor * c.solid_W, gas_W: factor * c.gas_W, shieldTemperatures_K: null, resistances: null, coldArea_m2 };
  }
  const r = layersPerArea(frame, block, warm_K, cold_K);
  const area_m2 = equivalentArea(frame.place);
  return {
    heat_W: factor * (r.heatLeak_W * area_m2),
    radiation_W: factor * (r.radiation_W * area_m2),
    solid_W: factor * (r.solid_W * area_m2),
    gas_W: factor * (r.gas_W * area_m2),
    shieldTemperatures_K: [...r.layerTemperatures_K, ...own],
    resistances: null,
    coldArea_m2,
  };
}

function stackInput(frame: BlockFrame, warm_K: number, cold_K: number) {
  const shield = { warmSide: frame.faces.warmSide, coldSide: frame.faces.coldSide };
  return {
    geometry: frame.place,
    warm: { temperature_K: warm_K, emissivity: frame.warmFace },
    cold: { temperature_K: cold_K, emissivity: frame.coldFace },
    shields: new Array(frame.interior).fill(shield),
  };
}

/**
 * The series network of estimateStack in closed form for shields of constant emissivity:
 * Q = σ(T_w⁴ − T_c⁴)/ΣR with surface resistances (1 − ε)/(εA) and space resistances 1/A of
 * each gap's inner surface (Incropera et al., 6th ed., Sec. 13.3). Same areas and even
 * spacing as stackNodes, but no allocation, so a 10 000-point sweep stays cheap.
 */
function constantStackHeat(frame: BlockFrame, warm_K: number, cold_K: number): number {
  const n = frame.interior;
  const place = frame.place;
  const ew = evaluateEmissivity(frame.warmFace, warm_K);
  const ec = evaluateEmissivity(frame.coldFace, cold_K);
  let shieldFaces = 0;
  if (n > 0) {
    const ews = evaluateEmissivity(frame.faces.warmSide, warm_K);
    const ecs = evaluateEmissivity(frame.faces.coldSide, warm_K);
    shieldFaces = (1 - ews) / ews + (1 - ecs) / ecs;
  }
  let total: number;
  if (place.kind === "planar") {
    const a = place.area_m2;
    total = ((1 - ew) / ew + (1 - ec) / ec + (n + 1) + n * shieldFaces) / a;
  } else {
    const rc = place.coldRadius_m;
    const span = place.warmRadius_m - rc;
    const area = (r: number) => (place.kind === "cylinder" ? 2 * Math.PI * r * place.length_m : 4 * Math.PI * r * r);
    // Σ 1/A over the shields (k = 1 … n, radii as in stackNodes).
    let inverseShieldAreas = 0;
    for (let k = 1; k <= n; k++) inverseShieldAreas += 1 / area(rc + (span * (n + 1 - k)) / (n + 1));
    const warmArea = area(place.warmRadius_m);
    const coldArea_m2 = area(rc);
    total = (1 - ew) / (ew * warmArea) + (1 - ec) / (ec * coldArea_m2) + 1 / coldArea_m2 + inverseShieldAreas * (1 + shieldFaces);
  }
  return (SIGMA * warm_K ** 4 - SIGMA * cold_K ** 4) / total;
}

/** Keller–Cunnington–Glassford correlation on the equivalent area; ε the mean of the faces at T_m. */
function correlation(frame: BlockFrame, block: PlanBlock, warm_K: number, cold_K: number) {
  const mean_K = (warm_K + cold_K) / 2;
  const emissivity = (evaluateEmissivity(frame.faces.warmSide, mean_K) + evaluateEmissivity(frame.faces.coldSide, mean_K)) / 2;
  const q = blanketCorrelation({
    layers: block.layers,
    layerDensity_per_cm: block.layerDensity_per_cm as number,
    warm_K,
    cold_K,
    pressure_torr: frame.vacuum.pressure_Pa / TORR_PA,
    emissivity,
    coefficients: block.coefficients,
  });
  const area_m2 = equivalentArea(frame.place);
  return { heat_W: q.heatFlux_W_per_m2 * area_m2, radiation_W: q.radiation_W_per_m2 * area_m2, solid_W: q.solid_W_per_m2 * area_m2, gas_W: q.gas_W_per_m2 * area_m2 };
}

// One layer and one spacer per pitch: the pitch is 1 cm over the layer density (common practice).
const METRES_PER_CM = 0.01;

function spacerModel(block: PlanBlock): SpacerModel | undefined {
  const s = block.spacer;
  if (s === undefined) return undefined;
  if ("conductance_W_per_m2_K" in s) {
    // Contacts press harder in a denser blanket: the conductance follows (N̄/N̄_ref)^a when both are known.
    const density = block.layerDensity_per_cm;
    const scaled =
      s.referenceLayerDensity_per_cm !== undefined && s.layerDensityExponent !== undefined && density !== undefined
        ? s.conductance_W_per_m2_K * (density / s.referenceLayerDensity_per_cm) ** s.layerDensityExponent
        : s.conductance_W_per_m2_K;
    return { conductance_W_per_m2_K: scaled, referenceTemperature_K: s.referenceMeanTemperature_K };
  }
  const thickness_m = s.thickness_m ?? METRES_PER_CM / (block.layerDensity_per_cm as number);
  return { conductivity_W_per_m_K: s.conductivity_W_per_m_K, thickness_m, contactFactor: s.contactFactor };
}

/**
 * The layer-by-layer solve of one square metre; a block's heats are these times its equivalent
 * area. A cylinder's flat ends put the same blanket between the same temperatures as its lateral
 * wall, so the last few inputs and results are kept and a repeat is answered from them. The
 * solve is a pure function of its input. Inputs are kept as copies and compared by value: sweeps
 * change plans in place, and a design's emissivity objects may be edited between estimates.
 */
function layersPerArea(frame: BlockFrame, block: PlanBlock, warm_K: number, cold_K: number): BlanketLayersResult {
  const input = layersInput(frame, block, warm_K, cold_K);
  for (const kept of recentLayerSolves) if (sameLayersInput(kept.input, input)) return kept.result;
  const result = estimateLayers(input);
  recentLayerSolves[nextLayerSolve] = { input: copyLayersInput(input), result };
  nextLayerSolve = (nextLayerSolve + 1) % RECENT_LAYER_SOLVES;
  return result;
}

// A few: the lateral and end solves of one segment and variant follow each other closely.
const RECENT_LAYER_SOLVES = 8;
const recentLayerSolves: { input: BlanketLayersInput; result: BlanketLayersResult }[] = [];
let nextLayerSolve = 0;

function sameLayersInput(a: BlanketLayersInput, b: BlanketLayersInput): boolean {
  return (
    a.area_m2 === b.area_m2 &&
    a.layers === b.layers &&
    a.warm.temperature_K === b.warm.temperature_K &&
    a.cold.temperature_K === b.cold.temperature_K &&
    sameEmissivity(a.warm.emissivity, b.warm.emissivity) &&
    sameEmissivity(a.cold.emissivity, b.cold.emissivity) &&
    sameEmissivity(a.reflector.warmSide, b.reflector.warmSide) &&
    sameEmissivity(a.reflector.coldSide, b.reflector.coldSide) &&
    sameSpacer(a.spacer, b.spacer) &&
    sameGas(a.gas, b.gas)
  );
}

function copyLayersInput(input: BlanketLayersInput): BlanketLayersInput {
  const { warm, cold, reflector, spacer, gas } = input;
  return {
    ...input,
    warm: { temperature_K: warm.temperature_K, emissivity: copyEmissivity(warm.emissivity) },
    cold: { temperature_K: cold.temperature_K, emissivity: copyEmissivity(cold.emissivity) },
    reflector: { warmSide: copyEmissivity(reflector.warmSide), coldSide: copyEmissivity(reflector.coldSide) },
    spacer: spacer === undefined ? undefined : { ...spacer },
    gas: gas === undefined ? undefined : { ...gas, accommodation: gas.accommodation === undefined ? undefined : { ...gas.accommodation } },
  };
}

function copyEmissivity(e: Emissivity): Emissivity {
  if (typeof e === "number") return e;
  if (e.kind === "power") return { ...e };
  return { ...e, points: e.points.map(([t, v]) => [t, v]) };
}

function sameEmissivity(a: Emissivity, b: Emissivity): boolean {
  if (typeof a === "number" || typeof b === "number") return a === b;
  if (a.kind === "power" || b.kind === "power") {
    return a.kind === "power" && b.kind === "power" && a.reference === b.reference && a.referenceTemperature_K === b.referenceTemperature_K && a.exponent === b.exponent;
  }
  return a.points.length === b.points.length && a.points.every(([t, e], i) => t === b.points[i][0] && e === b.points[i][1]);
}

function sameSpacer(a: SpacerModel | undefined, b: SpacerModel | undefined): boolean {
  if (a === undefined || b === undefined) return a === b;
  if ("conductance_W_per_m2_K" in a) {
    return "conductance_W_per_m2_K" in b && a.conductance_W_per_m2_K === b.conductance_W_per_m2_K && a.referenceTemperature_K === b.referenceTemperature_K;
  }
  return "conductivity_W_per_m_K" in b && a.conductivity_W_per_m_K === b.conductivity_W_per_m_K && a.thickness_m === b.thickness_m && a.contactFactor === b.contactFactor;
}

function sameGas(a: BlanketGas | undefined, b: BlanketGas | undefined): boolean {
  if (a === undefined || b === undefined) return a === b;
  const accommodation = a.accommodation === undefined || b.accommodation === undefined ? a.accommodation === b.accommodation : a.accommodation.warm === b.accommodation.warm && a.accommodation.cold === b.accommodation.cold;
  return a.gas === b.gas && a.pressure_Pa === b.pressure_Pa && a.gaugeTemperature_K === b.gaugeTemperature_K && accommodation;
}

function layersInput(frame: BlockFrame, block: PlanBlock, warm_K: number, cold_K: number): BlanketLayersInput {
  const v = frame.vacuum;
  return {
    area_m2: 1,
    warm: { temperature_K: warm_K, emissivity: frame.warmFace },
    cold: { temperature_K: cold_K, emissivity: frame.coldFace },
    layers: frame.interior,
    reflector: frame.faces,
    spacer: spacerModel(block),
    gas: { gas: v.gas, pressure_Pa: v.pressure_Pa, gaugeTemperature_K: v.gaugeTemperature_K, accommodation: v.accommodation },
  };
}
