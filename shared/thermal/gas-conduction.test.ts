import { describe, expect, it } from "vitest";
import { fieldOf } from "./checks.test-helpers";
import { GasConductionInput, freeMolecularParameter, gasConduction, meanFreePath, overallAccommodation } from "./gas-conduction";

describe("freeMolecularParameter", () => {
  it("matches the published G for helium and nitrogen with the gauge at 300 K", () => {
    // R. F. Barron, Cryogenic Heat Transfer (1999), table of the free-molecular conduction
    // parameter G at 300 K: helium 2.10, nitrogen 1.19 W/(m²·K·Pa) (from memory). By hand from
    // Corruccini's G = [(γ + 1)/(γ − 1)]·√(R/(8πMT)): helium 4·√(8.3145/(8π·0.0040026·300)) = 2.0995,
    // nitrogen 6·√(8.3145/(8π·0.0280134·300)) = 1.1904.
    expect(Math.abs(freeMolecularParameter("helium", 300) - 2.1) / 2.1).toBeLessThan(0.005);
    expect(Math.abs(freeMolecularParameter("nitrogen", 300) - 1.19) / 1.19).toBeLessThan(0.005);
    expect(freeMolecularParameter("helium", 300)).toBeCloseTo(2.0995, 4);
    expect(freeMolecularParameter("nitrogen", 300)).toBeCloseTo(1.1904, 4);
  });
});

describe("overallAccommodation", () => {
  it("is a/(2 − a) for two parallel plates of the same coefficient", () => {
    // Corruccini 1959 with a_h = a_c = a and A_c/A_h = 1; derived by hand: a = 0.5 gives 1/3.
    expect(overallAccommodation(0.5, 0.5)).toBeCloseTo(1 / 3, 15);
  });

  it("weights the warm surface by the area ratio for concentric surfaces", () => {
    // Corruccini 1959; derived by hand: a_c = 1, a_h = 0.3, A_c/A_h = 0.5 → 0.3/(0.3 + 0.35) = 0.46154.
    expect(overallAccommodation(0.3, 1, 0.5)).toBeCloseTo(0.3 / 0.65, 15);
  });
});

describe("gasConduction", () => {
  const base: GasConductionInput = { gas: "helium", pressure_Pa: 1e-3, gaugeTemperature_K: 300, warm_K: 300, cold_K: 77, accommodation: { warm: 0.5, cold: 0.5 } };

  it("gives q = G·a·P·(T_h − T_c)", () => {
    // Derived by hand: 2.0995 × (1/3) × 1e-3 Pa × 223 K = 0.15607 W/m².
    const result = gasConduction(base);
    expect(result.heatFlux_W_per_m2).toBeCloseTo(0.15607, 5);
    expect(result.overallAccommodation).toBeCloseTo(1 / 3, 15);
  });

  it("takes the default coefficients at each surface's temperature", () => {
    // Helium on clean metal, 0.29 at 300 K and 0.42 at 76 K (Corruccini 1959 as reproduced by
    // Barron, from memory); derived by hand: 0.42·0.29/(0.29 + 0.42 − 0.42·0.29) = 0.20707.
    const result = gasConduction({ ...base, cold_K: 76, accommodation: undefined });
    expect(result.overallAccommodation).toBeCloseTo(0.20707, 5);
  });

  it("reports the mean free path at the gauge's conditions", () => {
    // Common practice (J. F. O'Hanlon, A User's Guide to Vacuum Technology, 3rd ed., Ch. 2; from
    // memory): for air at room temperature λ ≈ 5×10⁻³ cm·Torr / P, i.e. 6.7 mm at 1 Pa.
    const result = gasConduction({ ...base, gas: "air", pressure_Pa: 1 });
    expect(Math.abs(result.meanFreePath_m! - 6.67e-3) / 6.67e-3).toBeLessThan(0.03);
    expect(meanFreePath("air", 1, 300)).toBe(result.meanFreePath_m);
  });

  it("warns when the mean free path is not much larger than the gap", () => {
    // Helium at 1 Pa and 300 K: λ ≈ 20 mm (hard-sphere, as above), a 10 mm gap gives Kn ≈ 2.
    const crowded = gasConduction({ ...base, pressure_Pa: 1, gap_m: 0.01 });
    expect(crowded.knudsen).toBeLessThan(10);
    expect(crowded.warning).toMatch(/Knudsen number/);
    const rarefied = gasConduction({ ...base, pressure_Pa: 1e-3, gap_m: 0.01 });
    expect(rarefied.knudsen).toBeGreaterThan(10);
    expect(rarefied.warning).toBeUndefined();
    expect(gasConduction(base).knudsen).toBeUndefined();
  });

  it("conducts nothing at zero pressure", () => {
    const result = gasConduction({ ...base, pressure_Pa: 0, gap_m: 0.01 });
    expect(result.heatFlux_W_per_m2).toBe(0);
    expect(result.meanFreePath_m).toBeUndefined();
  });

  it.each<[string, Partial<GasConductionInput> & Record<string, unknown>, string]>([
    ["an unknown gas", { gas: "xenon" as GasConductionInput["gas"] }, "gas"],
    ["a negative pressure", { pressure_Pa: -1 }, "pressure_Pa"],
    ["a gauge at 0 K", { gaugeTemperature_K: 0 }, "gaugeTemperature_K"],
    ["a cold surface at 0 K", { cold_K: 0 }, "cold_K"],
    ["a warm surface no warmer than the cold one", { warm_K: 77 }, "warm_K"],
    ["a warm accommodation above 1", { accommodation: { warm: 1.2, cold: 0.5 } }, "accommodation.warm"],
    ["a cold accommodation of 0", { accommodation: { warm: 0.5, cold: 0 } }, "accommodation.cold"],
    ["a gap of 0", { gap_m: 0 }, "gap_m"],
    ["an area ratio of 0", { areaRatio: 0 }, "areaRatio"],
  ])("rejects %s, naming the field", (_name, change, field) => {
    expect(fieldOf(() => gasConduction({ ...base, ...change } as GasConductionInput))).toBe(field);
  });
});
