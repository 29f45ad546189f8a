import { ThermalInputError } from "./errors";

/**
 * Solves A·x = b by Gaussian elimination with partial pivoting (G. H. Golub & C. F. Van Loan,
 * Matrix Computations, 4th ed., Algorithm 3.4.1, from memory). `matrix` is n×n, row-major,
 * and is not modified. Throws ThermalInputError("matrix", …) when A is singular to working precision,
 * which for a radiation enclosure means a group of surfaces sees no surface of known temperature.
 */
export function solveLinearSystem(matrix: number[][], rhs: number[]): number[] {
  const n = rhs.length;
  if (!Array.isArray(matrix) || matrix.length !== n || matrix.some((row) => !Array.isArray(row) || row.length !== n)) {
    throw new ThermalInputError("matrix", matrix, `a square ${n}×${n} matrix matching the right-hand side`);
  }
  // Augmented copy, one flat array: row i occupies a[i*w … i*w + n].
  const w = n + 1;
  const a = new Float64Array(n * w);
  let scale = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const value = matrix[i][j];
      if (!Number.isFinite(value)) throw new ThermalInputError(`matrix[${i}][${j}]`, value, "a finite number");
      a[i * w + j] = value;
      scale = Math.max(scale, Math.abs(value));
    }
    if (!Number.isFinite(rhs[i])) throw new ThermalInputError(`rhs[${i}]`, rhs[i], "a finite number");
    a[i * w + n] = rhs[i];
  }
  const tiny = scale * n * Number.EPSILON;
  for (let col = 0; col < n; col++) {
    let pivotRow = col;
    let pivot = Math.abs(a[col * w + col]);
    for (let i = col + 1; i < n; i++) {
      const candidate = Math.abs(a[i * w + col]);
      if (candidate > pivot) {
        pivot = candidate;
        pivotRow = i;
      }
    }
    if (pivot <= tiny) throw new ThermalInputError("matrix", `singular at column ${col}`, "a non-singular system");
    if (pivotRow !== col) {
      for (let j = col; j < w; j++) {
        const swap = a[col * w + j];
        a[col * w + j] = a[pivotRow * w + j];
        a[pivotRow * w + j] = swap;
      }
    }
    const diagonal = a[col * w + col];
    for (let i = col + 1; i < n; i++) {
      const factor = a[i * w + col] / diagonal;
      if (factor === 0) continue;
      for (let j = col + 1; j < w; j++) a[i * w + j] -= factor * a[col * w + j];
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let i = n - 1; i >= 0; i--) {
    let sum = a[i * w + n];
    for (let j = i + 1; j < n; j++) sum -= a[i * w + j] * x[j];
    x[i] = sum / a[i * w + i];
  }
  return x;
}

/**
 * Solves a tridiagonal system in place by the Thomas algorithm (Golub & Van Loan, 4th ed.,
 * Sec. 4.3, banded elimination without pivoting, from memory), stable for the diagonally
 * dominant Jacobians of a heat-conducting chain. Row k: sub[k]·x[k−1] + diag[k]·x[k] + sup[k]·x[k+1] = rhs[k].
 * Overwrites diag and rhs; the answer is left in rhs. Internal to the engine: no validation,
 * because it runs inside Newton iterations on arrays the engine built itself.
 */
export function solveTridiagonalInPlace(n: number, sub: number[], diag: number[], sup: number[], rhs: number[]): void {
  for (let k = 1; k < n; k++) {
    const factor = sub[k] / diag[k - 1];
    diag[k] -= factor * sup[k - 1];
    rhs[k] -= factor * rhs[k - 1];
  }
  rhs[n - 1] /= diag[n - 1];
  for (let k = n - 2; k >= 0; k--) rhs[k] = (rhs[k] - sup[k] * rhs[k + 1]) / diag[k];
}
