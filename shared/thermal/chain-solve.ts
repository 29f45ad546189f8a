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
// Largest gap-to-gap heat mismatch, relative to the mean heat, that is only rounding noise.
const RESIDUAL_FLOOR = 1e-14;
// A line search that finds no descent is accepted as converged only below this mismatch.
const STALL_FLOOR = 1e-12;

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
    let full = 0;
    for (let k = 0; k < n; k++) full = Math.max(full, Math.abs(step[k]) / start[k]);
    if (full < STEP_TOLERANCE || merit.relative < RESIDUAL_FLOOR) {
      // Converged: the Newton correction is below the tolerance (or rounding is all that is
      // left). The caller evaluates its gaps once more at these temperatures for its outputs.
      for (let k = 0; k < n; k++) t[k + 1] = clamp(start[k] + step[k], tCold, tWarm);
      return iterations;
    }
    let lambda = 1;
    let accepted = false;
    for (let halving = 0; halving <= MAX_HALVINGS && !accepted; halving++, lambda *= 0.5) {
      for (let k = 0; k < n; k++) t[k + 1] = clamp(start[k] + lambda * step[k], tCold, tWarm);
      const trial = residualMerit(t, gaps, q, dWarm, dCold);
      // Armijo condition on ½Σr², whose slope along the Newton direction is −Σr².
      if (trial.value <= (1 - 1e-4 * lambda) * merit.value) {
        merit = trial;
        accepted = true;
      }
    }
    if (!accepted) {
      for (let k = 0; k < n; k++) t[k + 1] = start[k];
      // No descent left: fine if only rounding remains, otherwise a genuine stall.
      if (merit.relative < STALL_FLOOR) return iterations;
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

function clamp(value: number, low: number, high: number): number {
  return value < low ? low : value > high ? high : value;
}

function zeros(n: number): number[] {
  return new Array<number>(n).fill(0);
}
