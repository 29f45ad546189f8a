import fc from "fast-check";
import type { Emissivity } from "./emissivity";

/**
 * Test-only (imported by *.property.test.ts, never by the engine): fast-check generators for
 * emissivity models and wall temperatures in the range real cryostat surfaces occupy. Power
 * laws rise with temperature, n from 0 to 1 (metals: n ≈ 0.5 in the Hagen–Rubens regime),
 * from a reference of 0.01 to 0.5; tables rise gently. Steeply rising, falling or sub-0.001
 * emissivities are left out on purpose: there a shield chain can have more than one
 * self-consistent solution (see chain-solve.ts).
 */
export const constantEmissivity = fc.double({ min: 0.005, max: 1, noNaN: true });

export const powerEmissivity = fc.record({
  kind: fc.constant("power" as const),
  reference: fc.double({ min: 0.01, max: 0.5, noNaN: true }),
  referenceTemperature_K: fc.double({ min: 50, max: 400, noNaN: true }),
  exponent: fc.double({ min: 0, max: 1, noNaN: true }),
});

export const tableEmissivity = fc
  .tuple(fc.double({ min: 0.005, max: 0.2, noNaN: true }), fc.array(fc.double({ min: 1, max: 1.6, noNaN: true }), { minLength: 1, maxLength: 5 }))
  .map(([first, ratios]) => {
    const points: [number, number][] = [[4, first]];
    ratios.forEach((ratio, i) => points.push([4 * 2 ** (i + 2), Math.min(1, points[i][1] * ratio)]));
    return { kind: "table" as const, points };
  });

export const anyEmissivity: fc.Arbitrary<Emissivity> = fc.oneof(constantEmissivity, powerEmissivity, tableEmissivity);

/** A cold wall from 4 K to 200 K and a warm wall 1 K to 400 K above it. */
export const wallTemperatures = fc
  .tuple(fc.double({ min: 4, max: 200, noNaN: true }), fc.double({ min: 1, max: 400, noNaN: true }))
  .map(([cold_K, rise_K]) => ({ cold_K, warm_K: cold_K + rise_K }));
