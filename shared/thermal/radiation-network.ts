import { ThermalConvergenceError } from "./convergence-error";
import { solveChain } from "./chain-solve";
import { Emissivity, emissivitySlope, evaluateEmissivity, isConstantModel, validateEmissivity } from "./emissivity";
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
  /**
   * Passes needed for shield temperatures and emissivities to agree: 1 when no shield's
   * emissivity varies, else 1 + the substitution and Newton steps taken.
   */
  iterations: number;
}

export const MAX_SHIELDS = 1000;
// Shield temperatures from the final linear solve and from the iteration must agree this well.
const AGREEMENT = 1e-9;
const WARM_UP_PASSES = 2;

/**
 * Heat leak through a stack of gray, diffuse, opaque shields in vacuum: every face adds a
 * surface resistance (1 − ε)/(εA), every gap a space resistance 1/(A_inner·F) with F = 1 from
 * the inner to the outer of two concentric (or two large parallel) surfaces, all in series
 * (F. P. Incropera, D. P. DeWitt, T. L. Bergman & A. S. Lavine, Fundamentals of Heat and Mass
 * Transfer, 6th ed., Sec. 13.2, the two-surface enclosure and radiation shields; section
 * numbers from memory).
 */
export function estimateStack(input: StackInput): StackResult {
  const { nodes, shields, warmEpsilon, coldEpsilon, tw, tc } = validateStack(input);
  const n = shields.length;
  const warmModels: Emissivity[] = [];
  const coldModels: Emissivity[] = [];
  let varying = false;
  for (const shield of shields) {
    warmModels.push(shield.warmSide);
    coldModels.push(shield.coldSide);
    if (!isConstantModel(shield.warmSide) || !isConstantModel(shield.coldSide)) varying = true;
  }
  const network = new Network(nodes.areas_m2, warmModels, coldModels, warmEpsilon, coldEpsilon, tw, tc);
  // Start from T⁴ falling evenly across the shields (exact for equal emissivities, planar).
  const t = zeros(n + 2);
  t[0] = tw;
  t[n + 1] = tc;
  const ew = SIGMA * tw * tw * tw * tw;
  const ec = SIGMA * tc * tc * tc * tc;
  for (let k = 1; k <= n; k++) t[k] = Math.sqrt(Math.sqrt((ec + ((ew - ec) * (n + 1 - k)) / (n + 1)) / SIGMA));
  let iterations = 1;
  if (varying) {
    // Temperatures and emissivities together. Two plain substitutions (ε at the current
    // temperatures, then the linear network for new ones) give Newton a close start; Newton
    // on the chain r_k = q_{k−1} − q_k finishes; a last linear solve with ε at the converged
    // temperatures must reproduce them.
    for (let pass = 0; pass < WARM_UP_PASSES; pass++) {
      network.setShieldEmissivities(t);
      network.solve();
      for (let k = 0; k < n; k++) t[k + 1] = network.shieldT[k];
    }
    const u = t.map((temperature_K) => temperature_K - tc);
    u[n + 1] = 0;
    iterations += WARM_UP_PASSES + solveChain(u, network.gaps, "Shield temperatures with temperature-dependent emissivity");
    for (let k = 1; k <= n; k++) t[k] = tc + u[k];
  }
  network.setShieldEmissivities(t);
  network.solve();
  if (varying) checkAgreement(network.shieldT, t, iterations);
  return network.result(nodes.radii_m, iterations);
}

function checkAgreement(linear: number[], newton: number[], iterations: number): void {
  let worst = 0;
  for (let k = 0; k < linear.length; k++) worst = Math.max(worst, Math.abs(linear[k] - newton[k + 1]) / newton[k + 1]);
  if (!(worst <= AGREEMENT)) {
    throw new ThermalConvergenceError("Shield temperatures with temperature-dependent emissivity", iterations, worst);
  }
}

function zeros(n: number): number[] {
  return new Array<number>(n).fill(0);
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
  // A layup usually repeats one reflector model object; a valid object stays valid, so check it once.
  const checked = new Set<Emissivity>();
  const check = (model: Emissivity, field: string) => {
    if (typeof model === "object" && model !== null && checked.has(model)) return;
    validateEmissivity(model, field);
    if (typeof model === "object") checked.add(model);
  };
  shields.forEach((shield, i) => {
    if (shield === null || typeof shield !== "object") throw new ThermalInputError(`shields[${i}]`, shield, "a shield { warmSide, coldSide }");
    check(shield.warmSide, `shields[${i}].warmSide`);
    check(shield.coldSide, `shields[${i}].coldSide`);
  });
  const nodes = stackNodes(input.geometry, shields.map((s) => s.radius_m));
  const warmEpsilon = evaluateEmissivity(warm.emissivity, tw);
  const coldEpsilon = evaluateEmissivity(cold.emissivity, tc);
  return { nodes, shields, warmEpsilon, coldEpsilon, tw, tc };
}

/** The series network with preallocated arrays, so the iteration allocates nothing. */
class Network {
  readonly shieldT: number[];
  private readonly n: number;
  private readonly nodeT: number[]; // scratch: absolute temperatures of nodes 0…n+1
  private readonly warmFace: number[]; // surface resistance of each shield's warm face
  private readonly coldFace: number[];
  private readonly space: number[]; // gap g lies between node g and node g + 1
  private readonly dWarmFace: number[]; // d(warm-face resistance)/dT of each shield
  private readonly dColdFace: number[];
  private readonly warmWall: number;
  private readonly coldWall: number;
  private heat_W = 0;
  private total = 0;

  constructor(
    private readonly areas: number[],
    private readonly warmModels: Emissivity[],
    private readonly coldModels: Emissivity[],
    warmEpsilon: number,
    coldEpsilon: number,
    private readonly tw: number,
    private readonly tc: number,
  ) {
    const n = warmModels.length;
    this.n = n;
    this.shieldT = zeros(n);
    this.nodeT = zeros(n + 2);
    this.warmFace = zeros(n);
    this.coldFace = zeros(n);
    this.dWarmFace = zeros(n);
    this.dColdFace = zeros(n);
    this.space = zeros(n + 1);
    // The inner (colder) surface of each concentric pair sees the outer one entirely: F = 1.
    for (let g = 0; g <= n; g++) this.space[g] = 1 / areas[g + 1];
    this.warmWall = (1 - warmEpsilon) / (warmEpsilon * areas[0]);
    this.coldWall = (1 - coldEpsilon) / (coldEpsilon * areas[n + 1]);
  }

  /** Face resistances (1 − ε)/(εA) at the node temperatures t[1…n], and (for Newton) dR/dT = −ε′/(ε²A). */
  setShieldEmissivities(t: number[], withSlopes = false): void {
    for (let k = 0; k < this.n; k++) {
      const temperature_K = t[k + 1];
      const area = this.areas[k + 1];
      const ew = evaluateEmissivity(this.warmModels[k], temperature_K);
      // Both faces of one film often share a model object: evaluate it once.
      const ec = this.coldModels[k] === this.warmModels[k] ? ew : evaluateEmissivity(this.coldModels[k], temperature_K);
      this.warmFace[k] = (1 - ew) / (ew * area);
      this.coldFace[k] = (1 - ec) / (ec * area);
      if (!withSlopes) continue;
      this.dWarmFace[k] = -emissivitySlope(this.warmModels[k], temperature_K, ew) / (ew * ew * area);
      this.dColdFace[k] = ec === ew && this.coldModels[k] === this.warmModels[k] ? this.dWarmFace[k] : -emissivitySlope(this.coldModels[k], temperature_K, ec) / (ec * ec * area);
    }
  }

  /** Heat σ(T_g⁴ − T_{g+1}⁴)/R_g through every gap with its face resistances, for solveChain. */
  readonly gaps = (u: number[], q: number[], dqdWarm: number[], dqdCold: number[]): void => {
    const n = this.n;
    const tc = this.tc;
    for (let k = 1; k <= n; k++) this.nodeT[k] = tc + u[k];
    this.setShieldEmissivities(this.nodeT, true);
    for (let g = 0; g <= n; g++) {
      const a = tc + u[g];
      const b = tc + u[g + 1];
      const drop = u[g] - u[g + 1];
      const upper = g === 0 ? this.warmWall : this.coldFace[g - 1];
      const lower = g === n ? this.coldWall : this.warmFace[g];
      const dUpper = g === 0 ? 0 : this.dColdFace[g - 1];
      const dLower = g === n ? 0 : this.dWarmFace[g];
      const r = upper + this.space[g] + lower;
      // a⁴ − b⁴ factored around the offset difference, so close neighbours keep their digits.
      const heat = (SIGMA * drop * (a + b) * (a * a + b * b)) / r;
      q[g] = heat;
      dqdWarm[g] = (4 * SIGMA * a * a * a - heat * dUpper) / r;
      dqdCold[g] = (-4 * SIGMA * b * b * b - heat * dLower) / r;
    }
  };

  /** Heat from σ(T_w⁴ − T_c⁴)/ΣR; each shield's σT⁴ from the drop across the resistances below it. */
  solve(): void {
    const n = this.n;
    let total = this.warmWall + this.coldWall;
    for (let g = 0; g <= n; g++) total += this.space[g];
    for (let k = 0; k < n; k++) total += this.warmFace[k] + this.coldFace[k];
    this.total = total;
    const tc = this.tc;
    const tw = this.tw;
    const ec = SIGMA * tc * tc * tc * tc;
    this.heat_W = (SIGMA * tw * tw * tw * tw - ec) / total;
    // March from the cold wall up: E_k = E_c + Q·(resistance between shield k and the cold wall).
    // Every term is positive, so no cancellation even for a 4 K wall under a 300 K one.
    let below = this.coldWall;
    for (let k = n - 1; k >= 0; k--) {
      below += this.space[k + 1] + this.coldFace[k];
      this.shieldT[k] = Math.sqrt(Math.sqrt((ec + this.heat_W * below) / SIGMA));
      below += this.warmFace[k];
    }
  }

  result(radii_m: number[], iterations: number): StackResult {
    const n = this.n;
    const total = this.total;
    const labels = labelsFor(n);
    const resistances: StackResistance[] = [surface(labels[0], this.warmWall, total)];
    for (let g = 0; g <= n; g++) {
      resistances.push(space(labels[3 * g + 1], this.space[g], total));
      if (g < n) {
        resistances.push(surface(labels[3 * g + 2], this.warmFace[g], total));
        resistances.push(surface(labels[3 * g + 3], this.coldFace[g], total));
      }
    }
    resistances.push(surface(labels[3 * n + 2], this.coldWall, total));
    const shields: StackResult["shields"] = [];
    for (let k = 0; k < n; k++) {
      const temperature_K = this.shieldT[k];
      const area_m2 = this.areas[k + 1];
      shields.push(radii_m.length > 0 ? { temperature_K, radius_m: radii_m[k + 1], area_m2 } : { temperature_K, area_m2 });
    }
    return {
      heatLeak_W: this.heat_W,
      heatFlux_W_per_m2: this.heat_W / this.areas[n + 1],
      shields,
      resistances,
      iterations,
    };
  }
}

function surface(label: string, value: number, total: number): StackResistance {
  return { kind: "surface", label, value, share: value / total };
}

function space(label: string, value: number, total: number): StackResistance {
  return { kind: "space", label, value, share: value / total };
}

// Resistance labels in ladder order, built once per shield count and reused: a 60-shield
// stack would otherwise spend a third of its time formatting strings.
const labelCache = new Map<number, string[]>();
function labelsFor(n: number): string[] {
  let labels = labelCache.get(n);
  if (labels) return labels;
  labels = ["warm wall surface"];
  for (let g = 1; g <= n + 1; g++) {
    labels.push(`gap ${g} space`);
    if (g <= n) labels.push(`shield ${g} warm face`, `shield ${g} cold face`);
  }
  labels.push("cold wall surface");
  if (labelCache.size < 64) labelCache.set(n, labels);
  return labels;
}
