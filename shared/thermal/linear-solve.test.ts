import { describe, expect, it } from "vitest";
import { ThermalInputError } from "./errors";
import { solveLinearSystem, solveTridiagonalInPlace } from "./linear-solve";

describe("solveLinearSystem", () => {
  it("solves a system whose first pivot is zero, which needs row exchanges", () => {
    // Constructed: b = A·x for x = (1, −2, 3), so x is the answer; A[0][0] = 0 forces a pivot swap
    // (G. H. Golub & C. F. Van Loan, Matrix Computations, 4th ed., Sec. 3.4).
    const a = [
      [0, 2, 1],
      [1, 1, 1],
      [2, -1, 4],
    ];
    const x = solveLinearSystem(a, [-1, 2, 16]);
    expect(x[0]).toBeCloseTo(1, 14);
    expect(x[1]).toBeCloseTo(-2, 14);
    expect(x[2]).toBeCloseTo(3, 14);
  });

  it("leaves the caller's matrix as it was", () => {
    const a = [
      [0, 2],
      [3, 1],
    ];
    solveLinearSystem(a, [2, 4]);
    expect(a).toEqual([
      [0, 2],
      [3, 1],
    ]);
  });

  it("refuses a singular matrix", () => {
    expect(() => solveLinearSystem([[1, 2], [2, 4]], [1, 2])).toThrow(ThermalInputError);
  });

  it("refuses a matrix that does not match the right-hand side", () => {
    expect(() => solveLinearSystem([[1, 2]], [1, 2])).toThrow(ThermalInputError);
    expect(() => solveLinearSystem([[1, Number.NaN], [0, 1]], [1, 2])).toThrow(ThermalInputError);
  });
});

describe("solveTridiagonalInPlace", () => {
  it("solves the chain of three equal conductances between 1 and 0", () => {
    // Constructed: −x_{k−1} + 2x_k − x_{k+1} = 0 with x_0 = 1, x_4 = 0 folded into the right-hand
    // side; the answer falls linearly, 3/4, 1/2, 1/4 (conduction through equal resistances in series).
    const rhs = [1, 0, 0];
    solveTridiagonalInPlace(3, [0, -1, -1], [2, 2, 2], [-1, -1, 0], rhs);
    expect(rhs[0]).toBeCloseTo(0.75, 15);
    expect(rhs[1]).toBeCloseTo(0.5, 15);
    expect(rhs[2]).toBeCloseTo(0.25, 15);
  });
});
