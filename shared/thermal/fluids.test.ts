import { describe, expect, it } from "vitest";
import { relativeError, thrownUnchecked } from "./checks.test-helpers";
import { ThermalInputError } from "./errors";
import {
  CRYOGEN_IDS,
  CRYOGENS,
  cryogenProperties,
  saturationTemperatureSlope_K_per_Pa,
  ventedGasFactor,
  type CryogenId,
} from "./fluids";

describe("CRYOGENS table", () => {
  it("has all eight cryogens, each with a named source and a vapour lighter than its liquid", () => {
    expect(CRYOGEN_IDS.sort()).toEqual(
      ["argon", "helium-4", "hydrogen-normal", "hydrogen-para", "methane", "neon", "nitrogen", "oxygen"].sort(),
    );
    for (const id of CRYOGEN_IDS) {
      const fluid = CRYOGENS[id];
      expect(fluid.id).toBe(id);
      expect(fluid.source.length).toBeGreaterThan(20);
      expect(fluid.vapourDensity_kg_per_m3).toBeGreaterThan(0);
      expect(fluid.vapourDensity_kg_per_m3).toBeLessThan(fluid.liquidDensity_kg_per_m3);
      expect(fluid.latentHeat_J_per_kg).toBeGreaterThan(0);
    }
  });

  it("normal hydrogen matches the NIST WebBook 1 atm row (20.369 K, 70.850 kg/m³)", () => {
    // NIST Chemistry WebBook, Saturation Properties for Hydrogen — Pressure Increments, 1.0000 atm row.
    const h2 = cryogenProperties("hydrogen-normal");
    expect(h2.saturationTemperature_K).toBeCloseTo(20.369, 3);
    expect(h2.liquidDensity_kg_per_m3).toBeCloseTo(70.85, 2);
  });

  it("helium and nitrogen agree with an independent tabulation to 0.5 %", () => {
    // University of Wisconsin–Madison LN2/LHe facility, "Nitrogen and helium data" page, from
    // McCarty & Arp 1990 (helium) and Jacobsen, Stewart & Jahangiri 1986 (nitrogen):
    // He 125.1 kg/m³, 16.74 kg/m³, 20.75 J/g; N2 806.5 kg/m³, 4.622 kg/m³, 198.8 J/g.
    const he = cryogenProperties("helium-4");
    expect(relativeError(he.liquidDensity_kg_per_m3, 125.1)).toBeLessThan(0.005);
    expect(relativeError(he.vapourDensity_kg_per_m3, 16.74)).toBeLessThan(0.005);
    expect(relativeError(he.latentHeat_J_per_kg, 20_750)).toBeLessThan(0.005);
    const n2 = cryogenProperties("nitrogen");
    expect(relativeError(n2.liquidDensity_kg_per_m3, 806.5)).toBeLessThan(0.005);
    expect(relativeError(n2.vapourDensity_kg_per_m3, 4.622)).toBeLessThan(0.005);
    expect(relativeError(n2.latentHeat_J_per_kg, 198_800)).toBeLessThan(0.005);
  });

  it("molar masses are the IUPAC standard atomic weights (from memory)", () => {
    expect(CRYOGENS["helium-4"].molarMass_kg_per_mol).toBeCloseTo(4.002602e-3, 9);
    expect(CRYOGENS.nitrogen.molarMass_kg_per_mol).toBeCloseTo(2 * 14.0067e-3, 8);
    expect(CRYOGENS.oxygen.molarMass_kg_per_mol).toBeCloseTo(2 * 15.9994e-3, 8);
    expect(CRYOGENS.argon.molarMass_kg_per_mol).toBeCloseTo(39.948e-3, 8);
    expect(CRYOGENS.methane.molarMass_kg_per_mol).toBeCloseTo(12.0107e-3 + 4 * 1.00794e-3, 7);
  });
});

describe("ventedGasFactor", () => {
  it("is about 0.87 for helium: the vent sees 13 % less gas than boils (common practice)", () => {
    expect(ventedGasFactor(cryogenProperties("helium-4"))).toBeCloseTo(0.866, 2);
  });

  it("is about 0.994 for nitrogen: under 1 % (common practice)", () => {
    expect(ventedGasFactor(cryogenProperties("nitrogen"))).toBeCloseTo(0.994, 3);
  });
});

describe("saturationTemperatureSlope_K_per_Pa (Clapeyron)", () => {
  // Expected slopes hand-derived by quadratic interpolation of T(p) through three rows of the CRC
  // Handbook of Chemistry and Physics table "Vapor Pressure of Fluids at Temperatures below 300 K"
  // (edition not noted in the copy read), differentiated at 101.325 kPa:
  // He 4.1/4.2/4.3 K at 90.0/99.0/108.7 kPa → 0.010526 K/kPa;
  // H2 19.5/20.0/20.5 K at 79.89/93.26/108.2 kPa → 0.033302 K/kPa;
  // Ne 26/27/28 K at 71.8/98.5/132.1 kPa → 0.033327 K/kPa (1 K steps: coarse).
  const cases: Array<[CryogenId, number, number]> = [
    ["helium-4", 0.010526, 0.01],
    ["hydrogen-normal", 0.033302, 0.01],
    ["neon", 0.033327, 0.03],
  ];
  it.each(cases)("%s matches the vapour-pressure table (%f K/kPa)", (id, expected_K_per_kPa, tolerance) => {
    const slope_K_per_kPa = saturationTemperatureSlope_K_per_Pa(cryogenProperties(id)) * 1000;
    expect(relativeError(slope_K_per_kPa, expected_K_per_kPa)).toBeLessThan(tolerance);
  });
});

describe("cryogenProperties", () => {
  it("throws ThermalInputError naming the field for an unknown cryogen", () => {
    const error = thrownUnchecked(() => cryogenProperties("xenon" as CryogenId, "stages[1].cryogen"));
    expect(error).toBeInstanceOf(ThermalInputError);
    expect(error.field).toBe("stages[1].cryogen");
    expect(error.allowed).toContain("helium-4");
  });

  it("does not accept inherited object keys as cryogens", () => {
    expect(() => cryogenProperties("toString" as CryogenId)).toThrow(ThermalInputError);
  });
});
