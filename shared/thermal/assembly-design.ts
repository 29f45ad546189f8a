import type { BlanketCoefficients } from "./blanket-correlation";
import type { VentReference } from "./boil-off";
import type { Emissivity } from "./emissivity";
import type { CryogenId } from "./fluids";
import type { GasName } from "./gas-conduction";
import type { SupportMaterial } from "./supports";

/**
 * The input of estimateAssembly: a whole design, warm → cold. Every number is SI with its unit
 * in its name; every field is checked by validateAssembly, whose errors name the field path.
 */

/**
 * Curved walls are concentric, the cold one inside. A cylinder's lateral surface is the
 * concentric stack; `flatEnds` (0, 1 or 2, default 0) adds that many flat ends of area
 * π·coldRadius², each a planar stack of the same layup.
 */
export type AssemblyGeometry =
  | { kind: "planar"; area_m2: number }
  | { kind: "cylinder"; coldRadius_m: number; warmRadius_m: number; length_m: number; flatEnds?: number }
  | { kind: "sphere"; coldRadius_m: number; warmRadius_m: number };

/** A cryogen bath on a sink: boil-off is reported when `cryogen` is given. */
export interface CryogenLoad {
  cryogen?: CryogenId;
  capacity_L?: number;
  /** Liquid fill when the hold time starts, fraction of capacity (default 1). */
  fillFraction?: number;
  /** Liquid left when the hold time ends, fraction of capacity (default 0). */
  minimumFraction?: number;
  ventReference?: VentReference;
}

/** The vacuum jacket's inner face. */
export interface AssemblyWarm {
  temperature_K: number;
  emissivity: Emissivity;
}

/** The cold vessel's outer face. */
export interface AssemblyCold extends CryogenLoad {
  temperature_K: number;
  emissivity: Emissivity;
  label?: string;
}

export interface ReflectorFaces {
  warmSide: Emissivity;
  coldSide: Emissivity;
}

/** A reflector's nominal faces, with optional low and high models for the uncertainty band. */
export interface Reflector extends ReflectorFaces {
  low?: ReflectorFaces;
  high?: ReflectorFaces;
}

export type BlockModel = "radiation" | "correlation" | "layers";

/**
 * Solid conduction through the spacer of a "layers" block, per gap: a conductance, or a bulk
 * conductivity over a thickness (default the blanket's pitch, 1 cm / layer density) times the
 * share that survives the point contacts (contactFactor, default 1). A conductance may name the
 * mean temperature it was taken at (it then scales with each gap's mean temperature) and the
 * layer density (it then scales as (N̄/N̄_ref)^exponent with the block's density): together the
 * form h_s = C_s·N̄^a·T_m of Cunnington, Keller & Glassford (NASA CR-134477, 1974).
 */
export type AssemblySpacer =
  | { conductance_W_per_m2_K: number; referenceMeanTemperature_K?: number; referenceLayerDensity_per_cm?: number; layerDensityExponent?: number }
  | { conductivity_W_per_m_K: number; thickness_m?: number; contactFactor?: number };

/** N layers of one reflector, modelled one way. */
export interface LayupBlock {
  kind: "block";
  label?: string;
  layers: number;
  reflector: Reflector;
  model: BlockModel;
  /** Layers per cm; needed by "correlation", and by "layers" when the spacer's thickness is left out. */
  layerDensity_per_cm?: number;
  spacer?: AssemblySpacer;
  /** For "correlation"; default the 1974 set for aluminized polyester film with polyester netting. */
  coefficients?: BlanketCoefficients;
  /** Seams and penetrations: multiplies the block's heat; at least 1, default 1. */
  degradationFactor?: number;
}

/** A cooled shield held at a fixed temperature (a cryogen jacket or a cryocooler stage). */
export interface LayupStage extends CryogenLoad {
  kind: "stage";
  label: string;
  temperature_K: number;
  /** Of both faces of the stage's shield. */
  emissivity: Emissivity;
}

export type LayupItem = LayupBlock | LayupStage;

/**
 * A support or penetration conducting from a warmer to a colder fixed temperature. `from` and
 * `to` count the stages only (0 = the warmest stage), or name the walls.
 */
export interface AssemblySupport {
  label?: string;
  material: SupportMaterial;
  area_m2: number;
  length_m: number;
  /** Default 1. */
  count?: number;
  from: number | "warm";
  to: number | "cold";
}

export interface AssemblyVacuum {
  pressure_Pa: number;
  gas: GasName;
  /** Where the gauge reads; default 300 K (common practice: a room-temperature gauge). */
  gaugeTemperature_K?: number;
  /** Fixed accommodation coefficients for "layers" blocks; default the gas table's. */
  accommodation?: { warm: number; cold: number };
}

export interface AssemblyDesign {
  geometry: AssemblyGeometry;
  warm: AssemblyWarm;
  cold: AssemblyCold;
  /** Ordered warm → cold. */
  layup: LayupItem[];
  supports?: AssemblySupport[];
  vacuum: AssemblyVacuum;
}

/** Most layers in one block: the radiation network's limit. */
export const MAX_BLOCK_LAYERS = 1000;
export const MAX_LAYUP_ITEMS = 50;
export const MAX_SUPPORTS = 100;
/** Most shields in the whole layup (blocks and stages): keeps one estimate well under a second. */
export const MAX_TOTAL_SHIELDS = 5000;
