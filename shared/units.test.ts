import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { QUANTITIES, fromSi, toSi, type QuantityKind } from "./units";

describe("unit conversions", () => {
  // Reference values: NIST SP 811 (2008), Appendix B.8 and B.9, and the definitions of the
  // Fahrenheit scale (°F = 1.8·K − 459.67).
  it.each([
    ["temperature", 77.355, -320.431, "liquid-nitrogen boiling point in °F (definition of °F)"],
    ["temperature", 273.15, 32, "ice point (definition)"],
    ["temperature", 4.222, -452.0704, "helium boiling point, 1.8·4.222 − 459.67"],
    ["heat", 1, 3.412142, "1 W = 3.412142 Btu_IT/h (NIST SP 811 B.9: 1 Btu_IT/h = 0.2930711 W)"],
    ["heatFlux", 1, 0.3169983, "1 W/m² = 0.3169983 Btu/(h·ft²) (NIST SP 811 B.9: 3.154591 W/m²)"],
    ["length", 0.0254, 1, "1 in = 0.0254 m exactly"],
    ["area", 0.09290304, 1, "1 ft² = 0.09290304 m² exactly"],
    ["volume", 3.785411784, 1, "1 US gal = 3.785411784 L exactly"],
    ["mass", 0.45359237, 1, "1 lb = 0.45359237 kg exactly"],
    ["pressure", 101325, 760, "1 atm = 760 torr exactly"],
    ["gaugePressure", 6894.757, 1, "1 psi = 6894.757 Pa (NIST SP 811 B.9)"],
    ["layerDensity", 10, 25.4, "10 layers/cm = 25.4 layers/in"],
  ] as [QuantityKind, number, number, string][])("%s: %f SI is %f US (%s)", (kind, si, us) => {
    expect(fromSi(kind, si, "us")).toBeCloseTo(us, 4);
    expect(toSi(kind, us, "us")).toBeCloseTo(si, 6);
  });

  it("SI is the identity", () => {
    for (const kind of Object.keys(QUANTITIES) as QuantityKind[]) {
      expect(fromSi(kind, 12.5, "si")).toBe(12.5);
      expect(toSi(kind, 12.5, "si")).toBe(12.5);
    }
  });

  it("property: converting to US and back returns the SI value", () => {
    const kinds = Object.keys(QUANTITIES) as QuantityKind[];
    fc.assert(
      fc.property(fc.constantFrom(...kinds), fc.double({ min: 1e-6, max: 1e6, noNaN: true }), (kind, value) => {
        const back = toSi(kind, fromSi(kind, value, "us"), "us");
        expect(Math.abs(back - value)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(value)) + 1e-9);
      }),
    );
  });
});
