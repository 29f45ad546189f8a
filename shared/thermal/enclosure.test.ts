import { describe, expect, it } from "vitest";
import { fieldOf, relativeError } from "./checks.test-helpers";
import { EnclosureInput, checkViewFactors, solveEnclosure } from "./enclosure";
import { STEFAN_BOLTZMANN_W_PER_M2_K4 as SIGMA } from "./errors";

/**
 * Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer, 6th ed.,
 * Sec. 13.2.3 (section numbers from memory): the two-surface enclosure, q12 = σ(T1⁴ − T2⁴) /
 * [(1 − ε1)/(ε1A1) + 1/(A1F12) + (1 − ε2)/(ε2A2)], the general form behind Table 13.3.
 */
function twoSurface(t1: number, e1: number, a1: number, t2: number, e2: number, a2: number, f12: number): number {
  return (SIGMA * (t1 ** 4 - t2 ** 4)) / ((1 - e1) / (e1 * a1) + 1 / (a1 * f12) + (1 - e2) / (e2 * a2));
}

describe("solveEnclosure: two-surface enclosures", () => {
  it("large parallel plates", () => {
    // Plates of Çengel & Ghajar, 5th ed., Ch. 13 (800 K, ε 0.2; 500 K, ε 0.7): 3625 W/m², from memory.
    const { surfaces } = solveEnclosure({
      surfaces: [
        { area_m2: 1, emissivity: 0.2, temperature_K: 800 },
        { area_m2: 1, emissivity: 0.7, temperature_K: 500 },
      ],
      viewFactors: [[0, 1], [1, 0]],
    });
    expect(relativeError(surfaces[0].netHeat_W, twoSurface(800, 0.2, 1, 500, 0.7, 1, 1))).toBeLessThan(1e-12);
    expect(relativeError(surfaces[0].netHeat_W, 3625)).toBeLessThan(1e-3);
    expect(surfaces[1].netHeat_W).toBeCloseTo(-surfaces[0].netHeat_W, 9);
  });

  it("long concentric cylinders, per metre", () => {
    // Inner 20 mm tube at 77 K (ε 0.02), outer 50 mm at 300 K (ε 0.05): the setting of Incropera
    // et al., 7th ed., Problem 13.63. F11 = 0, F12 = 1, F21 = r1/r2, F22 = 1 − r1/r2 (Incropera
    // et al., 6th ed., Sec. 13.1.2, summation and reciprocity). Derived by hand: 0.49884 W/m.
    const a1 = Math.PI * 0.02;
    const a2 = Math.PI * 0.05;
    const { surfaces } = solveEnclosure({
      surfaces: [
        { area_m2: a1, emissivity: 0.02, temperature_K: 77 },
        { area_m2: a2, emissivity: 0.05, temperature_K: 300 },
      ],
      viewFactors: [[0, 1], [0.4, 0.6]],
    });
    expect(relativeError(surfaces[1].netHeat_W, twoSurface(300, 0.05, a2, 77, 0.02, a1, 0.4))).toBeLessThan(1e-12);
    expect(surfaces[0].netHeat_W).toBeCloseTo(-0.49884, 5);
  });

  it("concentric spheres", () => {
    // r1 = 0.25 m at 77 K (ε 0.04) inside r2 = 0.30 m at 300 K (ε 0.06): F21 = (r1/r2)².
    const a1 = 4 * Math.PI * 0.25 ** 2;
    const a2 = 4 * Math.PI * 0.3 ** 2;
    const f21 = (0.25 / 0.3) ** 2;
    const { surfaces } = solveEnclosure({
      surfaces: [
        { area_m2: a1, emissivity: 0.04, temperature_K: 77 },
        { area_m2: a2, emissivity: 0.06, temperature_K: 300 },
      ],
      viewFactors: [[0, 1], [f21, 1 - f21]],
    });
    // Table 13.3 of Incropera et al., 6th ed.: q = σA1(T2⁴ − T1⁴)/(1/ε1 + (1 − ε2)/ε2·(r1/r2)²).
    const tableForm = (SIGMA * a1 * (300 ** 4 - 77 ** 4)) / (1 / 0.04 + ((1 - 0.06) / 0.06) * f21);
    expect(relativeError(-surfaces[0].netHeat_W, tableForm)).toBeLessThan(1e-12);
  });

  it("black surfaces exchange σ(T1⁴ − T2⁴)A with radiosity equal to the emissive power", () => {
    const { surfaces } = solveEnclosure({
      surfaces: [
        { area_m2: 2, emissivity: 1, temperature_K: 300 },
        { area_m2: 2, emissivity: 1, temperature_K: 77 },
      ],
      viewFactors: [[0, 1], [1, 0]],
    });
    expect(relativeError(surfaces[0].netHeat_W, 2 * SIGMA * (300 ** 4 - 77 ** 4))).toBeLessThan(1e-12);
    expect(relativeError(surfaces[0].radiosity_W_per_m2, SIGMA * 300 ** 4)).toBeLessThan(1e-14);
  });
});

/**
 * Incropera et al., 6th ed., Sec. 13.2.5, the re-radiating surface (Eq. 13.30 in the numbering
 * our brief gives; equation number not checked against the book):
 * q1 = σ(T1⁴ − T2⁴) / [(1 − ε1)/(ε1A1) + 1/(A1F12 + 1/(1/(A1F1R) + 1/(A2F2R))) + (1 − ε2)/(ε2A2)].
 */
function reradiating(t1: number, e1: number, a1: number, t2: number, e2: number, a2: number, f12: number, f1r: number, f2r: number): number {
  const space = 1 / (a1 * f12 + 1 / (1 / (a1 * f1r) + 1 / (a2 * f2r)));
  return (SIGMA * (t1 ** 4 - t2 ** 4)) / ((1 - e1) / (e1 * a1) + space + (1 - e2) / (e2 * a2));
}

describe("solveEnclosure: three surfaces, one re-radiating", () => {
  // The paint-baking oven of Incropera et al., 6th ed., Ch. 13 (the re-radiating-surface example,
  // from memory): a long equilateral triangular duct, 1 m sides; heater 1200 K, ε 0.8; panels
  // 500 K, ε 0.4; the third wall insulated, ε 0.8. Every F_ij = 0.5. Book answer, from memory:
  // about 37 kW per metre of duct.
  const oven = (insulatedEmissivity: number): EnclosureInput => ({
    surfaces: [
      { area_m2: 1, emissivity: 0.8, temperature_K: 1200 },
      { area_m2: 1, emissivity: 0.4, temperature_K: 500 },
      { area_m2: 1, emissivity: insulatedEmissivity, reradiating: true },
    ],
    viewFactors: [[0, 0.5, 0.5], [0.5, 0, 0.5], [0.5, 0.5, 0]],
  });

  it("matches the closed form of the re-radiating network", () => {
    const { surfaces } = solveEnclosure(oven(0.8));
    const closed = reradiating(1200, 0.8, 1, 500, 0.4, 1, 0.5, 0.5, 0.5);
    expect(relativeError(surfaces[0].netHeat_W, closed)).toBeLessThan(1e-12);
    expect(relativeError(surfaces[0].netHeat_W, 37000)).toBeLessThan(0.01);
    expect(surfaces[2].netHeat_W).toBe(0);
  });

  it("finds the insulated wall's temperature from its radiosity", () => {
    // Derived by hand from the same network: the two space resistances to R are equal, so
    // J_R = (J1 + J2)/2 and σT_R⁴ = J_R; J1 = σT1⁴ − q(1 − ε1)/ε1, J2 = σT2⁴ + q(1 − ε2)/ε2.
    const { surfaces } = solveEnclosure(oven(0.8));
    const q = surfaces[0].netHeat_W;
    const j1 = SIGMA * 1200 ** 4 - (q * 0.2) / 0.8;
    const j2 = SIGMA * 500 ** 4 + (q * 0.6) / 0.4;
    expect(relativeError(surfaces[2].temperature_K, ((j1 + j2) / 2 / SIGMA) ** 0.25)).toBeLessThan(1e-12);
    expect(relativeError(surfaces[0].radiosity_W_per_m2, j1)).toBeLessThan(1e-12);
  });

  it("does not depend on the re-radiating wall's emissivity", () => {
    const a = solveEnclosure(oven(0.8)).surfaces;
    const b = solveEnclosure(oven(0.05)).surfaces;
    for (let i = 0; i < 3; i++) {
      expect(relativeError(b[i].temperature_K, a[i].temperature_K)).toBeLessThan(1e-12);
      if (i < 2) expect(relativeError(b[i].netHeat_W, a[i].netHeat_W)).toBeLessThan(1e-12);
    }
  });

  it("handles a concave re-radiating wall that sees itself", () => {
    // Two facing strips 1 m wide, 1 m apart, the two side walls joined into one re-radiating
    // surface R (2 m). Hottel's crossed-strings rule (H. C. Hottel & A. F. Sarofim, Radiative
    // Transfer, 1967, Ch. 2; from memory): F12 = (2√2 − 2)/2 = √2 − 1. Then F1R = F2R = 2 − √2,
    // F_R1 = F_R2 = A1F1R/A_R and F_RR = 1 − 2F_R1 by reciprocity and summation.
    const f12 = Math.SQRT2 - 1;
    const f1r = 1 - f12;
    const fr1 = f1r / 2;
    const { surfaces } = solveEnclosure({
      surfaces: [
        { area_m2: 1, emissivity: 0.6, temperature_K: 900 },
        { area_m2: 1, emissivity: 0.3, temperature_K: 400 },
        { area_m2: 2, emissivity: 0.5, reradiating: true },
      ],
      viewFactors: [[0, f12, f1r], [f12, 0, f1r], [fr1, fr1, 1 - 2 * fr1]],
    });
    expect(relativeError(surfaces[0].netHeat_W, reradiating(900, 0.6, 1, 400, 0.3, 1, f12, f1r, f1r))).toBeLessThan(1e-12);
  });
});

describe("solveEnclosure: a known net heat", () => {
  it("returns the temperature that carries the given heat", () => {
    // Round trip on the parallel plates above: give plate 1 the heat it had at 800 K.
    const base = solveEnclosure({
      surfaces: [
        { area_m2: 1, emissivity: 0.2, temperature_K: 800 },
        { area_m2: 1, emissivity: 0.7, temperature_K: 500 },
      ],
      viewFactors: [[0, 1], [1, 0]],
    });
    const { surfaces } = solveEnclosure({
      surfaces: [
        { area_m2: 1, emissivity: 0.2, netHeat_W: base.surfaces[0].netHeat_W },
        { area_m2: 1, emissivity: 0.7, temperature_K: 500 },
      ],
      viewFactors: [[0, 1], [1, 0]],
    });
    expect(surfaces[0].temperature_K).toBeCloseTo(800, 9);
  });
});

describe("checkViewFactors", () => {
  it("accepts a matrix that obeys summation and reciprocity", () => {
    expect(() => checkViewFactors([Math.PI * 0.02, Math.PI * 0.05], [[0, 1], [0.4, 0.6]])).not.toThrow();
  });

  it.each<[string, number[], unknown, string]>([
    ["a row that does not sum to 1", [1, 1], [[0, 0.9], [1, 0]], "viewFactors[0]"],
    ["a factor above 1", [1, 1], [[0, 1.2], [1, 0]], "viewFactors[0][1]"],
    ["a negative factor", [1, 1], [[-0.1, 1.1], [1, 0]], "viewFactors[0][0]"],
    ["a broken reciprocity", [1, 2], [[0, 1], [1, 0]], "viewFactors[1][0]"],
    ["a matrix of the wrong size", [1, 1, 1], [[0, 1], [1, 0]], "viewFactors"],
    ["a short row", [1, 1], [[0, 1], [1]], "viewFactors[1]"],
    ["an area of 0", [1, 0], [[0, 1], [1, 0]], "areas_m2[1]"],
  ])("rejects %s", (_name, areas, matrix, field) => {
    expect(fieldOf(() => checkViewFactors(areas, matrix as number[][]))).toBe(field);
  });

  it("lets the caller loosen the tolerance, within reason", () => {
    expect(() => checkViewFactors([1, 1], [[0, 0.999], [1, 0]], 1e-2)).not.toThrow();
    expect(fieldOf(() => checkViewFactors([1, 1], [[0, 1], [1, 0]], 0.5))).toBe("tolerance");
  });
});

describe("solveEnclosure: bad input", () => {
  const valid = (): EnclosureInput => ({
    surfaces: [
      { area_m2: 1, emissivity: 0.8, temperature_K: 1200 },
      { area_m2: 1, emissivity: 0.4, netHeat_W: -1000 },
      { area_m2: 1, emissivity: 0.8, reradiating: true },
    ],
    viewFactors: [[0, 0.5, 0.5], [0.5, 0, 0.5], [0.5, 0.5, 0]],
  });

  it("accepts the valid base case", () => {
    expect(() => solveEnclosure(valid())).not.toThrow();
  });

  it.each<[string, (input: EnclosureInput) => void, string]>([
    ["a single surface", (i) => (i.surfaces = i.surfaces.slice(0, 1)), "surfaces"],
    ["an area of 0", (i) => (i.surfaces[1].area_m2 = 0), "surfaces[1].area_m2"],
    ["an emissivity of 0", (i) => (i.surfaces[1].emissivity = 0), "surfaces[1].emissivity"],
    ["an emissivity above 1", (i) => (i.surfaces[2].emissivity = 1.1), "surfaces[2].emissivity"],
    ["no boundary condition", (i) => delete i.surfaces[1].netHeat_W, "surfaces[1]"],
    ["two boundary conditions", (i) => (i.surfaces[0].netHeat_W = 10), "surfaces[0]"],
    ["a temperature of 0 K", (i) => (i.surfaces[0].temperature_K = 0), "surfaces[0].temperature_K"],
    ["a net heat that is not a number", (i) => (i.surfaces[1].netHeat_W = Number.NaN), "surfaces[1].netHeat_W"],
    ["no surface of known temperature", (i) => ((i.surfaces[0] = { area_m2: 1, emissivity: 0.8, netHeat_W: 1000 }), undefined), "surfaces"],
    ["a view-factor row that does not sum to 1", (i) => (i.viewFactors[2] = [0.5, 0.4, 0]), "viewFactors[2]"],
    ["a view-factor matrix of the wrong size", (i) => (i.viewFactors = [[0, 1], [1, 0]]), "viewFactors"],
    ["more heat drawn than the enclosure can give", (i) => (i.surfaces[1].netHeat_W = -1e9), "surfaces[1].netHeat_W"],
  ])("rejects %s, naming the field", (_name, spoil, field) => {
    const input = valid();
    spoil(input);
    expect(fieldOf(() => solveEnclosure(input))).toBe(field);
  });

  it("rejects a surface that exchanges with nothing of known temperature", () => {
    // Surface 1 sees only itself: its radiosity is undetermined.
    const input: EnclosureInput = {
      surfaces: [
        { area_m2: 1, emissivity: 0.5, temperature_K: 300 },
        { area_m2: 1, emissivity: 0.5, netHeat_W: 0 },
      ],
      viewFactors: [[1, 0], [0, 1]],
    };
    expect(fieldOf(() => solveEnclosure(input))).toBe("viewFactors");
  });
});
