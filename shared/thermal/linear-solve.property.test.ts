import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { solveLinearSystem, solveTridiagonalInPlace } from "./linear-solve";

const entry = fc.double({ min: -10, max: 10, noNaN: true });

describe("linear solver laws", () => {
  it("the solution of A·x = b reproduces b for diagonally dominant A", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 30 }).chain((n) => fc.tuple(fc.array(entry, { minLength: n * n, maxLength: n * n }), fc.array(entry, { minLength: n, maxLength: n }))), ([flat, b]) => {
        const n = b.length;
        const a = Array.from({ length: n }, (_, i) => flat.slice(i * n, (i + 1) * n));
        // Strict diagonal dominance keeps A well away from singular.
        a.forEach((row, i) => (row[i] = row.reduce((s, x) => s + Math.abs(x), 0) + 1));
        const x = solveLinearSystem(a, b);
        a.forEach((row, i) => {
          const back = row.reduce((s, aij, j) => s + aij * x[j], 0);
          expect(Math.abs(back - b[i])).toBeLessThan(1e-10 * (1 + Math.abs(b[i])) * row.reduce((s, v) => s + Math.abs(v), 0));
        });
      }),
    );
  });

  it("the tridiagonal solve agrees with Gaussian elimination on the same system", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 40 }).chain((n) => fc.tuple(fc.array(entry, { minLength: 3 * n, maxLength: 3 * n }), fc.array(entry, { minLength: n, maxLength: n }))), ([bands, b]) => {
        const n = b.length;
        const sub = bands.slice(0, n);
        const sup = bands.slice(n, 2 * n);
        const diag = bands.slice(2 * n).map((d, k) => Math.abs(sub[k]) + Math.abs(sup[k]) + Math.abs(d) + 1);
        const dense = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (j === i ? diag[i] : j === i - 1 ? sub[i] : j === i + 1 ? sup[i] : 0)));
        const expected = solveLinearSystem(dense, b);
        const rhs = b.slice();
        solveTridiagonalInPlace(n, sub, diag.slice(), sup, rhs);
        rhs.forEach((x, k) => expect(Math.abs(x - expected[k])).toBeLessThan(1e-10 * (1 + Math.abs(expected[k]))));
      }),
    );
  });
});
