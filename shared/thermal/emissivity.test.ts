import { describe, expect, it } from "vitest";
import { fieldOf } from "./checks.test-helpers";
import { Emissivity, emissivityAt, emissivitySlope, isConstantEmissivity, validateEmissivity } from "./emissivity";

// Hagen–Rubens regime: for a metal whose resistivity is proportional to T, ε ∝ T^0.5
// (R. Siegel & J. R. Howell, Thermal Radiation Heat Transfer, 4th ed., Ch. 4, the Hagen–Rubens
// relation; from memory). The 0.03 at 300 K is a typical aluminized polyester film (common practice).
const filmHagenRubens: Emissivity = { kind: "power", reference: 0.03, referenceTemperature_K: 300, exponent: 0.5 };

describe("emissivityAt", () => {
  it("returns a constant emissivity at any temperature", () => {
    expect(emissivityAt(0.05, 4.2)).toBe(0.05);
    expect(emissivityAt(0.05, 300)).toBe(0.05);
  });

  it("follows the square-root law of the Hagen–Rubens regime", () => {
    // Derived by hand from ε = ε_ref·(T/T_ref)^0.5: at 75 K, 0.03·√(75/300) = 0.015.
    expect(emissivityAt(filmHagenRubens, 75)).toBeCloseTo(0.015, 15);
    // At 4.2 K: 0.03·√0.014 = 0.0035496…
    expect(emissivityAt(filmHagenRubens, 4.2)).toBeCloseTo(0.03 * Math.sqrt(0.014), 15);
  });

  it("handles exponents other than one half", () => {
    // Derived by hand: 0.02·(150/300)^1 = 0.01, and 0.02·(600/300)^2 = 0.08.
    expect(emissivityAt({ kind: "power", reference: 0.02, referenceTemperature_K: 300, exponent: 1 }, 150)).toBeCloseTo(0.01, 15);
    expect(emissivityAt({ kind: "power", reference: 0.02, referenceTemperature_K: 300, exponent: 2 }, 600)).toBeCloseTo(0.08, 15);
  });

  it("caps a power law at 1, since no gray surface emits more than a black body", () => {
    // 0.5·(900/300) would be 1.5.
    expect(emissivityAt({ kind: "power", reference: 0.5, referenceTemperature_K: 300, exponent: 1 }, 900)).toBe(1);
  });

  it("interpolates a table linearly in temperature and holds the end values outside it", () => {
    const table: Emissivity = { kind: "table", points: [[20, 0.01], [80, 0.02], [300, 0.04]] };
    // Derived by hand: halfway between 80 K and 300 K is 190 K, ε = 0.03.
    expect(emissivityAt(table, 190)).toBeCloseTo(0.03, 15);
    expect(emissivityAt(table, 50)).toBeCloseTo(0.015, 15);
    expect(emissivityAt(table, 80)).toBe(0.02);
    expect(emissivityAt(table, 4)).toBe(0.01);
    expect(emissivityAt(table, 400)).toBe(0.04);
  });

  it("accepts a one-point table as a constant", () => {
    expect(emissivityAt({ kind: "table", points: [[77, 0.1]] }, 300)).toBe(0.1);
  });

  it("names the field it was given when the model is bad", () => {
    expect(fieldOf(() => emissivityAt(1.5, 300, "reflector.warmSide"))).toBe("reflector.warmSide");
  });

  it("rejects a temperature at or below 0 K", () => {
    expect(fieldOf(() => emissivityAt(0.1, 0))).toBe("temperature_K");
    expect(fieldOf(() => emissivityAt(0.1, Number.NaN))).toBe("temperature_K");
  });
});

describe("emissivitySlope", () => {
  it("is n·ε/T for a power law and the segment slope inside a table", () => {
    // Derived by hand: dε/dT = 0.5·0.015/75 = 1e-4 per kelvin at 75 K.
    expect(emissivitySlope(filmHagenRubens, 75)).toBeCloseTo(1e-4, 15);
    expect(emissivitySlope({ kind: "table", points: [[20, 0.01], [80, 0.02]] }, 50)).toBeCloseTo(0.01 / 60, 15);
    expect(emissivitySlope({ kind: "table", points: [[20, 0.01], [80, 0.02]] }, 100)).toBe(0);
    expect(emissivitySlope(0.2, 100)).toBe(0);
  });

  it("is zero where a power law is capped at 1", () => {
    expect(emissivitySlope({ kind: "power", reference: 0.5, referenceTemperature_K: 300, exponent: 1 }, 900)).toBe(0);
  });
});

describe("isConstantEmissivity", () => {
  it("tells constant models from temperature-dependent ones", () => {
    expect(isConstantEmissivity(0.04)).toBe(true);
    expect(isConstantEmissivity({ kind: "power", reference: 0.04, referenceTemperature_K: 300, exponent: 0 })).toBe(true);
    expect(isConstantEmissivity({ kind: "table", points: [[20, 0.04], [300, 0.04]] })).toBe(true);
    expect(isConstantEmissivity(filmHagenRubens)).toBe(false);
    expect(isConstantEmissivity({ kind: "table", points: [[20, 0.02], [300, 0.04]] })).toBe(false);
  });
});

describe("validateEmissivity", () => {
  const f = "shields[2].warmSide";

  it("accepts every well-formed model", () => {
    expect(() => validateEmissivity(1, f)).not.toThrow();
    expect(() => validateEmissivity(filmHagenRubens, f)).not.toThrow();
    expect(() => validateEmissivity({ kind: "table", points: [[20, 0.01], [300, 1]] }, f)).not.toThrow();
  });

  it.each<[string, unknown, string]>([
    ["a constant of 0", 0, f],
    ["a constant above 1", 1.01, f],
    ["a constant that is not a number", "0.1", f],
    ["a power law with reference 0", { kind: "power", reference: 0, referenceTemperature_K: 300, exponent: 0.5 }, `${f}.reference`],
    ["a power law with reference above 1", { kind: "power", reference: 1.2, referenceTemperature_K: 300, exponent: 0.5 }, `${f}.reference`],
    ["a power law at 0 K", { kind: "power", reference: 0.1, referenceTemperature_K: 0, exponent: 0.5 }, `${f}.referenceTemperature_K`],
    ["a power law without an exponent", { kind: "power", reference: 0.1, referenceTemperature_K: 300 }, `${f}.exponent`],
    ["a power law with an absurd exponent", { kind: "power", reference: 0.1, referenceTemperature_K: 300, exponent: 12 }, `${f}.exponent`],
    ["an empty table", { kind: "table", points: [] }, `${f}.points`],
    ["a table point that is not a pair", { kind: "table", points: [[20, 0.1, 3]] }, `${f}.points[0]`],
    ["a table at 0 K", { kind: "table", points: [[0, 0.1]] }, `${f}.points[0][0]`],
    ["a table out of order", { kind: "table", points: [[80, 0.1], [20, 0.05]] }, `${f}.points[1][0]`],
    ["a table with a repeated temperature", { kind: "table", points: [[20, 0.1], [20, 0.2]] }, `${f}.points[1][0]`],
    ["a table emissivity of 0", { kind: "table", points: [[20, 0.1], [80, 0]] }, `${f}.points[1][1]`],
    ["a table emissivity above 1", { kind: "table", points: [[20, 1.1]] }, `${f}.points[0][1]`],
    ["an unknown kind", { kind: "polynomial", coefficients: [0.1] }, `${f}.kind`],
    ["nothing", undefined, f],
  ])("rejects %s, naming the field", (_name, model, field) => {
    expect(fieldOf(() => validateEmissivity(model as Emissivity, f))).toBe(field);
  });
});
