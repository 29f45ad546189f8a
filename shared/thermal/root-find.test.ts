import { describe, expect, it } from "vitest";
import { ThermalInputError } from "./errors";
import { brentRoot } from "./root-find";

describe("brentRoot", () => {
  it("finds √2 as the root of x² − 2 to the last few digits", () => {
    // √2 = 1.41421356237309504… (common knowledge).
    expect(Math.abs(brentRoot((x) => x * x - 2, 0, 2) - Math.SQRT2)).toBeLessThan(4e-16);
  });

  it("finds the fixed point of cos x, 0.7390851332151607", () => {
    // The root of cos x − x (the Dottie number, 0.739085133215160641…; from memory).
    expect(Math.abs(brentRoot((x) => Math.cos(x) - x, 0, 1) - 0.7390851332151607)).toBeLessThan(3e-16);
  });

  it("stops within the tolerance it is given", () => {
    let calls = 0;
    const root = brentRoot((x) => (calls++, Math.exp(x) - 10), 0, 10, 1e-6);
    // ln 10 = 2.302585092994046 (common knowledge).
    expect(Math.abs(root - Math.LN10)).toBeLessThan(1e-6);
    expect(calls).toBeLessThan(20);
  });

  it("converges on a sign change even where the function jumps, no slower than bisection", () => {
    let calls = 0;
    const root = brentRoot((x) => (calls++, x < 1 / 3 ? -1 : 1), 0, 1);
    expect(Math.abs(root - 1 / 3)).toBeLessThan(1e-15);
    expect(calls).toBeLessThanOrEqual(60);
  });

  it("returns an end that is already a root, and refuses an interval without a sign change", () => {
    expect(brentRoot((x) => x - 2, 2, 5)).toBe(2);
    expect(() => brentRoot((x) => x * x + 1, -1, 1)).toThrow(ThermalInputError);
    expect(() => brentRoot((x) => x, Number.NaN, 1)).toThrow(ThermalInputError);
  });
});
