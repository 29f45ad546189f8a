import { describe, expect, it } from "vitest";
import { fieldOf, relativeError } from "./checks.test-helpers";
import { emissivityAt } from "./emissivity";
import { STEFAN_BOLTZMANN_W_PER_M2_K4 as SIGMA } from "./errors";
import { StackInput, estimateStack } from "./radiation-network";

describe("estimateStack: large parallel plates", () => {
  // Y. A. Çengel & A. J. Ghajar, Heat and Mass Transfer: Fundamentals and Applications, 5th ed.,
  // Ch. 13, the radiation-shield example: plates at 800 K (ε 0.2) and 500 K (ε 0.7), a thin sheet
  // of ε 0.1 on both sides between them. Book answers, from memory: 3625 W/m² without the sheet,
  // 806 W/m² with it (the book rounds σ to 5.67e-8, 0.007 % below CODATA).
  const plates = (shields: StackInput["shields"]): StackInput => ({
    geometry: { kind: "planar", area_m2: 1 },
    warm: { temperature_K: 800, emissivity: 0.2 },
    cold: { temperature_K: 500, emissivity: 0.7 },
    shields,
  });

  it("matches the textbook heat flux without and with one shield", () => {
    expect(relativeError(estimateStack(plates([])).heatFlux_W_per_m2, 3625)).toBeLessThan(1e-3);
    expect(relativeError(estimateStack(plates([{ warmSide: 0.1, coldSide: 0.1 }])).heatFlux_W_per_m2, 806)).toBeLessThan(1e-3);
  });

  it("matches the closed form for parallel plates with a shield to rounding", () => {
    // Çengel & Ghajar, 5th ed., Ch. 13 (radiation shields): q = σ(T1⁴ − T2⁴) /
    // [(1/ε1 + 1/ε2 − 1) + (1/ε3,1 + 1/ε3,2 − 1)]. Derived by hand: 805.6906 W/m².
    const closedForm = (SIGMA * (800 ** 4 - 500 ** 4)) / (1 / 0.2 + 1 / 0.7 - 1 + (1 / 0.1 + 1 / 0.1 - 1));
    const result = estimateStack(plates([{ warmSide: 0.1, coldSide: 0.1 }]));
    expect(relativeError(result.heatFlux_W_per_m2, closedForm)).toBeLessThan(1e-12);
    expect(result.heatFlux_W_per_m2).toBeCloseTo(805.6906, 3);
  });

  it("puts the shield at the temperature the closed form gives", () => {
    // Same source: σT3⁴ = σT1⁴ − q·(1/ε1 + 1/ε3 − 1). Derived by hand: T3 = 677.49 K.
    const result = estimateStack(plates([{ warmSide: 0.1, coldSide: 0.1 }]));
    const q = result.heatFlux_W_per_m2;
    const t3 = ((SIGMA * 800 ** 4 - q * (1 / 0.2 + 1 / 0.1 - 1)) / SIGMA) ** 0.25;
    expect(relativeError(result.shields[0].temperature_K, t3)).toBeLessThan(1e-12);
    expect(result.shields[0].temperature_K).toBeCloseTo(677.49, 2);
  });

  it("gives the black-body flux for black plates", () => {
    // Stefan–Boltzmann law between two black parallel plates (Incropera et al., 6th ed., Table 13.3 with ε = 1).
    const result = estimateStack({ ...plates([]), warm: { temperature_K: 800, emissivity: 1 }, cold: { temperature_K: 500, emissivity: 1 } });
    expect(relativeError(result.heatFlux_W_per_m2, SIGMA * (800 ** 4 - 500 ** 4))).toBeLessThan(1e-14);
  });
});

describe("estimateStack: long concentric cylinders", () => {
  // The setting of F. P. Incropera, D. P. DeWitt, T. L. Bergman & A. S. Lavine, Fundamentals of
  // Heat and Mass Transfer, 7th ed., Problem 13.63: a 20 mm tube at 77 K (ε 0.02) inside a 50 mm
  // tube at 300 K (ε 0.05), evacuated; then a 35 mm shield of ε 0.02 on both sides midway.
  const tubes = (shields: StackInput["shields"]): StackInput => ({
    geometry: { kind: "cylinder", coldRadius_m: 0.01, warmRadius_m: 0.025, length_m: 1 },
    warm: { temperature_K: 300, emissivity: 0.05 },
    cold: { temperature_K: 77, emissivity: 0.02 },
    shields,
  });

  it("matches the long-concentric-cylinder closed form", () => {
    // Incropera et al., 6th ed., Table 13.3: q = σA1(T2⁴ − T1⁴)/(1/ε1 + (1 − ε2)/ε2·(r1/r2)).
    // Derived by hand: 0.49884 W per metre of tube.
    const a1 = 2 * Math.PI * 0.01;
    const closedForm = (SIGMA * a1 * (300 ** 4 - 77 ** 4)) / (1 / 0.02 + ((1 - 0.05) / 0.05) * (0.01 / 0.025));
    const result = estimateStack(tubes([]));
    expect(relativeError(result.heatLeak_W, closedForm)).toBeLessThan(1e-12);
    expect(result.heatLeak_W).toBeCloseTo(0.49884, 5);
  });

  it("halves the heat gain with the midway shield", () => {
    // Derived by hand from the series network of Incropera et al., 6th ed., Sec. 13.2.4 (section
    // number from memory), per metre:
    // ΣR = 0.98/(0.02·π·0.02) + 1/(π·0.02) + 2·0.98/(0.02·π·0.035) + 1/(π·0.035) + 0.95/(0.05·π·0.05)
    //    = 1817.15 m⁻², q = σ(300⁴ − 77⁴)/ΣR = 0.25167 W/m, 49.55 % below the unshielded 0.49884 W/m.
    const result = estimateStack(tubes([{ warmSide: 0.02, coldSide: 0.02, radius_m: 0.0175 }]));
    expect(result.heatLeak_W).toBeCloseTo(0.25167, 5);
    expect(1 - result.heatLeak_W / estimateStack(tubes([])).heatLeak_W).toBeCloseTo(0.4955, 4);
  });

  it("spaces a shield midway by default and reports its area", () => {
    const result = estimateStack(tubes([{ warmSide: 0.02, coldSide: 0.02 }]));
    expect(result.shields[0].radius_m).toBeCloseTo(0.0175, 15);
    expect(result.shields[0].area_m2).toBeCloseTo(2 * Math.PI * 0.0175, 15);
    expect(result.heatLeak_W).toBeCloseTo(0.25167, 5);
  });

  it("reports the heat flux on the cold wall's area", () => {
    const result = estimateStack(tubes([]));
    expect(result.heatFlux_W_per_m2).toBeCloseTo(result.heatLeak_W / (2 * Math.PI * 0.01), 15);
  });
});

describe("estimateStack: concentric spheres", () => {
  // An invented vessel: a 0.25 m radius sphere at 77 K (ε 0.04) inside a 0.30 m one at 300 K (ε 0.06).
  const spheres = (shields: StackInput["shields"]): StackInput => ({
    geometry: { kind: "sphere", coldRadius_m: 0.25, warmRadius_m: 0.3 },
    warm: { temperature_K: 300, emissivity: 0.06 },
    cold: { temperature_K: 77, emissivity: 0.04 },
    shields,
  });

  it("matches the concentric-sphere closed form", () => {
    // Incropera et al., 6th ed., Table 13.3: q = σA1(T2⁴ − T1⁴)/(1/ε1 + (1 − ε2)/ε2·(r1/r2)²).
    const a1 = 4 * Math.PI * 0.25 ** 2;
    const closedForm = (SIGMA * a1 * (300 ** 4 - 77 ** 4)) / (1 / 0.04 + ((1 - 0.06) / 0.06) * (0.25 / 0.3) ** 2);
    expect(relativeError(estimateStack(spheres([])).heatLeak_W, closedForm)).toBeLessThan(1e-12);
  });

  it("matches two sphere-pair closed forms in series with one shield", () => {
    // Each gap is a two-surface enclosure of Table 13.3 (Incropera et al., 6th ed.); with the same
    // heat through both, σ(T_w⁴ − T_c⁴) = q·(R_outer pair + R_inner pair), each R = (1/ε_in +
    // (1 − ε_out)/ε_out·(r_in/r_out)²)/A_in. Derived by hand from those formulas.
    const r = 0.275;
    const eps = 0.03;
    const outerPair = (1 / eps + ((1 - 0.06) / 0.06) * (r / 0.3) ** 2) / (4 * Math.PI * r * r);
    const innerPair = (1 / 0.04 + ((1 - eps) / eps) * (0.25 / r) ** 2) / (4 * Math.PI * 0.25 ** 2);
    const closedForm = (SIGMA * (300 ** 4 - 77 ** 4)) / (outerPair + innerPair);
    const result = estimateStack(spheres([{ warmSide: eps, coldSide: eps, radius_m: r }]));
    expect(relativeError(result.heatLeak_W, closedForm)).toBeLessThan(1e-12);
    // And the shield's σT⁴ is the cold wall's plus q times the inner pair's resistance.
    const ts = ((SIGMA * 77 ** 4 + closedForm * innerPair) / SIGMA) ** 0.25;
    expect(relativeError(result.shields[0].temperature_K, ts)).toBeLessThan(1e-12);
  });
});

describe("estimateStack: identical shields", () => {
  it("divides the heat by N + 1 when every surface has the same emissivity", () => {
    // J. P. Holman, Heat Transfer, 10th ed., Sec. 8-8 (radiation shields): between large parallel
    // planes of equal emissivity, n shields of that emissivity give 1/(n + 1) of the heat (from memory).
    const input = (n: number): StackInput => ({
      geometry: { kind: "planar", area_m2: 2 },
      warm: { temperature_K: 300, emissivity: 0.05 },
      cold: { temperature_K: 77, emissivity: 0.05 },
      shields: Array.from({ length: n }, () => ({ warmSide: 0.05, coldSide: 0.05 })),
    });
    const bare = estimateStack(input(0)).heatLeak_W;
    expect(relativeError(estimateStack(input(10)).heatLeak_W, bare / 11)).toBeLessThan(1e-12);
    expect(relativeError(estimateStack(input(1000)).heatLeak_W, bare / 1001)).toBeLessThan(1e-10);
  });
});

describe("estimateStack: the resistance ladder", () => {
  const input: StackInput = {
    geometry: { kind: "planar", area_m2: 1 },
    warm: { temperature_K: 300, emissivity: 0.1 },
    cold: { temperature_K: 77, emissivity: 0.2 },
    shields: [{ warmSide: 0.05, coldSide: 0.04 }, { warmSide: 0.03, coldSide: 1 }],
  };

  it("lists every resistance warm to cold with its label", () => {
    expect(estimateStack(input).resistances.map((r) => `${r.kind}: ${r.label}`)).toEqual([
      "surface: warm wall surface",
      "space: gap 1 space",
      "surface: shield 1 warm face",
      "surface: shield 1 cold face",
      "space: gap 2 space",
      "surface: shield 2 warm face",
      "surface: shield 2 cold face",
      "space: gap 3 space",
      "surface: cold wall surface",
    ]);
  });

  it("gives each face (1 − ε)/(εA) and each gap 1/A, and shares that sum to 1", () => {
    // Incropera et al., 6th ed., Sec. 13.2: surface resistance (1 − ε)/(εA), space resistance 1/(A·F).
    const { resistances } = estimateStack(input);
    const values = resistances.map((r) => r.value);
    expect(values[0]).toBeCloseTo(9, 12); // (1 − 0.1)/0.1
    expect(values[2]).toBeCloseTo(19, 12); // (1 − 0.05)/0.05
    expect(values[3]).toBeCloseTo(24, 12); // (1 − 0.04)/0.04
    expect(values[6]).toBe(0); // a black face has no surface resistance
    expect(values[8]).toBeCloseTo(4, 12); // (1 − 0.2)/0.2
    expect(values[1]).toBe(1);
    expect(resistances.reduce((sum, r) => sum + r.share, 0)).toBeCloseTo(1, 14);
  });

  it("takes one pass when every emissivity is constant", () => {
    expect(estimateStack(input).iterations).toBe(1);
  });
});

describe("estimateStack: emissivity that depends on temperature", () => {
  // Hagen–Rubens-like film, ε = 0.03·(T/300)^0.5 (see emissivity.test.ts for the source).
  const film = { kind: "power" as const, reference: 0.03, referenceTemperature_K: 300, exponent: 0.5 };
  const input: StackInput = {
    geometry: { kind: "planar", area_m2: 1 },
    warm: { temperature_K: 300, emissivity: 0.05 },
    cold: { temperature_K: 4.2, emissivity: film },
    shields: Array.from({ length: 20 }, () => ({ warmSide: film, coldSide: film })),
  };

  it("iterates, and every gap then carries the same heat at the emissivities of its temperatures", () => {
    // Check against the two-plate formula of Incropera et al., 6th ed., Table 13.3, gap by gap,
    // with ε read off the model at each reported shield temperature.
    const result = estimateStack(input);
    expect(result.iterations).toBeGreaterThan(1);
    const t = [300, ...result.shields.map((s) => s.temperature_K), 4.2];
    for (let g = 0; g < t.length - 1; g++) {
      const upper = g === 0 ? 0.05 : emissivityAt(film, t[g]);
      const lower = emissivityAt(film, t[g + 1]);
      const gapFlux = (SIGMA * (t[g] ** 4 - t[g + 1] ** 4)) / (1 / upper + 1 / lower - 1);
      expect(relativeError(gapFlux, result.heatFlux_W_per_m2)).toBeLessThan(1e-9);
    }
  });

  it("leaks less than the same stack with the room-temperature emissivity everywhere", () => {
    // ε falls with temperature, so every cold face resists more (Hagen–Rubens, as above).
    const constant: StackInput = { ...input, cold: { temperature_K: 4.2, emissivity: 0.03 }, shields: input.shields.map(() => ({ warmSide: 0.03, coldSide: 0.03 })) };
    expect(estimateStack(input).heatLeak_W).toBeLessThan(estimateStack(constant).heatLeak_W);
  });
});

describe("estimateStack: bad input", () => {
  const valid = (): StackInput => ({
    geometry: { kind: "cylinder", coldRadius_m: 0.3, warmRadius_m: 0.4, length_m: 2 },
    warm: { temperature_K: 300, emissivity: 0.05 },
    cold: { temperature_K: 77, emissivity: 0.05 },
    shields: [{ warmSide: 0.03, coldSide: 0.03 }, { warmSide: 0.03, coldSide: 0.03 }, { warmSide: 0.03, coldSide: 0.03 }],
  });

  it("accepts the valid base case", () => {
    expect(() => estimateStack(valid())).not.toThrow();
  });

  it.each<[string, (input: StackInput) => void, string]>([
    ["a warm wall at 0 K", (i) => (i.warm.temperature_K = 0), "warm.temperature_K"],
    ["a cold wall below 0 K", (i) => (i.cold.temperature_K = -4), "cold.temperature_K"],
    ["a cold wall that is not a number", (i) => (i.cold.temperature_K = Number.NaN), "cold.temperature_K"],
    ["a warm wall no warmer than the cold one", (i) => (i.warm.temperature_K = 77), "warm.temperature_K"],
    ["a warm-wall emissivity of 0", (i) => (i.warm.emissivity = 0), "warm.emissivity"],
    ["a cold-wall emissivity above 1", (i) => (i.cold.emissivity = 1.2), "cold.emissivity"],
    ["a shield face with emissivity above 1", (i) => (i.shields[2].warmSide = 1.5), "shields[2].warmSide"],
    ["a shield face with an unsorted table", (i) => (i.shields[1].coldSide = { kind: "table", points: [[80, 0.03], [20, 0.02]] }), "shields[1].coldSide.points[1][0]"],
    ["more than 1000 shields", (i) => (i.shields = Array.from({ length: 1001 }, () => ({ warmSide: 0.03, coldSide: 0.03 }))), "shields"],
    ["shields that are not a list", (i) => (i.shields = "many" as unknown as StackInput["shields"]), "shields"],
    ["an unknown geometry", (i) => (i.geometry = { kind: "cone" } as unknown as StackInput["geometry"]), "geometry.kind"],
    ["a planar area of 0", (i) => (i.geometry = { kind: "planar", area_m2: 0 }), "geometry.area_m2"],
    ["a cold radius of 0", (i) => (i.geometry = { kind: "cylinder", coldRadius_m: 0, warmRadius_m: 0.4, length_m: 2 }), "geometry.coldRadius_m"],
    ["a warm radius inside the cold one", (i) => (i.geometry = { kind: "sphere", coldRadius_m: 0.4, warmRadius_m: 0.3 }), "geometry.warmRadius_m"],
    ["a cylinder without length", (i) => (i.geometry = { kind: "cylinder", coldRadius_m: 0.3, warmRadius_m: 0.4, length_m: 0 }), "geometry.length_m"],
    ["a shield radius outside the warm wall", (i) => (i.shields[0].radius_m = 0.45), "shields[0].radius_m"],
    ["a shield radius inside the cold wall", (i) => (i.shields[2].radius_m = 0.3), "shields[2].radius_m"],
    [
      "shield radii that do not fall warm to cold",
      (i) => {
        i.shields[0].radius_m = 0.35;
        i.shields[1].radius_m = 0.37;
        i.shields[2].radius_m = 0.32;
      },
      "shields[1].radius_m",
    ],
    ["a given radius that leaves no room for the evenly spaced next shield", (i) => (i.shields[0].radius_m = 0.34), "shields[0].radius_m"],
    ["a shield radius on a planar stack", (i) => ((i.geometry = { kind: "planar", area_m2: 1 }), (i.shields[1].radius_m = 0.35)), "shields[1].radius_m"],
  ])("rejects %s, naming the field", (_name, spoil, field) => {
    const input = valid();
    spoil(input);
    expect(fieldOf(() => estimateStack(input))).toBe(field);
  });
});
