import { describe, expect, it } from "vitest";
import { relativeError, thrownUnchecked } from "./checks.test-helpers";
import { ThermalInputError } from "./errors";
import {
  conductivityIntegral,
  SUPPORT_MATERIAL_IDS,
  SUPPORT_MATERIALS,
  supportConduction,
  thermalConductivity,
  type SupportMaterial,
} from "./supports";

describe("thermalConductivity at published check points", () => {
  it("304 stainless is about 15 W/(m·K) at 300 K", () => {
    // Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, Table A.1: AISI 304 at 300 K,
    // 14.9 W/(m·K) (from memory); the NIST fit is quoted to a few per cent.
    expect(relativeError(thermalConductivity("stainless-304", 300), 14.9)).toBeLessThan(0.05);
  });

  it("304 stainless is about 8 W/(m·K) at 77 K (common practice)", () => {
    expect(relativeError(thermalConductivity("stainless-304", 77), 8)).toBeLessThan(0.05);
  });

  it("OFHC copper is within 3 % of pure copper's 401 W/(m·K) at 300 K, where purity hardly matters", () => {
    // Incropera & DeWitt, Table A.1, pure copper at 300 K (from memory).
    expect(relativeError(thermalConductivity("copper-ofhc-rrr100", 300), 401)).toBeLessThan(0.03);
    expect(relativeError(thermalConductivity("copper-ofhc-rrr50", 300), 401)).toBeLessThan(0.03);
  });

  it("purer copper conducts better at low temperature and peaks near 20 K", () => {
    // Physical behaviour shown in Hust & Lankford, NBSIR 84-3007 (1984): impurity scattering
    // limits the low-temperature peak, so RRR 100 exceeds RRR 50 there.
    expect(thermalConductivity("copper-ofhc-rrr100", 20)).toBeGreaterThan(thermalConductivity("copper-ofhc-rrr50", 20));
    expect(thermalConductivity("copper-ofhc-rrr100", 20)).toBeGreaterThan(thermalConductivity("copper-ofhc-rrr100", 77));
  });

  it("PTFE is about 0.25 W/(m·K) near room temperature (common practice)", () => {
    expect(relativeError(thermalConductivity("ptfe", 300), 0.25)).toBeLessThan(0.15);
  });

  it("G-10 conducts better along the warp than normal to the cloth across its range", () => {
    for (const t of [12, 20, 50, 77, 150, 300]) {
      expect(thermalConductivity("g10-warp", t)).toBeGreaterThan(thermalConductivity("g10-normal", t));
    }
  });

  // Guards the transcribed coefficients: each fit evaluated independently of this code (the
  // published NIST formula typed afresh in a separate Python script), at 4 or 12, 77 and 300 K.
  const independent: Array<[SupportMaterial, number, number]> = [
    ["stainless-304", 4, 0.272396],
    ["stainless-304", 77, 7.92065],
    ["g10-normal", 12, 0.121667],
    ["g10-normal", 77, 0.279965],
    ["g10-warp", 12, 0.151778],
    ["g10-warp", 300, 0.863638],
    ["ptfe", 4, 0.0459949],
    ["ptfe", 77, 0.232392],
    ["copper-ofhc-rrr50", 20, 1367.85],
    ["copper-ofhc-rrr50", 150, 408.421],
    ["copper-ofhc-rrr100", 12, 1813.68],
    ["copper-ofhc-rrr100", 77, 547.2],
  ];
  it.each(independent)("%s at %f K is %f W/(m·K) (independent evaluation of the fit)", (material, t, expected) => {
    expect(relativeError(thermalConductivity(material, t), expected)).toBeLessThan(1e-5);
  });
});

describe("conductivityIntegral", () => {
  it("304 stainless 4→300 K is about 3060 W/m", () => {
    // Ekin, Experimental Techniques for Low-Temperature Measurements (2006), App. A2.1,
    // thermal conductivity integrals: 304 stainless 4→300 K ≈ 3060 W/m (from memory).
    expect(relativeError(conductivityIntegral("stainless-304", 4, 300), 3060)).toBeLessThan(0.02);
  });

  it("304 stainless 77→300 K is about 2735 W/m", () => {
    // Same table, 3060 − 325 W/m (the 4→77 K entry, from memory). The fit gives 2705 W/m.
    expect(relativeError(conductivityIntegral("stainless-304", 77, 300), 3060 - 325)).toBeLessThan(0.02);
  });

  // To 1e-8 relative against an independent quadrature (scipy.integrate.quad, relative tolerance
  // 1e-13) of the same published fits.
  const quadrature: Array<[SupportMaterial, number, number, number]> = [
    ["stainless-304", 4, 300, 3030.8435830824],
    ["stainless-304", 77, 300, 2704.7130656896],
    ["stainless-304", 1, 4, 0.4422553376],
    ["g10-normal", 10, 300, 111.1609864093],
    ["g10-warp", 12, 300, 161.6876189432],
    ["ptfe", 4, 300, 71.4269028882],
    ["copper-ofhc-rrr50", 4, 300, 161223.8132274664],
    ["copper-ofhc-rrr100", 4, 300, 194330.6334144572],
    ["copper-ofhc-rrr100", 4, 77, 100540.0417696906],
  ];
  it.each(quadrature)("%s from %f to %f K is %f W/m to 1e-8", (material, cold, warm, expected) => {
    expect(relativeError(conductivityIntegral(material, cold, warm), expected)).toBeLessThan(1e-8);
  });

  it("is zero over an empty interval", () => {
    expect(conductivityIntegral("ptfe", 77, 77)).toBe(0);
  });

  it("holds k at the fit's lower limit below it: the 4→10 K part of G-10 normal is k(10 K)·6 K", () => {
    // Hand check of the range policy in supports.ts: ∫4→300 = k(10)·(10 − 4) + ∫10→300.
    const expected = thermalConductivity("g10-normal", 10) * 6 + conductivityIntegral("g10-normal", 10, 300);
    expect(relativeError(conductivityIntegral("g10-normal", 4, 300), expected)).toBeLessThan(1e-12);
    const result = supportConduction({ material: "g10-warp", area_m2: 1e-4, length_m: 0.2, warm_K: 77, cold_K: 4.2 });
    expect(result.warnings.join(" ")).toMatch(/below the .* fit's range \(from 12 K\)/);
  });

  it("refuses a cold end below 1 K and a warm end below the cold end", () => {
    expect(thrownUnchecked(() => conductivityIntegral("g10-normal", 0.5, 300)).field).toBe("cold_K");
    expect(thrownUnchecked(() => conductivityIntegral("stainless-304", 0.5, 300)).field).toBe("cold_K");
    expect(thrownUnchecked(() => conductivityIntegral("ptfe", 100, 50)).field).toBe("warm_K");
    expect(thrownUnchecked(() => conductivityIntegral("ptfe", 4, 450)).field).toBe("warm_K");
  });
});

describe("supportConduction", () => {
  it("is (A/L)·∫k dT·count: three 304 tubes of 10 mm², 200 mm long, 4→300 K carry 0.4546 W", () => {
    // Hand-derived: (1e-5 m² / 0.2 m) × 3030.84 W/m × 3.
    const result = supportConduction({
      material: "stainless-304",
      area_m2: 1e-5,
      length_m: 0.2,
      warm_K: 300,
      cold_K: 4,
      count: 3,
    });
    expect(result.heat_W).toBeCloseTo(0.454627, 5);
    expect(result.conductivityIntegral_W_per_m).toBeCloseTo(3030.84, 2);
    expect(result.warnings).toEqual([]);
  });

  it("warns, and extrapolates, for a warm end between 300 K and 400 K", () => {
    const result = supportConduction({ material: "g10-normal", area_m2: 1e-4, length_m: 0.1, warm_K: 320, cold_K: 77 });
    expect(result.warnings).toHaveLength(1);
    expect(result.warnings[0]).toContain("extrapolated");
    expect(result.heat_W).toBeGreaterThan(supportConduction({ material: "g10-normal", area_m2: 1e-4, length_m: 0.1, warm_K: 300, cold_K: 77 }).heat_W);
  });

  it.each<[string, Record<string, unknown>]>([
    ["material", { material: "titanium" }],
    ["area_m2", { area_m2: 0 }],
    ["length_m", { length_m: -1 }],
    ["count", { count: 2.5 }],
    ["count", { count: 0 }],
    ["cold_K", { cold_K: 0.5 }],
    ["warm_K", { warm_K: 500 }],
  ])("refuses a bad %s", (field, override) => {
    const input = { material: "ptfe", area_m2: 1e-4, length_m: 0.1, warm_K: 300, cold_K: 77, ...override };
    const error = thrownUnchecked(() => supportConduction(input as Parameters<typeof supportConduction>[0]));
    expect(error).toBeInstanceOf(ThermalInputError);
    expect(error.field).toBe(field);
  });

  it("names a fit source and range for every material", () => {
    for (const id of SUPPORT_MATERIAL_IDS) {
      const fit = SUPPORT_MATERIALS[id];
      expect(fit.fitSource).toContain("NIST");
      expect(fit.validRange_K[0]).toBeLessThan(fit.validRange_K[1]);
      expect(fit.coefficients).toHaveLength(9);
    }
  });
});
