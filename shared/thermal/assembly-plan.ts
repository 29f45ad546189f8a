import { blanketCorrelation, CORRELATION_SETS, type BlanketCoefficients } from "./blanket-correlation";
import { boilOff } from "./boil-off";
import { validateEmissivity, type Emissivity } from "./emissivity";
import { requireAbove, requireAtLeast, requireWhole, ThermalInputError } from "./errors";
import { requireGas } from "./gas-conduction";
import { EXTRAPOLATION_LIMIT_K, INTEGRAL_FLOOR_K, SUPPORT_MATERIAL_IDS, SUPPORT_MATERIALS, type SupportMaterial } from "./supports";
import {
  MAX_BLOCK_LAYERS,
  MAX_LAYUP_ITEMS,
  MAX_SUPPORTS,
  MAX_TOTAL_SHIELDS,
  type AssemblyDesign,
  type AssemblyGeometry,
  type AssemblySpacer,
  type BlockModel,
  type CryogenLoad,
  type LayupBlock,
  type LayupStage,
  type ReflectorFaces,
} from "./assembly-design";

/** The design after validation, split at its fixed temperatures. Internal to the engine. */
export type Variant = "nominal" | "low" | "high";

export interface PlanSurface {
  temperature_K: number;
  emissivity: Emissivity;
}

export interface PlanSink extends PlanSurface, CryogenLoad {
  label: string;
  /** Index in the layup; null for the cold vessel. */
  layupIndex: number | null;
}

export interface PlanBlock {
  layupIndex: number;
  label: string;
  model: BlockModel;
  layers: number;
  faces: Record<Variant, ReflectorFaces>;
  layerDensity_per_cm: number | undefined;
  spacer: AssemblySpacer | undefined;
  coefficients: BlanketCoefficients;
  degradationFactor: number;
}

/** The blocks in series between two fixed temperatures; warmSink −1 is the warm wall. */
export interface PlanSegment {
  warmSink: number;
  coldSink: number;
  blocks: PlanBlock[];
}

export interface PlanSupport {
  index: number;
  label: string;
  material: SupportMaterial;
  area_m2: number;
  length_m: number;
  count: number;
  /** Sink indices; −1 is the warm wall. */
  from: number;
  to: number;
}

export interface Plan {
  geometry: AssemblyGeometry;
  flatEnds: number;
  warm: PlanSurface;
  /** Every stage warm → cold, then the cold vessel. */
  sinks: PlanSink[];
  segments: PlanSegment[];
  supports: PlanSupport[];
  vacuum: { pressure_Pa: number; gas: AssemblyDesign["vacuum"]["gas"]; gaugeTemperature_K: number; accommodation?: { warm: number; cold: number } };
  hasBand: boolean;
}

const DEFAULT_SET = CORRELATION_SETS.find((s) => s.id === "kcg-1974-polyester-netting") ?? CORRELATION_SETS[0];
const MODELS: BlockModel[] = ["radiation", "correlation", "layers"];
const DEFAULT_GAUGE_K = 300;

/** Re-throws a ThermalInputError from a lower-level check with the design's field path in front. */
export function underField<T>(prefix: string, run: () => T): T {
  try {
    return run();
  } catch (error) {
    if (error instanceof ThermalInputError) throw new ThermalInputError(`${prefix}.${error.field}`, error.value, error.allowed);
    throw error;
  }
}

function requireObject(field: string, value: unknown, allowed: string): void {
  if (value === null || typeof value !== "object" || Array.isArray(value)) throw new ThermalInputError(field, value, allowed);
}

/** Validates a whole design and returns its plan; throws ThermalInputError naming the field path. */
export function planAssembly(design: AssemblyDesign): Plan {
  requireObject("design", design, "a design { geometry, warm, cold, layup, vacuum }");
  const { geometry, flatEnds } = validateGeometry(design.geometry);
  requireObject("warm", design.warm, "a warm boundary { temperature_K, emissivity }");
  const warmT = requireAbove("warm.temperature_K", design.warm.temperature_K, 0, "K");
  validateEmissivity(design.warm.emissivity, "warm.emissivity");
  requireObject("cold", design.cold, "a cold boundary { temperature_K, emissivity, … }");
  const vacuum = validateVacuum(design.vacuum);

  const layup: unknown = design.layup;
  if (!Array.isArray(layup) || layup.length > MAX_LAYUP_ITEMS) {
    throw new ThermalInputError("layup", layup, `a list of at most ${MAX_LAYUP_ITEMS} blocks and stages, warm → cold`);
  }
  const sinks: PlanSink[] = [];
  const segments: PlanSegment[] = [{ warmSink: -1, coldSink: 0, blocks: [] }];
  let previous = { temperature_K: warmT, name: "warm.temperature_K" };
  let shields = 0;
  let hasBand = false;
  layup.forEach((item: LayupBlock | LayupStage, i: number) => {
    const field = `layup[${i}]`;
    requireObject(field, item, 'a block { kind: "block", … } or a stage { kind: "stage", … }');
    if (item.kind === "block") {
      const block = validateBlock(item, field, i, vacuum.pressure_Pa);
      hasBand ||= item.reflector.low !== undefined || item.reflector.high !== undefined;
      segments[segments.length - 1].blocks.push(block);
      shields += block.layers;
    } else if (item.kind === "stage") {
      const t = requireAbove(`${field}.temperature_K`, item.temperature_K, 0, "K");
      if (t >= previous.temperature_K) {
        throw new ThermalInputError(`${field}.temperature_K`, t, `a temperature below ${previous.name} (${previous.temperature_K} K): stages are listed warm → cold`);
      }
      if (typeof item.label !== "string" || item.label.trim() === "") throw new ThermalInputError(`${field}.label`, item.label, "a non-empty name");
      validateEmissivity(item.emissivity, `${field}.emissivity`);
      validateLoad(item, field);
      sinks.push({ ...loadOf(item), label: item.label, layupIndex: i, temperature_K: t, emissivity: item.emissivity });
      segments.push({ warmSink: sinks.length - 1, coldSink: sinks.length, blocks: [] });
      previous = { temperature_K: t, name: `${field}.temperature_K` };
      shields += 1;
    } else {
      throw new ThermalInputError(`${field}.kind`, (item as { kind?: unknown }).kind, '"block" or "stage"');
    }
  });
  if (shields > MAX_TOTAL_SHIELDS) throw new ThermalInputError("layup", `${shields} shields`, `a layup of at most ${MAX_TOTAL_SHIELDS} shields in all`);

  const coldT = requireAbove("cold.temperature_K", design.cold.temperature_K, 0, "K");
  if (coldT >= previous.temperature_K) {
    throw new ThermalInputError("cold.temperature_K", coldT, `a temperature below ${previous.name} (${previous.temperature_K} K)`);
  }
  validateEmissivity(design.cold.emissivity, "cold.emissivity");
  validateLoad(design.cold, "cold");
  const coldLabel = design.cold.label === undefined ? "cold vessel" : String(design.cold.label);
  sinks.push({ ...loadOf(design.cold), label: coldLabel, layupIndex: null, temperature_K: coldT, emissivity: design.cold.emissivity });

  const warm = { temperature_K: warmT, emissivity: design.warm.emissivity };
  const supports = validateSupports(design.supports, sinks, warmT);
  return { geometry, flatEnds, warm, sinks, segments, supports, vacuum, hasBand };
}

function validateGeometry(geometry: AssemblyGeometry): { geometry: AssemblyGeometry; flatEnds: number } {
  requireObject("geometry", geometry, 'an object with kind "planar", "cylinder" or "sphere"');
  if (geometry.kind === "planar") {
    return { geometry: { kind: "planar", area_m2: requireAbove("geometry.area_m2", geometry.area_m2, 0, "m²") }, flatEnds: 0 };
  }
  if (geometry.kind !== "cylinder" && geometry.kind !== "sphere") {
    throw new ThermalInputError("geometry.kind", (geometry as { kind?: unknown }).kind, '"planar", "cylinder" or "sphere"');
  }
  const coldRadius_m = requireAbove("geometry.coldRadius_m", geometry.coldRadius_m, 0, "m");
  const warmRadius_m = requireAbove("geometry.warmRadius_m", geometry.warmRadius_m, 0, "m");
  if (warmRadius_m <= coldRadius_m) {
    throw new ThermalInputError("geometry.warmRadius_m", warmRadius_m, `a radius above geometry.coldRadius_m (${coldRadius_m} m): the cold wall is the inner one`);
  }
  if (geometry.kind === "sphere") return { geometry: { kind: "sphere", coldRadius_m, warmRadius_m }, flatEnds: 0 };
  const length_m = requireAbove("geometry.length_m", geometry.length_m, 0, "m");
  const flatEnds = geometry.flatEnds === undefined ? 0 : requireWhole("geometry.flatEnds", geometry.flatEnds, 0, 2);
  return { geometry: { kind: "cylinder", coldRadius_m, warmRadius_m, length_m, flatEnds }, flatEnds };
}

function validateFaces(faces: ReflectorFaces, field: string): ReflectorFaces {
  requireObject(field, faces, "a reflector { warmSide, coldSide }");
  validateEmissivity(faces.warmSide, `${field}.warmSide`);
  validateEmissivity(faces.coldSide, `${field}.coldSide`);
  return { warmSide: faces.warmSide, coldSide: faces.coldSide };
}

function validateBlock(item: LayupBlock, field: string, layupIndex: number, pressure_Pa: number): PlanBlock {
  const layers = requireWhole(`${field}.layers`, item.layers, 1, MAX_BLOCK_LAYERS);
  const nominal = validateFaces(item.reflector, `${field}.reflector`);
  const low = item.reflector.low === undefined ? nominal : validateFaces(item.reflector.low, `${field}.reflector.low`);
  const high = item.reflector.high === undefined ? nominal : validateFaces(item.reflector.high, `${field}.reflector.high`);
  if (!MODELS.includes(item.model)) throw new ThermalInputError(`${field}.model`, item.model, `one of ${MODELS.join(", ")}`);
  const density = item.layerDensity_per_cm === undefined ? undefined : requireAbove(`${field}.layerDensity_per_cm`, item.layerDensity_per_cm, 0, "layers/cm");
  const spacer = item.spacer === undefined ? undefined : validateSpacer(item.spacer, `${field}.spacer`);
  const spacerNeedsDensity =
    spacer !== undefined && ("conductivity_W_per_m_K" in spacer ? spacer.thickness_m === undefined : spacer.referenceLayerDensity_per_cm !== undefined);
  const needsDensity = item.model === "correlation" || (item.model === "layers" && spacerNeedsDensity);
  if (needsDensity && density === undefined) {
    throw new ThermalInputError(`${field}.layerDensity_per_cm`, density, `a number above 0 layers/cm (the ${item.model} model needs the layer density)`);
  }
  const coefficients = item.coefficients ?? DEFAULT_SET.coefficients;
  if (item.model === "correlation") {
    // Let the correlation check its own coefficients, under this block's path.
    underField(field, () =>
      blanketCorrelation({ layers, layerDensity_per_cm: density ?? 1, warm_K: 2, cold_K: 1, pressure_torr: pressure_Pa / TORR_PA, emissivity: 1, coefficients }),
    );
  }
  const degradationFactor = item.degradationFactor === undefined ? 1 : requireAtLeast(`${field}.degradationFactor`, item.degradationFactor, 1);
  const label = item.label === undefined ? `block ${layupIndex + 1}` : String(item.label);
  return { layupIndex, label, model: item.model, layers, faces: { nominal, low, high }, layerDensity_per_cm: density, spacer, coefficients, degradationFactor };
}

/** One torr is 101 325/760 Pa exactly (definition of the torr; NIST SP 811, 2008, App. B). */
export const TORR_PA = 101_325 / 760;

function validateSpacer(spacer: AssemblySpacer, field: string): AssemblySpacer {
  requireObject(field, spacer, "a spacer { conductance_W_per_m2_K } or { conductivity_W_per_m_K, thickness_m?, contactFactor? }");
  if ("conductance_W_per_m2_K" in spacer) {
    const conductance_W_per_m2_K = requireAbove(`${field}.conductance_W_per_m2_K`, spacer.conductance_W_per_m2_K, 0, "W/(m²·K)");
    const optional = (name: "referenceMeanTemperature_K" | "referenceLayerDensity_per_cm", unit: string) =>
      spacer[name] === undefined ? {} : { [name]: requireAbove(`${field}.${name}`, spacer[name], 0, unit) };
    const exponent = spacer.layerDensityExponent;
    if (exponent !== undefined && (typeof exponent !== "number" || !Number.isFinite(exponent) || exponent < 0 || exponent > 5)) {
      throw new ThermalInputError(`${field}.layerDensityExponent`, exponent, "a number from 0 to 5");
    }
    if ((spacer.referenceLayerDensity_per_cm === undefined) !== (exponent === undefined)) {
      throw new ThermalInputError(`${field}.layerDensityExponent`, exponent, "given together with referenceLayerDensity_per_cm, or both left out");
    }
    return {
      conductance_W_per_m2_K,
      ...optional("referenceMeanTemperature_K", "K"),
      ...optional("referenceLayerDensity_per_cm", "layers/cm"),
      ...(exponent === undefined ? {} : { layerDensityExponent: exponent }),
    };
  }
  const conductivity_W_per_m_K = requireAbove(`${field}.conductivity_W_per_m_K`, spacer.conductivity_W_per_m_K, 0, "W/(m·K)");
  const thickness_m = spacer.thickness_m === undefined ? undefined : requireAbove(`${field}.thickness_m`, spacer.thickness_m, 0, "m");
  const c = spacer.contactFactor;
  if (c !== undefined && (typeof c !== "number" || !Number.isFinite(c) || c <= 0 || c > 1)) {
    throw new ThermalInputError(`${field}.contactFactor`, c, "a number above 0 and at most 1");
  }
  return { conductivity_W_per_m_K, thickness_m, contactFactor: c };
}

function validateLoad(load: CryogenLoad, field: string): void {
  if (load.cryogen === undefined) return;
  // boilOff checks the cryogen, capacity and fractions in its own words; 0 W is a valid heat.
  underField(field, () => boilOff({ ...loadOf(load), heat_W: 0, cryogen: load.cryogen! }));
}

function loadOf(load: CryogenLoad): CryogenLoad {
  const { cryogen, capacity_L, fillFraction, minimumFraction, ventReference } = load;
  return { cryogen, capacity_L, fillFraction, minimumFraction, ventReference };
}

function validateVacuum(vacuum: AssemblyDesign["vacuum"]): Plan["vacuum"] {
  requireObject("vacuum", vacuum, "a vacuum { pressure_Pa, gas }");
  const pressure_Pa = requireAtLeast("vacuum.pressure_Pa", vacuum.pressure_Pa, 0, "Pa");
  const gas = requireGas("vacuum.gas", vacuum.gas);
  const gauge = vacuum.gaugeTemperature_K === undefined ? DEFAULT_GAUGE_K : requireAbove("vacuum.gaugeTemperature_K", vacuum.gaugeTemperature_K, 0, "K");
  const a = vacuum.accommodation;
  if (a !== undefined) {
    requireObject("vacuum.accommodation", a, "accommodation coefficients { warm, cold }");
    for (const side of ["warm", "cold"] as const) {
      const value = a[side];
      if (typeof value !== "number" || !Number.isFinite(value) || value <= 0 || value > 1) {
        throw new ThermalInputError(`vacuum.accommodation.${side}`, value, "an accommodation coefficient above 0 and at most 1");
      }
    }
  }
  return { pressure_Pa, gas, gaugeTemperature_K: gauge, accommodation: a === undefined ? undefined : { warm: a.warm, cold: a.cold } };
}

function validateSupports(supports: AssemblyDesign["supports"], sinks: PlanSink[], warm_K: number): PlanSupport[] {
  if (supports === undefined) return [];
  if (!Array.isArray(supports) || supports.length > MAX_SUPPORTS) throw new ThermalInputError("supports", supports, `a list of at most ${MAX_SUPPORTS} supports`);
  const stages = sinks.length - 1;
  const stageRange = stages === 0 ? "" : ` or a stage number from 0 to ${stages - 1}`;
  return supports.map((s, i) => {
    const field = `supports[${i}]`;
    requireObject(field, s, "a support { material, area_m2, length_m, count, from, to }");
    if (typeof s.material !== "string" || !SUPPORT_MATERIAL_IDS.includes(s.material)) {
      throw new ThermalInputError(`${field}.material`, s.material, `one of ${SUPPORT_MATERIAL_IDS.join(", ")}`);
    }
    const area_m2 = requireAbove(`${field}.area_m2`, s.area_m2, 0, "m²");
    const length_m = requireAbove(`${field}.length_m`, s.length_m, 0, "m");
    const count = s.count === undefined ? 1 : requireWhole(`${field}.count`, s.count, 1, 1_000_000);
    const from = s.from === "warm" ? -1 : stageEnd(`${field}.from`, s.from, stages, `"warm"${stageRange}`);
    const to = s.to === "cold" ? sinks.length - 1 : stageEnd(`${field}.to`, s.to, stages, `"cold"${stageRange}`);
    if (to <= from) throw new ThermalInputError(`${field}.to`, s.to, `"cold" or a stage colder than ${field}.from`);
    const fit = SUPPORT_MATERIALS[s.material];
    const fromT = from < 0 ? warm_K : sinks[from].temperature_K;
    if (fromT > EXTRAPOLATION_LIMIT_K) {
      throw new ThermalInputError(`${field}.from`, s.from, `an end at or below ${EXTRAPOLATION_LIMIT_K} K for ${fit.label} (this one is at ${fromT} K)`);
    }
    const toT = sinks[to].temperature_K;
    // Below the fit's lower limit the integral holds k there and warns (supports.ts range policy).
    if (toT < INTEGRAL_FLOOR_K) {
      throw new ThermalInputError(`${field}.to`, s.to, `an end at or above ${INTEGRAL_FLOOR_K} K for ${fit.label} (this one is at ${toT} K)`);
    }
    const label = s.label === undefined ? `support ${i + 1}` : String(s.label);
    return { index: i, label, material: s.material, area_m2, length_m, count, from, to };
  });
}

function stageEnd(field: string, value: unknown, stages: number, allowed: string): number {
  if (typeof value !== "number" || !Number.isInteger(value) || value < 0 || value >= stages) {
    throw new ThermalInputError(field, value, allowed);
  }
  return value;
}
