import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { GasName, freeMolecularParameter, gasConduction, overallAccommodation } from "./gas-conduction";

const gas = fc.constantFrom<GasName>("helium", "hydrogen", "neon", "nitrogen", "air", "argon");
const coefficient = fc.double({ min: 0.01, max: 1, noNaN: true });
const temperatures = fc.tuple(fc.double({ min: 2, max: 400, noNaN: true }), fc.double({ min: 0.1, max: 400, noNaN: true })).map(([cold_K, rise]) => ({ cold_K, warm_K: cold_K + rise }));

describe("gas conduction laws", () => {
  it("the heat flux is proportional to the pressure", () => {
    fc.assert(
      fc.property(gas, temperatures, coefficient, coefficient, fc.double({ min: 1e-8, max: 1, noNaN: true }), fc.double({ min: 0.01, max: 100, noNaN: true }), (g, t, aw, ac, p, factor) => {
        const input = { gas: g, gaugeTemperature_K: 300, ...t, accommodation: { warm: aw, cold: ac } };
        const one = gasConduction({ ...input, pressure_Pa: p }).heatFlux_W_per_m2;
        const many = gasConduction({ ...input, pressure_Pa: p * factor }).heatFlux_W_per_m2;
        expect(Math.abs(many - factor * one) / (factor * one)).toBeLessThan(1e-12);
      }),
    );
  });

  it("with fixed coefficients the heat flux is proportional to the temperature difference", () => {
    fc.assert(
      fc.property(gas, temperatures, temperatures, coefficient, coefficient, (g, t1, t2, aw, ac) => {
        const q = (t: { cold_K: number; warm_K: number }) =>
          gasConduction({ gas: g, pressure_Pa: 1e-3, gaugeTemperature_K: 300, ...t, accommodation: { warm: aw, cold: ac } }).heatFlux_W_per_m2 / (t.warm_K - t.cold_K);
        expect(Math.abs(q(t1) - q(t2)) / q(t1)).toBeLessThan(1e-9);
      }),
    );
  });

  it("between parallel plates the overall accommodation is at most either surface's, and 1 only for two perfect ones", () => {
    fc.assert(
      fc.property(coefficient, coefficient, (aw, ac) => {
        const a = overallAccommodation(aw, ac);
        expect(a).toBeLessThanOrEqual(Math.min(aw, ac) * (1 + 1e-12));
        expect(a).toBeGreaterThan(0);
      }),
    );
    expect(overallAccommodation(1, 1)).toBe(1);
  });

  it("G falls as one over the square root of the gauge temperature", () => {
    fc.assert(
      fc.property(gas, fc.double({ min: 1, max: 1000, noNaN: true }), fc.double({ min: 1, max: 1000, noNaN: true }), (g, t1, t2) => {
        const ratio = freeMolecularParameter(g, t1) / freeMolecularParameter(g, t2);
        expect(Math.abs(ratio - Math.sqrt(t2 / t1)) / Math.sqrt(t2 / t1)).toBeLessThan(1e-12);
      }),
    );
  });

  it("a warning appears exactly when the Knudsen number is below 10", () => {
    fc.assert(
      fc.property(gas, fc.double({ min: 1e-6, max: 100, noNaN: true }), fc.double({ min: 1e-4, max: 1, noNaN: true }), (g, p, gap) => {
        const result = gasConduction({ gas: g, pressure_Pa: p, gaugeTemperature_K: 300, warm_K: 300, cold_K: 77, gap_m: gap });
        expect(result.warning !== undefined).toBe(result.knudsen! < 10);
      }),
    );
  });
});
