import { ThermalConvergenceError } from "./convergence-error";
import { solveTridiagonalInPlace } from "./linear-solve";

/**
 * A chain of nodes 0…n+1 (0 the warm end, n+1 the cold end, both held fixed) joined by n + 1
 * gaps. `gaps` fills, for every gap g between node g and node g + 1, the heat q[g] flowing
 * cold-ward and its partial derivatives with respect to the two node temperatures.
 */
export type ChainGaps = (t: number[], q: number[], dqdWarm: number[], dqdCold: number[]) => void;

const MAX_ITERATIONS = 500;
const MAX_HALVINGS = 40;
// Newton converges quadratically: once a step is this small the error left is far below 1e-9.
const STEP_TOLERANCE = 1e-10;

/**
 * Solves for the interior node temperatures of `t` (in place; the interior holds the starting
 * guess) so the same heat crosses every gap: r_k = q_{k−1} − q_k = 0 for k = 1…n. Newton's
 * method on the tridiagonal Jacobian with a backtracking line search on Σr² (J. E. Dennis &
 * R. B. Schnabel, Numerical Methods for Unconstrained Optimization and Nonlinear Equations,
 * Sec. 6.3). Nodes are kept between the end temperatures, where every solution lies.
 * Returns the number of Newton iterations; throws ThermalConvergenceError if it stalls.
 */
export function solveChain(t: number[], gaps: ChainGaps, what: string): number {
  const n = t.length - 2;
  if (n <= 0) return 0;
  const tWarm = t[0];
  const tCold = t[n + 1];
  const q = zeros(n + 1);
  const dWarm = zeros(n + 1);
  const dCold = zeros(n + 1);
  const sub = zeros(n);
  const diag = zeros(n);
  const sup = zeros(n);
  const step = zeros(n);
  const start = zeros(n);
  let merit = residualMerit(t, gaps, q, dWarm, dCold);
  for (let iterations = 1; iterations <= MAX_ITERATIONS; iterations++) {
    // Jacobian row k (node k + 1): ∂r/∂t_k = dWarm[k], ∂r/∂t_{k+1} = dCold[k] − dWarm[k+1], ∂r/∂t_{k+2} = −dCold[k+1].
    for (let k = 0; k < n; k++) {
      sub[k] = dWarm[k];
      diag[k] = dCold[k] - dWarm[k + 1];
      sup[k] = -dCold[k + 1];
      step[k] = q[k + 1] - q[k];
      start[k] = t[k + 1];
    }
    solveTridiagonalInPlace(n, sub, diag, sup, step);
    let lambda = 1;
    let accepted = false;
    let trialMerit = merit.value;
    for (let halving = 0; halving <= MAX_HALVINGS; halving++) {
      for (let k = 0; k < n; k++) {
        const next = start[k] + lambda * step[k];
        t[k + 1] = next < tCold ? tCold : next > tWarm ? tWarm : next;
      }
      const trial = residualMerit(t, gaps, q, dWarm, dCold);
      trialMerit = trial.value;
      // Armijo condition on ½Σr², whose Newton-direction slope is −Σr².
      if (trialMerit <= (1 - 1e-4 * lambda) * merit.value || !(merit.value > 0)) {
        merit = trial;
        accepted = true;
        break;
      }
      if ((globalThis as any).DEBUG) console.log("halve", iterations, lambda, trialMerit, merit.value);
      lambda *= 0.5;
    }
    let largest = 0;
    for (let k = 0; k < n; k++) largest = Math.max(largest, Math.abs(t[k + 1] - start[k]) / start[k]);
    if ((globalThis as any).DEBUG) console.log("it", iterations, lambda, largest, merit.relative);
    if (accepted && largest < STEP_TOLERANCE) return iterations;
    if (!accepted) {
      // No descent left: accept only if the residual is already at rounding level.
      if (merit.relative < 1e-12) {
        for (let k = 0; k < n; k++) t[k + 1] = start[k];
        residualMerit(t, gaps, q, dWarm, dCold);
        return iterations;
      }
      throw new ThermalConvergenceError(what, iterations, merit.relative);
    }
  }
  throw new ThermalConvergenceError(what, MAX_ITERATIONS, merit.relative);
}

/** Σ r_k² and the largest |r_k| relative to the mean gap heat, after evaluating every gap. */
function residualMerit(t: number[], gaps: ChainGaps, q: number[], dWarm: number[], dCold: number[]) {
  gaps(t, q, dWarm, dCold);
  const n = q.length - 1;
  let sum = 0;
  let mean = 0;
  let largest = 0;
  for (let g = 0; g <= n; g++) mean += Math.abs(q[g]);
  mean /= n + 1;
  for (let k = 0; k < n; k++) {
    const r = q[k] - q[k + 1];
    sum += r * r;
    largest = Math.max(largest, Math.abs(r));
  }
  return { value: sum, relative: mean > 0 ? largest / mean : largest };
}

function zeros(n: number): number[] {
  return new Array<number>(n).fill(0);
}
