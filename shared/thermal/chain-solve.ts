import { ThermalConvergenceError } from "./convergence-error";
import { solveTridiagonalInPlace } from "./linear-solve";

/**
 * A chain of nodes 0…n+1 (0 the warm end, n+1 the cold end, both held fixed) joined by n + 1
 * gaps. Temperatures are passed as offsets above the cold end, u = T − T_cold, so that a gap
 * of a few microkelvin next to a cold wall keeps its digits. `gaps` fills, for every gap g
 * between node g and node g + 1, the heat q[g] flowing cold-ward (which has the sign of
 * u[g] − u[g+1]) and its partial derivatives with respect to the two node temperatures.
 */
export type ChainGaps = (u: number[], q: number[], dqdWarm: number[], dqdCold: number[]) => void;

const MAX_ITERATIONS = 500;
const MAX_HALVINGS = 30;
const WARM_UP_STEPS = 2;
// Converged when the heat through every gap agrees to this, relative to the mean heat (or to
// what rounding allows), and the next Newton correction moves no node by more than
// STEP_TOLERANCE of the temperature drops beside it.
const BALANCE_TOLERANCE = 1e-11;
const STEP_TOLERANCE = 1e-10;
// How many ulps of temperature the balance test allows for, where rounding sets the floor.
const ROUNDING_MARGIN = 64;

/**
 * Solves for the interior offsets of `u` (in place; the interior holds the starting guess) so
 * the same heat crosses every gap: r_k = q_{k−1} − q_k = 0. A few substitution steps first
 * (every gap's secant conductance q/ΔT frozen, the series chain solved exactly; skip them with
 * warmUpSteps = 0 when the start is already close), then Newton's
 * method on the tridiagonal Jacobian with a backtracking line search on Σr² (J. E. Dennis &
 * R. B. Schnabel, Numerical Methods for Unconstrained Optimization and Nonlinear Equations,
 * Sec. 6.3, from memory); where the line search finds no descent, another substitution step. Nodes stay
 * between the ends, where every solution lies. Returns the number of Newton iterations;
 * throws ThermalConvergenceError.
 */
export function solveChain(u: number[], gaps: ChainGaps, what: string, warmUpSteps = WARM_UP_STEPS): number {
  const n = u.length - 2;
  if (n <= 0) return 0;
  const top = u[0];
  const w = new Workspace(n);
  let merit = evaluate(u, gaps, w);
  for (let step = 0; step < warmUpSteps; step++) {
    substitute(u, w);
    merit = evaluate(u, gaps, w);
  }
  for (let iterations = 1; iterations <= MAX_ITERATIONS; iterations++) {
    // Jacobian row k (node k + 1): ∂r/∂u_k = dWarm[k], ∂r/∂u_{k+1} = dCold[k] − dWarm[k+1], ∂r/∂u_{k+2} = −dCold[k+1].
    for (let k = 0; k < n; k++) {
      w.sub[k] = w.dWarm[k];
      w.diag[k] = w.dCold[k] - w.dWarm[k + 1];
      w.sup[k] = -w.dCold[k + 1];
      w.step[k] = w.q[k + 1] - w.q[k];
      w.start[k] = u[k + 1];
    }
    solveTridiagonalInPlace(n, w.sub, w.diag, w.sup, w.step);
    const settled = stepIsNegligible(u, w.step);
    const finite = w.step.every(Number.isFinite);
    if (merit.relative <= merit.reachable && (settled || !finite)) return iterations;
    let accepted = false;
    if (finite) {
      let lambda = 1;
      for (let halving = 0; halving <= MAX_HALVINGS && !accepted; halving++, lambda *= 0.5) {
        for (let k = 0; k < n; k++) u[k + 1] = clamp(w.start[k] + lambda * w.step[k], 0, top);
        const trial = evaluate(u, gaps, w);
        // Armijo condition on ½Σr², whose slope along the Newton direction is −Σr².
        if (trial.value <= (1 - 1e-4 * lambda) * merit.value) {
          merit = trial;
          accepted = true;
        }
      }
    }
    if (!accepted) {
      for (let k = 0; k < n; k++) u[k + 1] = w.start[k];
      merit = evaluate(u, gaps, w);
      // Only rounding left: done. Otherwise the Jacobian misleads here; substitute instead.
      if (merit.relative <= merit.reachable) return iterations;
      substitute(u, w);
      merit = evaluate(u, gaps, w);
    }
  }
  throw new ThermalConvergenceError(what, MAX_ITERATIONS, merit.relative);
}

/**
 * True when the Newton correction moves every node by less than STEP_TOLERANCE of the smaller
 * temperature drop beside it: the heat through a gap follows its drop, so this is what bounds
 * the error of the heat, not the correction relative to the temperature itself. One part in
 * ROUNDING_MARGIN/ε_machine of the offset is as close as a double gets.
 */
function stepIsNegligible(u: number[], step: number[]): boolean {
  for (let k = 0; k < step.length; k++) {
    const node = u[k + 1];
    const drop = Math.min(u[k] - node, node - u[k + 2]);
    const limit = Math.max(STEP_TOLERANCE * drop, ROUNDING_MARGIN * Number.EPSILON * node);
    if (!(Math.abs(step[k]) <= limit)) return false;
  }
  return true;
}

/**
 * One substitution step: freeze each gap's conductance C_g = q_g/(u_g − u_{g+1}) and solve the
 * series chain exactly, Q = (u_0 − u_{n+1})/Σ 1/C_g, marching up from the cold end so every
 * term is positive. Needs w.q and w.dWarm from an evaluation at u.
 */
function substitute(u: number[], w: Workspace): void {
  const n = u.length - 2;
  let resistance = 0;
  for (let g = 0; g <= n; g++) {
    const drop = u[g] - u[g + 1];
    const secant = drop > 0 ? w.q[g] / drop : w.dWarm[g];
    w.conductance[g] = secant > 0 ? secant : Number.MIN_VALUE;
    resistance += 1 / w.conductance[g];
  }
  const heat = u[0] / resistance;
  let above = 0;
  for (let g = n; g >= 1; g--) {
    above += heat / w.conductance[g];
    u[g] = Math.min(above, u[0]);
  }
}

/**
 * Evaluates every gap; returns Σr², the largest |r_k| relative to the mean gap heat, and the
 * balance this chain can reach at all: a one-ulp change of a node's offset moves a gap's heat
 * by |∂q/∂u|·u·ε_machine, which for tightly coupled shields far exceeds 1e-11 of the heat.
 */
function evaluate(u: number[], gaps: ChainGaps, w: Workspace) {
  gaps(u, w.q, w.dWarm, w.dCold);
  const n = w.q.length - 1;
  let sum = 0;
  let mean = 0;
  let largest = 0;
  let sensitivity = 0;
  for (let g = 0; g <= n; g++) {
    mean += Math.abs(w.q[g]);
    sensitivity = Math.max(sensitivity, Math.abs(w.dWarm[g]) * u[g] + Math.abs(w.dCold[g]) * u[g + 1]);
  }
  mean /= n + 1;
  for (let k = 0; k < n; k++) {
    const r = w.q[k] - w.q[k + 1];
    sum += r * r;
    largest = Math.max(largest, Math.abs(r));
  }
  const scale = mean > 0 ? mean : 1;
  return {
    value: sum,
    relative: largest / scale,
    reachable: Math.max(BALANCE_TOLERANCE, (ROUNDING_MARGIN * Number.EPSILON * sensitivity) / scale),
  };
}

/** Arrays reused across iterations, so the loop allocates nothing per node. */
class Workspace {
  readonly q: number[];
  readonly dWarm: number[];
  readonly dCold: number[];
  readonly conductance: number[];
  readonly sub: number[];
  readonly diag: number[];
  readonly sup: number[];
  readonly step: number[];
  readonly start: number[];

  constructor(n: number) {
    this.q = zeros(n + 1);
    this.dWarm = zeros(n + 1);
    this.dCold = zeros(n + 1);
    this.conductance = zeros(n + 1);
    this.sub = zeros(n);
    this.diag = zeros(n);
    this.sup = zeros(n);
    this.step = zeros(n);
    this.start = zeros(n);
  }
}

function clamp(value: number, low: number, high: number): number {
  return value < low ? low : value > high ? high : value;
}

function zeros(n: number): number[] {
  return new Array<number>(n).fill(0);
}
