import { ThermalConvergenceError } from "./convergence-error";
import { Emissivity, evaluateEmissivity, isConstantEmissivity, validateEmissivity } from "./emissivity";
import { STEFAN_BOLTZMANN_W_PER_M2_K4 as SIGMA, ThermalInputError, requireAbove } from "./errors";
import { StackGeometry, stackNodes } from "./stack-geometry";

export type { StackGeometry } from "./stack-geometry";

export interface StackWall {
  temperature_K: number;
  emissivity: Emissivity;
}

export interface StackShield {
  warmSide: Emissivity;
  coldSide: Emissivity;
  radius_m?: number;
}

export interface StackInput {
  geometry: StackGeometry;
  /** Warm wall; its emissivity is that of the face toward the cold side. */
  warm: StackWall;
  /** Cold wall; its emissivity is that of the face toward the warm side. */
  cold: StackWall;
  /** Listed warm → cold. */
  shields: StackShield[];
}

export interface StackResistance {
  kind: "surface" | "space";
  label: string;
  /** Resistance in 1/m²; heat = σ·ΔT⁴ / Σ value. */
  value: number;
  /** Fraction of the total resistance; the shares sum to 1. */
  share: number;
}

export interface StackResult {
  heatLeak_W: number;
  /** On the cold wall's area. */
  heatFlux_W_per_m2: number;
  shields: { temperature_K: number; radius_m?: number; area_m2: number }[];
  resistances: StackResistance[];
  /** Network solves until shield temperatures and emissivities agreed; 1 when no shield's emissivity varies. */
  iterations: number;
}

export const MAX_SHIELDS = 1000;
const MAX_ITERATIONS = 500;
// Tighter than the promised 1e-9 so the linear (fixed-point) convergence leaves margin.
const RELATIVE_TOLERANCE = 1e-11;

/**
 * Heat leak through a stack of gray, diffuse, opaque shields in vacuum: every face adds a
 * surface resistance (1 − ε)/(εA), every gap a space resistance 1/(A_inner·F) with F = 1 from
 * the inner to the outer of two concentric (or two large parallel) surfaces, all in series
 * (F. P. Incropera, D. P. DeWitt, T. L. Bergman & A. S. Lavine, Fundamentals of Heat and Mass
 * Transfer, 6th ed., Sec. 13.3, the two-surface enclosure and the radiation shield).
 */
export function estimateStack(input: StackInput): StackResult {
  const { nodes, shields, warmEpsilon, coldEpsilon, tw, tc } = validateStack(input);
  const n = shields.length;
  const areas = nodes.areas_m2;
  const network = new Network(n, areas, warmEpsilon, coldEpsilon, tw, tc);
  const warmModels = shields.map((s) => s.warmSide);
  const coldModels = shields.map((s) => s.coldSide);
  const varying = shields.some((s) => !isConstantEmissivity(s.warmSide) || !isConstantEmissivity(s.coldSide));

  // Start from T⁴ falling evenly across the shields (exact for equal emissivities, planar).
  const t = new Float64Array(n);
  const ew = SIGMA * tw ** 4;
  const ec = SIGMA * tc ** 4;
  for (let k = 1; k <= n; k++) t[k - 1] = Math.sqrt(Math.sqrt((ec + ((ew - ec) * (n + 1 - k)) / (n + 1)) / SIGMA));

  let iterations = 0;
  let relaxation = 1;
  let previousStep = Infinity;
  for (;;) {
    iterations++;
    const epsilonChange = network.setShieldEmissivities(warmModels, coldModels, t, iterations > 1);
    network.solve();
    if (!varying) break;
    // Fixed point on the shield temperatures, damped whenever a step fails to shrink.
    let step = 0;
    for (let k = 0; k < n; k++) {
      const change = Math.abs(network.shieldT[k] - t[k]) / t[k];
      if (change > step) step = change;
    }
    if (step < RELATIVE_TOLERANCE && epsilonChange < RELATIVE_TOLERANCE) break;
    if (iterations >= MAX_ITERATIONS) {
      throw new ThermalConvergenceError("Shield temperatures with temperature-dependent emissivity", iterations, Math.max(step, epsilonChange));
    }
    if (step >= previousStep) relaxation = Math.max(relaxation * 0.5, 1 / 64);
    previousStep = step;
    for (let k = 0; k < n; k++) t[k] += relaxation * (network.shieldT[k] - t[k]);
  }
  return network.result(nodes.radii_m, iterations);
}

function validateStack(input: StackInput) {
  if (input === null || typeof input !== "object") throw new ThermalInputError("input", input, "a stack description");
  const { warm, cold, shields } = input;
  const tw = requireAbove("warm.temperature_K", warm?.temperature_K, 0, "K");
  const tc = requireAbove("cold.temperature_K", cold?.temperature_K, 0, "K");
  if (tw <= tc) throw new ThermalInputError("warm.temperature_K", tw, `a temperature above cold.temperature_K (${tc} K)`);
  validateEmissivity(warm.emissivity, "warm.emissivity");
  validateEmissivity(cold.emissivity, "cold.emissivity");
  if (!Array.isArray(shields) || shields.length > MAX_SHIELDS) {
    throw new ThermalInputError("shields", Array.isArray(shields) ? `${shields.length} shields` : shields, `a list of at most ${MAX_SHIELDS} shields`);
  }
  shields.forEach((shield, i) => {
    if (shield === null || typeof shield !== "object") throw new ThermalInputError(`shields[${i}]`, shield, "a shield { warmSide, coldSide }");
    validateEmissivity(shield.warmSide, `shields[${i}].warmSide`);
    validateEmissivity(shield.coldSide, `shields[${i}].coldSide`);
  });
  const nodes = stackNodes(input.geometry, shields.map((s) => s.radius_m));
  const warmEpsilon = evaluateEmissivity(warm.emissivity, tw);
  const coldEpsilon = evaluateEmissivity(cold.emissivity, tc);
  return { nodes, shields, warmEpsilon, coldEpsilon, tw, tc };
}

/** The series network with preallocated arrays, so the fixed-point loop allocates nothing. */
class Network {
  readonly shieldT: Float64Array;
  private readonly warmFace: Float64Array; // surface resistance of each shield's warm face
  private readonly coldFace: Float64Array;
  private readonly space: Float64Array; // gap g lies between node g and node g + 1
  private readonly epsWarm: Float64Array;
  private readonly epsCold: Float64Array;
  private readonly warmWall: number;
  private readonly coldWall: number;
  private heat_W = 0;
  private total = 0;

  constructor(
    private readonly n: number,
    private readonly areas: Float64Array,
    warmEpsilon: number,
    coldEpsilon: number,
    private readonly tw: number,
    private readonly tc: number,
  ) {
    this.shieldT = new Float64Array(n);
    this.warmFace = new Float64Array(n);
    this.coldFace = new Float64Array(n);
    this.epsWarm = new Float64Array(n);
    this.epsCold = new Float64Array(n);
    this.space = new Float64Array(n + 1);
    // The inner (colder) surface of each concentric pair sees the outer one entirely: F = 1.
    for (let g = 0; g <= n; g++) this.space[g] = 1 / areas[g + 1];
    this.warmWall = (1 - warmEpsilon) / (warmEpsilon * areas[0]);
    this.coldWall = (1 - coldEpsilon) / (coldEpsilon * areas[n + 1]);
  }

  /** Evaluates every shield face at its temperature; returns the largest relative change of ε. */
  setShieldEmissivities(warm: Emissivity[], cold: Emissivity[], t: Float64Array, compare: boolean): number {
    let change = 0;
    for (let k = 0; k < this.n; k++) {
      const ew = evaluateEmissivity(warm[k], t[k]);
      const ec = evaluateEmissivity(cold[k], t[k]);
      if (compare) change = Math.max(change, Math.abs(ew - this.epsWarm[k]) / ew, Math.abs(ec - this.epsCold[k]) / ec);
      this.epsWarm[k] = ew;
      this.epsCold[k] = ec;
      const area = this.areas[k + 1];
      this.warmFace[k] = (1 - ew) / (ew * area);
      this.coldFace[k] = (1 - ec) / (ec * area);
    }
    return change;
  }

  /** Heat from σ(T_w⁴ − T_c⁴)/ΣR; each shield's σT⁴ from the drop across the resistances below it. */
  solve(): void {
    const n = this.n;
    let total = this.warmWall + this.coldWall;
    for (let g = 0; g <= n; g++) total += this.space[g];
    for (let k = 0; k < n; k++) total += this.warmFace[k] + this.coldFace[k];
    this.total = total;
    const ec = SIGMA * this.tc ** 4;
    this.heat_W = (SIGMA * this.tw ** 4 - ec) / total;
    // March from the cold wall up: E_k = E_c + Q·(resistance between shield k and the cold wall).
    // Every term is positive, so no cancellation even for a 4 K wall under a 300 K one.
    let below = this.coldWall;
    for (let k = n - 1; k >= 0; k--) {
      below += this.space[k + 1] + this.coldFace[k];
      this.shieldT[k] = Math.sqrt(Math.sqrt((ec + this.heat_W * below) / SIGMA));
    }
  }

  result(radii_m: Float64Array, iterations: number): StackResult {
    const n = this.n;
    const resistances: StackResistance[] = [];
    const add = (kind: StackResistance["kind"], label: string, value: number) =>
      resistances.push({ kind, label, value, share: value / this.total });
    add("surface", "warm wall surface", this.warmWall);
    for (let g = 0; g <= n; g++) {
      add("space", `gap ${g + 1} space`, this.space[g]);
      if (g < n) {
        add("surface", `shield ${g + 1} warm face`, this.warmFace[g]);
        add("surface", `shield ${g + 1} cold face`, this.coldFace[g]);
      }
    }
    add("surface", "cold wall surface", this.coldWall);
    const shields = Array.from(this.shieldT, (temperature_K, k) =>
      radii_m.length > 0
        ? { temperature_K, radius_m: radii_m[k + 1], area_m2: this.areas[k + 1] }
        : { temperature_K, area_m2: this.areas[k + 1] },
    );
    return {
      heatLeak_W: this.heat_W,
      heatFlux_W_per_m2: this.heat_W / this.areas[n + 1],
      shields,
      resistances,
      iterations,
    };
  }
}
