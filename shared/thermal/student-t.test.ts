import { describe, expect, it } from "vitest";
import { ThermalInputError } from "./errors";
import { studentTCdf, studentTQuantile } from "./student-t";

// NIST/SEMATECH e-Handbook of Statistical Methods, Table 1.3.6.7.2, upper critical values of
// Student's t, printed to three decimals (values recalled from the table: from memory).
// Columns: upper-tail probability 0.10, 0.05, 0.025, 0.01, 0.005, 0.001.
const upperTail = [0.1, 0.05, 0.025, 0.01, 0.005, 0.001];
const table: Array<[number, number[]]> = [
  [1, [3.078, 6.314, 12.706, 31.821, 63.657]], // the 0.001 entry is left out: tables disagree in the last digit
  [2, [1.886, 2.92, 4.303, 6.965, 9.925, 22.327]],
  [5, [1.476, 2.015, 2.571, 3.365, 4.032, 5.893]],
  [8, [1.397, 1.86, 2.306, 2.896, 3.355, 4.501]],
  [10, [1.372, 1.812, 2.228, 2.764, 3.169, 4.144]],
  [20, [1.325, 1.725, 2.086, 2.528, 2.845, 3.552]],
  [30, [1.31, 1.697, 2.042, 2.457, 2.75, 3.385]],
  [100, [1.29, 1.66, 1.984, 2.364, 2.626, 3.174]],
];

describe("studentTQuantile against the NIST/SEMATECH t table", () => {
  it.each(table)("ν = %i", (nu, row) => {
    row.forEach((expected, column) => {
      // Half a unit in the third decimal, the table's rounding.
      expect(Math.abs(studentTQuantile(1 - upperTail[column], nu) - expected)).toBeLessThanOrEqual(0.0005 + 1e-9);
    });
  });

  it("tends to the normal quantiles as ν grows (the table's ∞ row: 1.282, 1.645, 1.960, 2.326, 2.576, 3.090)", () => {
    [1.282, 1.645, 1.96, 2.326, 2.576, 3.09].forEach((expected, column) => {
      expect(Math.abs(studentTQuantile(1 - upperTail[column], 1e7) - expected)).toBeLessThanOrEqual(0.0005 + 1e-9);
    });
  });

  it("is antisymmetric and zero at the median", () => {
    expect(studentTQuantile(0.5, 7)).toBe(0);
    expect(studentTQuantile(0.025, 7)).toBeCloseTo(-studentTQuantile(0.975, 7), 12);
  });

  it("inverts the CDF", () => {
    for (const nu of [1, 3, 8, 47, 1000]) {
      for (const p of [0.6, 0.9, 0.975, 0.999]) expect(studentTCdf(studentTQuantile(p, nu), nu)).toBeCloseTo(p, 12);
    }
  });

  it("refuses probabilities outside (0, 1) and non-positive degrees of freedom", () => {
    expect(() => studentTQuantile(1, 5)).toThrow(ThermalInputError);
    expect(() => studentTQuantile(0, 5)).toThrow(ThermalInputError);
    expect(() => studentTQuantile(0.975, 0)).toThrow(ThermalInputError);
  });
});

describe("studentTCdf", () => {
  // Closed forms for ν = 1 and 2 (e.g. Johnson, Kotz & Balakrishnan, Continuous Univariate
  // Distributions, vol. 2, 2nd ed., ch. 28; from memory).
  it("for one degree of freedom is the Cauchy CDF, 1/2 + atan(t)/π (closed form)", () => {
    for (const t of [-3, -0.4, 0, 1, 12.706]) expect(studentTCdf(t, 1)).toBeCloseTo(0.5 + Math.atan(t) / Math.PI, 12);
  });

  it("for two degrees of freedom is 1/2 + t/(2√(2 + t²)) (closed form)", () => {
    for (const t of [-2, 0.3, 4.303]) expect(studentTCdf(t, 2)).toBeCloseTo(0.5 + t / (2 * Math.sqrt(2 + t * t)), 12);
  });
});
