import { describe, expect, it } from "vitest";
import type { AssemblyDesign } from "./assembly-design";
import { estimateAssembly, validateAssembly } from "./assembly";
import { thrownInputError } from "./checks.test-helpers";

// A valid two-segment design; each case below breaks one field of it.
function design(): AssemblyDesign {
  return {
    geometry: { kind: "cylinder", coldRadius_m: 0.3, warmRadius_m: 0.4, length_m: 1.5, flatEnds: 2 },
    warm: { temperature_K: 295, emissivity: 0.1 },
    cold: { temperature_K: 4.222, emissivity: 0.05, cryogen: "helium-4", capacity_L: 250 },
    layup: [
      { kind: "block", layers: 30, reflector: { warmSide: 0.03, coldSide: 0.03 }, model: "correlation", layerDensity_per_cm: 20 },
      { kind: "stage", label: "nitrogen shield", temperature_K: 77.355, emissivity: 0.05, cryogen: "nitrogen", capacity_L: 60 },
      { kind: "block", layers: 10, reflector: { warmSide: 0.03, coldSide: 0.03 }, model: "radiation" },
    ],
    supports: [{ material: "g10-normal", area_m2: 1e-4, length_m: 0.1, count: 4, from: "warm", to: 0 }],
    vacuum: { pressure_Pa: 1e-4, gas: "helium" },
  };
}

// Each case: what to break, the field path the error must name, and words of the allowed range.
const cases: Array<[string, (d: AssemblyDesign) => void, string, string]> = [
  ["too many layers", (d) => ((d.layup[2] as { layers: number }).layers = 1001), "layup[2].layers", "a whole number from 1 to 1000"],
  ["a fractional layer count", (d) => ((d.layup[0] as { layers: number }).layers = 2.5), "layup[0].layers", "a whole number from 1 to 1000"],
  ["a reflector emissivity above 1", (d) => ((d.layup[2] as { reflector: { coldSide: number } }).reflector.coldSide = 1.2), "layup[2].reflector.coldSide", "an emissivity above 0 and at most 1"],
  ["a bad low model", (d) => ((d.layup[2] as { reflector: object }).reflector = { warmSide: 0.03, coldSide: 0.03, low: { warmSide: 0, coldSide: 0.01 } }), "layup[2].reflector.low.warmSide", "an emissivity above 0"],
  ["an unknown model", (d) => ((d.layup[2] as { model: string }).model = "magic"), "layup[2].model", "one of radiation, correlation, layers"],
  ["a correlation without layer density", (d) => delete (d.layup[0] as { layerDensity_per_cm?: number }).layerDensity_per_cm, "layup[0].layerDensity_per_cm", "a number above 0 layers/cm"],
  ["a negative correlation coefficient", (d) => ((d.layup[0] as { coefficients?: object }).coefficients = { solid: -1, solidExponent: 2.63, radiation: 7e-10, gas: 1.46e4 }), "layup[0].coefficients.solid", "a number of at least 0"],
  ["a degradation factor below 1", (d) => ((d.layup[2] as { degradationFactor?: number }).degradationFactor = 0.5), "layup[2].degradationFactor", "a number of at least 1"],
  ["a stage warmer than the warm wall", (d) => ((d.layup[1] as { temperature_K: number }).temperature_K = 300), "layup[1].temperature_K", "a temperature below warm.temperature_K (295 K)"],
  ["a cold vessel warmer than the stage", (d) => (d.cold.temperature_K = 80), "cold.temperature_K", "a temperature below layup[1].temperature_K (77.355 K)"],
  ["a zero temperature", (d) => (d.warm.temperature_K = 0), "warm.temperature_K", "a number above 0 K"],
  ["an inner warm radius", (d) => ((d.geometry as { warmRadius_m: number }).warmRadius_m = 0.2), "geometry.warmRadius_m", "a radius above geometry.coldRadius_m"],
  ["three flat ends", (d) => ((d.geometry as { flatEnds?: number }).flatEnds = 3), "geometry.flatEnds", "a whole number from 0 to 2"],
  ["a bad capacity", (d) => (d.cold.capacity_L = -5), "cold.capacity_L", "a number above 0 L"],
  ["an unknown stage cryogen", (d) => ((d.layup[1] as { cryogen?: string }).cryogen = "xenon"), "layup[1].cryogen", "one of helium-4"],
  ["a support ending on the warm side of its start", (d) => (d.supports![0] = { ...d.supports![0], from: 0, to: 0 }), "supports[0].to", '"cold" or a stage colder than supports[0].from'],
  ["a support to a missing stage", (d) => (d.supports![0].to = 4), "supports[0].to", '"cold" or a stage number from 0 to 0'],
  ["an unknown support material", (d) => ((d.supports![0] as { material: string }).material = "unobtainium"), "supports[0].material", "one of stainless-304"],
  ["a negative pressure", (d) => (d.vacuum.pressure_Pa = -1), "vacuum.pressure_Pa", "a number of at least 0 Pa"],
  ["an unknown gas", (d) => ((d.vacuum as { gas: string }).gas = "xenon"), "vacuum.gas", "one of helium"],
  ["an item of unknown kind", (d) => ((d.layup[1] as { kind: string }).kind = "shelf"), "layup[1].kind", '"block" or "stage"'],
];

describe("estimateAssembly input checks", () => {
  it("accepts the base design", () => {
    expect(() => validateAssembly(design())).not.toThrow();
    expect(estimateAssembly(design()).stages).toHaveLength(2);
  });

  it.each(cases)("refuses %s, naming the field and the range", (_name, breakIt, field, words) => {
    const d = design();
    breakIt(d);
    const error = thrownInputError(() => estimateAssembly(d));
    expect(error.field).toBe(field);
    expect(error.allowed).toContain(words);
    expect(error.message.startsWith(`${field} must be `)).toBe(true);
  });

  it("refuses something that is not a design", () => {
    expect(thrownInputError(() => estimateAssembly(null as unknown as AssemblyDesign)).field).toBe("design");
    expect(thrownInputError(() => estimateAssembly({ ...design(), layup: "none" } as unknown as AssemblyDesign)).field).toBe("layup");
  });
});
